using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>States where the mixture solvers failed although the answer exists: each is checked
/// against the defining equations recomputed here from the model, not against a stored number.</summary>
public sealed class MixtureRobustnessTests
{
    /// <summary>Ethanol + water with k_ij = −0.1 at 320 K (a k_ij chosen to probe the solver, not a
    /// fitted value): a dense liquid far below its critical point, whose ln φ^L carries a rounding
    /// floor near 1e-12 to 1e-10. The bubble point used to stall there for 56 Newton steps and
    /// report no convergence (exit 5); each of these compositions failed on the old code.</summary>
    [Theory]
    [InlineData(0.03)]
    [InlineData(0.05)]
    [InlineData(0.1)]
    [InlineData(0.3)]
    [InlineData(0.5)]
    [InlineData(0.6)]
    public void BubbleAtTemperature_DenseLiquidAtItsRoundingFloor_Converges(double ethanol)
    {
        const double t = 320;
        var engine = Engine(-0.1, "ethanol", "water");
        double[] z = [ethanol, 1 - ethanol];
        var point = engine.BubbleAtTemperature(t, z);
        Assert.Equal(t, point.Temperature);
        var y = point.Vapour.MoleFractions.ToArray();
        AssertClose.Absolute(1, y.Sum(), 1e-12, "incipient vapour fractions sum");

        // Equal fugacities recomputed from the model on the liquid root of the feed and the vapour
        // root of the incipient phase. 1e-8 in ln f: the solver accepts a residual below 1e-8 at the
        // rounding floor of ln φ (see MixtureEquilibrium.Saturation).
        var lnPhiL = new double[2];
        var lnPhiV = new double[2];
        engine.Model.LnFugacityCoefficientsAtPressure(t, point.Pressure, z, MixtureRoot.Liquid, lnPhiL);
        engine.Model.LnFugacityCoefficientsAtPressure(t, point.Pressure, y, MixtureRoot.Vapour, lnPhiV);
        for (int i = 0; i < 2; i++)
        {
            AssertClose.Absolute(Math.Log(z[i]) + lnPhiL[i], Math.Log(y[i]) + lnPhiV[i], 1e-8, $"ln f of component {i}");
        }

        Assert.True(point.Liquid.Density > 100 * point.Vapour.Density, "a liquid and a low-pressure vapour");

        // The liquid feed is itself stable just above its bubble pressure (0.1 % above it, where the
        // vapour root is no longer favoured): liquid-like trials near each pure component find no
        // second liquid, so a bubble point of one liquid is what the model predicts here (no
        // liquid-liquid split to report instead). Trial K_i = w_i/z_i for w = (0.02, 0.98) and (0.98, 0.02).
        foreach (double trial in new[] { 0.02, 0.98 })
        {
            double[] lnK = [Math.Log(trial / z[0]), Math.Log((1 - trial) / z[1])];
            var stability = StabilityAnalysis.Test(engine.Model, t, 1.001 * point.Pressure, z, lnK);
            Assert.True(stability.IsStable, $"liquid x_ethanol = {ethanol} at 1.001 × its bubble pressure, trial {trial}: tangent-plane distance {stability.TangentPlaneDistance}");
        }

        // The bubble point at the pressure found returns the given temperature. 1e-8 relative:
        // ln P and ln T are each settled to better than the 1e-8 residual bound.
        AssertClose.Relative(t, engine.BubbleAtPressure(point.Pressure, z).Temperature, 1e-8, "bubble temperature at the bubble pressure");
    }

    [Fact]
    public void PxyDiagram_EthanolWaterNegativeKij_IsBuiltAt320K()
    {
        // The P-x-y diagram at 320 K failed on the old code (its bubble points at several x stalled
        // as above): now every composition has its bubble point at the given temperature.
        var engine = Engine(-0.1, "ethanol", "water");
        var diagram = BinaryDiagram.AtTemperature(engine, 320);
        Assert.Equal(BinaryDiagram.DefaultPoints, diagram.Points.Count);
        Assert.All(diagram.Points, p => Assert.Equal(320, p.Point.Temperature));
        Assert.All(diagram.Points, p => Assert.True(p.Pressure > 0 && double.IsFinite(p.Pressure)));
    }
}
