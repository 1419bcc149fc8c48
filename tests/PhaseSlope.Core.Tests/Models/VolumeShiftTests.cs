using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class VolumeShiftTests
{
    private const double R = Constants.GasConstant;

    /// <summary>Saturated-liquid density of propane at its normal boiling point, 231.036 K:
    /// about 580.9 kg/m³ (Lemmon, McLinden &amp; Wagner, J. Chem. Eng. Data 54, 3141 (2009);
    /// from memory, to perhaps ±1 kg/m³).</summary>
    private const double PropaneLiquidDensityAtNormalBoilingPoint = 580.9;

    private static Fluid Propane => FluidCatalog.Embedded.Find("propane");

    private static double RackettZ => VolumeShift.RackettCompressibility(Propane.AcentricFactor.Value);

    private static double MinimumTemperature => CoexistenceSolver.LowestValidTemperature(Propane);

    private static double LiquidMassDensity(CubicModel model, double temperature)
        => new CoexistenceSolver(model, MinimumTemperature).AtTemperature(temperature).Liquid.Density * Propane.MolarMass!.Value;

    [Fact]
    public void Correlations_AreTheFormulasWithYamadaGunnZra()
    {
        // Pure arithmetic on the stated formulas: 1e-14.
        double tc = 369.89, pc = 4.2512e6, omega = 0.152;
        double zra = 0.29056 - 0.08775 * omega;

        AssertClose.Relative(zra, VolumeShift.RackettCompressibility(omega), 1e-15, "Z_RA");
        AssertClose.Relative(0.40768 * (0.29441 - zra) * R * tc / pc, VolumeShift.PenelouxSoaveRedlichKwong(tc, pc, zra), 1e-14, "SRK c");
        AssertClose.Relative(0.50033 * (0.25969 - zra) * R * tc / pc, VolumeShift.PenelouxPengRobinson(tc, pc, zra), 1e-14, "PR c");
        Assert.Equal(VolumeShift.PenelouxPengRobinson(tc, pc, zra), VolumeShift.Peneloux(CubicModelKind.PengRobinson1978, tc, pc, zra));
        Assert.Throws<InvalidInputException>(() => VolumeShift.Peneloux(CubicModelKind.RedlichKwong, tc, pc, zra));
    }

    [Theory]
    [InlineData(CubicModelKind.SoaveRedlichKwong)]
    [InlineData(CubicModelKind.PengRobinson)]
    public void Peneloux_Propane_ImprovesLiquidDensityAtNormalBoilingPoint(CubicModelKind kind)
    {
        // Untranslated, SRK is 5.3 % low and PR 7.0 % high against the recalled 580.9 kg/m³;
        // with the Péneloux-type shift they are +1.1 % and −1.8 %. Required: within 2.5 % (the
        // correlations are fits across many fluids, good to a couple of percent) and at least
        // twice as close as before. The recalled reference is uncertain by far less than either.
        var model = CubicModel.For(kind, Propane);
        double c = VolumeShift.Peneloux(kind, model.CriticalTemperature, model.CriticalPressure, RackettZ);
        double t = Propane.NormalBoilingPoint!.Value;

        double before = Math.Abs(LiquidMassDensity(model, t) / PropaneLiquidDensityAtNormalBoilingPoint - 1);
        double after = Math.Abs(LiquidMassDensity(model.WithVolumeShift(c), t) / PropaneLiquidDensityAtNormalBoilingPoint - 1);

        AssertClose.InRange(0, 0.025, after, $"{kind} relative error of the translated liquid density");
        AssertClose.InRange(0, before / 2, after, $"{kind} translated error against untranslated {before}");
    }

    [Fact]
    public void PenelouxSrk_Propane_MatchesRackettAtTr07()
    {
        // The Péneloux correlation was built (as recalled) to reproduce the Rackett density
        // v = (R·Tc/Pc)·Z_RA^(1 + (1 − Tr)^(2/7)) near Tr = 0.7. For propane the translated SRK
        // gives 547.1 kg/m³ against 546.0 (0.21 %); untranslated it is 514.7 (−5.7 %). 1 %
        // allows the scatter of a correlation fitted across fluids.
        var model = CubicModel.For(CubicModelKind.SoaveRedlichKwong, Propane);
        double tc = model.CriticalTemperature;
        double c = VolumeShift.PenelouxSoaveRedlichKwong(tc, model.CriticalPressure, RackettZ);
        double t = 0.7 * tc;
        double rackett = Propane.MolarMass!.Value
            / (R * tc / model.CriticalPressure * Math.Pow(RackettZ, 1 + Math.Pow(1 - 0.7, 2.0 / 7)));

        AssertClose.Relative(rackett, LiquidMassDensity(model.WithVolumeShift(c), t), 0.01, "translated SRK liquid density at Tr = 0.7");
        Assert.True(LiquidMassDensity(model, t) < 0.95 * rackett, "untranslated SRK should be more than 5 % low");
    }

    [Theory]
    [InlineData(CubicModelKind.SoaveRedlichKwong)]
    [InlineData(CubicModelKind.PengRobinson)]
    [InlineData(CubicModelKind.RedlichKwong)]
    public void FitToLiquidDensity_ReproducesTheDensityItWasFittedTo(CubicModelKind kind)
    {
        // The fit is exact by construction; the check is that the translated model's own
        // coexistence solve returns it: limited by the solver's ~1e-12 on each volume, so 1e-10.
        double t = Propane.NormalBoilingPoint!.Value;
        double measured = PropaneLiquidDensityAtNormalBoilingPoint / Propane.MolarMass!.Value;
        var model = CubicModel.For(kind, Propane);

        double c = VolumeShift.FitToLiquidDensity(model, t, measured, MinimumTemperature);
        var fitted = model.WithVolumeShift(c);

        AssertClose.Relative(measured, new CoexistenceSolver(fitted, MinimumTemperature).AtTemperature(t).Liquid.Density, 1e-10, $"{kind} fitted liquid density");
        // Fitting from an already-translated model gives the same whole shift.
        AssertClose.Relative(c, VolumeShift.FitToLiquidDensity(fitted, t, measured, MinimumTemperature), 1e-12, $"{kind} refit from the translated model");
    }

    [Fact]
    public void FitToLiquidDensity_FarTooDenseLiquid_ThrowsBeforeTheShiftReachesB()
    {
        // A liquid so dense that v_measured = v_model − 1.01·b would need c = 1.01·b ≥ b.
        var model = CubicModel.For(CubicModelKind.SoaveRedlichKwong, Propane);
        double t = Propane.NormalBoilingPoint!.Value;
        double vModel = new CoexistenceSolver(model, MinimumTemperature).AtTemperature(t).Liquid.MolarVolume;
        double tooSmallVolume = vModel - 1.01 * model.CovolumeB;

        var ex = Assert.Throws<InvalidInputException>(() => VolumeShift.FitToLiquidDensity(model, t, 1 / tooSmallVolume, MinimumTemperature));

        Assert.Equal("measured liquid density", ex.Field);
    }
}
