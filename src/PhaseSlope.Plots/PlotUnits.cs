using PhaseSlope.Core.Units;

namespace PhaseSlope.Plots;

/// <summary>The unit system of a figure's axes.</summary>
public enum PlotUnits
{
    /// <summary>K, kPa, mol/m³, cm³/mol, kJ/mol, J/(mol·K).</summary>
    Si,

    /// <summary>°C, bar, kg/m³, m³/kg, kJ/kg, kJ/(kg·K).</summary>
    Engineering,
}

/// <summary>Conversion from SI molar values to the display units of an axis, through the one
/// unit table of the core (<see cref="UnitTable"/>); the labels are the table's typographic
/// spellings (°C, mol/m³, cm³/mol).</summary>
internal readonly record struct UnitScale(PlotUnits Units)
{
    private static readonly Unit Celsius = UnitTable.Get("°C");
    private static readonly Unit Kilopascal = UnitTable.Get("kPa");
    private static readonly Unit Bar = UnitTable.Get("bar");
    private static readonly Unit CubicCentimetrePerMole = UnitTable.Get("cm³/mol");
    private static readonly Unit KilojoulePerMole = UnitTable.Get("kJ/mol");
    private static readonly Unit KilojoulePerKilogram = UnitTable.Get("kJ/kg");
    private static readonly Unit KilojoulePerKilogramKelvin = UnitTable.Get("kJ/(kg·K)");

    private bool Si => Units == PlotUnits.Si;

    public string TemperatureUnit => Si ? "K" : "°C";

    public double Temperature(double kelvin) => Si ? kelvin : Celsius.FromSi(kelvin);

    public double TemperatureToSi(double shown) => Si ? shown : Celsius.ToSi(shown);

    public string PressureUnit => Si ? "kPa" : "bar";

    public double Pressure(double pascal) => Si ? Kilopascal.FromSi(pascal) : Bar.FromSi(pascal);

    public double PressureToSi(double shown) => Si ? Kilopascal.ToSi(shown) : Bar.ToSi(shown);

    public string SlopeUnit => Si ? "kPa/K" : "bar/K";

    public string DensityUnit => Si ? "mol/m³" : "kg/m³";

    public double Density(double molPerM3, double molarMass) => Si ? molPerM3 : molPerM3 * molarMass;

    public double DensityToSi(double shown, double molarMass) => Si ? shown : shown / molarMass;

    // cm³/mol rather than m³/mol: tick labels such as 50 and 2000 instead of 5e-05 and 0.002.
    public string VolumeUnit => Si ? "cm³/mol" : "m³/kg";

    public double Volume(double m3PerMol, double molarMass) => Si ? CubicCentimetrePerMole.FromSi(m3PerMol) : m3PerMol / molarMass;

    public string EnthalpyUnit => Si ? "kJ/mol" : "kJ/kg";

    public double Enthalpy(double jPerMol, double molarMass) => Si ? KilojoulePerMole.FromSi(jPerMol) : KilojoulePerKilogram.FromSi(jPerMol / molarMass);

    public string EntropyUnit => Si ? "J/(mol·K)" : "kJ/(kg·K)";

    public double Entropy(double jPerMolK, double molarMass) => Si ? jPerMolK : KilojoulePerKilogramKelvin.FromSi(jPerMolK / molarMass);

    public double EntropyToSi(double shown, double molarMass) => Si ? shown : KilojoulePerKilogramKelvin.ToSi(shown) * molarMass;
}
