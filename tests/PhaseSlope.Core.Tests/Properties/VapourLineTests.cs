using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>Wet and dry vapour lines. Which fluids are wet (water, ammonia, methanol: small,
/// strongly associating molecules with few internal degrees of freedom) and which are dry
/// (aromatics and alkanes from pentane up) is common practice in the choice of working fluids
/// for organic Rankine cycles, not a published table; the test checks that the models reproduce it.</summary>
public class VapourLineTests
{
    [Theory]
    [InlineData("water", CubicModelKind.PengRobinson)]
    [InlineData("water", CubicModelKind.SoaveRedlichKwong)]
    [InlineData("methanol", CubicModelKind.PengRobinson)]
    [InlineData("ammonia", CubicModelKind.PengRobinson)]
    public void Classify_SmallPolarFluids_Wet(string fluid, CubicModelKind kind)
    {
        var engine = TestSupport.Engines.For(fluid, kind);

        var line = VapourLine.Classify(engine);

        Assert.Equal(VapourLineClass.Wet, line.Class);
        Assert.True(line.ReducedSlope < -VapourLine.IsentropicBand, $"xi = {line.ReducedSlope}");
        Assert.Null(line.MaximumEntropyTemperature);
        // The reading: ξ = (Tc/R)·ds_V/dT|σ at 0.7 Tc, from the engine's along-line slope.
        double t = VapourLine.ReadingReducedTemperature * engine.Solver.CriticalTemperature;
        double slope = engine.Coexistence(engine.Solver.AtTemperature(t)).Vapour.EntropySlope!.Value;
        AssertClose.Relative(engine.Solver.CriticalTemperature / Constants.GasConstant * slope, line.ReducedSlope, 1e-12, $"{fluid} xi");
    }

    [Theory]
    [InlineData("toluene", CubicModelKind.PengRobinson)]
    [InlineData("n-pentane", CubicModelKind.PengRobinson)]
    [InlineData("benzene", CubicModelKind.PengRobinson)]
    [InlineData("toluene", CubicModelKind.SoaveRedlichKwong)]
    public void Classify_HeavierOrganics_DryWithEntropyMaximumBelowTc(string fluid, CubicModelKind kind)
    {
        var engine = TestSupport.Engines.For(fluid, kind);
        double tc = engine.Solver.CriticalTemperature;

        var line = VapourLine.Classify(engine);

        Assert.Equal(VapourLineClass.Dry, line.Class);
        Assert.True(line.ReducedSlope > VapourLine.IsentropicBand, $"xi = {line.ReducedSlope}");
        double tMax = Assert.NotNull(line.MaximumEntropyTemperature);
        AssertClose.InRange(VapourLine.ReadingReducedTemperature * tc, tc, tMax, $"{fluid} temperature of maximum vapour entropy");

        // At the maximum ds_V/dT|σ = 0. The root is sought in τ = T/Tc for ξ = (Tc/R)·ds_V/dT to
        // 1e-10 in both (MathNet's Brent stops on either), so |ds_V/dT| there is below
        // 1e-10·Tc·|d²s_V/dT²| + 1e-10·R/Tc; the curvature is estimated from the slopes 1e-3·Tc
        // on either side, which must also bracket the root with + below and − above. A factor 10
        // covers the curvature estimate.
        double Slope(double t) => engine.Coexistence(engine.Solver.AtTemperature(t)).Vapour.EntropySlope!.Value;
        double below = Slope(tMax - 1e-3 * tc);
        double above = Slope(tMax + 1e-3 * tc);
        Assert.True(below > 0 && above < 0, $"{fluid}: ds_V/dT is {below} below and {above} above {tMax} K");
        double curvature = (below - above) / (2e-3 * tc);
        AssertClose.Absolute(0, Slope(tMax), 10 * (1e-10 * tc * curvature + 1e-10 * Constants.GasConstant / tc), $"{fluid} ds_V/dT at the entropy maximum");
    }
}
