namespace PhaseSlope.Core.Mixtures;

/// <summary>The root of the Rachford–Rice equation for given feed and K-values.</summary>
/// <param name="VapourFraction">β, the vapour fraction: within (0, 1) for a split; outside it
/// (a negative flash, within the asymptotes 1/(1 − K_max) &lt; β &lt; 1/(1 − K_min)) when asked
/// for and the K-values put the feed in one phase; exactly 0 or 1 when the single phase is
/// reported without a negative flash.</param>
/// <param name="IsTwoPhase">Whether 0 &lt; β &lt; 1: the K-values split the feed.</param>
/// <param name="Iterations">Newton (or bisection) steps taken.</param>
/// <param name="Residual">|g(β)| at the returned β (0 when a single phase is reported without
/// solving).</param>
public readonly record struct RachfordRiceSolution(double VapourFraction, bool IsTwoPhase, int Iterations, double Residual);
