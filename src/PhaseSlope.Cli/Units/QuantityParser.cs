using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;

namespace PhaseSlope.Cli.Units;

/// <summary>Parses command-line text for a temperature or an absolute pressure into SI units
/// (kelvin, pascal).</summary>
/// <remarks>
/// <para>The text is a number optionally followed by a unit, with or without a space between
/// them (<c>300</c>, <c>300 K</c>, <c>26.85degC</c>, <c>1.2e5 Pa</c>). The number is always read
/// with the invariant culture, whatever the machine's locale: a dot is the decimal separator, an
/// exponent is allowed, a comma is rejected (it is neither a decimal nor a group separator here),
/// and NaN or infinity are rejected. A bare number is kelvin for a temperature and pascal for a
/// pressure.</para>
/// <para>Unit symbols are matched case-insensitively. For pressures this means <c>mpa</c>,
/// <c>MPA</c> and <c>mPa</c> all mean megapascal (a millipascal is never a sensible pressure for
/// vapour–liquid coexistence), and <c>MBAR</c> means millibar.</para>
/// <para>Conversion factors are those of NIST Special Publication 811 (2008 edition), built from
/// the exact definitions it gives: the standard atmosphere (101 325 Pa), the bar (10^5 Pa), the
/// international pound (0.453 592 37 kg), the international inch (0.0254 m), standard gravity
/// (9.806 65 m/s²), and the Celsius, Fahrenheit and Rankine temperature scales.</para>
/// </remarks>
internal static partial class QuantityParser
{
    // --- Exact definitions (NIST SP 811, 2008 edition, Appendix B and section 4.2.1.1) ---

    /// <summary>Offset of the Celsius scale: t/°C = T/K − 273.15 (exact, SP 811 §4.2.1.1).</summary>
    internal const double CelsiusOffsetK = 273.15;

    /// <summary>Size of the kelvin in degrees Rankine or Fahrenheit: 1 K = 1.8 °R (exact, SP 811 B.9).</summary>
    internal const double RankinePerKelvin = 1.8;

    /// <summary>Offset of the Fahrenheit scale: t/°F = T/°R − 459.67 (exact, SP 811 B.9).</summary>
    internal const double FahrenheitOffsetR = 459.67;

    /// <summary>International pound (avoirdupois), kg (exact, SP 811 B.8).</summary>
    internal const double PoundKg = 0.45359237;

    /// <summary>International inch, m (exact, SP 811 B.8).</summary>
    internal const double InchM = 0.0254;

    /// <summary>Standard acceleration of gravity, m/s² (exact, SP 811 B.8 note on the
    /// pound-force and kilogram-force).</summary>
    internal const double StandardGravity = 9.80665;

    /// <summary>Standard atmosphere, Pa (exact, SP 811 B.8).</summary>
    internal const double AtmospherePa = 101325.0;

    /// <summary>Bar, Pa (exact, SP 811 B.8).</summary>
    internal const double BarPa = 1.0e5;

    /// <summary>Pound-force per square inch, Pa: one pound under standard gravity over one square
    /// inch, 6894.757293168… Pa (SP 811 B.8 lists the rounded 6.894 757 E+03).</summary>
    internal const double PsiPa = PoundKg * StandardGravity / (InchM * InchM);

    /// <summary>Torr, Pa: exactly 1/760 of a standard atmosphere (SP 811 B.8 lists the rounded
    /// 1.333 224 E+02).</summary>
    internal const double TorrPa = AtmospherePa / 760.0;

    /// <summary>Conventional millimetre of mercury, Pa: the pressure of 1 mm of a fluid of density
    /// 13 595.1 kg/m³ under standard gravity, 133.322 387 415 Pa (SP 811 B.8 lists the rounded
    /// 1.333 224 E+02 for the conventional mmHg).</summary>
    internal const double MillimetreOfMercuryPa = 13595.1 * StandardGravity * 1.0e-3;

    private static readonly Dictionary<string, Func<double, double>> TemperatureUnits =
        new(StringComparer.OrdinalIgnoreCase)
        {
            ["K"] = t => t,
            ["degC"] = t => t + CelsiusOffsetK,
            ["°C"] = t => t + CelsiusOffsetK,
            ["degF"] = t => (t + FahrenheitOffsetR) / RankinePerKelvin,
            ["°F"] = t => (t + FahrenheitOffsetR) / RankinePerKelvin,
            ["degR"] = t => t / RankinePerKelvin,
            ["°R"] = t => t / RankinePerKelvin,
        };

    private static readonly Dictionary<string, double> PressureUnits =
        new(StringComparer.OrdinalIgnoreCase)
        {
            ["Pa"] = 1.0,
            ["kPa"] = 1.0e3,
            ["MPa"] = 1.0e6, // case-insensitive: "mPa" is read as megapascal too
            ["GPa"] = 1.0e9,
            ["bar"] = BarPa,
            ["mbar"] = BarPa * 1.0e-3,
            ["psi"] = PsiPa,
            ["psia"] = PsiPa,
            ["atm"] = AtmospherePa,
            ["mmHg"] = MillimetreOfMercuryPa,
            ["torr"] = TorrPa,
        };

    private static readonly HashSet<string> GaugePressureUnits =
        new(StringComparer.OrdinalIgnoreCase) { "psig", "barg", "kPag", "MPag" };

    /// <summary>A leading number in invariant form: optional sign, digits with an optional dot
    /// fraction (or a bare fraction), optional exponent. The rest of the text is the unit.</summary>
    [GeneratedRegex(@"^(?<num>[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)(?<rest>.*)$",
        RegexOptions.CultureInvariant | RegexOptions.Singleline)]
    private static partial Regex LeadingNumber();

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
        ArgumentException.ThrowIfNullOrWhiteSpace(optionName);
        (double number, string unit) = Split(text, optionName, "temperature");

        Func<double, double> toKelvin;
        if (unit.Length == 0)
        {
            toKelvin = TemperatureUnits["K"];
        }
        else if (!TemperatureUnits.TryGetValue(unit, out toKelvin!))
        {
            throw Fail(optionName, text,
                $"unknown temperature unit '{Clean(unit)}'", "(use K, degC, degF or degR)");
        }

        double kelvin = toKelvin(number);
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
        ArgumentException.ThrowIfNullOrWhiteSpace(optionName);
        (double number, string unit) = Split(text, optionName, "pressure");

        double factor;
        if (unit.Length == 0)
        {
            factor = 1.0;
        }
        else if (GaugePressureUnits.Contains(unit))
        {
            throw Fail(optionName, text,
                $"gauge pressures are not accepted ('{Clean(unit)}')",
                "(give an absolute pressure, e.g. in Pa, kPa, MPa, bar, psia or atm)");
        }
        else if (!PressureUnits.TryGetValue(unit, out factor))
        {
            throw Fail(optionName, text,
                $"unknown pressure unit '{Clean(unit)}'",
                "(use Pa, kPa, MPa, GPa, bar, mbar, psi, psia, atm, mmHg or torr)");
        }

        double pascal = number * factor;
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

    private static readonly Dictionary<string, double> MolarDensityUnits =
        new(StringComparer.OrdinalIgnoreCase)
        {
            ["mol/m3"] = 1.0,
            ["mol/L"] = 1.0e3,
            ["mol/dm3"] = 1.0e3,
            ["kmol/m3"] = 1.0e3,
        };

    /// <summary>Parses a density and returns it as a molar density in mol/m3.</summary>
    /// <param name="text">The user's text: a bare number (mol/m3), <c>mol/m3</c>, <c>mol/L</c>,
    /// <c>mol/dm3</c>, <c>kmol/m3</c>, or a mass density in <c>kg/m3</c> or <c>g/cm3</c>
    /// (divided by <paramref name="molarMass"/>).</param>
    /// <param name="optionName">The option the text came from; it starts every error message.</param>
    /// <param name="molarMass">Molar mass of the fluid in kg/mol, for mass densities.</param>
    /// <exception cref="UsageException">Empty, malformed, unknown unit, or not above zero.</exception>
    public static double ParseDensity(string text, string optionName, double molarMass)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(optionName);
        (double number, string unit) = Split(text, optionName, "density");
        double molar;
        if (unit.Length == 0)
        {
            molar = number;
        }
        else if (MolarDensityUnits.TryGetValue(unit, out double factor))
        {
            molar = number * factor;
        }
        else if (string.Equals(unit, "kg/m3", StringComparison.OrdinalIgnoreCase))
        {
            molar = number / molarMass;
        }
        else if (string.Equals(unit, "g/cm3", StringComparison.OrdinalIgnoreCase))
        {
            molar = number * 1.0e3 / molarMass;
        }
        else
        {
            throw Fail(optionName, text,
                $"unknown density unit '{Clean(unit)}'", "(use mol/m3, mol/L, mol/dm3, kmol/m3, kg/m3 or g/cm3)");
        }

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

    /// <summary>Splits the text into its invariant-culture number and its (trimmed) unit.</summary>
    private static (double Number, string Unit) Split(string? text, string optionName, string quantity)
    {
        if (string.IsNullOrWhiteSpace(text))
        {
            throw new UsageException(
                $"{optionName}: no {quantity} given in '{Clean(text ?? string.Empty)}' (give a number with an optional unit)");
        }

        // Accept the typographic minus sign (U+2212) as a minus.
        string trimmed = text.Trim().Replace('\u2212', '-');

        Match match = LeadingNumber().Match(trimmed);
        if (!match.Success)
        {
            string unsigned = trimmed.TrimStart('+', '-');
            bool nonFinite = unsigned.StartsWith("nan", StringComparison.OrdinalIgnoreCase)
                || unsigned.StartsWith("inf", StringComparison.OrdinalIgnoreCase)
                || unsigned.StartsWith('\u221E');
            throw nonFinite
                ? Fail(optionName, text, "NaN and infinity are not accepted", "(give a finite number)")
                : Fail(optionName, text, $"expected a {quantity} starting with a number",
                    "(use a dot as the decimal separator, e.g. '1.5')");
        }

        string rest = match.Groups["rest"].Value.TrimStart();
        if (rest.StartsWith(','))
        {
            throw Fail(optionName, text, "comma in number",
                "(use a dot as the decimal separator and no digit grouping, e.g. '1.5')");
        }
        if (rest.Length > 0 && (char.IsAsciiDigit(rest[0]) || rest[0] == '.' || rest[0] == '+' || rest[0] == '-'))
        {
            throw Fail(optionName, text, "malformed number",
                "(give one number, with a dot as the decimal separator, then an optional unit)");
        }

        double number = double.Parse(match.Groups["num"].Value,
            NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
            CultureInfo.InvariantCulture);
        if (!double.IsFinite(number))
        {
            throw Fail(optionName, text, "number is too large", "(give a finite number)");
        }
        return (number, rest.TrimEnd());
    }

    /// <summary>Builds the one-line error: "option: problem in 'text' (hint)".</summary>
    private static UsageException Fail(string optionName, string text, string problem, string? hint)
    {
        string message = $"{optionName}: {problem} in '{Clean(text)}'";
        return new UsageException(hint is null ? message : $"{message} {hint}");
    }

    /// <summary>Makes user text safe to echo on one line (see <see cref="Input.DataFileException.OneLine"/>).</summary>
    private static string Clean(string text) => Input.DataFileException.OneLine(text);

    private static string Format(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
