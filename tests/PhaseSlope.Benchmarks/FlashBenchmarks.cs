using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Benchmarks;

/// <summary>Flashes of R-134a with Peng–Robinson on the refrigeration reference: (P, h) and
/// (P, s) in the superheated vapour (a compressor discharge), inside the dome (after a throttle)
/// and in the compressed liquid, and (T, quality). The target for a (P, h) or (P, s)
/// flash is 20 µs in process; docs/performance.md gives the results as multiples of one model
/// evaluation (<see cref="ModelEvaluation"/>). Each flash builds on a warm engine (its critical
/// point and lowest saturation pressure already known), as in a batch or a cycle.</summary>
[MemoryDiagnoser]
public class FlashBenchmarks
{
    private PropertyModel _engine = null!;
    private IResidualModel _model = null!;
    private double _hVapour, _sVapour, _hTwoPhase, _sTwoPhase, _hLiquid;
    private const double Pressure = 1e6;

    /// <summary>Builds the engine and the specified values from (T, P) states.</summary>
    [GlobalSetup]
    public void Setup()
    {
        var fluid = FluidCatalog.Embedded.Find("r-134a");
        _engine = PropertyModel.For(fluid, CubicModelKind.PengRobinson, ReferenceState.Refrigeration);
        _model = _engine.Model;
        var vapour = _engine.AtPressure(330, Pressure);
        (_hVapour, _sVapour) = (vapour.Enthalpy!.Value, vapour.Entropy!.Value);
        var mixture = _engine.Flash(StateProperty.Pressure, Pressure, StateProperty.Quality, 0.3);
        (_hTwoPhase, _sTwoPhase) = (mixture.Enthalpy!.Value, mixture.Entropy!.Value);
        _hLiquid = _engine.AtPressure(280, Pressure).Enthalpy!.Value;
    }

    /// <summary>One residual Helmholtz evaluation with all its derivatives: the unit.</summary>
    [Benchmark(Baseline = true)]
    public HelmholtzDerivatives ModelEvaluation() => _model.Residual(300, 500, Composition.Pure);

    /// <summary>(P, h) in the superheated vapour.</summary>
    [Benchmark]
    public double PressureEnthalpyVapour() => _engine.Flash(StateProperty.Pressure, Pressure, StateProperty.Enthalpy, _hVapour).Temperature;

    /// <summary>(P, s) in the superheated vapour.</summary>
    [Benchmark]
    public double PressureEntropyVapour() => _engine.Flash(StateProperty.Pressure, Pressure, StateProperty.Entropy, _sVapour).Temperature;

    /// <summary>(P, h) inside the dome.</summary>
    [Benchmark]
    public double PressureEnthalpyTwoPhase() => _engine.Flash(StateProperty.Pressure, Pressure, StateProperty.Enthalpy, _hTwoPhase).Temperature;

    /// <summary>(P, s) inside the dome.</summary>
    [Benchmark]
    public double PressureEntropyTwoPhase() => _engine.Flash(StateProperty.Pressure, Pressure, StateProperty.Entropy, _sTwoPhase).Temperature;

    /// <summary>(P, h) in the compressed liquid.</summary>
    [Benchmark]
    public double PressureEnthalpyLiquid() => _engine.Flash(StateProperty.Pressure, Pressure, StateProperty.Enthalpy, _hLiquid).Temperature;
}
