namespace PhaseSlope.Core.Mixtures;

/// <summary>A binary interaction parameter k_ij given for one pair of a mixture's components (a
/// mixture file's <c>kij</c> line or the command line's <c>--kij</c>); it applies to whichever
/// cubic model the mixture is used with and overrides the published table.</summary>
/// <param name="First">Index of one component in the mixture.</param>
/// <param name="Second">Index of the other component (not <paramref name="First"/>).</param>
/// <param name="Value">k_ij (dimensionless).</param>
/// <param name="Source">Where the value comes from (a publication, "given on the command line", a
/// fit), shown beside it in the output.</param>
public sealed record GivenInteraction(int First, int Second, double Value, string Source);
