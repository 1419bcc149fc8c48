namespace PhaseSlope.Plots;

/// <summary>The unit system of a figure's axes.</summary>
public enum PlotUnits
{
    /// <summary>K, kPa, mol/m³, cm³/mol, kJ/mol, J/(mol·K).</summary>
    Si,

    /// <summary>°C, bar, kg/m³, m³/kg, kJ/kg, kJ/(kg·K).</summary>
    Engineering,
}

/// <summary>Conversion from SI molar values to the display units of an axis.</summary>
internal readonly record struct UnitScale(PlotUnits Units)
{
    private bool Si => Units == PlotUnits.Si;

    public string TemperatureUnit => Si ? "K" : "°C";

    public double Temperature(double kelvin) => Si ? kelvin : kelvin - 273.15;

    public string PressureUnit => Si ? "kPa" : "bar";

    public double Pressure(double pascal) => Si ? pascal / 1e3 : pascal / 1e5;

    public string SlopeUnit => Si ? "kPa/K" : "bar/K";

    public string DensityUnit => Si ? "mol/m³" : "kg/m³";

    public double Density(double molPerM3, double molarMass) => Si ? molPerM3 : molPerM3 * molarMass;

    // cm³/mol rather than m³/mol: tick labels such as 50 and 2000 instead of 5e-05 and 0.002.
    public string VolumeUnit => Si ? "cm³/mol" : "m³/kg";

    public double Volume(double m3PerMol, double molarMass) => Si ? m3PerMol * 1e6 : m3PerMol / molarMass;

    public string EnthalpyUnit => Si ? "kJ/mol" : "kJ/kg";

    public double Enthalpy(double jPerMol, double molarMass) => Si ? jPerMol / 1e3 : jPerMol / molarMass / 1e3;

    public string EntropyUnit => Si ? "J/(mol·K)" : "kJ/(kg·K)";

    public double Entropy(double jPerMolK, double molarMass) => Si ? jPerMolK : jPerMolK / molarMass / 1e3;
}
