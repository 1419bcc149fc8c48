using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Fluids;

/// <summary>Published alpha-function parameters of one fluid for one cubic model.</summary>
/// <param name="Form">Which alpha function the values belong to.</param>
/// <param name="Model">The cubic model they were fitted with (Peng–Robinson or Soave–Redlich–Kwong form).</param>
/// <param name="Values">The parameters in the order of the form: Soave m; Twu L, M, N; Mathias–Copeman c1, c2, c3.</param>
/// <param name="Source">Published source, "from memory" note, or "tuned by ..." label.</param>
public sealed record AlphaParameterSet(AlphaForm Form, CubicModelKind Model, IReadOnlyList<double> Values, string Source)
{
    /// <summary>The number of parameters of each form that has fluid-specific parameters.</summary>
    public static int ParameterCount(AlphaForm form) => form switch
    {
        AlphaForm.Soave => 1,
        AlphaForm.Twu or AlphaForm.MathiasCopeman => 3,
        _ => throw new ArgumentOutOfRangeException(nameof(form), form, "the model's own alpha function has no fluid-specific parameters"),
    };

    /// <summary>The parameters' covariance matrix (from a fit to data, e.g. <c>phaseslope tune</c>),
    /// or null when the source gives none.</summary>
    public double[,]? Covariance { get; init; }

    /// <summary>How the tuned parameters would move with the critical constants they were tuned
    /// with, ∂θ_j/∂Tc (1/K) in column 0 and ∂θ_j/∂Pc (1/Pa) in column 1, or null. A tuning holds
    /// Tc and Pc fixed; a different Tc or Pc would have given other parameters that reproduce the
    /// same data, so in the propagation the parameters move with Tc and Pc (their covariance with
    /// them is this sensitivity times u²), which keeps the uncertainty inside the data at the level
    /// the data support.</summary>
    public double[,]? CriticalSensitivity { get; init; }
}
