namespace PhaseSlope.Core.Equilibrium;

/// <summary>Why a coexistence calculation stopped. Failures are not listed: they throw a
/// <see cref="Errors.ConvergenceException"/> carrying the last iterate.</summary>
public enum StopReason
{
    /// <summary>The Newton correction fell below 1e-13 (relative, in each density) and the
    /// equal-fugacity residual met the tolerance.</summary>
    Converged,

    /// <summary>The state is the critical point itself: both phases coincide, nothing to iterate.</summary>
    CriticalPoint,

    /// <summary>Close to the critical point, where the pressure difference between the phases
    /// shrinks as (Tc − T)^(3/2) and drowns in rounding, the Newton corrections stopped shrinking
    /// before 1e-13. The state returned is the best iterate and
    /// <see cref="SolverReport.DensityUncertainty"/> states how far its densities can be trusted.</summary>
    RoundingLimit,
}
