namespace PhaseSlope.Core.Uncertainty;

/// <summary>One uncertain input of a model: its value, its standard uncertainty and where that
/// uncertainty comes from.</summary>
/// <param name="Name">Key with its SI unit, for reports (for example "critical_temperature_K").</param>
/// <param name="Value">The value in SI units.</param>
/// <param name="StandardUncertainty">The standard uncertainty u, same unit, not negative.</param>
/// <param name="UncertaintySource">Where u comes from: the fluid file's source, or
/// "family default (...)" when the file states none (see <see cref="FamilyUncertainty"/>).</param>
public sealed record UncertainInput(string Name, double Value, double StandardUncertainty, string UncertaintySource);
