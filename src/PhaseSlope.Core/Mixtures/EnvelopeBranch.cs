namespace PhaseSlope.Core.Mixtures;

/// <summary>Which side of a phase envelope a point lies on, for the feed composition.</summary>
public enum EnvelopeBranch
{
    /// <summary>The feed is a saturated liquid; the incipient phase is a vapour.</summary>
    Bubble,

    /// <summary>The feed is a saturated vapour; the incipient phase is a liquid.</summary>
    Dew,
}
