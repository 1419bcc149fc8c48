using PhaseSlope.Core.Units;

namespace PhaseSlope.Core.Correlations.Audit;

/// <summary>Logarithm base of a published vapour-pressure correlation.</summary>
public enum LogBase
{
    /// <summary>Common (decimal) logarithm, log10.</summary>
    Ten,

    /// <summary>Natural logarithm, ln.</summary>
    E,
}

/// <summary>Pressure unit of a published correlation.</summary>
public enum PublishedPressureUnit
{
    /// <summary>Pascal.</summary>
    Pa,

    /// <summary>Kilopascal.</summary>
    KPa,

    /// <summary>Megapascal.</summary>
    MPa,

    /// <summary>Bar, 1e5 Pa.</summary>
    Bar,

    /// <summary>Conventional millimetre of mercury, 133.322387415 Pa (<see cref="UnitTable.MillimetreOfMercury"/>).</summary>
    MmHg,

    /// <summary>Standard atmosphere, 101325 Pa.</summary>
    Atm,

    /// <summary>Pound-force per square inch, 6894.757293168 Pa.</summary>
    Psi,

    /// <summary>Torr, 101325/760 Pa; given explicitly only (it is not a detection candidate:
    /// it differs from the mmHg by 1.4e-7 relative, which no correlation can resolve).</summary>
    Torr,
}

/// <summary>Temperature scale of a published correlation.</summary>
public enum PublishedTemperatureUnit
{
    /// <summary>Kelvin.</summary>
    Kelvin,

    /// <summary>Degree Celsius, t = T − 273.15 K.</summary>
    Celsius,

    /// <summary>Degree Fahrenheit, t = 1.8·T/K − 459.67 (<see cref="UnitTable"/>, NIST SP 811 B.9).</summary>
    Fahrenheit,

    /// <summary>Rankine, T_R = 1.8·T/K (<see cref="UnitTable"/>, NIST SP 811 B.9): absolute, like the kelvin.</summary>
    Rankine,
}

/// <summary>The convention a published correlation is printed in: log base, pressure unit and
/// temperature scale.</summary>
public sealed record PublishedConvention(LogBase LogBase, PublishedPressureUnit PressureUnit, PublishedTemperatureUnit TemperatureUnit)
{
    /// <summary>Offset of the Celsius scale, K (from the one unit table, <see cref="UnitTable.CelsiusOffset"/>).</summary>
    public const double CelsiusOffset = (double)UnitTable.CelsiusOffset;

    /// <summary>The pressure units tried when the unit is not given, in the order candidates are
    /// listed (every unit but the torr, which the mmHg stands for).</summary>
    public static IReadOnlyList<PublishedPressureUnit> PressureUnits { get; } =
        [.. Enum.GetValues<PublishedPressureUnit>().Where(unit => unit != PublishedPressureUnit.Torr)];

    /// <summary>Pascals per unit, from the one unit table (<see cref="UnitTable"/>): bar 1e5 Pa,
    /// standard atmosphere 101325 Pa, psi 6894.757293168 Pa, the conventional millimetre of
    /// mercury 133.322387415 Pa, the torr 101325/760 Pa (sources named in the table).</summary>
    public static double PascalsPer(PublishedPressureUnit unit) => UnitTable.Get(Symbol(unit)).ToSi(1.0);

    /// <summary>The symbol written in reports: Pa, kPa, MPa, bar, mmHg, atm, psi, torr (the
    /// unit table's symbols).</summary>
    public static string Symbol(PublishedPressureUnit unit) => unit switch
    {
        PublishedPressureUnit.Pa => "Pa",
        PublishedPressureUnit.KPa => "kPa",
        PublishedPressureUnit.MPa => "MPa",
        PublishedPressureUnit.Bar => "bar",
        PublishedPressureUnit.MmHg => "mmHg",
        PublishedPressureUnit.Atm => "atm",
        PublishedPressureUnit.Psi => "psi",
        PublishedPressureUnit.Torr => "torr",
        _ => throw new ArgumentOutOfRangeException(nameof(unit)),
    };

    /// <summary>The symbol written in reports: K, degC, degF or degR (the unit table's symbols).</summary>
    public static string Symbol(PublishedTemperatureUnit unit) => unit switch
    {
        PublishedTemperatureUnit.Kelvin => "K",
        PublishedTemperatureUnit.Celsius => "degC",
        PublishedTemperatureUnit.Fahrenheit => "degF",
        PublishedTemperatureUnit.Rankine => "degR",
        _ => throw new ArgumentOutOfRangeException(nameof(unit)),
    };

    /// <summary>The temperature tried when the scale is not given: K and degC (degF and degR are
    /// read when stated, never guessed: the fewer candidates, the fewer false matches).</summary>
    public static IReadOnlyList<PublishedTemperatureUnit> DetectedTemperatureUnits { get; } = [PublishedTemperatureUnit.Kelvin, PublishedTemperatureUnit.Celsius];

    /// <summary>True for a scale with its zero at absolute zero (K, degR): the only ones a form
    /// with terms in 1/T or ln T can be printed in.</summary>
    public static bool IsAbsolute(PublishedTemperatureUnit unit) => unit is PublishedTemperatureUnit.Kelvin or PublishedTemperatureUnit.Rankine;

    /// <summary>The printed temperature as t = k·T − o with T in K: the factor k and the offset o
    /// of the scale, read from the one unit table (T/K = (t + o)·n/d there, so k = d/n).</summary>
    public static (double Factor, double Offset) Scale(PublishedTemperatureUnit unit)
    {
        var u = UnitTable.Get(Symbol(unit));
        return ((double)(u.Denominator / u.Numerator), (double)u.Offset);
    }

    /// <summary>A temperature in K expressed on the scale.</summary>
    public static double FromKelvin(double kelvin, PublishedTemperatureUnit unit) => UnitTable.Get(Symbol(unit)).FromSi(kelvin);

    /// <summary>A temperature on the scale expressed in K.</summary>
    public static double ToKelvin(double value, PublishedTemperatureUnit unit) => UnitTable.Get(Symbol(unit)).ToSi(value);

    /// <summary>The symbol written in reports: 10 or e.</summary>
    public static string Symbol(LogBase logBase) => logBase == LogBase.Ten ? "10" : "e";

    /// <summary>Parses a pressure unit through the one unit table (case-sensitive; any spelling
    /// of the table's units, e.g. psia for psi). False for a unit that is not in the table or
    /// that published correlations here do not use (mPa, GPa, mbar).</summary>
    public static bool TryParsePressureUnit(string text, out PublishedPressureUnit unit)
    {
        unit = PublishedPressureUnit.Pa;
        if (!UnitTable.TryFind(text, out Unit? found, Dimension.Pressure))
        {
            return false;
        }

        foreach (var u in Enum.GetValues<PublishedPressureUnit>())
        {
            if (Symbol(u) == found!.Symbol)
            {
                unit = u;
                return true;
            }
        }

        return false;
    }

    /// <summary>Parses K, degC, degF or degR (also °C, °F, °R) through the one unit table (case-sensitive).</summary>
    public static bool TryParseTemperatureUnit(string text, out PublishedTemperatureUnit unit)
    {
        unit = PublishedTemperatureUnit.Kelvin;
        if (!UnitTable.TryFind(text, out Unit? found, Dimension.Temperature))
        {
            return false;
        }

        switch (found!.Symbol)
        {
            case "K":
                return true;
            case "degC":
                unit = PublishedTemperatureUnit.Celsius;
                return true;
            case "degF":
                unit = PublishedTemperatureUnit.Fahrenheit;
                return true;
            case "degR":
                unit = PublishedTemperatureUnit.Rankine;
                return true;
            default:
                return false;
        }
    }

    /// <summary>Parses 10 or e (also ln, log10).</summary>
    public static bool TryParseLogBase(string text, out LogBase logBase)
    {
        string t = text.Trim().ToLowerInvariant();
        logBase = t is "e" or "ln" ? LogBase.E : LogBase.Ten;
        return t is "e" or "ln" or "10" or "log10";
    }

    /// <summary>Text such as "log10, mmHg, degC".</summary>
    public override string ToString()
        => $"{(LogBase == LogBase.Ten ? "log10" : "ln")}, {Symbol(PressureUnit)}, {Symbol(TemperatureUnit)}";
}
