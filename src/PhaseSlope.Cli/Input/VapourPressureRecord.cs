namespace PhaseSlope.Cli.Input;

/// <summary>One measured vapour-pressure point, in SI units.</summary>
/// <param name="Temperature">Saturation temperature in K, greater than zero.</param>
/// <param name="Pressure">Vapour pressure in Pa, greater than zero.</param>
/// <param name="StandardUncertainty">Standard uncertainty of <paramref name="Pressure"/> in Pa,
/// greater than zero, when the file gives one (a relative uncertainty in the file is already
/// multiplied by the pressure here); otherwise null.</param>
/// <param name="Weight">Dimensionless weight of the point, greater than zero, when the file gives
/// one; otherwise null. A file gives an uncertainty or a weight, never both.</param>
/// <param name="Line">1-based physical line of the file the point was read from, counting comment
/// and blank lines, for error messages of later steps.</param>
internal sealed record VapourPressureRecord(double Temperature, double Pressure, double? StandardUncertainty, double? Weight, int Line);
