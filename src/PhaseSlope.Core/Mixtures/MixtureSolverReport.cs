namespace PhaseSlope.Core.Mixtures;

/// <summary>How a mixture equilibrium result was obtained.</summary>
/// <param name="SubstitutionSteps">Successive-substitution steps (accelerated ones included).</param>
/// <param name="NewtonSteps">Newton steps (on the amounts for a flash, on ln K and ln P or ln T for
/// a bubble or dew point; outer steps in T for a P–h or P–s flash are counted in
/// <see cref="OuterSteps"/>).</param>
/// <param name="ModelEvaluations">Fugacity (or residual Helmholtz) evaluations of the mixture
/// model, the stability test's included.</param>
/// <param name="FugacityResidual">max_i |ln f_i(vapour) − ln f_i(liquid)| at the result (0 for a
/// single phase).</param>
/// <param name="AcceleratedSteps">Dominant-eigenvalue extrapolations accepted.</param>
/// <param name="OuterSteps">Temperature steps of a P–h or P–s flash (0 otherwise).</param>
public sealed record MixtureSolverReport(int SubstitutionSteps, int NewtonSteps, int ModelEvaluations, double FugacityResidual,
    int AcceleratedSteps = 0, int OuterSteps = 0)
{
    /// <summary>All iterations: substitution, Newton and outer steps.</summary>
    public int Iterations => SubstitutionSteps + NewtonSteps + OuterSteps;
}
