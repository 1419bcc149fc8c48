using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>One published binary interaction parameter: a pair of catalog fluids, the cubic
/// models it was fitted for, the value and its source.</summary>
/// <param name="First">Canonical catalog name of one fluid (as its <c>name</c> line).</param>
/// <param name="Second">Canonical catalog name of the other fluid.</param>
/// <param name="Models">The cubic models the value applies to.</param>
/// <param name="Value">k_ij (dimensionless).</param>
/// <param name="Source">The publication, with "from memory" where the value was recalled.</param>
public sealed record PublishedInteraction(string First, string Second, IReadOnlyList<CubicModelKind> Models, double Value, string Source);
