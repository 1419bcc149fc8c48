using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Fluids;

/// <summary>Published alpha-function parameters of one fluid for one cubic model.</summary>
/// <param name="Form">Which alpha function the values belong to.</param>
/// <param name="Model">The cubic model they were fitted with (Peng–Robinson or Soave–Redlich–Kwong form).</param>
/// <param name="Values">The parameters in the order of the form: Twu L, M, N; Mathias–Copeman c1, c2, c3.</param>
/// <param name="Source">Published source, "from memory" note, or "fitted by ..." label.</param>
public sealed record AlphaParameterSet(AlphaForm Form, CubicModelKind Model, IReadOnlyList<double> Values, string Source);
