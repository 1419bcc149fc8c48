namespace PhaseSlope.Core.Mixtures;

/// <summary>The tangent-plane-distance test of a feed at (T, P).</summary>
/// <param name="IsStable">Whether no trial phase lowers the Gibbs energy: every stationary point
/// found has tm ≥ −<see cref="StabilityAnalysis.NegativeDistance"/> or is trivial.</param>
/// <param name="VapourLike">The trial started from the feed times the Wilson K-values.</param>
/// <param name="LiquidLike">The trial started from the feed divided by the Wilson K-values.</param>
/// <param name="ModelEvaluations">Fugacity evaluations, the feed's included.</param>
public sealed record StabilityResult(bool IsStable, StabilityTrial VapourLike, StabilityTrial LiquidLike, int ModelEvaluations)
{
    /// <summary>The trial of lower tangent-plane distance (the one that shows instability when the
    /// feed is unstable).</summary>
    public StabilityTrial Lowest => LiquidLike.TangentPlaneDistance < VapourLike.TangentPlaneDistance && !LiquidLike.IsTrivial || VapourLike.IsTrivial ? LiquidLike : VapourLike;

    /// <summary>The lowest tangent-plane distance found (0 when both trials are trivial).</summary>
    public double TangentPlaneDistance => Math.Min(VapourLike.IsTrivial ? 0 : VapourLike.TangentPlaneDistance, LiquidLike.IsTrivial ? 0 : LiquidLike.TangentPlaneDistance);

    /// <summary>The composition of the trial that lowers the Gibbs energy most.</summary>
    public IReadOnlyList<double> TrialComposition => Lowest.Composition;
}
