namespace PhaseSlope.Cli.Input;

/// <summary>The temperature and pressure units of data-file headers, and their exact conversion
/// to K and Pa.</summary>
/// <remarks>
/// <para>The vocabulary is that of <see cref="Units.QuantityParser"/>: the same symbols, matched
/// case-insensitively (so <c>mPa</c> is megapascal there and here), gauge units rejected. The
/// factors come from the same exact definitions (NIST SP 811, 2008 edition), written here as
/// decimals.</para>
/// <para>A value is converted in decimal arithmetic and rounded to a double once, at the end, so
/// that a file in degC or kPa gives the double nearest to the exact converted value: 25 degC is
/// the double 298.15 and 101.325 kPa is 101325 Pa. Double arithmetic (25.0 + 273.15, or
/// 0.12 × 1000) is often one unit in the last place off, and a duplicate-temperature check or a
/// comparison with a value typed in kelvin would see the difference. Values outside 1e-10 … 1e15
/// are converted in double arithmetic, where decimal has no room.</para>
/// </remarks>
internal static class DataUnits
{
    /// <summary>A temperature scale: T/K = (x + Offset) / Divisor.</summary>
    internal sealed record TemperatureUnit(string Symbol, decimal Offset, decimal Divisor);

    /// <summary>A pressure unit: p/Pa = x · Numerator / Denominator.</summary>
    internal sealed record PressureUnit(string Symbol, decimal Numerator, decimal Denominator);

    // Exact definitions, SP 811 B.8, B.9 and 4.2.1.1.
    private const decimal CelsiusOffset = 273.15m;
    private const decimal FahrenheitOffset = 459.67m;
    private const decimal RankinePerKelvin = 1.8m;
    private const decimal Atmosphere = 101325m;
    private const decimal StandardGravity = 9.80665m;
    private const decimal Pound = 0.45359237m;
    private const decimal Inch = 0.0254m;

    private static readonly Dictionary<string, TemperatureUnit> Temperatures =
        new[]
        {
            new TemperatureUnit("K", 0m, 1m),
            new TemperatureUnit("degC", CelsiusOffset, 1m),
            new TemperatureUnit("°C", CelsiusOffset, 1m),
            new TemperatureUnit("degF", FahrenheitOffset, RankinePerKelvin),
            new TemperatureUnit("°F", FahrenheitOffset, RankinePerKelvin),
            new TemperatureUnit("degR", 0m, RankinePerKelvin),
            new TemperatureUnit("°R", 0m, RankinePerKelvin),
        }.ToDictionary(unit => unit.Symbol, StringComparer.OrdinalIgnoreCase);

    private static readonly Dictionary<string, PressureUnit> Pressures =
        new[]
        {
            new PressureUnit("Pa", 1m, 1m),
            new PressureUnit("kPa", 1e3m, 1m),
            new PressureUnit("MPa", 1e6m, 1m),
            new PressureUnit("GPa", 1e9m, 1m),
            new PressureUnit("bar", 1e5m, 1m),
            new PressureUnit("mbar", 1e2m, 1m),
            new PressureUnit("psi", Pound * StandardGravity, Inch * Inch),
            new PressureUnit("psia", Pound * StandardGravity, Inch * Inch),
            new PressureUnit("atm", Atmosphere, 1m),
            new PressureUnit("mmHg", 13595.1m * StandardGravity * 0.001m, 1m),
            new PressureUnit("torr", Atmosphere, 760m),
        }.ToDictionary(unit => unit.Symbol, StringComparer.OrdinalIgnoreCase);

    private static readonly HashSet<string> GaugePressures =
        new(StringComparer.OrdinalIgnoreCase) { "psig", "barg", "kPag", "MPag" };

    /// <summary>The list of temperature units for messages.</summary>
    internal const string TemperatureChoices = "K, degC, degF or degR";

    /// <summary>The list of pressure units for messages.</summary>
    internal const string PressureChoices = "Pa, kPa, MPa, GPa, bar, mbar, psi, psia, atm, mmHg or torr";

    /// <summary>Looks a temperature unit up; false when the symbol is unknown.</summary>
    internal static bool TryTemperature(string symbol, out TemperatureUnit unit)
        => Temperatures.TryGetValue(symbol.Trim(), out unit!);

    /// <summary>Looks an absolute-pressure unit up; false when the symbol is unknown or a gauge unit.</summary>
    internal static bool TryPressure(string symbol, out PressureUnit unit)
        => Pressures.TryGetValue(symbol.Trim(), out unit!);

    /// <summary>Whether the symbol is a gauge-pressure unit, which is never accepted.</summary>
    internal static bool IsGauge(string symbol) => GaugePressures.Contains(symbol.Trim());

    /// <summary>Converts a value to K; <paramref name="exact"/> is the decimal reading of the
    /// cell, or null when it does not fit a decimal.</summary>
    internal static double ToKelvin(TemperatureUnit unit, double value, decimal? exact)
    {
        if (exact is decimal x && InDecimalRange(value))
        {
            return (double)((x + unit.Offset) / unit.Divisor) + 0.0; // + 0.0 turns a decimal -0 into 0
        }
        return (value + (double)unit.Offset) / (double)unit.Divisor;
    }

    /// <summary>Converts a value to Pa; <paramref name="exact"/> is the decimal reading of the
    /// cell, or null when it does not fit a decimal.</summary>
    internal static double ToPascal(PressureUnit unit, double value, decimal? exact)
    {
        if (exact is decimal x && InDecimalRange(value))
        {
            return (double)(x * unit.Numerator / unit.Denominator) + 0.0; // + 0.0 turns a decimal -0 into 0
        }
        return value * (double)unit.Numerator / (double)unit.Denominator;
    }

    private static bool InDecimalRange(double value)
        => value == 0.0 || (Math.Abs(value) >= 1e-10 && Math.Abs(value) <= 1e15);
}
