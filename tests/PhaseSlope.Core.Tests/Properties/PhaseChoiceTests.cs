using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary><see cref="PropertyModel.AtPressure"/> with a <see cref="PhaseChoice"/>, and the
/// range checks of <see cref="PropertyModel.AtDensity"/>.</summary>
public class PhaseChoiceTests
{
    public static TheoryData<string, CubicModelKind, double> Cases => new()
    {
        { "propane", CubicModelKind.PengRobinson, 0.9 },
        { "water", CubicModelKind.SoaveRedlichKwong, 0.8 },
        { "nitrogen", CubicModelKind.VanDerWaals, 0.95 },
    };

    private static (PropertyModel Engine, double T, CoexistencePoint Point, SpinodalWindow Window) Setup(string fluid, CubicModelKind kind, double reduced)
    {
        var engine = TestSupport.Engines.For(fluid, kind);
        double t = reduced * engine.Solver.CriticalTemperature;
        Assert.True(SpinodalWindow.TryFind((CubicModel)engine.Model, t, out var window));
        return (engine, t, engine.Solver.AtTemperature(t), window);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void AtPressure_BetweenSpinodals_StableIsLowerGibbsRootAndOtherIsMetastable(string fluid, CubicModelKind kind, double reduced)
    {
        var (engine, t, point, window) = Setup(fluid, kind, reduced);
        double psat = point.Pressure;
        // Above Psat (up to the vapour spinodal) the liquid is stable, below it (down to the liquid
        // spinodal, or to zero) the vapour: Gibbs energies cross at Psat, (∂g/∂P)_T = v.
        double above = psat + 0.5 * (window.VapourPressure - psat);
        double below = psat - 0.5 * (psat - Math.Max(window.LiquidPressure, 0));
        foreach (var (p, stablePhase) in new[] { (above, PhaseLabel.Liquid), (below, PhaseLabel.Vapour) })
        {
            var stable = engine.AtPressure(t, p);
            var liquid = engine.AtPressure(t, p, PhaseChoice.Liquid);
            var vapour = engine.AtPressure(t, p, PhaseChoice.Vapour);
            string at = $"{fluid} at {t:F2} K, {p:F0} Pa";

            Assert.Equal(PhaseLabel.Liquid, liquid.Phase);
            Assert.Equal(PhaseLabel.Vapour, vapour.Phase);
            Assert.True(liquid.Density > vapour.Density, at);
            Assert.Equal(stablePhase, stable.Phase);
            Assert.False(stable.Metastable, at);
            Assert.Equal(Math.Min(liquid.GibbsEnergy!.Value, vapour.GibbsEnergy!.Value), stable.GibbsEnergy!.Value);
            var other = stablePhase == PhaseLabel.Liquid ? vapour : liquid;
            var chosen = stablePhase == PhaseLabel.Liquid ? liquid : vapour;
            Assert.True(other.Metastable, $"the {other.Phase} root at {at} is metastable");
            Assert.False(chosen.Metastable, at);
            Assert.True(other.GibbsEnergy > stable.GibbsEnergy, at);
            Assert.True(other.MechanicallyStable, "a metastable root is still mechanically stable");
        }
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void AtPressure_PhaseBeyondItsSpinodal_ThrowsInvalidInputException(string fluid, CubicModelKind kind, double reduced)
    {
        var (engine, t, _, window) = Setup(fluid, kind, reduced);

        var ex = Assert.Throws<InvalidInputException>(() => engine.AtPressure(t, 1.05 * window.VapourPressure, PhaseChoice.Vapour));
        Assert.Contains("beyond its spinodal", ex.Message, StringComparison.Ordinal);
        Assert.Equal(PhaseLabel.Liquid, engine.AtPressure(t, 1.05 * window.VapourPressure).Phase);
        if (window.LiquidPressure > 0)
        {
            Assert.Throws<InvalidInputException>(() => engine.AtPressure(t, 0.95 * window.LiquidPressure, PhaseChoice.Liquid));
            Assert.Equal(PhaseLabel.Vapour, engine.AtPressure(t, 0.95 * window.LiquidPressure).Phase);
        }
    }

    [Fact]
    public void AtPressure_LiquidSpinodalAbovePressure_LiquidThrows()
    {
        // At 0.95 Tc the liquid spinodal pressure of a cubic is positive (its loop no longer dips
        // below zero), so a positive pressure below it has no liquid root. Guard that the case
        // is really exercised.
        var (engine, t, _, window) = Setup("propane", CubicModelKind.PengRobinson, 0.95);
        Assert.True(window.LiquidPressure > 0, $"liquid spinodal pressure {window.LiquidPressure} Pa");

        Assert.Throws<InvalidInputException>(() => engine.AtPressure(t, 0.9 * window.LiquidPressure, PhaseChoice.Liquid));
    }

    [Theory]
    [InlineData(PhaseChoice.Liquid)]
    [InlineData(PhaseChoice.Vapour)]
    public void AtPressure_AboveCriticalTemperatureWithPhaseChosen_Throws(PhaseChoice choice)
    {
        var engine = TestSupport.Engines.For("propane", CubicModelKind.PengRobinson);
        double t = 1.1 * engine.Solver.CriticalTemperature;

        var ex = Assert.Throws<InvalidInputException>(() => engine.AtPressure(t, 5e6, choice));

        Assert.Contains("one fluid phase", ex.Message, StringComparison.Ordinal);
        Assert.Equal(PhaseLabel.Supercritical, engine.AtPressure(t, 5e6).Phase);
    }

    [Theory]
    [InlineData(1.0)]
    [InlineData(1.5)]
    public void AtDensity_AtOrAboveInverseCovolume_Throws(double factor)
    {
        var engine = TestSupport.Engines.For("propane", CubicModelKind.PengRobinson);
        double limit = ((CubicModel)engine.Model).MaximumDensity;

        var ex = Assert.Throws<InvalidInputException>(() => engine.AtDensity(300, factor * limit));

        Assert.Contains("1/b", ex.Message, StringComparison.Ordinal);
        Assert.True(engine.AtDensity(300, 0.9 * limit).Pressure > 0, "just below 1/b the state exists (at very high pressure)");
    }

    [Fact]
    public void AtDensity_VolumeShiftedModel_LimitIsOneOverTranslatedCovolume()
    {
        // With the Péneloux shift c the limit moves to 1/(b − c).
        var engine = TestSupport.Engines.For("propane", CubicModelKind.PengRobinson, peneloux: true);
        var model = (CubicModel)engine.Model;
        Assert.NotEqual(0, model.VolumeShift);

        Assert.Throws<InvalidInputException>(() => engine.AtDensity(300, 1 / model.TranslatedCovolume));
        Assert.True(engine.AtDensity(300, 0.99 / model.TranslatedCovolume).Pressure > 0);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void AtDensity_BetweenSaturatedDensities_RefusedAsTwoPhase(string fluid, CubicModelKind kind, double reduced)
    {
        // At T < Tc a density between the saturated ones is, at equilibrium, two phases; the
        // single-phase answer ("vapour, 1175.6 kPa" for R-134a at 0 degC, 100 kg/m3) was wrong.
        var (engine, t, point, _) = Setup(fluid, kind, reduced);
        double rho = Math.Sqrt(point.Liquid.Density * point.Vapour.Density);

        var ex = Assert.Throws<InvalidInputException>(() => engine.AtDensity(t, rho));

        Assert.Contains("between the saturated vapour and liquid densities", ex.Message, StringComparison.Ordinal);
        Assert.Contains("two phases", ex.Message, StringComparison.Ordinal);
        Assert.Equal("density", ex.Field);
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void AtDensity_MetastableRootsWithPhaseChosen_FlaggedAndAgreeWithPressureRoute(string fluid, CubicModelKind kind, double reduced)
    {
        var (engine, t, point, window) = Setup(fluid, kind, reduced);
        double psat = point.Pressure;
        double above = psat + 0.5 * (window.VapourPressure - psat);
        double below = psat - 0.5 * (psat - Math.Max(window.LiquidPressure, 0));
        foreach (var (p, choice, label) in new[] { (above, PhaseChoice.Vapour, PhaseLabel.Vapour), (below, PhaseChoice.Liquid, PhaseLabel.Liquid) })
        {
            var byPressure = engine.AtPressure(t, p, choice);
            Assert.True(byPressure.Metastable, $"{fluid} {label} at {p} Pa");

            var byDensity = engine.AtDensity(t, byPressure.Density, choice);

            Assert.Equal(label, byDensity.Phase);
            Assert.True(byDensity.Metastable, $"{fluid}: the {label} at {byPressure.Density} mol/m3 is metastable by density too");
            // P recomputed from the polished root: the terms P is summed from are at most a few
            // hundred times P here, so 1e-9 relative is far above the rounding.
            AssertClose.Relative(p, byDensity.Pressure, 1e-9, $"{fluid} {label} pressure");
            var other = choice == PhaseChoice.Liquid ? PhaseChoice.Vapour : PhaseChoice.Liquid;
            var ex = Assert.Throws<InvalidInputException>(() => engine.AtDensity(t, byPressure.Density, other));
            Assert.Contains("branch", ex.Message, StringComparison.Ordinal);
        }
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void AtDensity_OutsideTheDome_StableAndNotMetastable(string fluid, CubicModelKind kind, double reduced)
    {
        var (engine, t, point, _) = Setup(fluid, kind, reduced);

        var vapour = engine.AtDensity(t, 0.5 * point.Vapour.Density);
        var liquid = engine.AtDensity(t, 1.01 * point.Liquid.Density);
        var saturated = engine.AtDensity(t, point.Vapour.Density);

        Assert.Equal((PhaseLabel.Vapour, false), (vapour.Phase, vapour.Metastable));
        Assert.Equal((PhaseLabel.Liquid, false), (liquid.Phase, liquid.Metastable));
        Assert.Equal((PhaseLabel.Vapour, false), (saturated.Phase, saturated.Metastable));
        Assert.Throws<InvalidInputException>(() => engine.AtDensity(t, 1.01 * point.Liquid.Density, PhaseChoice.Vapour));
    }

    [Fact]
    public void AtDensity_LiquidUnderTension_EveryDefinedPropertyGivenLnPhiNull()
    {
        // Propane PR at 300 K: at 11000 mol/m3 the liquid is stretched to P of about -2.5 MPa
        // while its isotherm still rises ((dP/drho)_T > 0): a metastable liquid.
        var engine = TestSupport.Engines.For("propane", CubicModelKind.PengRobinson);

        var state = engine.AtDensity(300, 11000, PhaseChoice.Liquid);

        Assert.True(state.Pressure < 0, $"P = {state.Pressure}");
        Assert.True(state.Metastable);
        Assert.Equal(PhaseLabel.Liquid, state.Phase);
        Assert.True(state.MechanicallyStable);
        Assert.Null(state.LnFugacityCoefficient);
        Assert.Null(state.ResidualEntropy);
        Assert.Contains("ln Z is undefined", state.UndefinedReason, StringComparison.Ordinal);
        foreach (double? value in new double?[] { state.Enthalpy, state.Entropy, state.GibbsEnergy, state.IsobaricHeatCapacity,
                     state.SpeedOfSound, state.IsothermalCompressibility, state.JouleThomsonCoefficient, state.ResidualEnthalpy })
        {
            Assert.True(value is double v && double.IsFinite(v), $"defined property {value}");
        }

        // Without a chosen phase it is a density inside the dome: refused as two-phase.
        Assert.Throws<InvalidInputException>(() => engine.AtDensity(300, 11000));
    }

    [Fact]
    public void AtDensity_InsideTheSpinodal_RefusedSayingWhy()
    {
        // Propane PR at 300 K, 7000 mol/m3: the isotherm falls, no single phase exists.
        var engine = TestSupport.Engines.For("propane", CubicModelKind.PengRobinson);

        var ex = Assert.Throws<InvalidInputException>(() => engine.AtDensity(300, 7000, PhaseChoice.Liquid));

        Assert.Contains("inside the spinodal", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(0.0, 0.0, true)]
    [InlineData(1e-10, -1e-10, true)]
    [InlineData(0.0, 1e-6, false)]
    public void CriticalPoint_RecognisedByTemperatureAndPressureOrDensity(double dt, double dx, bool critical)
    {
        var engine = TestSupport.Engines.For("propane", CubicModelKind.PengRobinson);
        var c = engine.Model.CriticalPoint(Composition.Pure);
        double t = c.Temperature * (1 + dt);

        var byPressure = engine.AtPressure(t, c.Pressure * (1 + dx));
        var byDensity = engine.AtDensity(t, c.Density * (1 + dx));

        foreach (var state in new[] { byPressure, byDensity })
        {
            Assert.Equal(critical, state.Critical);
            if (critical)
            {
                // (dP/drho)_T vanishes at the critical point: cp and kT diverge and are null.
                Assert.Null(state.IsobaricHeatCapacity);
                Assert.Null(state.IsothermalCompressibility);
            }
        }
    }
}
