namespace PhaseSlope.Core.Mixtures;

/// <summary>A traced phase envelope of one feed composition: the bubble branch from the start
/// pressure up to the critical point, the dew branch from there down to the end pressure.</summary>
public sealed record PhaseEnvelope
{
    /// <summary>Feed mole fractions, in component order.</summary>
    public required IReadOnlyList<double> Composition { get; init; }

    /// <summary>Converged points in tracing order (bubble branch first, then dew).</summary>
    public required IReadOnlyList<EnvelopePoint> Points { get; init; }

    /// <summary>The critical point, where every ln K passes through zero; null when the trace
    /// ended before it.</summary>
    public required EnvelopeLandmark? CriticalPoint { get; init; }

    /// <summary>The highest pressure of the envelope, located where dP/dT = 0 along it; null when
    /// the traced part has no interior pressure maximum.</summary>
    public required EnvelopeLandmark? Cricondenbar { get; init; }

    /// <summary>The highest temperature of the envelope, located where dT/dP = 0 along it; null
    /// when the traced part has no interior temperature maximum.</summary>
    public required EnvelopeLandmark? Cricondentherm { get; init; }

    /// <summary>Why the trace ended.</summary>
    public required EnvelopeStop StopReason { get; init; }

    /// <summary>Model evaluations (fugacities of one phase with derivatives) the trace used.</summary>
    public required int Evaluations { get; init; }

    /// <summary>The bubble-branch points.</summary>
    public IEnumerable<EnvelopePoint> BubblePoints => Points.Where(p => p.Branch == EnvelopeBranch.Bubble);

    /// <summary>The dew-branch points.</summary>
    public IEnumerable<EnvelopePoint> DewPoints => Points.Where(p => p.Branch == EnvelopeBranch.Dew);
}
