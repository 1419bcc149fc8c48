using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Benchmarks;

/// <summary>Uncertainty propagation on a 100-point propane curve (Peng–Robinson, Tc, Pc and ω
/// with the alkane family defaults): linear propagation, and Monte Carlo with 10 000 samples
/// (each sample a new model and solver, its curve traced with neighbour starts, samples in
/// parallel on every core), beside one model evaluation (the baseline).</summary>
[MemoryDiagnoser]
public class UncertaintyBenchmarks
{
    private const int CurvePoints = 100;
    private CubicParameterization _parameters = null!;
    private CubicModel _model = null!;
    private IReadOnlyList<CoexistencePoint> _curve = null!;
    private double[] _temperatures = null!;
    private double _temperature;
    private double _density;

    /// <summary>Samples of the Monte Carlo run.</summary>
    [Params(1000, 10000)]
    public int Samples { get; set; }

    /// <summary>Builds the inputs and the nominal curve.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _parameters = new CubicParameterization(FluidCatalog.Embedded.Find("propane"), CubicModelKind.PengRobinson);
        _model = _parameters.Nominal;
        var solver = new CoexistenceSolver(_model, _parameters.MinimumTemperature);
        _curve = CoexistenceCurve.Trace(solver, CurvePoints);
        _temperatures = [.. _curve.Select(p => p.Temperature)];
        _temperature = 0.7 * solver.CriticalTemperature;
        _density = solver.AtTemperature(_temperature).Liquid.Density;
    }

    /// <summary>One residual Helmholtz evaluation with all its T and ρ derivatives: the unit.</summary>
    [Benchmark(Baseline = true)]
    public HelmholtzDerivatives ModelEvaluation() => _model.Residual(_temperature, _density);

    /// <summary>Linear propagation on the whole 100-point curve (nominal curve given).</summary>
    [Benchmark]
    public int LinearCurve() => _curve.Select(p => LinearPropagation.Propagate(p, _parameters, atFixedPressure: false)).Count(u => u.Reason is null);

    /// <summary>Monte Carlo on the whole 100-point curve.</summary>
    [Benchmark]
    public int MonteCarloCurve() => MonteCarloPropagation.AtTemperatures(_parameters, _temperatures, Samples, seed: 1).Count(u => u.Reason is null);
}
