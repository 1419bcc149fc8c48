using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The P–T flash and the stability test: material balance, equal fugacities, the Gibbs
/// energy of the split against the single phase, the split found inside the envelope and none
/// outside, and the P–h and P–s flashes inverting the P–T flash.</summary>
public sealed class MixtureFlashTests
{
    public static TheoryData<string, double, double> TwoPhaseStates() => new()
    {
        // (system, T K, P Pa): states between the bubble and dew pressures of each feed, found by
        // this solver's own bubble and dew points (checked in MixtureSaturationTests).
        { "methane-propane", 277.6, 2.0e6 },
        { "methane-propane", 250.0, 1.0e6 },
        { "natural-gas", 220.0, 4.0e6 },
        { "natural-gas", 250.0, 2.0e6 },
        { "r-407c", 233.0, 101325 },
        // Near the mixture critical point of equimolar methane/propane (x and y of methane 0.49 and
        // 0.69, densities within a factor of 2): Newton on the amounts finishes what substitution
        // starts.
        { "methane-propane-equimolar", 300.0, 8.75e6 },
    };

    private static (MixtureEquilibrium Engine, double[] Feed) System(string name) => name switch
    {
        "methane-propane" => (Engine(0.02, "methane", "propane"), [0.2, 0.8]),
        "natural-gas" => (Engine(0, NaturalGasNames), NaturalGas),
        "methane-propane-equimolar" => (Engine(0.02, "methane", "propane"), [0.5, 0.5]),
        _ => R407C(),
    };

    private static (MixtureEquilibrium, double[]) R407C()
    {
        var engine = Engine(0, "r-32", "r-125", "r-134a");
        return (engine, FromMass(engine, 0.23, 0.25, 0.52));
    }

    [Theory]
    [MemberData(nameof(TwoPhaseStates))]
    public void Flash_InsideTheEnvelope_SplitsWithClosedBalanceAndEqualFugacities(string system, double temperature, double pressure)
    {
        var (engine, z) = System(system);
        var flash = engine.Flash(temperature, pressure, z);
        Assert.True(flash.IsTwoPhase, $"{system} at {temperature} K, {pressure} Pa should split");
        Assert.False(flash.Stability.IsStable);
        AssertClose.InRange(0, 1, flash.VapourFraction, "vapour fraction");
        Assert.True(flash.Liquid!.Density > flash.Vapour!.Density);
        // Material balance: l = z − v in the solver, so it closes to rounding; 1e-12 (the issue's
        // requirement) leaves room for the normalisation of x and y.
        for (int i = 0; i < z.Length; i++)
        {
            double balance = (1 - flash.VapourFraction) * flash.Liquid.MoleFractions[i] + flash.VapourFraction * flash.Vapour.MoleFractions[i];
            AssertClose.Absolute(z[i], balance, 1e-12, $"material balance of component {i}");
        }

        // Equal fugacities, recomputed here from the model at the reported compositions and roots:
        // 1e-10 (the solver stops at 1e-11; the roots are recomputed at the same T, P).
        int n = z.Length;
        var lnPhiL = new double[n];
        var lnPhiV = new double[n];
        engine.Model.LnFugacityCoefficientsAtPressure(temperature, pressure, flash.Liquid.MoleFractions.ToArray(), Core.Models.MixtureRoot.Liquid, lnPhiL);
        engine.Model.LnFugacityCoefficientsAtPressure(temperature, pressure, flash.Vapour.MoleFractions.ToArray(), Core.Models.MixtureRoot.Vapour, lnPhiV);
        for (int i = 0; i < n; i++)
        {
            double lnFL = Math.Log(flash.Liquid.MoleFractions[i]) + lnPhiL[i];
            double lnFV = Math.Log(flash.Vapour.MoleFractions[i]) + lnPhiV[i];
            AssertClose.Absolute(lnFL, lnFV, 1e-10, $"ln fugacity of component {i}");
        }

        Assert.True(flash.Report.FugacityResidual < 1e-11, flash.Report.ToString());
        Assert.True(flash.Report.ModelEvaluations > flash.Report.Iterations, flash.Report.ToString());
    }

    [Theory]
    [MemberData(nameof(TwoPhaseStates))]
    public void Flash_Split_HasLowerGibbsEnergyThanTheSinglePhase(string system, double temperature, double pressure)
    {
        // The minimum of G: below the feed on its own stable root (computed here independently as
        // Σ z_i(ln z_i + ln φ_i)), and the split phases themselves stable (a tangent-plane test of
        // the liquid finds no further phase).
        var (engine, z) = System(system);
        var flash = engine.Flash(temperature, pressure, z);
        int n = z.Length;
        var lnPhi = new double[n];
        engine.Model.LnFugacityCoefficientsAtPressure(temperature, pressure, z, Core.Models.MixtureRoot.Stable, lnPhi);
        double single = 0, split = 0;
        var lnPhiL = new double[n];
        var lnPhiV = new double[n];
        engine.Model.LnFugacityCoefficientsAtPressure(temperature, pressure, flash.Liquid!.MoleFractions.ToArray(), Core.Models.MixtureRoot.Liquid, lnPhiL);
        engine.Model.LnFugacityCoefficientsAtPressure(temperature, pressure, flash.Vapour!.MoleFractions.ToArray(), Core.Models.MixtureRoot.Vapour, lnPhiV);
        for (int i = 0; i < n; i++)
        {
            single += z[i] * (Math.Log(z[i]) + lnPhi[i]);
            double x = flash.Liquid.MoleFractions[i], y = flash.Vapour.MoleFractions[i];
            split += (1 - flash.VapourFraction) * x * (Math.Log(x) + lnPhiL[i]) + flash.VapourFraction * y * (Math.Log(y) + lnPhiV[i]);
        }

        Assert.True(split < single, $"split {split} not below single phase {single}");
        // The reported change is the same difference to rounding (1e-12 of G/RT ~ 1-10).
        AssertClose.Absolute(split - single, flash.GibbsEnergyChange, 1e-11, "Gibbs energy change");
        Assert.True(engine.Stability(temperature, pressure, flash.Liquid.MoleFractions).IsStable, "the liquid of the split is stable");
    }

    [Fact]
    public void Stability_FindsTheKnownSplitInsideAndNoneOutside()
    {
        // Inside: methane/propane 0.2/0.8 at 277.6 K and 2 MPa lies between its dew (about 0.69 MPa)
        // and bubble (about 3.5 MPa) pressures (Flash_... above and BubblePoint_... in
        // MixtureSaturationTests). The vapour-like trial ends at a stationary point of the
        // tangent-plane distance, where the trial's fugacities are proportional to the feed's:
        // ln y_i + ln φ_i(y) − ln z_i − ln φ_i(z) is the same for every i (recomputed here from the
        // model, to 1e-9: the trial's gradient is converged to 1e-10). It is methane-richer than
        // the feed, and tm < 0 proves the feed unstable.
        var (engine, z) = System("methane-propane");
        var inside = engine.Stability(277.6, 2e6, z);
        Assert.False(inside.IsStable);
        Assert.True(inside.TangentPlaneDistance < -1e-3, $"tm = {inside.TangentPlaneDistance}");
        var y = inside.VapourLike.Composition.ToArray();
        Assert.True(y[0] > z[0]);
        var lnPhiY = new double[2];
        var lnPhiZ = new double[2];
        engine.Model.LnFugacityCoefficientsAtPressure(277.6, 2e6, y, Core.Models.MixtureRoot.Stable, lnPhiY);
        engine.Model.LnFugacityCoefficientsAtPressure(277.6, 2e6, z, Core.Models.MixtureRoot.Stable, lnPhiZ);
        double first = Math.Log(y[0]) + lnPhiY[0] - Math.Log(z[0]) - lnPhiZ[0];
        double second = Math.Log(y[1]) + lnPhiY[1] - Math.Log(z[1]) - lnPhiZ[1];
        AssertClose.Absolute(first, second, 1e-9, "stationary point: equal fugacity ratios");
        // Outside: above the bubble pressure (6 MPa) and below the dew pressure (0.3 MPa).
        Assert.True(engine.Stability(277.6, 6e6, z).IsStable);
        Assert.True(engine.Stability(277.6, 3e5, z).IsStable);
        var single = engine.Flash(277.6, 6e6, z);
        Assert.False(single.IsTwoPhase);
        Assert.Equal(0, single.VapourFraction);
        Assert.Equal(0, single.Report.NewtonSteps);
        Assert.Equal(1, engine.Flash(277.6, 3e5, z).VapourFraction);
    }

    [Fact]
    public void Flash_NaturalGas_ReportsItsWork()
    {
        // The invented 10-component gas at 220 K and 4 MPa: the report counts what the flash did
        // (the benchmark divides the time by it); Newton finishes what substitution started.
        var (engine, z) = System("natural-gas");
        var flash = engine.Flash(220, 4e6, z);
        Assert.True(flash.Report.SubstitutionSteps + flash.Report.NewtonSteps > 0);
        Assert.True(flash.Report.ModelEvaluations >= flash.Stability.ModelEvaluations + 2 * flash.Report.Iterations, flash.Report.ToString());
        Assert.True(flash.Report.FugacityResidual < 1e-11);
    }

    [Theory]
    [InlineData(277.6, 2.0e6)]   // two-phase
    [InlineData(277.6, 6.0e6)]   // compressed liquid
    [InlineData(330.0, 1.0e6)]   // vapour
    public void EnergyFlashes_InvertThePressureTemperatureFlash(double temperature, double pressure)
    {
        // h and s of a P–T flash, then P–h and P–s flashes of them: the same temperature to 1e-7 K
        // (Brent stops at 1e-9 K; the inner flash's h is converged to ~1e-9 relative) and the same
        // vapour fraction to 1e-7.
        var (engine, z) = System("methane-propane");
        var flash = engine.Flash(temperature, pressure, z);
        var byEnthalpy = engine.FlashAtEnthalpy(pressure, flash.Enthalpy!.Value, z);
        var byEntropy = engine.FlashAtEntropy(pressure, flash.Entropy!.Value, z);
        AssertClose.Absolute(temperature, byEnthalpy.Temperature, 1e-7, "temperature of the P-h flash");
        AssertClose.Absolute(temperature, byEntropy.Temperature, 1e-7, "temperature of the P-s flash");
        AssertClose.Absolute(flash.VapourFraction, byEnthalpy.VapourFraction, 1e-7, "vapour fraction of the P-h flash");
        Assert.True(byEnthalpy.Report.OuterSteps > 0);
    }

    [Fact]
    public void BadInput_IsRefused()
    {
        var (engine, _) = System("methane-propane");
        Assert.Throws<InvalidInputException>(() => engine.Flash(277.6, 2e6, [1.0, 0.0]));
        Assert.Throws<InvalidInputException>(() => engine.Flash(277.6, -1, [0.5, 0.5]));
        Assert.Throws<InvalidInputException>(() => engine.Flash(277.6, 2e6, [0.5, 0.4]));
        Assert.Throws<InvalidInputException>(() => engine.FlashAtEnthalpy(2e6, 1e9, [0.5, 0.5]));
    }
}
