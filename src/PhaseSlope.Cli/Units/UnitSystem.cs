namespace PhaseSlope.Cli.Units;

/// <summary>The set of display units used for table output.</summary>
internal enum UnitSystem
{
    /// <summary>Molar SI units: K, kPa, mol/m3, m3/mol, J/mol, J/(mol·K), kPa/K.</summary>
    Si,

    /// <summary>Mass-based engineering units: degC, bar, kg/m3, m3/kg, kJ/kg, kJ/(kg·K), bar/K.</summary>
    Engineering,
}
