using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class VolumeTranslationTests
{
    private const double R = Constants.GasConstant;

    /// <summary>Models with a shift: Péneloux c for SRK (positive) and PR (negative), a shift of
    /// a fifth of b for van der Waals (δ1 = δ2, the other branch of G), each for propane.</summary>
    public static TheoryData<CubicModelKind, string> Cases()
    {
        var data = new TheoryData<CubicModelKind, string>();
        foreach (var kind in new[] { CubicModelKind.SoaveRedlichKwong, CubicModelKind.PengRobinson, CubicModelKind.VanDerWaals })
        {
            foreach (string state in new[] { "liquid", "vapour", "supercritical" })
            {
                data.Add(kind, state);
            }
        }

        return data;
    }

    private static Fluid Propane => FluidCatalog.Embedded.Find("propane");

    private static CubicModel Shifted(CubicModelKind kind)
    {
        var model = CubicModel.For(kind, Propane);
        double zra = VolumeShift.RackettCompressibility(Propane.AcentricFactor.Value);
        double c = kind == CubicModelKind.VanDerWaals
            ? 0.2 * model.CovolumeB
            : VolumeShift.Peneloux(kind, model.CriticalTemperature, model.CriticalPressure, zra);
        return model.WithVolumeShift(c);
    }

    private static (CubicModel Model, double T, double Rho) State(CubicModelKind kind, string state)
    {
        var model = Shifted(kind);
        var (t, rho) = HelmholtzStates.Pick(model, CoexistenceSolver.LowestValidTemperature(Propane), state);
        return (model, t, rho);
    }

    private static void CheckCentralDifference(Func<double, double> f, double x, double analytic, string what)
        => HelmholtzStates.CheckCentralDifference(f, x, analytic, what);

    [Theory]
    [MemberData(nameof(Cases))]
    public void Residual_Translated_DerivativesEqualCentralDifferences(CubicModelKind kind, string state)
    {
        var (model, t, rho) = State(kind, state);
        var d = model.Residual(t, rho);

        CheckCentralDifference(x => model.Residual(x, rho).Value, t, d.DT, $"{kind} {state} dA/dT");
        CheckCentralDifference(x => model.Residual(x, rho).DT, t, d.DTT, $"{kind} {state} d2A/dT2");
        CheckCentralDifference(x => model.Residual(x, rho).DRho, t, d.DTRho, $"{kind} {state} d2A/dTdrho");
        CheckCentralDifference(x => model.Residual(t, x).Value, rho, d.DRho, $"{kind} {state} dA/drho");
        CheckCentralDifference(x => model.Residual(t, x).DRho, rho, d.DRhoRho, $"{kind} {state} d2A/drho2");
        CheckCentralDifference(x => model.Residual(t, x).DRhoRho, rho, d.DRhoRhoRho, $"{kind} {state} d3A/drho3");
        CheckCentralDifference(x => model.Residual(t, x).DT, rho, d.DTRho, $"{kind} {state} d2A/dTdrho from dA/dT");
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Residual_Translated_IsTheUntranslatedModelAtTheUnshiftedVolume(CubicModelKind kind, string state)
    {
        // With v = v_cubic − c the total Helmholtz energy is the untranslated one at v + c, so
        // P'(T, 1/v) = P(T, 1/(v + c)) and A_r'(T, 1/v) = A_r(T, 1/(v + c)) − RT·ln((v + c)/v)
        // (the ideal-gas part −RT ln v is taken at different volumes). This checks the value
        // itself, which the difference tests leave open up to a constant. Both sides are sums
        // of O(RT) terms; 1e-11 relative to RT allows the cancellation in dense liquid states.
        var (model, t, rho) = State(kind, state);
        var plain = model.WithVolumeShift(0);
        double v = 1 / rho;
        double c = model.VolumeShift;
        var shifted = model.Residual(t, rho);
        var unshifted = plain.Residual(t, 1 / (v + c));

        AssertClose.Relative(unshifted.Pressure, shifted.Pressure, 1e-10, $"{kind} {state} pressure");
        AssertClose.Absolute(unshifted.Value - R * t * Math.Log((v + c) / v), shifted.Value, 1e-11 * R * t, $"{kind} {state} A_r");
        AssertClose.Absolute(unshifted.DT - R * Math.Log((v + c) / v), shifted.DT, 1e-11 * R, $"{kind} {state} dA_r/dT");
    }

    [Theory]
    [InlineData(CubicModelKind.SoaveRedlichKwong)]
    [InlineData(CubicModelKind.PengRobinson)]
    [InlineData(CubicModelKind.VanDerWaals)]
    public void Coexistence_Translated_SamePressureAndLatentHeatDensitiesShiftByC(CubicModelKind kind)
    {
        // Psat and Δh are invariant under a constant shift (g and h of both phases move by −Pc),
        // and each coexisting volume moves by −c. Both solves converge |Δ ln φ| to ≤ 1e-12, which
        // fixes P to ~1e-12 relative; measured differences are ~2e-15. 1e-10 leaves margin, while
        // a shift wrongly applied to one term would change Psat by O(c/v_L) ≈ 5 %.
        var shifted = Shifted(kind);
        var plain = shifted.WithVolumeShift(0);
        double c = shifted.VolumeShift;
        double tmin = CoexistenceSolver.LowestValidTemperature(Propane);
        foreach (double tr in new[] { 0.5, 0.7, 0.9, 0.99 })
        {
            double t = tr * plain.CriticalTemperature;
            var before = new CoexistenceSolver(plain, tmin).AtTemperature(t);
            var after = new CoexistenceSolver(shifted, tmin).AtTemperature(t);

            AssertClose.Relative(before.Pressure, after.Pressure, 1e-10, $"{kind} Tr = {tr} Psat");
            AssertClose.Relative(before.EnthalpyOfVaporization, after.EnthalpyOfVaporization, 1e-10, $"{kind} Tr = {tr} latent heat");
            AssertClose.Relative(before.Liquid.MolarVolume - c, after.Liquid.MolarVolume, 1e-10, $"{kind} Tr = {tr} liquid volume");
            AssertClose.Relative(before.Vapour.MolarVolume - c, after.Vapour.MolarVolume, 1e-10, $"{kind} Tr = {tr} vapour volume");
            Assert.NotEqual(before.Liquid.Density, after.Liquid.Density);
        }
    }

    [Theory]
    [InlineData(CubicModelKind.SoaveRedlichKwong)]
    [InlineData(CubicModelKind.PengRobinson)]
    [InlineData(CubicModelKind.VanDerWaals)]
    public void CriticalDensity_Translated_IsTheCriticalStateOfTheTranslatedModel(CubicModelKind kind)
    {
        // ρc' = 1/(vc − c): P = Pc there and both (∂P/∂ρ) and (∂²P/∂ρ²) vanish, scaled to be
        // dimensionless by RT as in CubicModelTests (1e-12 ≈ 100 ε of cancelling O(1) terms).
        var model = Shifted(kind);
        double tc = model.CriticalTemperature;
        double rhoc = model.CriticalDensity;
        var d = model.Residual(tc, rhoc);

        AssertClose.Relative(1 / (model.Form.CriticalCompressibility * R * tc / model.CriticalPressure - model.VolumeShift), rhoc, 1e-14, $"{kind} rho_c");
        AssertClose.Relative(model.CriticalPressure, d.Pressure, 1e-12, $"{kind} P(Tc, rho_c)");
        AssertClose.Absolute(0, d.PressureDRho / (R * tc), 1e-12, $"{kind} (dP/drho)/RT");
        AssertClose.Absolute(0, d.PressureDRhoRho * rhoc / (R * tc), 1e-12, $"{kind} rho (d2P/drho2)/RT");
        AssertClose.Relative(1 / (model.CovolumeB - model.VolumeShift), model.MaximumDensity, 1e-15, $"{kind} maximum density");
    }

    [Fact]
    public void WithVolumeShift_KeepsFormAlphaAndCriticalConstants()
    {
        var model = CubicModel.For(CubicModelKind.PengRobinson, Propane);
        var shifted = model.WithVolumeShift(-4e-6);

        Assert.Equal(0.0, model.VolumeShift);
        Assert.Equal(-4e-6, shifted.VolumeShift);
        Assert.Same(model.Form, shifted.Form);
        Assert.Same(model.Alpha, shifted.Alpha);
        Assert.Equal(model.Kind, shifted.Kind);
        Assert.Equal(model.CriticalTemperature, shifted.CriticalTemperature);
        Assert.Equal(model.CriticalPressure, shifted.CriticalPressure);
        Assert.Equal(model.CovolumeB, shifted.CovolumeB);
        Assert.Equal(model.AttractionA, shifted.AttractionA);
        // Shifting back to 0 gives the untranslated numbers exactly (c/b = 0 adds nothing).
        Assert.Equal(model.Residual(300, 5000), shifted.WithVolumeShift(0).Residual(300, 5000));
        Assert.Equal(model.CriticalDensity, shifted.WithVolumeShift(0).CriticalDensity);
    }

    [Theory]
    [InlineData(double.NaN)]
    [InlineData(double.PositiveInfinity)]
    [InlineData(6.3e-5)]
    [InlineData(1.0)]
    public void WithVolumeShift_NotFiniteOrNotBelowB_ThrowsNamingTheShift(double c)
    {
        // b of SRK propane is 6.27e-5 m³/mol, so 6.3e-5 is just above it.
        var model = CubicModel.For(CubicModelKind.SoaveRedlichKwong, Propane);

        var ex = Assert.Throws<InvalidInputException>(() => model.WithVolumeShift(c));

        Assert.Equal("volume shift", ex.Field);
        Assert.Contains("volume shift", ex.Message, StringComparison.Ordinal);
    }
}
