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
/// <para>All conversions come from one table keyed by quantity and unit system. Mass-based
/// engineering units need the molar mass of the fluid in kg/mol; in the SI system the molar mass
/// is not used. The factors are exact: 273.15 K for the Celsius offset (NIST SP 811, 2008
/// edition, §4.2.1.1), 10^5 Pa for the bar (SP 811 B.8), and powers of ten for the prefixes.
/// A temperature difference of 1 K equals 1 degC, so a slope in bar/K is also a slope in
/// bar/degC.</para>
/// </remarks>
internal static class UnitFormatter
{
    /// <summary>One display unit: its label, whether it needs the molar mass, and the conversion
    /// from the SI value (second argument: molar mass in kg/mol).</summary>
    private sealed record DisplayUnit(string Label, bool NeedsMolarMass, Func<double, double, double> FromSi);

    private static readonly Dictionary<(DisplayQuantity, UnitSystem), DisplayUnit> Table = new()
    {
        [(DisplayQuantity.Temperature, UnitSystem.Si)] = new("K", false, (k, _) => k),
        [(DisplayQuantity.Temperature, UnitSystem.Engineering)] =
            new("degC", false, (k, _) => k - QuantityParser.CelsiusOffsetK),

        [(DisplayQuantity.Pressure, UnitSystem.Si)] = new("kPa", false, (pa, _) => pa / 1.0e3),
        [(DisplayQuantity.Pressure, UnitSystem.Engineering)] =
            new("bar", false, (pa, _) => pa / QuantityParser.BarPa),

        [(DisplayQuantity.Density, UnitSystem.Si)] = new("mol/m3", false, (rho, _) => rho),
        [(DisplayQuantity.Density, UnitSystem.Engineering)] = new("kg/m3", true, (rho, m) => rho * m),

        [(DisplayQuantity.MolarVolume, UnitSystem.Si)] = new("m3/mol", false, (v, _) => v),
        [(DisplayQuantity.MolarVolume, UnitSystem.Engineering)] = new("m3/kg", true, (v, m) => v / m),

        [(DisplayQuantity.MolarEnergy, UnitSystem.Si)] = new("J/mol", false, (e, _) => e),
        [(DisplayQuantity.MolarEnergy, UnitSystem.Engineering)] =
            new("kJ/kg", true, (e, m) => e / m / 1.0e3),

        [(DisplayQuantity.MolarEntropy, UnitSystem.Si)] = new("J/(mol·K)", false, (s, _) => s),
        [(DisplayQuantity.MolarEntropy, UnitSystem.Engineering)] =
            new("kJ/(kg·K)", true, (s, m) => s / m / 1.0e3),

        [(DisplayQuantity.Slope, UnitSystem.Si)] = new("kPa/K", false, (d, _) => d / 1.0e3),
        [(DisplayQuantity.Slope, UnitSystem.Engineering)] =
            new("bar/K", false, (d, _) => d / QuantityParser.BarPa),

        [(DisplayQuantity.Speed, UnitSystem.Si)] = new("m/s", false, (w, _) => w),
        [(DisplayQuantity.Speed, UnitSystem.Engineering)] = new("m/s", false, (w, _) => w),

        [(DisplayQuantity.Expansivity, UnitSystem.Si)] = new("1/K", false, (a, _) => a),
        [(DisplayQuantity.Expansivity, UnitSystem.Engineering)] = new("1/K", false, (a, _) => a),

        [(DisplayQuantity.Compressibility, UnitSystem.Si)] = new("1/Pa", false, (k, _) => k),
        [(DisplayQuantity.Compressibility, UnitSystem.Engineering)] =
            new("1/bar", false, (k, _) => k * QuantityParser.BarPa),

        [(DisplayQuantity.JouleThomson, UnitSystem.Si)] = new("K/Pa", false, (mu, _) => mu),
        [(DisplayQuantity.JouleThomson, UnitSystem.Engineering)] =
            new("K/bar", false, (mu, _) => mu * QuantityParser.BarPa),
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
        return unit.FromSi(si, molarMass);
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
