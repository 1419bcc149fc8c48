using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Units;

/// <summary>The physical quantities that appear in table output.</summary>
internal enum DisplayQuantity
{
    /// <summary>Absolute temperature; SI value in K.</summary>
    Temperature,

    /// <summary>Absolute pressure; SI value in Pa.</summary>
    Pressure,

    /// <summary>Amount-of-substance density; SI value in mol/m3.</summary>
    Density,

    /// <summary>Molar volume; SI value in m3/mol.</summary>
    MolarVolume,

    /// <summary>Molar energy (enthalpy, internal energy, enthalpy of vaporization); SI value in J/mol.</summary>
    MolarEnergy,

    /// <summary>Molar entropy or heat capacity; SI value in J/(mol·K).</summary>
    MolarEntropy,

    /// <summary>Slope of the coexistence curve dp/dT; SI value in Pa/K.</summary>
    Slope,

    /// <summary>Speed of sound; SI value in m/s.</summary>
    Speed,

    /// <summary>Isobaric expansivity; SI value in 1/K.</summary>
    Expansivity,

    /// <summary>Isothermal or isentropic compressibility; SI value in 1/Pa.</summary>
    Compressibility,

    /// <summary>Joule-Thomson coefficient; SI value in K/Pa.</summary>
    JouleThomson,
}

/// <summary>Converts SI values (K, Pa, mol/m3, m3/mol, J/mol, J/(mol·K), Pa/K) to the display
/// units of a <see cref="UnitSystem"/> and gives the matching unit labels.</summary>
/// <remarks>
/// <para>Every display unit is a row of the one unit table of the core
/// (<see cref="UnitTable"/>), which holds its conversion and its source; this class only chooses
/// which unit each quantity is shown in. Mass-based engineering units divide (or, for density,
/// multiply) the molar SI value by the molar mass of the fluid in kg/mol first; in the SI system
/// the molar mass is not used. A temperature difference of 1 K equals 1 degC, so a slope in
/// bar/K is also a slope in bar/degC.</para>
/// </remarks>
internal static class UnitFormatter
{
    /// <summary>How a molar SI value becomes a mass-based one.</summary>
    private enum PerMass
    {
        /// <summary>Not mass-based: the molar mass is not used.</summary>
        No,

        /// <summary>Multiply by the molar mass (mol/m3 → kg/m3).</summary>
        Multiply,

        /// <summary>Divide by the molar mass (per mol → per kg).</summary>
        Divide,
    }

    /// <summary>One display unit: the table row and how the molar mass enters.</summary>
    private sealed record DisplayUnit(Unit Unit, PerMass PerMass)
    {
        public string Label => Unit.Symbol;

        public bool NeedsMolarMass => PerMass != PerMass.No;
    }

    private static DisplayUnit Show(string symbol, PerMass perMass = PerMass.No) => new(UnitTable.Get(symbol), perMass);

    private static readonly Dictionary<(DisplayQuantity, UnitSystem), DisplayUnit> Table = new()
    {
        [(DisplayQuantity.Temperature, UnitSystem.Si)] = Show("K"),
        [(DisplayQuantity.Temperature, UnitSystem.Engineering)] = Show("degC"),
        [(DisplayQuantity.Pressure, UnitSystem.Si)] = Show("kPa"),
        [(DisplayQuantity.Pressure, UnitSystem.Engineering)] = Show("bar"),
        [(DisplayQuantity.Density, UnitSystem.Si)] = Show("mol/m3"),
        [(DisplayQuantity.Density, UnitSystem.Engineering)] = Show("kg/m3", PerMass.Multiply),
        [(DisplayQuantity.MolarVolume, UnitSystem.Si)] = Show("m3/mol"),
        [(DisplayQuantity.MolarVolume, UnitSystem.Engineering)] = Show("m3/kg", PerMass.Divide),
        [(DisplayQuantity.MolarEnergy, UnitSystem.Si)] = Show("J/mol"),
        [(DisplayQuantity.MolarEnergy, UnitSystem.Engineering)] = Show("kJ/kg", PerMass.Divide),
        [(DisplayQuantity.MolarEntropy, UnitSystem.Si)] = Show("J/(mol·K)"),
        [(DisplayQuantity.MolarEntropy, UnitSystem.Engineering)] = Show("kJ/(kg·K)", PerMass.Divide),
        [(DisplayQuantity.Slope, UnitSystem.Si)] = Show("kPa/K"),
        [(DisplayQuantity.Slope, UnitSystem.Engineering)] = Show("bar/K"),
        [(DisplayQuantity.Speed, UnitSystem.Si)] = Show("m/s"),
        [(DisplayQuantity.Speed, UnitSystem.Engineering)] = Show("m/s"),
        [(DisplayQuantity.Expansivity, UnitSystem.Si)] = Show("1/K"),
        [(DisplayQuantity.Expansivity, UnitSystem.Engineering)] = Show("1/K"),
        [(DisplayQuantity.Compressibility, UnitSystem.Si)] = Show("1/Pa"),
        [(DisplayQuantity.Compressibility, UnitSystem.Engineering)] = Show("1/bar"),
        [(DisplayQuantity.JouleThomson, UnitSystem.Si)] = Show("K/Pa"),
        [(DisplayQuantity.JouleThomson, UnitSystem.Engineering)] = Show("K/bar"),
    };

    /// <summary>Converts an SI value of a quantity to the display unit of a unit system.</summary>
    /// <param name="quantity">Which quantity the value is.</param>
    /// <param name="si">The value in SI units (see <see cref="DisplayQuantity"/>).</param>
    /// <param name="system">The unit system to display in.</param>
    /// <param name="molarMass">Molar mass in kg/mol; required (finite, > 0) only when the display
    /// unit is mass-based, ignored otherwise.</param>
    /// <exception cref="ArgumentOutOfRangeException">A mass-based unit is asked for and the molar
    /// mass is missing, not finite or not positive.</exception>
    public static double Convert(DisplayQuantity quantity, double si, UnitSystem system, double molarMass = double.NaN)
    {
        DisplayUnit unit = Lookup(quantity, system);
        if (unit.NeedsMolarMass && !(double.IsFinite(molarMass) && molarMass > 0.0))
        {
            throw new ArgumentOutOfRangeException(nameof(molarMass), molarMass,
                $"{quantity} in {unit.Label} needs a finite molar mass > 0 kg/mol");
        }
        double si2 = unit.PerMass switch
        {
            PerMass.Multiply => si * molarMass,
            PerMass.Divide => si / molarMass,
            _ => si,
        };
        return unit.Unit.FromSi(si2);
    }

    /// <summary>The label of the display unit of a quantity in a unit system, e.g. "degC".</summary>
    public static string Label(DisplayQuantity quantity, UnitSystem system) => Lookup(quantity, system).Label;

    /// <summary>Whether the display unit of a quantity in a unit system is mass-based and so
    /// needs the molar mass.</summary>
    public static bool NeedsMolarMass(DisplayQuantity quantity, UnitSystem system) =>
        Lookup(quantity, system).NeedsMolarMass;

    /// <summary>Temperature from K: K (SI) or degC (engineering).</summary>
    public static double Temperature(double kelvin, UnitSystem system) =>
        Convert(DisplayQuantity.Temperature, kelvin, system);

    /// <summary>Pressure from Pa: kPa (SI) or bar (engineering).</summary>
    public static double Pressure(double pascal, UnitSystem system) =>
        Convert(DisplayQuantity.Pressure, pascal, system);

    /// <summary>Density from mol/m3: mol/m3 (SI) or kg/m3 (engineering; needs the molar mass in kg/mol).</summary>
    public static double Density(double molPerM3, double molarMass, UnitSystem system) =>
        Convert(DisplayQuantity.Density, molPerM3, system, molarMass);

    /// <summary>Molar volume from m3/mol: m3/mol (SI) or m3/kg (engineering; needs the molar mass in kg/mol).</summary>
    public static double MolarVolume(double m3PerMol, double molarMass, UnitSystem system) =>
        Convert(DisplayQuantity.MolarVolume, m3PerMol, system, molarMass);

    /// <summary>Molar energy from J/mol: J/mol (SI) or kJ/kg (engineering; needs the molar mass in kg/mol).</summary>
    public static double MolarEnergy(double jPerMol, double molarMass, UnitSystem system) =>
        Convert(DisplayQuantity.MolarEnergy, jPerMol, system, molarMass);

    /// <summary>Molar entropy from J/(mol·K): J/(mol·K) (SI) or kJ/(kg·K) (engineering; needs the molar mass in kg/mol).</summary>
    public static double MolarEntropy(double jPerMolK, double molarMass, UnitSystem system) =>
        Convert(DisplayQuantity.MolarEntropy, jPerMolK, system, molarMass);

    /// <summary>Coexistence slope dp/dT from Pa/K: kPa/K (SI) or bar/K (engineering).</summary>
    public static double Slope(double paPerK, UnitSystem system) =>
        Convert(DisplayQuantity.Slope, paPerK, system);

    /// <summary>Temperature label: "K" or "degC".</summary>
    public static string TemperatureLabel(UnitSystem system) => Label(DisplayQuantity.Temperature, system);

    /// <summary>Pressure label: "kPa" or "bar".</summary>
    public static string PressureLabel(UnitSystem system) => Label(DisplayQuantity.Pressure, system);

    /// <summary>Density label: "mol/m3" or "kg/m3".</summary>
    public static string DensityLabel(UnitSystem system) => Label(DisplayQuantity.Density, system);

    /// <summary>Molar volume label: "m3/mol" or "m3/kg".</summary>
    public static string MolarVolumeLabel(UnitSystem system) => Label(DisplayQuantity.MolarVolume, system);

    /// <summary>Molar energy label: "J/mol" or "kJ/kg".</summary>
    public static string MolarEnergyLabel(UnitSystem system) => Label(DisplayQuantity.MolarEnergy, system);

    /// <summary>Molar entropy label: "J/(mol·K)" or "kJ/(kg·K)".</summary>
    public static string MolarEntropyLabel(UnitSystem system) => Label(DisplayQuantity.MolarEntropy, system);

    /// <summary>Slope label: "kPa/K" or "bar/K".</summary>
    public static string SlopeLabel(UnitSystem system) => Label(DisplayQuantity.Slope, system);

    private static DisplayUnit Lookup(DisplayQuantity quantity, UnitSystem system) =>
        Table.TryGetValue((quantity, system), out DisplayUnit? unit)
            ? unit
            : throw new ArgumentOutOfRangeException(nameof(system), $"no display unit for {quantity} in {system}");
}
