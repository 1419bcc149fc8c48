using System.Globalization;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Units;

/// <summary>Parses command-line text for a temperature, an absolute pressure or a density into
/// SI units (kelvin, pascal, mol/m3) through the one unit table of the core
/// (<see cref="UnitTable"/>, <see cref="QuantityText"/>).</summary>
/// <remarks>
/// <para>The text is a number optionally followed by a unit, with or without a space between
/// them (<c>300</c>, <c>300 K</c>, <c>26.85degC</c>, <c>1.2e5 Pa</c>), read with the invariant
/// culture whatever the machine's locale. A bare number is kelvin for a temperature, pascal for a
/// pressure and mol/m3 for a density. Units are matched case-sensitively (<c>mPa</c> is the
/// millipascal, <c>MPa</c> the megapascal); a near miss is refused with the near matches named.
/// The number is converted in decimal arithmetic where it fits, so <c>40.70 degC</c> is the
/// double nearest to 313.85 K, as from a data file.</para>
/// </remarks>
internal static class QuantityParser
{
    /// <summary>Parses a temperature and returns it in kelvin.</summary>
    /// <param name="text">The user's text, e.g. <c>300</c>, <c>300 K</c>, <c>26.85 degC</c>,
    /// <c>80 °F</c>, <c>491.67 degR</c>. A bare number is kelvin.</param>
    /// <param name="optionName">The option the text came from (e.g. <c>--temperature</c>); it
    /// starts every error message.</param>
    /// <returns>The absolute temperature in K, finite and greater than zero.</returns>
    /// <exception cref="UsageException">The text is empty, malformed, has an unknown unit, or is
    /// not above absolute zero.</exception>
    public static double ParseTemperature(string text, string optionName)
    {
        double kelvin = Parse(text, optionName, "temperature", [Dimension.Temperature]).Value;
        if (!double.IsFinite(kelvin))
        {
            throw Fail(optionName, text, "temperature is too large", null);
        }
        if (kelvin <= 0.0)
        {
            throw Fail(optionName, text,
                $"temperature is {Format(kelvin)} K, not above absolute zero", "(an absolute temperature must be > 0 K)");
        }
        return kelvin;
    }

    /// <summary>Parses an absolute pressure and returns it in pascal.</summary>
    /// <param name="text">The user's text, e.g. <c>101325</c>, <c>101.325 kPa</c>, <c>1 atm</c>,
    /// <c>14.7 psi</c>, <c>760 mmHg</c>. A bare number is pascal. Gauge units (<c>psig</c>,
    /// <c>barg</c>, <c>kPag</c>, <c>MPag</c>) are rejected.</param>
    /// <param name="optionName">The option the text came from (e.g. <c>--pressure</c>); it starts
    /// every error message.</param>
    /// <returns>The absolute pressure in Pa, finite and greater than zero.</returns>
    /// <exception cref="UsageException">The text is empty, malformed, has an unknown or gauge
    /// unit, or is not above zero.</exception>
    public static double ParsePressure(string text, string optionName)
    {
        double pascal = Parse(text, optionName, "pressure", [Dimension.Pressure]).Value;
        if (!double.IsFinite(pascal))
        {
            throw Fail(optionName, text, "pressure is too large", null);
        }
        if (pascal <= 0.0)
        {
            throw Fail(optionName, text,
                "pressure is not above zero", "(an absolute pressure must be > 0)");
        }
        return pascal;
    }

    /// <summary>Parses a density and returns it as a molar density in mol/m3.</summary>
    /// <param name="text">The user's text: a bare number (mol/m3), a molar density
    /// (<c>mol/m3</c>, <c>mol/L</c>, <c>mol/dm3</c>, <c>kmol/m3</c>), or a mass density in
    /// <c>kg/m3</c> or <c>g/cm3</c> (divided by <paramref name="molarMass"/>).</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <param name="molarMass">Molar mass of the fluid in kg/mol, for mass densities; null when the
    /// fluid gives none (a mass density is then refused).</param>
    /// <exception cref="UsageException">Empty, malformed, unknown unit, or not above zero.</exception>
    public static double ParseDensity(string text, string optionName, double? molarMass)
    {
        ParsedQuantity parsed = Parse(text, optionName, "density", [Dimension.AmountDensity, Dimension.MassDensity]);
        if (parsed.Unit.Dimension == Dimension.MassDensity && molarMass is null)
        {
            throw Fail(optionName, text, $"a density in {parsed.Unit.Symbol} needs the fluid's molar mass, which the fluid does not give", "(give the density in mol/m3, or give the fluid a molar mass)");
        }

        double molar = parsed.Unit.Dimension == Dimension.MassDensity ? parsed.Value / molarMass!.Value : parsed.Value;
        if (!double.IsFinite(molar))
        {
            throw Fail(optionName, text, "density is too large", null);
        }

        if (molar <= 0.0)
        {
            throw Fail(optionName, text, "density is not above zero", "(a density must be > 0)");
        }

        return molar;
    }

    /// <summary>Parses a molar mass, which must carry its unit, and returns it in kg/mol.</summary>
    /// <param name="text">The user's text, e.g. <c>72.15 g/mol</c> or <c>0.07215 kg/mol</c>; a
    /// bare number is refused (g/mol and kg/mol are both common, so neither is assumed).</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <returns>The molar mass in kg/mol, finite and greater than zero.</returns>
    /// <exception cref="UsageException">Empty, malformed, no or unknown unit, or not above zero.</exception>
    public static double ParseMolarMass(string text, string optionName)
    {
        ParsedQuantity parsed = Parse(text, optionName, "molar mass", [Dimension.MolarMass]);
        if (!text.Trim().EndsWith("mol", StringComparison.Ordinal))
        {
            throw Fail(optionName, text, "no molar-mass unit", "(give g/mol or kg/mol, e.g. '72.15 g/mol')");
        }
        if (!double.IsFinite(parsed.Value))
        {
            throw Fail(optionName, text, "molar mass is too large", null);
        }
        if (parsed.Value <= 0.0)
        {
            throw Fail(optionName, text, "molar mass is not above zero", "(a molar mass must be > 0)");
        }
        return parsed.Value;
    }

    /// <summary>Parses a volume translation, a molar volume of either sign, and returns it in
    /// m3/mol.</summary>
    /// <param name="text">The user's text, e.g. <c>-3.2 cm3/mol</c>, <c>0.004 L/mol</c>; a bare
    /// number is m3/mol.</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <returns>The shift in m3/mol, finite (zero and negative values are allowed).</returns>
    /// <exception cref="UsageException">Empty, malformed, unknown unit, or too large.</exception>
    public static double ParseVolumeShift(string text, string optionName)
    {
        double shift = Parse(text, optionName, "molar volume", [Dimension.MolarVolume]).Value;
        return double.IsFinite(shift) ? shift : throw Fail(optionName, text, "molar volume is too large", null);
    }

    /// <summary>Parses an energy (h or u), an entropy or a volume per mole or per kilogram and
    /// returns it per mole.</summary>
    /// <param name="text">The user's text: a bare number (the molar SI unit), a molar unit, or a
    /// specific unit (per kg, multiplied by <paramref name="molarMass"/>).</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <param name="kind">Which quantity.</param>
    /// <param name="molarMass">Molar mass of the fluid in kg/mol; null when it gives none (a
    /// specific value is then refused).</param>
    /// <returns>The molar value in SI (J/mol, J/(mol·K), m³/mol); finite; a volume above zero.</returns>
    /// <exception cref="UsageException">Empty, malformed, unknown unit, a specific value without a
    /// molar mass, or a volume not above zero.</exception>
    public static double ParseMolarOrSpecific(string text, string optionName, MolarQuantity kind, double? molarMass)
    {
        var (quantity, molar, specific) = kind switch
        {
            MolarQuantity.Energy => ("energy", Dimension.MolarEnergy, Dimension.SpecificEnergy),
            MolarQuantity.Entropy => ("entropy", Dimension.MolarEntropy, Dimension.SpecificEntropy),
            _ => ("volume", Dimension.MolarVolume, Dimension.SpecificVolume),
        };
        ParsedQuantity parsed = Parse(text, optionName, quantity, [molar, specific]);
        if (parsed.Unit.Dimension == specific && molarMass is null)
        {
            throw Fail(optionName, text, $"a value in {parsed.Unit.Symbol} needs the fluid's molar mass, which the fluid does not give", $"(give it per mole, in {UnitTable.Si(molar).Symbol})");
        }

        double value = parsed.Unit.Dimension == specific ? parsed.Value * molarMass!.Value : parsed.Value;
        if (!double.IsFinite(value))
        {
            throw Fail(optionName, text, $"{quantity} is too large", null);
        }

        if (kind == MolarQuantity.Volume && value <= 0)
        {
            throw Fail(optionName, text, "volume is not above zero", "(a volume must be > 0)");
        }

        return value;
    }

    /// <summary>Parses a vapour quality, a bare fraction from 0 to 1.</summary>
    /// <exception cref="UsageException">Not a number, or outside 0 to 1.</exception>
    public static double ParseQuality(string text, string optionName)
    {
        if (!double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double x) || !double.IsFinite(x))
        {
            throw Fail(optionName, text, "not a number", "(a quality is a vapour fraction from 0 to 1, e.g. 0.35)");
        }

        return x is >= 0 and <= 1 ? x : throw Fail(optionName, text, "quality is outside 0 to 1", "(the vapour fraction of a liquid-vapour mixture)");
    }

    /// <summary>Parses a temperature difference (a step) and returns it in kelvin: a bare number is
    /// K, and a unit scales without its offset (<c>5 degC</c> is 5 K, <c>10 degF</c> is 10/1.8 K).</summary>
    /// <param name="text">The user's text, e.g. <c>5</c>, <c>5 K</c>, <c>10 degF</c>.</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <returns>The difference in K, finite and greater than zero.</returns>
    /// <exception cref="UsageException">Empty, malformed, unknown unit, or not above zero.</exception>
    public static double ParseTemperatureDifference(string text, string optionName) => ParseTemperatureDifference(text, optionName, allowZero: false);

    /// <summary>Parses a temperature difference as <see cref="ParseTemperatureDifference(string, string)"/>;
    /// with <paramref name="allowZero"/> (a superheat or subcooling) zero is accepted and only a
    /// negative difference refused.</summary>
    /// <exception cref="UsageException">Empty, malformed, unknown unit, or below the allowed range.</exception>
    public static double ParseTemperatureDifference(string text, string optionName, bool allowZero)
    {
        ParsedQuantity parsed = Parse(text, optionName, "temperature difference", [Dimension.Temperature]);
        QuantityText.TrySplit(text, out string number, out _);
        // A difference has no offset: the unit's scale alone, converted exactly in decimal.
        double kelvin = QuantityText.Convert(number, double.Parse(number, NumberStyles.Float, CultureInfo.InvariantCulture), parsed.Unit with { Offset = 0m });
        if (!double.IsFinite(kelvin))
        {
            throw Fail(optionName, text, "temperature difference is too large", null);
        }

        if (allowZero ? kelvin < 0.0 : !(kelvin > 0.0))
        {
            throw allowZero
                ? Fail(optionName, text, "the temperature difference is negative", "(give 0 K or more, e.g. '5 K')")
                : Fail(optionName, text, "the step is not above zero", "(give a positive temperature difference, e.g. '5 K')");
        }

        return kelvin;
    }

    /// <summary>Parses a list of temperatures, <c>-40,-30,-20 degC</c>: numbers separated by commas
    /// and one unit after the last number, which applies to all (none: K).</summary>
    /// <param name="text">The user's text.</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <returns>The temperatures in K, in the order given.</returns>
    /// <exception cref="UsageException">An entry is empty or malformed, carries its own unit, or is
    /// not above absolute zero.</exception>
    public static IReadOnlyList<double> ParseTemperatureList(string text, string optionName)
        => ParseList(text, optionName, "temperature", "-40,-30,-20 degC", ParseTemperature);

    /// <summary>Parses a list of absolute pressures, <c>1,2,5,10 bar</c>, written as
    /// <see cref="ParseTemperatureList"/> (none: Pa).</summary>
    /// <param name="text">The user's text.</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <returns>The pressures in Pa, in the order given.</returns>
    /// <exception cref="UsageException">An entry is empty or malformed, carries its own unit, or is
    /// not above zero.</exception>
    public static IReadOnlyList<double> ParsePressureList(string text, string optionName)
        => ParseList(text, optionName, "pressure", "1,2,5,10 bar", ParsePressure);

    private static IReadOnlyList<double> ParseList(string text, string optionName, string quantity, string example, Func<string, string, double> parse)
    {
        if (string.IsNullOrWhiteSpace(text) || text.Split(',').Any(string.IsNullOrWhiteSpace))
        {
            throw Fail(optionName, text, $"empty entry in the {quantity} list", $"(give numbers separated by commas and one unit at the end, e.g. '{example}')");
        }

        return [.. QuantityList.Items(text, optionName, int.MaxValue).Select(item => parse(item, optionName))];
    }

    /// <summary>Parses a number with a unit of one of the dimensions, or throws the one-line error
    /// naming the option (the one place where option text becomes a quantity).</summary>
    /// <exception cref="UsageException">Empty, malformed or an unknown unit.</exception>
    internal static ParsedQuantity ParseQuantity(string text, string optionName, string quantity, params Dimension[] dimensions)
        => Parse(text, optionName, quantity, dimensions);

    private static ParsedQuantity Parse(string? text, string optionName, string quantity, Dimension[] dimensions)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(optionName);
        return QuantityText.TryParse(text, quantity, dimensions, out ParsedQuantity parsed, out string problem, out string? hint)
            ? parsed
            : throw Fail(optionName, text ?? string.Empty, problem, hint);
    }

    /// <summary>Builds the one-line error: "option: problem in 'text' (hint)" or
    /// "option: problem in 'text'; did you mean …?".</summary>
    private static UsageException Fail(string optionName, string text, string problem, string? hint)
    {
        string message = $"{optionName}: {Clean(problem)} in '{Clean(text)}'";
        return new UsageException(hint is null ? message
            : hint.StartsWith(';') ? $"{message}{Clean(hint)}" : $"{message} {Clean(hint)}");
    }

    /// <summary>Makes user text safe to echo on one line (see <see cref="Input.DataFileException.OneLine"/>).</summary>
    private static string Clean(string text) => Input.DataFileException.OneLine(text);

    private static string Format(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}

/// <summary>A quantity given per mole or per kilogram.</summary>
internal enum MolarQuantity
{
    /// <summary>Enthalpy or internal energy: J/mol, kJ/mol, J/kg, kJ/kg.</summary>
    Energy,

    /// <summary>Entropy: J/(mol·K), J/(kg·K), kJ/(kg·K).</summary>
    Entropy,

    /// <summary>Molar or specific volume: m3/mol, L/mol, cm3/mol, m3/kg, L/kg, cm3/g.</summary>
    Volume,
}
