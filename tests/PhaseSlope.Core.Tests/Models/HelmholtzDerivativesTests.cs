using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class HelmholtzDerivativesTests
{
    /// <summary>Relative step of the central differences: near the optimum ε^(1/3) ≈ 6e-6 for a
    /// first derivative by a two-point central difference.</summary>
    private const double Step = 1e-5;

    /// <summary>Error bound of the central difference, relative to |f|/x + |f'|. Truncation is
    /// Step²·x²·|f'''|/6 relative to |f'|: x²f'''/f' is at most a few hundred at the dense
    /// liquid states (terms in 1/(1 − bρ)^n with bρ ≈ 0.8), i.e. ≤ 1e-8; rounding is
    /// ε/Step ≈ 2e-11. 1e-7 keeps a factor ~10 of margin and still catches any wrong term,
    /// whose error would be O(1).</summary>
    private const double Tolerance = 1e-7;

    public static TheoryData<CubicModelKind, string, string> States()
    {
        var data = new TheoryData<CubicModelKind, string, string>();
        foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
        {
            foreach (string state in new[] { "liquid", "vapour", "supercritical" })
            {
                data.Add(kind, "propane", state);
            }
        }

        // ω = 0.649 puts the 1978 Peng–Robinson κ on its own branch.
        foreach (string state in new[] { "liquid", "vapour", "supercritical" })
        {
            data.Add(CubicModelKind.PengRobinson1978, "ethanol", state);
        }

        return data;
    }

    /// <summary>Saturated liquid or vapour at T = 0.7·Tc (taken from the solver only to pick
    /// realistic densities), or the critical density at 1.5·Tc.</summary>
    private static (CubicModel Model, double T, double Rho) State(CubicModelKind kind, string fluidName, string state)
    {
        Fluid fluid = FluidCatalog.Embedded.Find(fluidName);
        var solver = CoexistenceSolver.For(fluid, kind);
        var model = solver.Model;
        double tc = model.CriticalTemperature;
        return state switch
        {
            "liquid" => (model, 0.7 * tc, solver.AtTemperature(0.7 * tc).Liquid.Density),
            "vapour" => (model, 0.7 * tc, solver.AtTemperature(0.7 * tc).Vapour.Density),
            _ => (model, 1.5 * tc, model.CriticalDensity),
        };
    }

    private static void CheckCentralDifference(Func<double, double> f, double x, double analytic, string what)
    {
        double h = Step * x;
        double fd = (f(x + h) - f(x - h)) / (2 * h);
        double scale = Math.Abs(f(x)) / x + Math.Abs(analytic);
        AssertClose.Absolute(analytic, fd, Tolerance * scale, what);
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Residual_TemperatureDerivatives_EqualCentralDifferences(CubicModelKind kind, string fluid, string state)
    {
        var (model, t, rho) = State(kind, fluid, state);
        var d = model.Residual(t, rho);

        CheckCentralDifference(x => model.Residual(x, rho).Value, t, d.DT, $"{kind} {state} dA/dT");
        CheckCentralDifference(x => model.Residual(x, rho).DT, t, d.DTT, $"{kind} {state} d2A/dT2");
        CheckCentralDifference(x => model.Residual(x, rho).DRho, t, d.DTRho, $"{kind} {state} d2A/dTdrho from dA/drho");
        CheckCentralDifference(x => model.Residual(x, rho).Pressure, t, d.PressureDT, $"{kind} {state} dP/dT");
    }

    [Theory]
    [MemberData(nameof(States))]
    public void Residual_DensityDerivatives_EqualCentralDifferences(CubicModelKind kind, string fluid, string state)
    {
        var (model, t, rho) = State(kind, fluid, state);
        var d = model.Residual(t, rho);

        CheckCentralDifference(x => model.Residual(t, x).Value, rho, d.DRho, $"{kind} {state} dA/drho");
        CheckCentralDifference(x => model.Residual(t, x).DRho, rho, d.DRhoRho, $"{kind} {state} d2A/drho2");
        CheckCentralDifference(x => model.Residual(t, x).DRhoRho, rho, d.DRhoRhoRho, $"{kind} {state} d3A/drho3");
        CheckCentralDifference(x => model.Residual(t, x).DT, rho, d.DTRho, $"{kind} {state} d2A/dTdrho from dA/dT");
        CheckCentralDifference(x => model.Residual(t, x).Pressure, rho, d.PressureDRho, $"{kind} {state} dP/drho");
        CheckCentralDifference(x => model.Residual(t, x).PressureDRho, rho, d.PressureDRhoRho, $"{kind} {state} d2P/drho2");
    }

    [Fact]
    public void Residual_VanDerWaals_HasNoTemperatureDependentAttraction()
    {
        // van der Waals (1873): a is constant, so A_r = −RT·ln(1 − bρ) − aρ exactly
        // (closed form; any textbook), d²A_r/dT² = 0. Rounding level 1e-13 relative.
        var model = CubicModel.For(CubicModelKind.VanDerWaals, 150.687, 4.863e6, -0.002);
        double t = 120;
        double rho = 20000;

        var d = model.Residual(t, rho);
        double expected = -Constants.GasConstant * t * Math.Log(1 - model.CovolumeB * rho) - model.AttractionA * rho;

        AssertClose.Relative(expected, d.Value, 1e-13, "vdW A_r");
        Assert.Equal(0.0, d.DTT);
    }
}
