namespace PhaseSlope.Core.Estimation;

/// <summary>One quantity estimated by two methods, their difference and whether it exceeds the
/// threshold of <see cref="EstimateCrossCheck"/>.</summary>
/// <param name="Quantity">Which quantity: "critical_temperature", "critical_pressure",
/// "critical_volume" or "acentric_factor".</param>
/// <param name="Joback">The value from Joback's constants (SI), or null.</param>
/// <param name="CrossCheck">The value from Lydersen's constants (SI), or null.</param>
/// <param name="Difference">(cross-check − Joback)/Joback for Tc, Pc and Vc; cross-check − Joback
/// for the acentric factor; null when either value is missing.</param>
/// <param name="Relative">True when <paramref name="Difference"/> is relative.</param>
/// <param name="Threshold">The largest |difference| accepted without a finding.</param>
/// <param name="Unavailable">Why there is no comparison, or null.</param>
public sealed record CrossCheckItem(string Quantity, double? Joback, double? CrossCheck, double? Difference, bool Relative, double Threshold, string? Unavailable)
{
    /// <summary>True when the two methods differ by more than <see cref="Threshold"/>.</summary>
    public bool Exceeds => Difference is double d && Math.Abs(d) > Threshold;
}
