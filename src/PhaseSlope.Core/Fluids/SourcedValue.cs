namespace PhaseSlope.Core.Fluids;

/// <summary>A constant with its provenance and, where the source states one, its standard uncertainty.</summary>
/// <param name="Value">The value in SI units (K, Pa, kg/mol, mol/m³, or dimensionless).</param>
/// <param name="Source">The published source, "from memory" note or "estimated by ..." label.</param>
/// <param name="StandardUncertainty">Standard uncertainty in the same unit as <paramref name="Value"/>, or null.</param>
public sealed record SourcedValue(double Value, string Source, double? StandardUncertainty = null);
