namespace PhaseSlope.Core.Units;

/// <summary>The physical dimension of a unit; each dimension has one SI unit that every unit of
/// it converts to.</summary>
public enum Dimension
{
    /// <summary>Thermodynamic temperature; SI unit K.</summary>
    Temperature,

    /// <summary>Absolute pressure; SI unit Pa.</summary>
    Pressure,

    /// <summary>Molar mass; SI unit kg/mol.</summary>
    MolarMass,

    /// <summary>Amount-of-substance (molar) density; SI unit mol/m3.</summary>
    AmountDensity,

    /// <summary>Mass density; SI unit kg/m3.</summary>
    MassDensity,

    /// <summary>Molar volume; SI unit m3/mol.</summary>
    MolarVolume,

    /// <summary>Specific (mass-based) volume; SI unit m3/kg.</summary>
    SpecificVolume,

    /// <summary>Molar energy (enthalpy, internal energy, latent heat); SI unit J/mol.</summary>
    MolarEnergy,

    /// <summary>Specific (mass-based) energy; SI unit J/kg.</summary>
    SpecificEnergy,

    /// <summary>Molar entropy or heat capacity; SI unit J/(mol·K).</summary>
    MolarEntropy,

    /// <summary>Specific (mass-based) entropy or heat capacity; SI unit J/(kg·K).</summary>
    SpecificEntropy,

    /// <summary>Slope of a pressure against temperature, dp/dT; SI unit Pa/K.</summary>
    PressureSlope,

    /// <summary>Speed; SI unit m/s.</summary>
    Speed,

    /// <summary>Reciprocal temperature (isobaric expansivity); SI unit 1/K.</summary>
    InverseTemperature,

    /// <summary>Reciprocal pressure (compressibility); SI unit 1/Pa.</summary>
    InversePressure,

    /// <summary>Temperature per pressure (Joule–Thomson coefficient); SI unit K/Pa.</summary>
    TemperaturePerPressure,
}
