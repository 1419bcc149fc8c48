namespace PhaseSlope.Core.Estimation;

/// <summary>Joback's critical constants against Lydersen's on the same groups (and the acentric
/// factors that follow from each pair), with the thresholds beyond which the disagreement is a
/// finding.</summary>
/// <remarks>
/// The thresholds are twice the root-sum-square of the two methods' average errors as quoted in
/// the literature (from memory): Joback about 1 % in Tc with a given Tb, 5 % in Pc, 2–3 % in Vc
/// (Poling, Prausnitz &amp; O'Connell, 5th ed., ch. 2); Lydersen about 2 % in Tc, 4 % in Pc, 3 % in
/// Vc (Reid, Prausnitz &amp; Sherwood, 3rd ed., ch. 2). Tc: 2·√(1² + 2²) ≈ 4.5 % → 5 %; Pc:
/// 2·√(5² + 4²) ≈ 12.8 % → 13 %; Vc: 2·√(2.5² + 3²) ≈ 7.8 % → 8 %. Both Tc relations use the same
/// Tb, so the error of an estimated Tb cancels in the comparison. Read as normal errors (an
/// average absolute error is about 0.8 standard deviations), a difference beyond the threshold is
/// 1.6 combined standard deviations, met by about one molecule in ten when both methods err as
/// usual: a finding says that at least one method is probably off for this molecule (a rule of
/// thumb, not a test of significance).
/// Acentric factor: 0.05, the difference that moves the vapour pressure at T/Tc = 0.7 by 12 %
/// (log10 Pr = −1 − ω there), about the Pc threshold.
/// </remarks>
public static class EstimateCrossCheck
{
    /// <summary>Largest accepted |ΔTc/Tc| between the methods.</summary>
    public const double CriticalTemperatureThreshold = 0.05;

    /// <summary>Largest accepted |ΔPc/Pc| between the methods.</summary>
    public const double CriticalPressureThreshold = 0.13;

    /// <summary>Largest accepted |ΔVc/Vc| between the methods.</summary>
    public const double CriticalVolumeThreshold = 0.08;

    /// <summary>Largest accepted |Δω| between the acentric factors from the two pairs of Tc, Pc.</summary>
    public const double AcentricFactorThreshold = 0.05;

    /// <summary>Compares Tc, Pc and Vc of the two methods.</summary>
    public static IReadOnlyList<CrossCheckItem> Compare(JobackEstimate joback, LydersenEstimate lydersen)
    {
        ArgumentNullException.ThrowIfNull(joback);
        ArgumentNullException.ThrowIfNull(lydersen);
        return
        [
            Relative("critical_temperature", joback.CriticalTemperature, lydersen.CriticalTemperature, CriticalTemperatureThreshold, lydersen.Unavailable, joback.GroupsWithout(g => g.Tc)),
            Relative("critical_pressure", joback.CriticalPressure, lydersen.CriticalPressure, CriticalPressureThreshold, lydersen.Unavailable, joback.GroupsWithout(g => g.Pc)),
            Relative("critical_volume", joback.CriticalVolume, lydersen.CriticalVolume, CriticalVolumeThreshold, lydersen.Unavailable, joback.GroupsWithout(g => g.Vc)),
        ];
    }

    /// <summary>Compares the acentric factors obtained with each method's Tc and Pc; a null
    /// value carries <paramref name="unavailable"/> as the reason.</summary>
    public static CrossCheckItem AcentricFactor(double? joback, double? crossCheck, string? unavailable)
        => new("acentric_factor", joback, crossCheck, joback is double j && crossCheck is double c ? c - j : null, false, AcentricFactorThreshold,
            joback is not null && crossCheck is not null ? null : unavailable ?? "no value");

    private static CrossCheckItem Relative(string quantity, double? joback, double? other, double threshold, string? otherUnavailable, string? jobackBlank)
    {
        if (joback is double j && other is double o)
        {
            return new CrossCheckItem(quantity, j, o, (o - j) / j, true, threshold, null);
        }

        string reason = joback is null ? $"no Joback contribution for {jobackBlank}" : otherUnavailable ?? "no value";
        return new CrossCheckItem(quantity, joback, other, null, true, threshold, reason);
    }
}
