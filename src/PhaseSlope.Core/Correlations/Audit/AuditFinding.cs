namespace PhaseSlope.Core.Correlations.Audit;

/// <summary>How serious a finding is.</summary>
public enum AuditSeverity
{
    /// <summary>The check found nothing wrong.</summary>
    Pass,

    /// <summary>Something to confirm against the source or measured data.</summary>
    Warn,

    /// <summary>The correlation, as declared, should not be used.</summary>
    Fail,
}

/// <summary>One check's result.</summary>
/// <param name="Check">Identifier of the check (e.g. "pole", "waring").</param>
/// <param name="Severity">Pass, warn or fail.</param>
/// <param name="Message">Plain-language explanation, with the numbers behind it.</param>
public sealed record AuditFinding(string Check, AuditSeverity Severity, string Message);

/// <summary>The deviation of one candidate convention at one anchor.</summary>
/// <param name="Anchor">"normal boiling point", "model" or "data".</param>
/// <param name="LnDeviation">ln(P_correlation/P_anchor) (RMS over points for model and data).</param>
/// <param name="Sigma">The ln P spread a right reading may show at the anchor (the anchor's
/// uncertainty and the correlation's own error together: the scale of the consistency score).</param>
/// <param name="Uncertainty">The anchor's own standard uncertainty in ln P (the scale of the
/// separation between candidates: two readings within it are a tie).</param>
public sealed record AnchorDeviation(string Anchor, double LnDeviation, double Sigma, double Uncertainty)
{
    /// <summary>The deviation as a percentage of the anchor pressure.</summary>
    public double Percent => 100 * (Math.Exp(LnDeviation) - 1);
}

/// <summary>A candidate convention with its scores and the evidence.</summary>
/// <param name="Convention">The candidate.</param>
/// <param name="Score">Consistency score, RMS of deviation/σ over the anchors (lower is more plausible).</param>
/// <param name="Evidence">The deviation at each anchor.</param>
/// <param name="Separation">Separation score, RMS over the anchors of max(|deviation|, u)/u with u
/// the anchor's own uncertainty: 1 when the candidate is within every anchor's uncertainty.</param>
public sealed record ConventionCandidate(PublishedConvention Convention, double Score, IReadOnlyList<AnchorDeviation> Evidence, double Separation);

/// <summary>What an audit found.</summary>
public sealed record AuditReport
{
    /// <summary>The convention used for the checks: declared or detected; null when detection refused to guess.</summary>
    public required PublishedConvention? Convention { get; init; }

    /// <summary>True when some part of the convention was detected rather than declared.</summary>
    public required bool Detected { get; init; }

    /// <summary>The most plausible candidate (null when nothing was detected).</summary>
    public required ConventionCandidate? Best { get; init; }

    /// <summary>The runner-up candidate: the second-best score, or, when detection refused as
    /// ambiguous, the candidate it could not exclude (null when there was only one candidate).</summary>
    public required ConventionCandidate? RunnerUp { get; init; }

    /// <summary>The SI natural-log coefficients (ln(P/Pa), T in K), or null without a convention.</summary>
    public required double[]? SiCoefficients { get; init; }

    /// <summary>The temperature range audited, K.</summary>
    public required double MinimumTemperature { get; init; }

    /// <summary>The temperature range audited, K.</summary>
    public required double MaximumTemperature { get; init; }

    /// <summary>The findings, in the order the checks ran.</summary>
    public required IReadOnlyList<AuditFinding> Findings { get; init; }

    /// <summary>True when any finding failed.</summary>
    public bool Failed => Findings.Any(f => f.Severity == AuditSeverity.Fail);
}
