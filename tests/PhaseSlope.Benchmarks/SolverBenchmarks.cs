using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Benchmarks;

/// <summary>The coexistence solver on propane with Peng–Robinson, every case per point, beside one
/// model evaluation (the baseline, so the Ratio column is "cost in model evaluations").</summary>
/// <remarks>The solver and property engine are built once (global setup), so the one-off
/// per-solver work (the model's own acentric factor for the ancillary start, the critical
/// series) is not in the per-point figures; <see cref="Program"/> <c>counts</c> reports it.</remarks>
[MemoryDiagnoser]
public class SolverBenchmarks
{
    private const int CurvePoints = 1000;
    private const int ColdPoints = 64;
    private CubicModel _model = null!;
    private CoexistenceSolver _solver = null!;
    private PropertyModel _engine = null!;
    private double[] _coldTemperatures = null!;
    private double[] _pressures = null!;
    private double _temperature;
    private double _density;

    /// <summary>Builds the model, solver and the states visited.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var fluid = FluidCatalog.Embedded.Find("propane");
        _model = CubicModel.For(CubicModelKind.PengRobinson, fluid);
        _engine = new PropertyModel(fluid, _model);
        _solver = _engine.Solver;
        double tmin = _solver.MinimumTemperature;
        double tc = _solver.CriticalTemperature;
        // Fixed, evenly spread states (no randomness between runs).
        _coldTemperatures = [.. Enumerable.Range(0, ColdPoints).Select(i => tmin + (0.999 * tc - tmin) * (i + 0.5) / ColdPoints)];
        _pressures = [.. _coldTemperatures.Select(t => _solver.AtTemperature(t).Pressure)];
        _ = CoexistenceCurve.Trace(_solver, CurvePoints); // warm the per-solver caches
        _ = _solver.AtPressure(0.9999 * _solver.CriticalPressure);
        _temperature = 0.7 * tc;
        _density = _solver.AtTemperature(_temperature).Liquid.Density;
    }

    /// <summary>One residual Helmholtz evaluation with all its T and ρ derivatives: the unit.</summary>
    [Benchmark(Baseline = true)]
    public HelmholtzDerivatives ModelEvaluation() => _model.Residual(_temperature, _density);

    /// <summary>One point of a 1 000-point traced curve (whole curve / 1 000).</summary>
    [Benchmark(OperationsPerInvoke = CurvePoints)]
    public int TracedPoint() => CoexistenceCurve.Trace(_solver, CurvePoints).Count;

    /// <summary>One point of a 1 000-point traced curve with every per-phase property (h, s, cp,
    /// sound speed, … and the along-line slopes) of both phases.</summary>
    [Benchmark(OperationsPerInvoke = CurvePoints)]
    public double TracedPointWithProperties()
    {
        double sum = 0;
        foreach (var point in CoexistenceCurve.Trace(_solver, CurvePoints))
        {
            var full = _engine.Coexistence(point);
            sum += full.Liquid.State.Enthalpy!.Value + full.Vapour.State.Entropy!.Value;
        }

        return sum;
    }

    /// <summary>One cold point at a given temperature (no neighbour), averaged over 64 temperatures
    /// from the lowest valid one to 0.999·Tc.</summary>
    [Benchmark(OperationsPerInvoke = ColdPoints)]
    public double ColdPointAtTemperature()
    {
        double sum = 0;
        foreach (double t in _coldTemperatures)
        {
            sum += _solver.AtTemperature(t).Pressure;
        }

        return sum;
    }

    /// <summary>One point at a given pressure (no neighbour), averaged over the 64 saturation
    /// pressures of the temperatures above.</summary>
    [Benchmark(OperationsPerInvoke = ColdPoints)]
    public double PointAtPressure()
    {
        double sum = 0;
        foreach (double p in _pressures)
        {
            sum += _solver.AtPressure(p).Temperature;
        }

        return sum;
    }
}

/// <summary>Whole curves of 100, 1 000 and 10 000 points: the cost is linear in the points.</summary>
[MemoryDiagnoser]
public class CurveBenchmarks
{
    private CoexistenceSolver _solver = null!;

    /// <summary>Points on the curve.</summary>
    [Params(100, 1000, 10000)]
    public int Points { get; set; }

    /// <summary>Builds the solver and warms its caches.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _solver = CoexistenceSolver.For(FluidCatalog.Embedded.Find("propane"), CubicModelKind.PengRobinson);
        _ = CoexistenceCurve.Trace(_solver, 100);
    }

    /// <summary>The whole curve from the lowest valid temperature to the critical point.</summary>
    [Benchmark]
    public int Curve() => CoexistenceCurve.Trace(_solver, Points).Count;
}
