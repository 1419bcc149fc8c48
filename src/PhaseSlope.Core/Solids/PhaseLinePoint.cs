namespace PhaseSlope.Core.Solids;

/// <summary>A point of a solid line (sublimation or melting) with its Clapeyron quantities.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Slope">dP/dT along the line, Pa/K.</param>
/// <param name="EnthalpyChange">Δh of the transition (vapour or liquid minus solid), J/mol, or null when the
/// fluid's data do not give it at this point.</param>
/// <param name="VolumeChange">Δv of the transition (vapour or liquid minus solid), m³/mol, or null.</param>
public sealed record PhaseLinePoint(double Temperature, double Pressure, double Slope, double? EnthalpyChange, double? VolumeChange);
