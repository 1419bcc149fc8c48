namespace PhaseSlope.Core.Models;

/// <summary>An optional addition to <see cref="IResidualModel"/>: the two mixed third derivatives
/// of the molar residual Helmholtz energy that second derivatives of the heat capacities need,
/// ∂³A_r/∂T²∂ρ and ∂³A_r/∂T∂ρ², for a pure fluid. Kept out of <see cref="HelmholtzDerivatives"/>
/// so the hot path of every property evaluation does not pay for them.</summary>
/// <remarks>(∂c_v/∂v)_T = T·(∂²P/∂T²)_v = T·ρ²·∂³A_r/∂T²∂ρ, and (∂c_p/∂P)_T = −T·(∂²v/∂T²)_P
/// needs ∂²P/∂T∂ρ = R + 2ρ·∂²A_r/∂T∂ρ + ρ²·∂³A_r/∂T∂ρ² as well
/// (<see cref="Properties.SecondDerivatives"/>).</remarks>
public interface IMixedThirdDerivatives
{
    /// <summary>(∂³A_r/∂T²∂ρ, ∂³A_r/∂T∂ρ²) at (T, ρ), SI molar units (J·m³/(mol²·K²) and
    /// J·m⁶/(mol³·K)).</summary>
    /// <param name="temperature">T in K, positive.</param>
    /// <param name="density">ρ in mol/m³, inside the model's density range.</param>
    (double DTTRho, double DTRhoRho) MixedThirdDerivatives(double temperature, double density);
}
