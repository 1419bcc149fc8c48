using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Models;

/// <summary>The physical requirements on an alpha function below Tc: α(T) finite and positive,
/// and decreasing in T (attraction weakens as the fluid heats), checked where the tool uses it.</summary>
/// <remarks>A rising α makes (∂P/∂T)_ρ of a dense liquid too large and can turn the Clapeyron
/// slope and the latent heat negative (a generalised Twu α with ω = −0.5 did). The check
/// evaluates α and dα/dT at T/Tc = 0.30, 0.31, …, 1.00: 0.3 is the tool's default lowest valid
/// reduced temperature, and every alpha function used here is a smooth function of √Tr or Tr^q
/// with at most one turning point, which a 0.01 step in Tr cannot step over unnoticed except
/// within 0.01 of it.</remarks>
public static class AlphaGuard
{
    /// <summary>Lowest reduced temperature checked.</summary>
    public const double LowestReducedTemperature = 0.3;

    private const int Steps = 70;

    /// <summary>The first reduced temperature on the grid where α is not finite and positive or
    /// dα/dT is not negative, with the reason; null when there is none.</summary>
    public static (double ReducedTemperature, string Reason)? FirstViolation(IAlphaFunction alpha, double criticalTemperature)
    {
        ArgumentNullException.ThrowIfNull(alpha);
        for (int i = 0; i <= Steps; i++)
        {
            double tr = LowestReducedTemperature + (1 - LowestReducedTemperature) * i / Steps;
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
    /// <exception cref="InvalidInputException">α not finite and positive, or not decreasing, somewhere on 0.3 ≤ T/Tc ≤ 1.</exception>
    public static void RequirePositiveDecreasing(IAlphaFunction alpha, double criticalTemperature, string what)
    {
        if (FirstViolation(alpha, criticalTemperature) is (double tr, string reason))
        {
            throw new InvalidInputException("alpha parameters", tr,
                $"{what}: the alpha function {reason} at T/Tc = {tr.ToString("0.00", System.Globalization.CultureInfo.InvariantCulture)}; it must stay positive and decrease with T for {LowestReducedTemperature.ToString(System.Globalization.CultureInfo.InvariantCulture)} <= T/Tc <= 1");
        }
    }
}
