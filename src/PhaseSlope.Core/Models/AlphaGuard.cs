using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Models;

/// <summary>The physical requirements on an alpha function below Tc: α(T) finite and positive,
/// and decreasing in T (attraction weakens as the fluid heats), checked where the tool uses it.</summary>
/// <remarks>A rising α makes (∂P/∂T)_ρ of a dense liquid too large and can turn the Clapeyron
/// slope and the latent heat negative (a generalised Twu α with ω = −0.5 did). The check
/// evaluates α and dα/dT at T/Tc = 0.30, 0.31, …, 1.00 (0.3 is the tool's lowest valid reduced
/// temperature where a fluid gives no triple point), or from a lower start in steps of about 0.01
/// when the fluid's triple point lies lower (see <see cref="Equilibrium.CoexistenceSolver.LowestValidTemperature"/>); every alpha function used here is a smooth function of √Tr or Tr^q
/// with at most one turning point, which a 0.01 step in Tr cannot step over unnoticed except
/// within 0.01 of it.</remarks>
public static class AlphaGuard
{
    /// <summary>Lowest reduced temperature checked.</summary>
    public const double LowestReducedTemperature = 0.3;


    /// <summary>The first reduced temperature on the grid where α is not finite and positive or
    /// dα/dT is not negative, with the reason; null when there is none.</summary>
    /// <param name="alpha">The alpha function.</param>
    /// <param name="criticalTemperature">Tc, K.</param>
    /// <param name="lowestReducedTemperature">Where the grid starts, T/Tc (at most <see cref="LowestReducedTemperature"/>).</param>
    public static (double ReducedTemperature, string Reason)? FirstViolation(IAlphaFunction alpha, double criticalTemperature, double lowestReducedTemperature = LowestReducedTemperature)
    {
        ArgumentNullException.ThrowIfNull(alpha);
        double start = Math.Min(lowestReducedTemperature, LowestReducedTemperature);
        int steps = (int)Math.Round((1 - start) * 100);
        for (int i = 0; i <= steps; i++)
        {
            double tr = start + (1 - start) * i / steps;
            var value = alpha.Evaluate(tr * criticalTemperature);
            if (!double.IsFinite(value.Value) || !double.IsFinite(value.FirstDerivative))
            {
                return (tr, "is not finite");
            }

            if (!(value.Value > 0))
            {
                return (tr, $"is not positive (alpha = {Preconditions.Format(value.Value)})");
            }

            if (!(value.FirstDerivative < 0))
            {
                return (tr, $"does not decrease with T (d alpha/dT = {Preconditions.Format(value.FirstDerivative)} 1/K)");
            }
        }

        return null;
    }

    /// <summary>Throws when <see cref="FirstViolation"/> finds one.</summary>
    /// <param name="alpha">The alpha function.</param>
    /// <param name="criticalTemperature">Tc, K.</param>
    /// <param name="what">What the function was built from, for the message (e.g. "Twu parameters L = …").</param>
    /// <param name="lowestReducedTemperature">Where the check starts, T/Tc (at most <see cref="LowestReducedTemperature"/>):
    /// the fluid's lowest valid temperature over Tc when that is lower.</param>
    /// <exception cref="InvalidInputException">α not finite and positive, or not decreasing, somewhere on the checked range up to T/Tc = 1.</exception>
    public static void RequirePositiveDecreasing(IAlphaFunction alpha, double criticalTemperature, string what, double lowestReducedTemperature = LowestReducedTemperature)
    {
        if (FirstViolation(alpha, criticalTemperature, lowestReducedTemperature) is (double tr, string reason))
        {
            double start = Math.Min(lowestReducedTemperature, LowestReducedTemperature);
            throw new InvalidInputException("alpha parameters", tr,
                $"{what}: the alpha function {reason} at T/Tc = {tr.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)}; it must stay positive and decrease with T for {start.ToString("0.###", System.Globalization.CultureInfo.InvariantCulture)} <= T/Tc <= 1");
        }
    }
}
