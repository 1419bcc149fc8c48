using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Benchmarks;

/// <summary>Phase envelopes and critical points of a lean natural gas (invented composition:
/// methane 0.85, ethane 0.06, propane 0.03, n-butane 0.02, nitrogen 0.02, carbon dioxide 0.02)
/// with Peng–Robinson. The target is a 200-point envelope in under 20 ms in process;
/// docs/performance.md gives the results and their ratio to one model evaluation
/// (<see cref="ModelEvaluation"/>: ln φ of the six components at (T, P) with their T, P and
/// amount derivatives, the unit the tracer calls twice per Newton iteration).</summary>
[MemoryDiagnoser]
public class EnvelopeBenchmarks
{
    /// <summary>The invented lean gas.</summary>
    public static readonly string[] Names = ["methane", "ethane", "propane", "n-butane", "nitrogen", "carbon-dioxide"];

    /// <summary>Its mole fractions.</summary>
    public static readonly double[] Composition = [0.85, 0.06, 0.03, 0.02, 0.02, 0.02];

    /// <summary>The largest step giving about 200 points for this gas (measured: see <see cref="Counts"/>).</summary>
    public const double TwoHundredPointStep = 0.125;

    private CubicMixtureModel _model = null!;
    private EnvelopeTracer _tracer = null!;
    private EnvelopeTracer _default = null!;
    private readonly double[] _lnPhi = new double[6];
    private readonly double[] _dT = new double[6];
    private readonly double[] _dP = new double[6];
    private readonly double[] _dN = new double[36];

    /// <summary>Builds the model and the tracers (each component's Wilson constants computed once).</summary>
    [GlobalSetup]
    public void Setup()
    {
        _model = new CubicMixtureModel(Names.Select(n => CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find(n))).ToList());
        _tracer = new EnvelopeTracer(_model, EnvelopeOptions.Default with { MaximumStep = TwoHundredPointStep });
        _default = new EnvelopeTracer(_model);
    }

    /// <summary>One model evaluation: ln φ and all derivatives of one phase at (T, P).</summary>
    [Benchmark(Baseline = true)]
    public double ModelEvaluation() => _model.LnFugacityCoefficientsAtPressure(240, 5e6, Composition, MixtureRoot.Vapour, _lnPhi, _dT, _dP, _dN);

    /// <summary>The whole envelope from 0.1 MPa bubble to 0.1 MPa dew, about 200 points, with the
    /// critical point, cricondenbar and cricondentherm.</summary>
    [Benchmark]
    public int Envelope200Points() => _tracer.Trace(Composition).Points.Count;

    /// <summary>The same with the default step (0.1).</summary>
    [Benchmark]
    public int EnvelopeDefaultStep() => _default.Trace(Composition).Points.Count;

    /// <summary>The Heidemann–Khalil critical point of the gas.</summary>
    [Benchmark]
    public double CriticalPoint() => CriticalPointCriteria.Locate(_model, Composition)[0].Temperature;
}
