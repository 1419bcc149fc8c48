namespace PhaseSlope.Core.Equilibrium;

/// <summary>How a coexistence point was obtained.</summary>
/// <param name="Method">The route taken.</param>
/// <param name="Iterations">Newton iterations of the route (each evaluates both phases once).</param>
/// <param name="FugacityResidual">|ln φL − ln φV| at the returned state, both evaluated at the
/// returned pressure; 0 at the critical point.</param>
/// <param name="StopReason">Why the calculation stopped.</param>
/// <param name="ModelEvaluations">Residual-Helmholtz evaluations the point cost, the start
/// included (0 for the critical state, which is one evaluation made by the caller).</param>
/// <param name="Start">Where the iteration started.</param>
/// <param name="DensityUncertainty">Estimated relative error of the returned densities: the size
/// of the Newton correction still pending at the returned state. Below 1e-13 when
/// <see cref="StopReason.Converged"/>; larger, and stated, when <see cref="StopReason.RoundingLimit"/>.</param>
public sealed record SolverReport(
    CoexistenceMethod Method,
    int Iterations,
    double FugacityResidual,
    StopReason StopReason,
    int ModelEvaluations = 0,
    CoexistenceStart Start = CoexistenceStart.None,
    double DensityUncertainty = 0);
