using BenchmarkDotNet.Attributes;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Benchmarks;

/// <summary>P–T flashes of a 10-component natural gas (an invented lean pipeline gas, labelled
/// invented: N2 0.02, CO2 0.01, C1 0.80, C2 0.08, C3 0.04, iC4 0.015, nC4 0.015, iC5 0.008,
/// nC5 0.007, nC6 0.005 mole fractions) with Peng–Robinson and k_ij = 0: a two-phase state (220 K,
/// 4 MPa) and a single-phase one (350 K, 5 MPa), each with its stability test, and a bubble and
/// dew point of the blend R-407C. The target for the P–T flash is 50 µs in process;
/// docs/performance.md gives the results as multiples of one mixture model evaluation
/// (<see cref="ModelEvaluation"/>: ln φ_i of the 10 components on one root at (T, P)).</summary>
[MemoryDiagnoser]
public class MixtureFlashBenchmarks
{
    private static readonly string[] Names =
        ["nitrogen", "carbon-dioxide", "methane", "ethane", "propane", "isobutane", "n-butane", "isopentane", "n-pentane", "n-hexane"];

    private static readonly double[] Gas = [0.02, 0.01, 0.80, 0.08, 0.04, 0.015, 0.015, 0.008, 0.007, 0.005];
    private readonly double[] _lnPhi = new double[10];
    private MixtureEquilibrium _gas = null!;
    private MixtureEquilibrium _blend = null!;
    private double[] _blendFeed = null!;

    /// <summary>Builds the engines.</summary>
    [GlobalSetup]
    public void Setup()
    {
        _gas = MixtureEquilibrium.For(Names.Select(FluidCatalog.Embedded.Find).ToList(), CubicModelKind.PengRobinson);
        _blend = MixtureEquilibrium.For(new[] { "r-32", "r-125", "r-134a" }.Select(FluidCatalog.Embedded.Find).ToList(), CubicModelKind.PengRobinson);
        _blendFeed = Mixture.MoleFractionsFromMass(_blend.Components, [0.23, 0.25, 0.52]);
    }

    /// <summary>One mixture model evaluation: ln φ_i of the gas on its stable root at (T, P): the unit.</summary>
    [Benchmark(Baseline = true)]
    public double ModelEvaluation() => _gas.Model.LnFugacityCoefficientsAtPressure(220, 4e6, Gas, MixtureRoot.Stable, _lnPhi);

    /// <summary>P–T flash of the gas inside its envelope.</summary>
    [Benchmark]
    public double FlashTwoPhase() => _gas.Flash(220, 4e6, Gas).VapourFraction;

    /// <summary>P–T flash of the gas as one stable phase (the stability test alone decides).</summary>
    [Benchmark]
    public double FlashSinglePhase() => _gas.Flash(350, 5e6, Gas).VapourFraction;

    /// <summary>The glide of R-407C at 1 atm: its bubble and dew points at given pressure.</summary>
    [Benchmark]
    public double GlideR407C() => _blend.Glide(101325, _blendFeed).Glide;
}
