namespace PhaseSlope.Core.Mixtures;

/// <summary>The k_ij a mixture model uses for one pair of components, with its source.</summary>
/// <param name="First">Index of the first component (the lower index).</param>
/// <param name="Second">Index of the second component.</param>
/// <param name="Value">k_ij (dimensionless); 0 when <paramref name="Origin"/> is
/// <see cref="InteractionOrigin.AssumedZero"/>.</param>
/// <param name="Source">The publication or the user's source; for an assumed zero, the note
/// saying that no value was given or published.</param>
/// <param name="Origin">Whether the value was given, published or assumed.</param>
public sealed record BinaryInteraction(int First, int Second, double Value, string Source, InteractionOrigin Origin);
