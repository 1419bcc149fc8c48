namespace PhaseSlope.Core.Units;

/// <summary>The one unit table of PhaseSlope: every unit that the command line, data files,
/// fluid files, the correlation audit and the displays parse or print, each with one value and
/// its source.</summary>
/// <remarks>
/// <para>Spellings are matched case-sensitively, so SI prefixes keep their meaning: <c>mPa</c> is
/// the millipascal and <c>MPa</c> the megapascal. A spelling that is not in the table is refused
/// by the caller with <see cref="NearMatches"/> named; nothing is guessed.</para>
/// <para>Sources: the SI Brochure (BIPM, 9th edition, 2019) for the SI units, the prefixes and
/// the degree Celsius; NIST Special Publication 811 (2008 edition), Appendix B.8 and B.9, for the
/// units outside the SI. The exact defining constants: standard atmosphere 101 325 Pa, standard
/// acceleration of gravity 9.806 65 m/s², international pound 0.453 592 37 kg, international
/// inch 0.0254 m (all SP 811 B.8). The millimetre of mercury is the conventional one,
/// 13.5951 g/cm³ × 9.806 65 m/s² × 1 mm = 133.322 387 415 Pa (from memory of the standard
/// definition; SP 811 B.8 lists it rounded, 1.333 224 E+02); the torr is a different unit,
/// exactly 101 325/760 Pa = 133.322 368 4… Pa, 1.4e-7 smaller.</para>
/// </remarks>
public static class UnitTable
{
    // Exact defining constants (NIST SP 811, 2008 edition, B.8).
    private const decimal StandardAtmosphere = 101325m;   // Pa, 10th CGPM (1954); SP 811 B.8
    private const decimal StandardGravity = 9.80665m;     // m/s², 3rd CGPM (1901); SP 811 B.8
    private const decimal Pound = 0.45359237m;            // kg, international pound; SP 811 B.8
    private const decimal Inch = 0.0254m;                 // m, international inch; SP 811 B.8
    private const decimal MercuryDensity = 13595.1m;      // kg/m³, conventional mercury (from memory of the definition of the mmHg)

    private const string SiBrochure = "SI Brochure, 9th ed. (BIPM 2019)";
    private const string SiPrefix = "SI Brochure, 9th ed. (BIPM 2019), SI prefixes";
    private const string Sp811 = "NIST SP 811 (2008)";

    /// <summary>The offset of the Celsius scale, K: t/°C = T/K − 273.15, exact (SI Brochure, 9th
    /// ed., 2019, definition of the degree Celsius; NIST SP 811 §4.2.1.1).</summary>
    public const decimal CelsiusOffset = 273.15m;

    /// <summary>The conventional millimetre of mercury, Pa: 13.5951 g/cm³ × 9.806 65 m/s² × 1 mm
    /// = 133.322 387 415 Pa (from memory of the standard definition; NIST SP 811 B.8 lists
    /// 1.333 224 E+02). The one mmHg of PhaseSlope.</summary>
    public const decimal MillimetreOfMercury = MercuryDensity * StandardGravity * 0.001m;

    private static Unit U(string symbol, Dimension dimension, decimal numerator, string source, params string[] aliases)
        => new(symbol, dimension, 0m, numerator, 1m, source, aliases);

    private static Unit U(string symbol, Dimension dimension, decimal numerator, decimal denominator, string source, params string[] aliases)
        => new(symbol, dimension, 0m, numerator, denominator, source, aliases);

    /// <summary>Every unit, grouped by dimension, the SI unit of each dimension first.</summary>
    public static IReadOnlyList<Unit> All { get; } =
    [
        // Temperature
        U("K", Dimension.Temperature, 1m, SiBrochure),
        new("degC", Dimension.Temperature, CelsiusOffset, 1m, 1m, $"{SiBrochure}, degree Celsius; {Sp811} 4.2.1.1", ["°C"]),
        new("degF", Dimension.Temperature, 459.67m, 1m, 1.8m, $"{Sp811} B.9: T/K = (t/°F + 459.67)/1.8", ["°F"]),
        U("degR", Dimension.Temperature, 1m, 1.8m, $"{Sp811} B.9: T/K = (T/°R)/1.8", "°R"),

        // Pressure (absolute)
        U("Pa", Dimension.Pressure, 1m, SiBrochure),
        U("kPa", Dimension.Pressure, 1e3m, SiPrefix),
        U("MPa", Dimension.Pressure, 1e6m, SiPrefix),
        U("GPa", Dimension.Pressure, 1e9m, SiPrefix),
        U("mPa", Dimension.Pressure, 1e-3m, SiPrefix),
        U("bar", Dimension.Pressure, 1e5m, $"{Sp811} B.8 (exact)"),
        U("mbar", Dimension.Pressure, 1e2m, $"{Sp811} B.8 (exact)"),
        U("psi", Dimension.Pressure, Pound * StandardGravity, Inch * Inch,
            $"{Sp811} B.8: lbf/in² = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)², exact", "psia"),
        U("atm", Dimension.Pressure, StandardAtmosphere, $"{Sp811} B.8 (exact, 10th CGPM 1954)"),
        U("mmHg", Dimension.Pressure, MillimetreOfMercury,
            "conventional mmHg, 13.5951 g/cm3 × 9.80665 m/s2 × 1 mm (from memory of the standard definition; NIST SP 811 B.8 lists 1.333224 E+02)"),
        U("torr", Dimension.Pressure, StandardAtmosphere, 760m, $"{Sp811} B.8: 101325/760 Pa (exact)"),

        // Molar mass
        U("kg/mol", Dimension.MolarMass, 1m, SiBrochure),
        U("g/mol", Dimension.MolarMass, 1e-3m, SiPrefix),

        // Amount density
        U("mol/m3", Dimension.AmountDensity, 1m, SiBrochure, "mol/m³"),
        U("mol/L", Dimension.AmountDensity, 1e3m, $"{SiBrochure}, litre = dm³"),
        U("mol/dm3", Dimension.AmountDensity, 1e3m, SiPrefix, "mol/dm³"),
        U("kmol/m3", Dimension.AmountDensity, 1e3m, SiPrefix, "kmol/m³"),

        // Mass density
        U("kg/m3", Dimension.MassDensity, 1m, SiBrochure, "kg/m³"),
        U("g/cm3", Dimension.MassDensity, 1e3m, SiPrefix, "g/cm³"),

        // Molar volume
        U("m3/mol", Dimension.MolarVolume, 1m, SiBrochure, "m³/mol"),
        U("L/mol", Dimension.MolarVolume, 1e-3m, $"{SiBrochure}, litre = dm³"),
        U("dm3/mol", Dimension.MolarVolume, 1e-3m, SiPrefix, "dm³/mol"),
        U("cm3/mol", Dimension.MolarVolume, 1e-6m, SiPrefix, "cm³/mol"),

        // Specific volume
        U("m3/kg", Dimension.SpecificVolume, 1m, SiBrochure, "m³/kg"),
        U("L/kg", Dimension.SpecificVolume, 1e-3m, $"{SiBrochure}, litre = dm³", "dm3/kg", "dm³/kg"),
        U("cm3/g", Dimension.SpecificVolume, 1e-3m, SiPrefix, "cm³/g"),

        // Molar and specific energy
        U("J/mol", Dimension.MolarEnergy, 1m, SiBrochure),
        U("kJ/mol", Dimension.MolarEnergy, 1e3m, SiPrefix),
        U("J/kg", Dimension.SpecificEnergy, 1m, SiBrochure),
        U("kJ/kg", Dimension.SpecificEnergy, 1e3m, SiPrefix),

        // Molar and specific entropy
        U("J/(mol·K)", Dimension.MolarEntropy, 1m, SiBrochure, "J/(mol*K)"),
        U("J/(kg·K)", Dimension.SpecificEntropy, 1m, SiBrochure, "J/(kg*K)"),
        U("kJ/(kg·K)", Dimension.SpecificEntropy, 1e3m, SiPrefix, "kJ/(kg*K)"),

        // Derivatives
        U("Pa/K", Dimension.PressureSlope, 1m, SiBrochure),
        U("kPa/K", Dimension.PressureSlope, 1e3m, SiPrefix),
        U("bar/K", Dimension.PressureSlope, 1e5m, $"{Sp811} B.8 (exact)"),
        U("m/s", Dimension.Speed, 1m, SiBrochure),
        U("1/K", Dimension.InverseTemperature, 1m, SiBrochure),
        U("1/Pa", Dimension.InversePressure, 1m, SiBrochure),
        U("1/bar", Dimension.InversePressure, 1m, 1e5m, $"{Sp811} B.8 (exact)"),
        U("1/kPa", Dimension.InversePressure, 1m, 1e3m, SiPrefix),
        U("1/MPa", Dimension.InversePressure, 1m, 1e6m, SiPrefix),
        U("K/Pa", Dimension.TemperaturePerPressure, 1m, SiBrochure),
        U("K/bar", Dimension.TemperaturePerPressure, 1m, 1e5m, $"{Sp811} B.8 (exact)"),
    ];

    /// <summary>Gauge-pressure spellings, never accepted (matched ignoring case): a gauge
    /// pressure needs the ambient pressure, which PhaseSlope does not guess.</summary>
    public static IReadOnlyList<string> GaugePressures { get; } = ["psig", "barg", "kPag", "MPag"];

    private static readonly Dictionary<string, Unit> BySpelling =
        All.SelectMany(unit => unit.Spellings.Select(spelling => (spelling, unit)))
            .ToDictionary(pair => pair.spelling, pair => pair.unit, StringComparer.Ordinal);

    /// <summary>The SI unit of a dimension (K, Pa, kg/mol, mol/m3, …).</summary>
    public static Unit Si(Dimension dimension) => All.First(unit => unit.Dimension == dimension);

    /// <summary>The units of some dimensions, in table order.</summary>
    public static IReadOnlyList<Unit> Of(params Dimension[] dimensions)
        => [.. All.Where(unit => dimensions.Contains(unit.Dimension))];

    /// <summary>The unit with exactly this spelling (case-sensitive), of any dimension.</summary>
    /// <exception cref="KeyNotFoundException">No unit is spelled so.</exception>
    public static Unit Get(string spelling)
        => BySpelling.TryGetValue(spelling, out Unit? unit) ? unit : throw new KeyNotFoundException($"unit '{spelling}' is not in the unit table");

    /// <summary>Finds the unit with exactly this spelling (case-sensitive, surrounding white
    /// space ignored) among the given dimensions.</summary>
    /// <param name="spelling">The spelling, e.g. <c>MPa</c>.</param>
    /// <param name="unit">The unit found, or null.</param>
    /// <param name="dimensions">The dimensions accepted; none means any.</param>
    /// <returns>Whether a unit was found.</returns>
    public static bool TryFind(string spelling, out Unit? unit, params Dimension[] dimensions)
    {
        unit = BySpelling.TryGetValue(spelling.Trim(), out Unit? found)
            && (dimensions.Length == 0 || dimensions.Contains(found.Dimension)) ? found : null;
        return unit is not null;
    }

    /// <summary>Whether a spelling is a gauge-pressure unit (ignoring case).</summary>
    public static bool IsGauge(string spelling)
        => GaugePressures.Contains(spelling.Trim(), StringComparer.OrdinalIgnoreCase);

    /// <summary>Symbols of the units of the given dimensions that a mistyped spelling most
    /// likely meant: those equal to it ignoring case (<c>mpa</c> → MPa, mPa); failing that,
    /// those one edit away ignoring case (<c>kPas</c> → kPa). Empty when none is close.</summary>
    public static IReadOnlyList<string> NearMatches(string spelling, params Dimension[] dimensions)
    {
        string s = spelling.Trim();
        var candidates = (dimensions.Length == 0 ? All : Of(dimensions))
            .SelectMany(unit => unit.Spellings.Select(text => (text, unit.Symbol)))
            .ToList();
        List<string> same = [.. candidates.Where(c => string.Equals(c.text, s, StringComparison.OrdinalIgnoreCase))
            .Select(c => c.Symbol).Distinct()];
        if (same.Count > 0)
        {
            return same;
        }

        return [.. candidates.Where(c => Fluids.FluidNames.EditDistance(c.text.ToLowerInvariant(), s.ToLowerInvariant()) == 1)
            .Select(c => c.Symbol).Distinct()];
    }

    /// <summary>The message fragment for a spelling that is not a unit of the given dimensions:
    /// "unknown pressure unit 'mpa'; did you mean MPa or mPa?" or, with nothing close, the list
    /// of accepted symbols.</summary>
    /// <param name="spelling">What was written.</param>
    /// <param name="quantity">The quantity's name for the message (e.g. "pressure").</param>
    /// <param name="dimensions">The dimensions accepted there.</param>
    public static string UnknownMessage(string spelling, string quantity, params Dimension[] dimensions)
    {
        IReadOnlyList<string> near = NearMatches(spelling, dimensions);
        string head = $"unknown {quantity} unit '{spelling.Trim()}'";
        return near.Count > 0
            ? $"{head}; did you mean {JoinOr(near)}?"
            : $"{head} (use {JoinOr([.. Of(dimensions).Select(unit => unit.Symbol)])})";
    }

    /// <summary>"a", "a or b", "a, b or c".</summary>
    public static string JoinOr(IReadOnlyList<string> items) => items.Count switch
    {
        0 => string.Empty,
        1 => items[0],
        _ => $"{string.Join(", ", items.Take(items.Count - 1))} or {items[^1]}",
    };

}
