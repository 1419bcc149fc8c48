namespace PhaseSlope.Core.Equilibrium;

/// <summary>Why a coexistence calculation stopped. Failures are not listed: they throw a
/// <see cref="Errors.ConvergenceException"/> carrying the last iterate.</summary>
public enum StopReason
{
    /// <summary>The equal-fugacity residual met the tolerance.</summary>
    Converged,

    /// <summary>The state is the critical point itself: both phases coincide, nothing to iterate.</summary>
    CriticalPoint,
}
