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

    /// <summary>The invented 10-component gas (k_ij = 0) flashed on a 420-state grid: 20 temperatures
    /// 150 to 340 K by 10 K and 21 pressures 0.5 to 10.5 MPa by 0.5 MPa, across its envelope and past
    /// its cricondenbar. The old code failed at 3 states (250 K and 10.5 MPa, 260 K and 10 and 10.5 MPa:
    /// a shallow stationary point of the stability test next to the feed started the split, which
    /// fell towards the trivial solution and stalled). Every state must now give a stable single
    /// phase or a split with closed material balance and equal fugacities recomputed here.</summary>
    [Fact]
    public void Flash_NaturalGasGrid_ConvergesEverywhere()
    {
        var engine = Engine(0, NaturalGasNames);
        var z = NaturalGas;
        int n = z.Length, splits = 0;
        var failures = new List<string>();
        var lnPhiL = new double[n];
        var lnPhiV = new double[n];
        for (int a = 0; a < 20; a++)
        {
            for (int b = 0; b < 21; b++)
            {
                double t = 150 + 10 * a, p = 0.5e6 * (b + 1);
                MixtureFlashResult flash;
                try
                {
                    flash = engine.Flash(t, p, z);
                }
                catch (PhaseSlope.Core.Errors.ConvergenceException e)
                {
                    failures.Add($"{t} K, {p} Pa: {e.Message}");
                    continue;
                }

                if (!flash.IsTwoPhase)
                {
                    Assert.True(flash.Stability.IsStable, $"{t} K, {p} Pa: one phase must be a stable one");
                    continue;
                }

                splits++;
                var x = flash.Liquid!.MoleFractions.ToArray();
                var y = flash.Vapour!.MoleFractions.ToArray();
                // Equal fugacities on each phase's own density: 1e-8 in ln f, the flash's acceptance
                // bound at the rounding floor (MixtureEquilibrium.Flash). The phases are evaluated on the
                // stable root of each composition, as the flash does.
                engine.Model.LnFugacityCoefficientsAtPressure(t, p, x, MixtureRoot.Stable, lnPhiL);
                engine.Model.LnFugacityCoefficientsAtPressure(t, p, y, MixtureRoot.Stable, lnPhiV);
                for (int i = 0; i < n; i++)
                {
                    // Material balance to 1e-12 (the requirement; l = z − v in the solver).
                    double balance = (1 - flash.VapourFraction) * x[i] + flash.VapourFraction * y[i];
                    AssertClose.Absolute(z[i], balance, 1e-12, $"{t} K, {p} Pa: material balance of component {i}");
                    AssertClose.Absolute(Math.Log(x[i]) + lnPhiL[i], Math.Log(y[i]) + lnPhiV[i], 1e-8, $"{t} K, {p} Pa: ln f of component {i}");
                }

                Assert.True(flash.GibbsEnergyChange < 0, $"{t} K, {p} Pa: the split lowers G");
            }
        }

        Assert.True(failures.Count == 0, string.Join("\n", failures));
        // The grid crosses the envelope (this solver puts the gas's dew point at 260 K at 0.34 MPa and
        // its bubble point at 239 K at 9.8 MPa), so it must contain splits.
        Assert.True(splits > 20, $"{splits} two-phase states");
    }
}
