namespace PhaseSlope.Core.Mixtures;

/// <summary>One trial phase of a tangent-plane-distance test, at the stationary point it reached.</summary>
/// <param name="Composition">The trial phase's mole fractions.</param>
/// <param name="TangentPlaneDistance">The modified tangent-plane distance
/// tm = 1 + Σ W_i (ln W_i + ln φ_i(W) − ln z_i − ln φ_i(z) − 1) at the stationary point (the
/// reduced tangent-plane distance, in units of RT per mole of feed); negative proves the feed
/// unstable.</param>
/// <param name="IsTrivial">Whether the trial converged to the feed itself (the trivial
/// stationary point, which says nothing).</param>
/// <param name="Iterations">Successive-substitution plus Newton iterations.</param>
public sealed record StabilityTrial(IReadOnlyList<double> Composition, double TangentPlaneDistance, bool IsTrivial, int Iterations);
