namespace PhaseSlope.Core.Mixtures;

/// <summary>Which saturation point of a mixture: where the first bubble of vapour or the first
/// drop of liquid appears.</summary>
public enum MixtureSaturationKind
{
    /// <summary>Bubble point: the feed is the liquid, in equilibrium with an incipient vapour.</summary>
    Bubble,

    /// <summary>Dew point: the feed is the vapour, in equilibrium with an incipient liquid.</summary>
    Dew,
}
