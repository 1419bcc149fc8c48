namespace PhaseSlope.Core.Correlations;

/// <summary>One measured vapour pressure.</summary>
/// <param name="Temperature">T in K.</param>
/// <param name="Pressure">P in Pa.</param>
/// <param name="StandardUncertainty">Standard uncertainty of P in Pa, or null.</param>
/// <param name="Weight">Relative weight of the point in ln P (used when no uncertainty is given), or null for 1.</param>
public sealed record VapourPressurePoint(double Temperature, double Pressure, double? StandardUncertainty = null, double? Weight = null);
