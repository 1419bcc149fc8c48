namespace PhaseSlope.Core.Equilibrium;

/// <summary>Tolerances and limits of the coexistence solver.</summary>
/// <param name="FugacityTolerance">Largest accepted |ln φL − ln φV|. Default 1e-12; the
/// iterations aim two orders lower, so the default is met with margin at rounding level.</param>
/// <param name="MaxIterations">Cap on each Newton loop. Default 100; converged points take
/// 5–40 (the pressure iteration counts its bracketing steps too).</param>
public sealed record CoexistenceOptions(double FugacityTolerance = 1e-12, int MaxIterations = 100)
{
    /// <summary>The defaults.</summary>
    public static CoexistenceOptions Default { get; } = new();
}
