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
internal sealed record VapourPressureRecord(double Temperature, double Pressure, double? StandardUncertainty, double? Weight, int Line)
{
    /// <summary>The saturated-liquid density measured at this temperature (an optional
    /// <c>rho_L [unit]</c> column; only <c>tune</c> reads it), or null.</summary>
    public LiquidDensity? LiquidDensity { get; init; }
}

/// <summary>A measured saturated-liquid density in SI: mol/m³, or kg/m³ when <paramref name="PerMass"/>
/// (converted with the fluid's molar mass once the fluid is known).</summary>
/// <param name="Value">The density.</param>
/// <param name="PerMass">Whether it is a mass density.</param>
internal sealed record LiquidDensity(double Value, bool PerMass);
