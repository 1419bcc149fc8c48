using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.TestSupport;

/// <summary>Representative states of a model and a central-difference check of an analytic
/// derivative, shared by the Helmholtz-derivative tests of plain and translated models.</summary>
internal static class HelmholtzStates
{
    /// <summary>Relative step of the central differences: near the optimum ε^(1/3) ≈ 6e-6 for a
    /// first derivative by a two-point central difference.</summary>
    public const double Step = 1e-5;

    /// <summary>Error bound of the central difference, relative to |f|/x + |f'|. Truncation is
    /// Step²·x²·|f'''|/6 relative to |f'|: x²f'''/f' is at most a few hundred at the dense
    /// liquid states (terms in 1/(1 − bρ)^n with bρ ≈ 0.8), i.e. ≤ 1e-8; rounding is
    /// ε/Step ≈ 2e-11. 1e-7 keeps a factor ~10 of margin and still catches any wrong term,
    /// whose error would be O(1).</summary>
    public const double Tolerance = 1e-7;

    /// <summary>Saturated liquid or vapour at T = 0.7·Tc (the solver only picks realistic
    /// densities), or the critical density at 1.5·Tc ("supercritical").</summary>
    public static (double T, double Rho) Pick(CubicModel model, double minimumTemperature, string state)
    {
        double tc = model.CriticalTemperature;
        var solver = new CoexistenceSolver(model, minimumTemperature);
        return state switch
        {
            "liquid" => (0.7 * tc, solver.AtTemperature(0.7 * tc).Liquid.Density),
            "vapour" => (0.7 * tc, solver.AtTemperature(0.7 * tc).Vapour.Density),
            _ => (1.5 * tc, model.CriticalDensity),
        };
    }

    /// <summary>Asserts that <paramref name="analytic"/> equals the central difference of
    /// <paramref name="f"/> at <paramref name="x"/> within <see cref="Tolerance"/>.</summary>
    public static void CheckCentralDifference(Func<double, double> f, double x, double analytic, string what)
    {
        double h = Step * x;
        double fd = (f(x + h) - f(x - h)) / (2 * h);
        double scale = Math.Abs(f(x)) / x + Math.Abs(analytic);
        AssertClose.Absolute(analytic, fd, Tolerance * scale, what);
    }
}
