namespace PhaseSlope.Core.Mixtures;

/// <summary>Where a binary interaction parameter k_ij came from.</summary>
public enum InteractionOrigin
{
    /// <summary>Given by the user (a mixture file's <c>kij</c> line or the command line's
    /// <c>--kij</c>); it overrides the published table.</summary>
    Given,

    /// <summary>From the sourced table of published values (<see cref="PublishedInteractions"/>).</summary>
    Published,

    /// <summary>Neither given nor published for this pair and model: k_ij = 0 is assumed, and the
    /// output says so.</summary>
    AssumedZero,
}
