namespace PhaseSlope.Core.Equilibrium;

/// <summary>How a coexistence point was obtained.</summary>
/// <param name="Method">The route taken.</param>
/// <param name="Iterations">Outer iterations (Newton steps or function evaluations of the outer loop).</param>
/// <param name="FugacityResidual">|ln φL − ln φV| at the returned state, both evaluated at the
/// returned pressure; 0 at the critical point.</param>
/// <param name="StopReason">Why the calculation stopped.</param>
public sealed record SolverReport(CoexistenceMethod Method, int Iterations, double FugacityResidual, StopReason StopReason);
