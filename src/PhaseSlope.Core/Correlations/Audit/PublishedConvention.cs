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

    /// <summary>Millimetre of mercury taken as the torr, 101325/760 Pa (see <see cref="PublishedConvention.PascalsPer"/>).</summary>
    MmHg,

    /// <summary>Standard atmosphere, 101325 Pa.</summary>
    Atm,

    /// <summary>Pound-force per square inch, 6894.757293168 Pa.</summary>
    Psi,
}

/// <summary>Temperature scale of a published correlation.</summary>
public enum PublishedTemperatureUnit
{
    /// <summary>Kelvin.</summary>
    Kelvin,

    /// <summary>Degree Celsius, t = T − 273.15 K.</summary>
    Celsius,
}

/// <summary>The convention a published correlation is printed in: log base, pressure unit and
/// temperature scale.</summary>
public sealed record PublishedConvention(LogBase LogBase, PublishedPressureUnit PressureUnit, PublishedTemperatureUnit TemperatureUnit)
{
    /// <summary>Offset of the Celsius scale, K (exact by definition of the scale).</summary>
    public const double CelsiusOffset = 273.15;

    /// <summary>Every pressure unit, in the order candidates are listed.</summary>
    public static IReadOnlyList<PublishedPressureUnit> PressureUnits { get; } = Enum.GetValues<PublishedPressureUnit>();

    /// <summary>Pascals per unit, from the exact definitions: bar 1e5 Pa, standard atmosphere
    /// 101325 Pa (10th CGPM, 1954), psi = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² =
    /// 6894.757293168 Pa (international pound and inch, standard gravity). The mmHg of printed
    /// Antoine tables is taken as the torr, exactly 101325/760 = 133.3223684 Pa, so that 760 mmHg
    /// is one atmosphere, as those tables assume; the conventional millimetre of mercury
    /// (13595.1 kg/m³ × 9.80665 m/s² × 1 mm = 133.3223874 Pa) is larger by 1.4e-7 relative, far
    /// below the precision of any correlation.</summary>
    public static double PascalsPer(PublishedPressureUnit unit) => unit switch
    {
        PublishedPressureUnit.Pa => 1.0,
        PublishedPressureUnit.KPa => 1.0e3,
        PublishedPressureUnit.MPa => 1.0e6,
        PublishedPressureUnit.Bar => 1.0e5,
        PublishedPressureUnit.MmHg => Constants.StandardAtmosphere / 760.0,
        PublishedPressureUnit.Atm => Constants.StandardAtmosphere,
        PublishedPressureUnit.Psi => 0.45359237 * 9.80665 / (0.0254 * 0.0254),
        _ => throw new ArgumentOutOfRangeException(nameof(unit)),
    };

    /// <summary>The symbol written in reports: Pa, kPa, MPa, bar, mmHg, atm, psi.</summary>
    public static string Symbol(PublishedPressureUnit unit) => unit switch
    {
        PublishedPressureUnit.Pa => "Pa",
        PublishedPressureUnit.KPa => "kPa",
        PublishedPressureUnit.MPa => "MPa",
        PublishedPressureUnit.Bar => "bar",
        PublishedPressureUnit.MmHg => "mmHg",
        PublishedPressureUnit.Atm => "atm",
        PublishedPressureUnit.Psi => "psi",
        _ => throw new ArgumentOutOfRangeException(nameof(unit)),
    };

    /// <summary>The symbol written in reports: K or degC.</summary>
    public static string Symbol(PublishedTemperatureUnit unit) => unit == PublishedTemperatureUnit.Kelvin ? "K" : "degC";

    /// <summary>The symbol written in reports: 10 or e.</summary>
    public static string Symbol(LogBase logBase) => logBase == LogBase.Ten ? "10" : "e";

    /// <summary>Parses a pressure-unit symbol (case-insensitive; "torr" is the same unit as mmHg here).</summary>
    public static bool TryParsePressureUnit(string text, out PublishedPressureUnit unit)
    {
        foreach (var u in PressureUnits)
        {
            if (string.Equals(text.Trim(), Symbol(u), StringComparison.OrdinalIgnoreCase))
            {
                unit = u;
                return true;
            }
        }

        unit = PublishedPressureUnit.Pa;
        if (string.Equals(text.Trim(), "torr", StringComparison.OrdinalIgnoreCase))
        {
            unit = PublishedPressureUnit.MmHg;
            return true;
        }

        return false;
    }

    /// <summary>Parses K or degC (also °C, C).</summary>
    public static bool TryParseTemperatureUnit(string text, out PublishedTemperatureUnit unit)
    {
        string t = text.Trim();
        unit = PublishedTemperatureUnit.Kelvin;
        if (string.Equals(t, "K", StringComparison.OrdinalIgnoreCase))
        {
            return true;
        }

        unit = PublishedTemperatureUnit.Celsius;
        return t is "degC" or "°C" or "C" or "degc" or "DEGC";
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
