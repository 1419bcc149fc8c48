using MathNet.Numerics.Integration;
using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Properties;

public class PhaseStateTests
{
    private const double R = Constants.GasConstant;

    /// <summary>The density of the vapour root of P(T, ρ) = p, between p/(2RT) (where Z ≤ 1
    /// puts P below p) and an upper bound known to lie on the stable vapour branch.</summary>
    private static double VapourDensity(CubicModel model, double t, double p, double upper)
        => Brent.FindRoot(rho => model.Pressure(t, rho) - p, 0.5 * p / (R * t), upper, 1e-16 * upper, 200);

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void LnFugacityCoefficient_SaturatedVapour_EqualsIntegralOfZMinusOneOverP(CubicModelKind kind)
    {
        // Definition of the fugacity coefficient of a pure gas (Lewis, 1901; any thermodynamics
        // text): ln φ = ∫0^P (Z − 1)/P' dP' at constant T. Integrated along the vapour isotherm
        // with MathNet's 64-point Gauss–Legendre rule, each Z from the vapour root at P'.
        Fluid propane = FluidCatalog.Embedded.Find("propane");
        var solver = CoexistenceSolver.For(propane, kind);
        double t = 0.8 * solver.CriticalTemperature;
        var vapour = solver.AtTemperature(t).Vapour;
        var model = (CubicModel)solver.Model;
        double upper = vapour.Density * (1 + 1e-6);

        double Integrand(double p)
        {
            double rho = VapourDensity(model, t, p, upper);
            double zMinusOne = rho * model.Residual(t, rho).DRho / (R * t);
            return zMinusOne / p;
        }

        double integral = GaussLegendreRule.Integrate(Integrand, 0, vapour.Pressure, 64);

        // The integrand is analytic on [0, Psat] (the vapour spinodal lies well above Psat at
        // 0.8·Tc), so 64 Gauss points converge to rounding (32 and 128 points agree with 64 to
        // ~1e-16); ln φ ≈ −0.2 and each root carries ~1e-15 relative error: 1e-13 absolute.
        AssertClose.Absolute(integral, vapour.LnFugacityCoefficient, 1e-13, $"{kind} ln phi of the saturated vapour at 0.8 Tc");
        Assert.True(vapour.LnFugacityCoefficient < 0, "attraction dominates a saturated vapour: phi < 1");
    }

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void ResidualGibbsEnergy_EqualsResidualEnthalpyMinusTTimesResidualEntropy(CubicModelKind kind)
    {
        // g = h − T·s for the residual parts (definition); g_r = RT·ln φ (Lewis). Residuals are of
        // order RT, so 1e-12·RT is rounding level.
        Fluid water = FluidCatalog.Embedded.Find("water");
        var solver = CoexistenceSolver.For(water, kind);
        var model = (CubicModel)solver.Model;
        double tc = model.CriticalTemperature;
        var point = solver.AtTemperature(0.6 * tc);
        var supercritical = PhaseState.Evaluate(model, 1.3 * tc, 2 * model.CriticalDensity);

        foreach (var (name, state) in new[] { ("liquid", point.Liquid), ("vapour", point.Vapour), ("supercritical", supercritical) })
        {
            double rt = R * state.Temperature;
            double g = state.ResidualEnthalpy - state.Temperature * state.ResidualEntropy;
            AssertClose.Absolute(rt * state.LnFugacityCoefficient, g, 1e-12 * rt, $"{kind} {name} g_r");
            AssertClose.Absolute(state.ResidualGibbsEnergy, g, 1e-12 * rt, $"{kind} {name} ResidualGibbsEnergy");
        }
    }

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void ResidualEnthalpyAndEntropy_Vapour_FollowFromResidualGibbsEnergyAtConstantPressure(CubicModelKind kind)
    {
        // Gibbs–Helmholtz at constant P (any thermodynamics text): s_r = −(∂g_r/∂T)_P and
        // h_r = g_r + T·s_r. The vapour is re-solved at T ± h for the same P, so the caloric
        // residuals are checked against the pressure-explicit model independently of how
        // PhaseState combines A_r and ∂A_r/∂T.
        Fluid propane = FluidCatalog.Embedded.Find("propane");
        var solver = CoexistenceSolver.For(propane, kind);
        var model = (CubicModel)solver.Model;
        double t = 0.75 * model.CriticalTemperature;
        var saturated = solver.AtTemperature(t).Vapour;
        double p = 0.5 * saturated.Pressure;
        double upper = saturated.Density;
        double GibbsResidual(double temperature)
            => PhaseState.Evaluate(model, temperature, VapourDensity(model, temperature, p, upper)).ResidualGibbsEnergy;

        var state = PhaseState.Evaluate(model, t, VapourDensity(model, t, p, upper));
        double h = 1e-4 * t;
        double dgdt = (GibbsResidual(t - 2 * h) - 8 * GibbsResidual(t - h) + 8 * GibbsResidual(t + h) - GibbsResidual(t + 2 * h)) / (12 * h);

        // 5-point stencil with h = 1e-4·T: truncation h⁴·g⁽⁵⁾/30 is negligible; rounding is
        // 1.5·δg/h with δg a few ε·RT (g_r and the re-solved density), i.e. ~1e-11·R. 1e-9·R
        // (s_r itself is ~0.8 R here) leaves a factor ~100 and catches any error in ∂A_r/∂T.
        AssertClose.Absolute(-dgdt, state.ResidualEntropy, 1e-9 * R, $"{kind} s_r");
        AssertClose.Absolute(state.ResidualGibbsEnergy - t * dgdt, state.ResidualEnthalpy, 1e-9 * R * t, $"{kind} h_r");
    }

    [Fact]
    public void Evaluate_IdealLimit_ResidualsVanish()
    {
        // Residual properties vanish as ρ → 0 (definition): at ρ = 1e-6 mol/m³ they are O(Bρ) ≈ 1e-9.
        var model = CubicModel.For(CubicModelKind.PengRobinson, 369.89, 4.2512e6, 0.152);

        var state = PhaseState.Evaluate(model, 300, 1e-6);

        AssertClose.Absolute(1, state.CompressibilityFactor, 1e-8, "Z");
        AssertClose.Absolute(0, state.LnFugacityCoefficient, 1e-8, "ln phi");
        AssertClose.Absolute(0, state.ResidualEnthalpy / (R * 300), 1e-8, "h_r/RT");
        AssertClose.Absolute(0, state.ResidualEntropy / R, 1e-8, "s_r/R");
        Assert.Equal(1e6, state.MolarVolume, 6);
    }
}
