using PhaseSlope.Core.Models;
using System.Globalization;
using System.Text;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Core.Fluids;

/// <summary>Reads the line-based <c>.fluid</c> text format (described in docs/fluid-files.md)
/// into a validated <see cref="Fluid"/> with every value in SI units.</summary>
/// <remarks>The core never opens files itself: the caller opens the file or resource and hands
/// over the reader or stream together with a name for it (the origin) that error messages use.
/// Every failure is a <see cref="FluidDataException"/> naming the origin, the line and the field.</remarks>
public static class FluidFile
{
    /// <summary>The word that opens every fluid file, on its <c>format</c> line.</summary>
    public const string FormatTag = "phaseslope-fluid";

    /// <summary>The only format version this library reads.</summary>
    public const int FormatVersion = 1;

    /// <summary>File name extension of fluid files, with the dot.</summary>
    public const string Extension = ".fluid";

    /// <summary>Lowest accepted acentric factor (the range of a fluid file's acentric_factor).</summary>
    public const double AcentricFactorLowest = FluidFileParser.AcentricFactorLowest;

    /// <summary>Highest accepted acentric factor.</summary>
    public const double AcentricFactorHighest = FluidFileParser.AcentricFactorHighest;

    /// <summary>Lowest accepted molar mass, kg/mol: 1 g/mol, below the lightest molecule (H2,
    /// 2.016 g/mol) and no lighter than a hydrogen atom.</summary>
    public const double MolarMassLowest = 1e-3;

    /// <summary>Highest accepted molar mass, kg/mol: 10 000 g/mol, above the heaviest petroleum
    /// pseudo-components that cubic equations of state are applied to (about 1 000 to 2 000 g/mol);
    /// a larger value is a unit slip or a typing error.</summary>
    public const double MolarMassHighest = 10.0;

    /// <summary>Reads a fluid file from a stream of UTF-8 text (a byte-order mark is allowed).</summary>
    /// <param name="stream">The open stream; it is read to the end and left open.</param>
    /// <param name="origin">File path or resource name, used in error messages and stored in
    /// <see cref="Fluid.Origin"/>.</param>
    /// <returns>The validated fluid.</returns>
    /// <exception cref="FluidDataException">The text is not a valid fluid file.</exception>
    public static Fluid Read(Stream stream, string origin)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(origin);
        using var reader = OpenText(stream);
        return Parse(reader, origin);
    }

    /// <summary>Reads only the name and synonyms of a fluid file (see
    /// <see cref="FluidFileParser.ScanNames"/>); the rest of the file is not validated.</summary>
    /// <param name="stream">The open stream; it is left open.</param>
    /// <param name="origin">File path or resource name, used in error messages.</param>
    /// <returns>The canonical name and the synonyms as a full read would give them.</returns>
    /// <exception cref="FluidDataException">The name or the synonyms are missing or malformed.</exception>
    internal static (string Name, IReadOnlyList<string> Synonyms) ScanNames(Stream stream, string origin)
    {
        using var reader = OpenText(stream);
        return new FluidFileParser(origin).ScanNames(reader);
    }

    private static StreamReader OpenText(Stream stream)
    {
        var encoding = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true);
        return new StreamReader(stream, encoding, detectEncodingFromByteOrderMarks: true,
            bufferSize: 4096, leaveOpen: true);
    }

    /// <summary>Reads a fluid file from text.</summary>
    /// <param name="reader">The text; it is read to the end and not disposed.</param>
    /// <param name="origin">File path or resource name, used in error messages and stored in
    /// <see cref="Fluid.Origin"/>.</param>
    /// <returns>The validated fluid.</returns>
    /// <exception cref="FluidDataException">The text is not a valid fluid file.</exception>
    public static Fluid Parse(TextReader reader, string origin)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(origin);
        return new FluidFileParser(origin).Run(reader);
    }

    /// <summary>The keys a fluid file may use, in the order the documentation lists them.</summary>
    public static IReadOnlyList<string> Keys { get; } = FluidFileParser.AllKeys;
}

/// <summary>One pass over one fluid file.</summary>
internal sealed partial class FluidFileParser
{
    private const string KeyFormat = "format";
    private const string KeyName = "name";
    private const string KeySynonyms = "synonyms";
    private const string KeyFormula = "formula";
    private const string KeyCas = "cas";
    private const string KeyFamily = "family";
    private const string KeyMolarMass = "molar_mass";
    private const string KeyCriticalTemperature = "critical_temperature";
    private const string KeyCriticalPressure = "critical_pressure";
    private const string KeyAcentricFactor = "acentric_factor";
    private const string KeyCriticalDensity = "critical_density";
    private const string KeyCriticalMolarVolume = "critical_molar_volume";
    private const string KeyNormalBoilingPoint = "normal_boiling_point";
    private const string KeyTriplePointTemperature = "triple_point_temperature";
    private const string KeyTriplePointPressure = "triple_point_pressure";
    private const string KeyEnthalpyOfFusion = "enthalpy_of_fusion";
    private const string KeySolidDensity = "solid_density";
    private const string KeyTriplePointLiquidDensity = "triple_point_liquid_density";
    private const string KeyFusionVolumeChange = "fusion_volume_change";
    private const string KeySolidHeatCapacity = "solid_heat_capacity";
    private const string KeyMeltingPressureEquation = "melting_pressure_equation";
    private const string KeySublimationPressureEquation = "sublimation_pressure_equation";
    private const string KeyRemarks = "remarks";
    private const string KeyHazardClass = "hazard_class";
    private const string KeyIdealGasCp = "ideal_gas_cp";
    private const string KeyAlphaTwuPr = "alpha_twu_pr";
    private const string KeyAlphaTwuSrk = "alpha_twu_srk";
    private const string KeyAlphaMathiasCopemanPr = "alpha_mathias_copeman_pr";
    private const string KeyAlphaMathiasCopemanSrk = "alpha_mathias_copeman_srk";
    private const string KeyAlphaSoavePr = "alpha_soave_pr";
    private const string KeyAlphaSoaveSrk = "alpha_soave_srk";
    private const string CovarianceSuffix = "_covariance";
    private const string SensitivitySuffix = "_critical_sensitivity";
    private const string KeyAlphaDefault = "alpha_default";
    private const string KeyProvenance = "provenance";
    private const string KeyVapourPressureEquation = "vapour_pressure_equation";
    private const string KeyVolumeShiftPr = "volume_shift_pr";
    private const string KeyVolumeShiftSrk = "volume_shift_srk";

    /// <summary>The keys of fluid-specific alpha parameters.</summary>
    private static readonly string[] AlphaKeys =
    [
        KeyAlphaSoavePr, KeyAlphaSoaveSrk, KeyAlphaTwuPr, KeyAlphaTwuSrk, KeyAlphaMathiasCopemanPr, KeyAlphaMathiasCopemanSrk,
    ];

    internal static readonly string[] AllKeys =
    [
        KeyFormat, KeyName, KeySynonyms, KeyFormula, KeyCas, KeyFamily, KeyHazardClass,
        KeyMolarMass, KeyCriticalTemperature, KeyCriticalPressure, KeyAcentricFactor,
        KeyCriticalDensity, KeyCriticalMolarVolume, KeyNormalBoilingPoint,
        KeyTriplePointTemperature, KeyTriplePointPressure, KeyEnthalpyOfFusion, KeySolidDensity, KeyTriplePointLiquidDensity,
        KeyFusionVolumeChange, KeySolidHeatCapacity, KeyMeltingPressureEquation, KeySublimationPressureEquation,
        KeyIdealGasCp, KeyVapourPressureEquation, KeyVolumeShiftPr, KeyVolumeShiftSrk,
        .. AlphaKeys, .. AlphaKeys.Select(k => k + CovarianceSuffix), .. AlphaKeys.Select(k => k + SensitivitySuffix), KeyAlphaDefault,
        KeyProvenance, KeyRemarks,
    ];

    private static readonly string[] RequiredKeys =
    [
        KeyFormat, KeyName, KeyCriticalTemperature, KeyCriticalPressure, KeyAcentricFactor,
    ];

    private static readonly Dictionary<string, Quantity> QuantityOfKey = new(StringComparer.Ordinal)
    {
        [KeyMolarMass] = Quantity.MolarMass,
        [KeyCriticalTemperature] = Quantity.Temperature,
        [KeyCriticalPressure] = Quantity.Pressure,
        [KeyAcentricFactor] = Quantity.Dimensionless,
        [KeyCriticalDensity] = Quantity.MolarDensity,
        [KeyCriticalMolarVolume] = Quantity.MolarVolume,
        [KeyNormalBoilingPoint] = Quantity.Temperature,
        [KeyTriplePointTemperature] = Quantity.Temperature,
        [KeyTriplePointPressure] = Quantity.Pressure,
        [KeyEnthalpyOfFusion] = Quantity.MolarEnergy,
        [KeySolidDensity] = Quantity.MolarDensity,
        [KeyTriplePointLiquidDensity] = Quantity.MolarDensity,
        [KeyFusionVolumeChange] = Quantity.SignedMolarVolume,
        [KeySolidHeatCapacity] = Quantity.HeatCapacity,
        [KeyVolumeShiftPr] = Quantity.VolumeShift,
        [KeyVolumeShiftSrk] = Quantity.VolumeShift,
    };

    internal const double AcentricFactorLowest = -0.5;
    internal const double AcentricFactorHighest = 2.0;

    private readonly string _origin;
    private readonly Dictionary<string, int> _lineOfKey = new(StringComparer.Ordinal);
    private readonly Dictionary<string, string> _text = new(StringComparer.Ordinal);
    private readonly Dictionary<string, RawQuantity> _quantities = new(StringComparer.Ordinal);
    private List<string> _synonyms = [];
    private IdealGasHeatCapacity? _idealGasCp;
    private readonly List<AlphaParameterSet> _alphaParameters = [];
    private readonly Dictionary<string, (int Line, double[] UpperTriangle)> _alphaCovariances = new(StringComparer.Ordinal);
    private readonly Dictionary<string, (int Line, double[] Values)> _alphaSensitivities = new(StringComparer.Ordinal);
    private AlphaForm _preferredAlpha = AlphaForm.Default;
    private PublishedVapourPressure? _vapourPressureEquation;
    private SolidLineEquation? _meltingEquation;
    private SolidLineEquation? _sublimationEquation;
    private HazardClass? _hazard;

    internal FluidFileParser(string origin) => _origin = origin;

    private enum Quantity
    {
        Temperature,
        Pressure,
        MolarMass,
        MolarDensity,
        MolarVolume,
        Dimensionless,
        VolumeShift,
        MolarEnergy,
        HeatCapacity,
        SignedMolarVolume,
    }

    /// <summary>A numeric entry as written: number and uncertainty in the file's unit.</summary>
    private sealed record RawQuantity(int Line, double Number, string? Unit, double? Uncertainty, string Source);

    internal Fluid Run(TextReader reader)
    {
        int lineNumber = 0;
        bool sawFormat = false;
        while (NextEntry(reader, ref lineNumber) is { } trimmed)
        {
            SplitKey(trimmed, out string key, out string rest);
            if (!sawFormat && key != KeyFormat)
            {
                throw Fail(lineNumber, KeyFormat,
                    $"the first entry must be '{KeyFormat} {FluidFile.FormatTag} {FluidFile.FormatVersion}', found '{key}'");
            }

            ReadEntry(lineNumber, key, rest);
            sawFormat = true;
        }

        int endLine = Math.Max(lineNumber, 1);
        if (!sawFormat)
        {
            throw Fail(endLine, KeyFormat,
                $"no entries; a fluid file starts with '{KeyFormat} {FluidFile.FormatTag} {FluidFile.FormatVersion}'");
        }

        foreach (string required in RequiredKeys)
        {
            if (!_lineOfKey.ContainsKey(required))
            {
                throw Fail(endLine, required, "required field is missing (end of file reached without it)");
            }
        }

        return Build();
    }

    /// <summary>Reads a fluid from entries given one by one rather than as file lines (an inline
    /// definition): the same keys, value syntax and checks as a file, without the <c>format</c>
    /// line; each entry's position stands for its line in errors.</summary>
    /// <param name="entries">(key, value text after the key) pairs, e.g. ("critical_temperature", "369.89 K | source").</param>
    internal Fluid RunEntries(IEnumerable<(string Key, string Text)> entries)
    {
        int position = 0;
        foreach (var (key, text) in entries)
        {
            position++;
            if (key == KeyFormat)
            {
                throw Fail(position, key, "unknown key");
            }

            ReadEntry(position, key, text);
        }

        foreach (string required in RequiredKeys.Where(k => k != KeyFormat))
        {
            if (!_lineOfKey.ContainsKey(required))
            {
                throw Fail(0, required, "required value is missing");
            }
        }

        return Build();
    }

    /// <summary>Reads only the <c>name</c> and <c>synonyms</c> entries, with the same checks as a
    /// full read gives them, and stops as soon as it has both: the cheap pass that lets a catalog
    /// index its files without parsing them.</summary>
    /// <returns>The canonical name and the synonyms (empty when the file gives none).</returns>
    /// <exception cref="FluidDataException">The name is missing or malformed, or a synonym is.</exception>
    internal (string Name, IReadOnlyList<string> Synonyms) ScanNames(TextReader reader)
    {
        int lineNumber = 0;
        bool sawSynonyms = false;
        while (!(sawSynonyms && _text.ContainsKey(KeyName)) && NextEntry(reader, ref lineNumber) is { } trimmed)
        {
            SplitKey(trimmed, out string key, out string rest);
            if (key is KeyName or KeySynonyms)
            {
                ReadEntry(lineNumber, key, rest);
                sawSynonyms |= key == KeySynonyms;
            }
        }

        if (!_text.TryGetValue(KeyName, out string? name))
        {
            throw Fail(Math.Max(lineNumber, 1), KeyName, "required field is missing (end of file reached without it)");
        }

        CheckSynonymsDifferFromName(name);
        return (name, _synonyms.AsReadOnly());
    }

    /// <summary>The next line that holds an entry, trimmed (blank and comment lines skipped, a
    /// byte-order mark on line 1 removed), or null at the end of the text.</summary>
    private string? NextEntry(TextReader reader, ref int lineNumber)
    {
        while (true)
        {
            string? line;
            try
            {
                line = reader.ReadLine();
            }
            catch (DecoderFallbackException)
            {
                throw Fail(lineNumber + 1, null, "the text is not valid UTF-8");
            }

            if (line is null)
            {
                return null;
            }

            lineNumber++;
            if (lineNumber == 1 && line.Length > 0 && line[0] == '\uFEFF')
            {
                line = line[1..];
            }

            string trimmed = line.Trim();
            if (trimmed.Length != 0 && trimmed[0] != '#')
            {
                return trimmed;
            }
        }
    }

    private void CheckSynonymsDifferFromName(string name)
    {
        if (_synonyms.Any(s => FluidNames.Normalise(s) == FluidNames.Normalise(name)))
        {
            throw Fail(_lineOfKey[KeySynonyms], KeySynonyms,
                $"a synonym is the same as the name '{name}' once normalised");
        }
    }

    private static void SplitKey(string trimmed, out string key, out string rest)
    {
        int gap = 0;
        while (gap < trimmed.Length && !char.IsWhiteSpace(trimmed[gap]))
        {
            gap++;
        }

        key = trimmed[..gap];
        rest = trimmed[gap..].Trim();
    }

    private void ReadEntry(int line, string key, string rest)
    {
        if (Array.IndexOf(AllKeys, key) < 0)
        {
            string hint = ClosestKey(key) is { } near ? $"; did you mean '{near}'?" : "";
            throw Fail(line, key, $"unknown key{hint}");
        }

        if (_lineOfKey.TryGetValue(key, out int earlier))
        {
            throw Fail(line, key, $"duplicate key; it was already given on line {earlier}");
        }

        _lineOfKey[key] = line;
        if (rest.Length == 0)
        {
            throw Fail(line, key, "no value given");
        }

        if (QuantityOfKey.TryGetValue(key, out Quantity quantity))
        {
            _quantities[key] = ReadQuantity(line, key, quantity, rest);
            return;
        }

        switch (key)
        {
            case KeyFormat:
                ReadFormat(line, rest);
                break;
            case KeyName:
                if (rest != rest.ToLowerInvariant())
                {
                    throw Fail(line, key, $"the canonical name must be lower case ('{rest.ToLowerInvariant()}')");
                }

                RequireNameLike(line, key, rest);
                _text[key] = rest;
                break;
            case KeySynonyms:
                _synonyms = ReadSynonyms(line, rest);
                break;
            case KeyCas:
                CheckCasNumber(line, rest);
                _text[key] = rest;
                break;
            case KeyIdealGasCp:
                _idealGasCp = ReadIdealGasCp(line, rest);
                break;
            case KeyAlphaSoavePr or KeyAlphaSoaveSrk or KeyAlphaTwuPr or KeyAlphaTwuSrk or KeyAlphaMathiasCopemanPr or KeyAlphaMathiasCopemanSrk:
                _alphaParameters.Add(ReadAlphaParameters(line, key, rest));
                break;
            case KeyVapourPressureEquation:
                _vapourPressureEquation = ReadVapourPressureEquation(line, rest);
                break;
            case KeyMeltingPressureEquation:
                _meltingEquation = ReadSolidLineEquation(line, key, SolidLineKind.Melting, rest);
                break;
            case KeySublimationPressureEquation:
                _sublimationEquation = ReadSolidLineEquation(line, key, SolidLineKind.Sublimation, rest);
                break;
            case KeyHazardClass:
                _hazard = ReadHazardClass(line, rest);
                break;
            case KeyAlphaDefault:
                _preferredAlpha = ReadAlphaDefault(line, key, rest);
                break;
            case var sensitivity when sensitivity.EndsWith(SensitivitySuffix, StringComparison.Ordinal):
                _alphaSensitivities[key[..^SensitivitySuffix.Length]] = (line, ReadSensitivity(line, key, rest));
                break;
            case var covariance when covariance.EndsWith(CovarianceSuffix, StringComparison.Ordinal):
                _alphaCovariances[key[..^CovarianceSuffix.Length]] = (line, ReadCovariance(line, key, rest));
                break;
            default:
                _text[key] = rest;
                break;
        }
    }

    /// <summary>Reads <c>A3 | source</c> or <c>flammable toxic | source</c> (see <see cref="HazardClass"/>).</summary>
    private HazardClass ReadHazardClass(int line, string rest)
    {
        string source = ReadSource(line, KeyHazardClass, rest, out string body);
        return HazardClass.TryParse(body, source) ?? throw Fail(line, KeyHazardClass,
            $"'{body.Trim()}' is not a hazard class; write one ASHRAE Standard 34 safety group ({string.Join(", ", HazardClass.SafetyGroups)}) "
            + $"or one or more distinct words of: {string.Join(", ", HazardClass.TraitWords)}, then '| source'");
    }

    private void ReadFormat(int line, string rest)
    {
        string[] parts = rest.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (parts.Length != 2 || parts[0] != FluidFile.FormatTag)
        {
            throw Fail(line, KeyFormat,
                $"expected '{FluidFile.FormatTag} {FluidFile.FormatVersion}', found '{rest}'");
        }

        if (!int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int version))
        {
            throw Fail(line, KeyFormat, $"format version '{parts[1]}' is not a whole number");
        }

        if (version != FluidFile.FormatVersion)
        {
            throw Fail(line, KeyFormat,
                $"unsupported format version {version}; this library reads version {FluidFile.FormatVersion}");
        }
    }

    private void RequireNameLike(int line, string key, string value)
    {
        if (FluidNames.Normalise(value).Length == 0)
        {
            throw Fail(line, key, $"'{value}' has no letters or digits");
        }

        if (value.Contains(';') || value.Contains('|'))
        {
            throw Fail(line, key, $"'{value}' must not contain ';' or '|'");
        }

        // A name is echoed in every table title: a control character (NUL, a line break) or an
        // invisible format character (a bidirectional override such as U+202E) would corrupt or
        // reorder what the reader sees.
        int bad = value.ToList().FindIndex(c => char.IsControl(c) || System.Globalization.CharUnicodeInfo.GetUnicodeCategory(c) == System.Globalization.UnicodeCategory.Format);
        if (bad >= 0)
        {
            throw Fail(line, key, $"the name must not contain control or invisible format characters (U+{(int)value[bad]:X4} at position {bad + 1})");
        }
    }

    private List<string> ReadSynonyms(int line, string rest)
    {
        var list = new List<string>();
        var seen = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (string piece in rest.Split(';'))
        {
            string synonym = piece.Trim();
            if (synonym.Length == 0)
            {
                throw Fail(line, KeySynonyms, "empty synonym (two ';' in a row, or a ';' at an end)");
            }

            RequireNameLike(line, KeySynonyms, synonym);
            string normal = FluidNames.Normalise(synonym);
            if (seen.TryGetValue(normal, out string? other))
            {
                throw Fail(line, KeySynonyms, $"'{synonym}' and '{other}' are the same name once normalised");
            }

            seen[normal] = synonym;
            list.Add(synonym);
        }

        return list;
    }

    /// <summary>A CAS registry number is 2–7 digits, 2 digits and a check digit; the check
    /// digit is the sum of the other digits, weighted 1, 2, 3, … from the right, modulo 10.</summary>
    private void CheckCasNumber(int line, string value)
    {
        string[] parts = value.Split('-');
        bool shapeOk = parts.Length == 3
            && parts[0].Length is >= 2 and <= 7 && parts[1].Length == 2 && parts[2].Length == 1
            && parts.All(p => p.All(char.IsAsciiDigit));
        if (!shapeOk)
        {
            throw Fail(line, KeyCas, $"'{value}' is not of the form NNNNNNN-NN-N");
        }

        string digits = parts[0] + parts[1];
        int sum = 0;
        for (int i = 0; i < digits.Length; i++)
        {
            sum += (digits[digits.Length - 1 - i] - '0') * (i + 1);
        }

        int expected = sum % 10;
        if (parts[2][0] - '0' != expected)
        {
            throw Fail(line, KeyCas, $"'{value}' fails the check digit (expected {expected})");
        }
    }

    private RawQuantity ReadQuantity(int line, string key, Quantity quantity, string rest)
    {
        int bar = rest.IndexOf('|');
        if (bar < 0)
        {
            throw Fail(line, key, "missing source: write '| <published source>' after the value");
        }

        string source = rest[(bar + 1)..].Trim();
        if (source.Length == 0)
        {
            throw Fail(line, key, "missing source: the text after '|' is empty");
        }

        string valuePart = rest[..bar].Replace("±", " ± ", StringComparison.Ordinal)
            .Replace("+/-", " ± ", StringComparison.Ordinal);
        string[] tokens = valuePart.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length == 0)
        {
            throw Fail(line, key, "no value before '|'");
        }

        double number = ParseNumber(line, key, tokens[0], "value");
        int next = 1;
        string? unit = null;
        if (next < tokens.Length && tokens[next] != "±")
        {
            unit = tokens[next];
            next++;
        }

        double? uncertainty = null;
        if (next < tokens.Length && tokens[next] == "±")
        {
            if (next + 1 >= tokens.Length)
            {
                throw Fail(line, key, "'±' is not followed by an uncertainty");
            }

            uncertainty = ParseNumber(line, key, tokens[next + 1], "uncertainty");
            next += 2;
        }

        if (next < tokens.Length)
        {
            throw Fail(line, key,
                $"unexpected '{tokens[next]}'; expected 'value unit [± uncertainty] | source'");
        }

        CheckUnit(line, key, quantity, unit);
        if (uncertainty < 0)
        {
            throw Fail(line, key, $"negative uncertainty {Show(uncertainty.Value)}");
        }

        CheckRange(line, key, quantity, number);
        return new RawQuantity(line, number, unit, uncertainty, source);
    }

    private double ParseNumber(int line, string key, string token, string what)
    {
        if (!double.TryParse(token, NumberStyles.Float, CultureInfo.InvariantCulture, out double number)
            || !double.IsFinite(number))
        {
            throw Fail(line, key,
                $"malformed {what} '{token}'; write a number with a '.' decimal point, such as 369.89 or 4.2512e6");
        }

        return number;
    }

    private void CheckUnit(int line, string key, Quantity quantity, string? unit)
    {
        string[] allowed = quantity switch
        {
            Quantity.Temperature => FluidUnits.Allowed(Dimension.Temperature),
            Quantity.Pressure => FluidUnits.Allowed(Dimension.Pressure),
            Quantity.MolarMass => FluidUnits.Allowed(Dimension.MolarMass),
            Quantity.MolarDensity => FluidUnits.Allowed(Dimension.AmountDensity),
            Quantity.MolarVolume or Quantity.VolumeShift or Quantity.SignedMolarVolume => FluidUnits.Allowed(Dimension.MolarVolume),
            Quantity.MolarEnergy => FluidUnits.Allowed(Dimension.MolarEnergy),
            Quantity.HeatCapacity => FluidUnits.Allowed(Dimension.MolarEntropy),
            _ => [],
        };

        if (allowed.Length == 0)
        {
            if (unit is not null)
            {
                throw Fail(line, key, $"takes no unit, found '{unit}'");
            }

            return;
        }

        if (unit is null)
        {
            throw Fail(line, key, $"missing unit; allowed: {string.Join(", ", allowed)}");
        }

        if (Array.IndexOf(allowed, unit) < 0)
        {
            throw Fail(line, key, $"wrong unit '{unit}'; allowed: {string.Join(", ", allowed)}");
        }
    }

    /// <summary>Checks that need no other field. Unit factors are all positive, so signs can be
    /// checked before conversion.</summary>
    private void CheckRange(int line, string key, Quantity quantity, double number)
    {
        if (quantity == Quantity.Dimensionless)
        {
            if (number < AcentricFactorLowest || number > AcentricFactorHighest)
            {
                throw Fail(line, key,
                    $"unphysical value {Show(number)}; expected between {Show(AcentricFactorLowest)} and {Show(AcentricFactorHighest)}");
            }

            return;
        }

        if (quantity == Quantity.VolumeShift)
        {
            return; // a translation may have either sign; the model bounds it by its co-volume
        }

        if (quantity == Quantity.SignedMolarVolume)
        {
            if (number == 0)
            {
                throw Fail(line, key, "a volume change of zero gives no Clapeyron slope; give the measured value with its sign (negative where the solid is the less dense phase, as for water)");
            }

            return; // v_liquid − v_solid is negative for water, positive for most fluids
        }

        if (number <= 0)
        {
            throw Fail(line, key, $"unphysical value {Show(number)}; must be greater than zero");
        }
    }

    /// <summary>The volume translations given for the cubic models, c in m³/mol (not inverted,
    /// unlike a critical molar volume).</summary>
    private IReadOnlyList<FluidVolumeShift> VolumeShifts()
    {        var shifts = new List<FluidVolumeShift>();
        foreach (var (key, model) in new[] { (KeyVolumeShiftPr, CubicModelKind.PengRobinson), (KeyVolumeShiftSrk, CubicModelKind.SoaveRedlichKwong) })
        {
            if (_quantities.TryGetValue(key, out RawQuantity? raw))
            {
                Unit unit = FluidUnits.Get(raw.Unit!);
                shifts.Add(new FluidVolumeShift(model, new SourcedValue(unit.ToSi(raw.Number), raw.Source, raw.Uncertainty is double u ? unit.ToSi(u) : null)));
            }
        }

        return shifts.AsReadOnly();
    }

    private Fluid Build()
    {
        if (_quantities.ContainsKey(KeyCriticalDensity) && _quantities.ContainsKey(KeyCriticalMolarVolume))
        {
            throw Fail(_lineOfKey[KeyCriticalMolarVolume], KeyCriticalMolarVolume,
                $"give either '{KeyCriticalDensity}' (line {_lineOfKey[KeyCriticalDensity]}) or '{KeyCriticalMolarVolume}', not both");
        }

        // The molar mass is optional: without it everything on a molar basis works, and what
        // needs it (mass units, a critical density in kg/m3, the speed of sound) says so.
        SourcedValue? molarMass = ToSi(KeyMolarMass, molarMass: null);
        if (molarMass is not null && (molarMass.Value < FluidFile.MolarMassLowest || molarMass.Value > FluidFile.MolarMassHighest))
        {
            throw Fail(_lineOfKey[KeyMolarMass], KeyMolarMass,
                $"implausible value {Show(molarMass.Value * 1e3)} g/mol; expected between {Show(FluidFile.MolarMassLowest * 1e3)} and {Show(FluidFile.MolarMassHighest * 1e3)} g/mol");
        }

        double? m = molarMass?.Value;
        SourcedValue criticalTemperature = ToSi(KeyCriticalTemperature, m)!;
        SourcedValue criticalPressure = ToSi(KeyCriticalPressure, m)!;
        SourcedValue acentricFactor = ToSi(KeyAcentricFactor, m)!;
        SourcedValue? criticalDensity = ToSi(KeyCriticalDensity, m)
            ?? ToSi(KeyCriticalMolarVolume, m);
        SourcedValue? normalBoilingPoint = ToSi(KeyNormalBoilingPoint, m);
        SourcedValue? triplePoint = ToSi(KeyTriplePointTemperature, m);

        if (normalBoilingPoint is not null && criticalTemperature.Value <= normalBoilingPoint.Value)
        {
            throw Fail(_lineOfKey[KeyNormalBoilingPoint], KeyNormalBoilingPoint,
                $"{Show(normalBoilingPoint.Value)} K is not below the critical temperature {Show(criticalTemperature.Value)} K (line {_lineOfKey[KeyCriticalTemperature]})");
        }

        if (triplePoint is not null && triplePoint.Value >= criticalTemperature.Value)
        {
            throw Fail(_lineOfKey[KeyTriplePointTemperature], KeyTriplePointTemperature,
                $"{Show(triplePoint.Value)} K is not below the critical temperature {Show(criticalTemperature.Value)} K (line {_lineOfKey[KeyCriticalTemperature]})");
        }

        if (triplePoint is not null && normalBoilingPoint is not null && triplePoint.Value > normalBoilingPoint.Value)
        {
            throw Fail(_lineOfKey[KeyTriplePointTemperature], KeyTriplePointTemperature,
                $"{Show(triplePoint.Value)} K is above the normal boiling point {Show(normalBoilingPoint.Value)} K (line {_lineOfKey[KeyNormalBoilingPoint]})");
        }

        string name = _text[KeyName];
        CheckSynonymsDifferFromName(name);
        var solid = SolidData(m, triplePoint, criticalTemperature, criticalPressure);

        return new Fluid
        {
            Name = name,
            Synonyms = _synonyms.AsReadOnly(),
            Formula = _text.GetValueOrDefault(KeyFormula),
            CasNumber = _text.GetValueOrDefault(KeyCas),
            Family = _text.GetValueOrDefault(KeyFamily),
            MolarMass = molarMass,
            CriticalTemperature = criticalTemperature,
            CriticalPressure = criticalPressure,
            AcentricFactor = acentricFactor,
            CriticalDensity = criticalDensity,
            NormalBoilingPoint = normalBoilingPoint,
            TriplePointTemperature = triplePoint,
            TriplePointPressure = solid.TriplePointPressure,
            EnthalpyOfFusion = solid.EnthalpyOfFusion,
            SolidDensity = solid.SolidDensity,
            TriplePointLiquidDensity = solid.LiquidDensity,
            FusionVolumeChange = solid.FusionVolumeChange,
            SolidHeatCapacity = solid.SolidHeatCapacity,
            MeltingPressureEquation = _meltingEquation,
            SublimationPressureEquation = _sublimationEquation,
            IdealGasHeatCapacity = _idealGasCp,
            AlphaParameters = AlphaParametersWithCovariances(),
            PreferredAlpha = _preferredAlpha,
            VapourPressureEquation = _vapourPressureEquation,
            VolumeShifts = VolumeShifts(),
            Provenance = _text.GetValueOrDefault(KeyProvenance),
            Remarks = _text.GetValueOrDefault(KeyRemarks),
            Hazard = _hazard,
            Origin = _origin,
        };
    }

    /// <summary>The solid-phase data (triple-point pressure, fusion, the solid's density and heat
    /// capacity) with the checks that relate them to each other and to the critical point.</summary>
    private (SourcedValue? TriplePointPressure, SourcedValue? EnthalpyOfFusion, SourcedValue? SolidDensity, SourcedValue? LiquidDensity,
        SourcedValue? FusionVolumeChange, SourcedValue? SolidHeatCapacity) SolidData(
        double? molarMass, SourcedValue? triplePoint, SourcedValue criticalTemperature, SourcedValue criticalPressure)
    {
        SourcedValue? pressure = ToSi(KeyTriplePointPressure, molarMass);
        SourcedValue? fusion = ToSi(KeyEnthalpyOfFusion, molarMass);
        SourcedValue? solidDensity = ToSi(KeySolidDensity, molarMass);
        SourcedValue? liquidDensity = ToSi(KeyTriplePointLiquidDensity, molarMass);
        SourcedValue? volumeChange = ToSi(KeyFusionVolumeChange, molarMass);
        SourcedValue? heatCapacity = ToSi(KeySolidHeatCapacity, molarMass);

        foreach (string key in new[] { KeyTriplePointPressure, KeyEnthalpyOfFusion, KeySolidDensity, KeyTriplePointLiquidDensity, KeyFusionVolumeChange, KeySolidHeatCapacity, KeyMeltingPressureEquation, KeySublimationPressureEquation })
        {
            if (triplePoint is null && _lineOfKey.TryGetValue(key, out int line))
            {
                throw Fail(line, key, $"needs the triple point ('{KeyTriplePointTemperature}'), which is not given");
            }
        }

        if (pressure is not null && pressure.Value >= criticalPressure.Value)
        {
            throw Fail(_lineOfKey[KeyTriplePointPressure], KeyTriplePointPressure,
                $"{Show(pressure.Value)} Pa is not below the critical pressure {Show(criticalPressure.Value)} Pa (line {_lineOfKey[KeyCriticalPressure]})");
        }

        if ((solidDensity is null) != (liquidDensity is null))
        {
            string given = solidDensity is null ? KeyTriplePointLiquidDensity : KeySolidDensity;
            string missing = solidDensity is null ? KeySolidDensity : KeyTriplePointLiquidDensity;
            throw Fail(_lineOfKey[given], given, $"needs '{missing}' too: the volume change on melting is the difference of the two");
        }

        if (solidDensity is not null && volumeChange is not null)
        {
            throw Fail(_lineOfKey[KeyFusionVolumeChange], KeyFusionVolumeChange,
                $"give either '{KeyFusionVolumeChange}' or the two densities (line {_lineOfKey[KeySolidDensity]}), not both");
        }

        if (solidDensity is not null && liquidDensity is not null)
        {
            // Δv_fus = v_liquid − v_solid at the triple point, from the two molar densities.
            volumeChange = new SourcedValue(1 / liquidDensity.Value - 1 / solidDensity.Value,
                $"from {KeyTriplePointLiquidDensity} ({liquidDensity.Source}) and {KeySolidDensity} ({solidDensity.Source})");
        }

        foreach (var equation in new[] { _meltingEquation, _sublimationEquation })
        {
            if (equation is null)
            {
                continue;
            }

            string key = equation.Kind == SolidLineKind.Melting ? KeyMeltingPressureEquation : KeySublimationPressureEquation;
            if (equation.Kind == SolidLineKind.Sublimation && equation.HighestTemperature > triplePoint!.Value * (1 + 1e-9))
            {
                throw Fail(_lineOfKey[key], key, $"the range ends at {Show(equation.HighestTemperature)} K, above the triple point {Show(triplePoint.Value)} K: a solid sublimes only below it");
            }

            if (equation.HighestTemperature >= criticalTemperature.Value && equation.Kind == SolidLineKind.Sublimation)
            {
                throw Fail(_lineOfKey[key], key, "the range reaches the critical temperature");
            }
        }

        return (pressure, fusion, solidDensity, liquidDensity, volumeChange, heatCapacity);
    }

    /// <summary>Reads <c>reduce TR K PR UNIT form powers|excess terms a1^b1 … range T1-T2 K | source</c>:
    /// a published melting or sublimation equation (<see cref="SolidLineForm"/>) over its stated range.</summary>
    private SolidLineEquation ReadSolidLineEquation(int line, string key, SolidLineKind kind, string rest)
    {
        const string example = "reduce 273.16 K 611.657 Pa form powers terms 1195393.37^3 80818.3159^25.75 range 251.165-273.16 K | source";
        string source = ReadSource(line, key, rest, out string body);
        string[] tokens = body.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        int terms = Array.IndexOf(tokens, "terms");
        int range = Array.IndexOf(tokens, "range");
        if (tokens.Length < 12 || tokens[0] != "reduce" || tokens[5] != "form" || terms != 7 || range < 9 || range != tokens.Length - 3)
        {
            throw Fail(line, key, $"malformed equation; write {example}");
        }

        double tr = ReadKelvin(line, key, "reduce", [tokens[1], tokens[2]], example);
        double pr = ReadPressureWithUnit(line, key, tokens[3], tokens[4]);
        SolidLineForm form = tokens[6] switch
        {
            "powers" => SolidLineForm.Powers,
            "excess" => SolidLineForm.Excess,
            _ => throw Fail(line, key, $"unknown form '{tokens[6]}'; expected powers or excess (docs/fluid-files.md)"),
        };

        var coefficients = new List<double>();
        var exponents = new List<double>();
        foreach (string term in tokens[8..range])
        {
            int caret = term.IndexOf('^', StringComparison.Ordinal);
            if (caret <= 0 || !TryNumber(term[..caret], out double a) || !TryNumber(term[(caret + 1)..], out double b))
            {
                throw Fail(line, key, $"malformed term '{term}'; write a^b");
            }

            coefficients.Add(a);
            exponents.Add(b);
        }

        string[] ends = tokens[range + 1].Split('-');
        if (ends.Length != 2 || !TryNumber(ends[0], out double low) || !TryNumber(ends[1], out double high) || tokens[range + 2] != "K" || !(low > 0) || !(high > low))
        {
            throw Fail(line, key, $"malformed range '{string.Join(' ', tokens[(range + 1)..])}'; write range T1-T2 K with 0 < T1 < T2");
        }

        var equation = new SolidLineEquation(kind, form, tr, pr, coefficients, exponents, low, high, source);
        foreach (double t in new[] { low, high, 0.5 * (low + high) })
        {
            var (p, slope) = equation.Evaluate(t);
            if (!(p > 0) || !double.IsFinite(p) || !double.IsFinite(slope))
            {
                throw Fail(line, key, $"gives no positive finite pressure at {Show(t)} K inside its range (an excess form needs T on one side of the reference temperature)");
            }
        }

        return equation;
    }

    private double ReadPressureWithUnit(int line, string key, string number, string unitText)
    {
        if (!TryNumber(number, out double value) || !(value > 0))
        {
            throw Fail(line, key, $"'{number}' is not a positive pressure");
        }

        string[] allowed = FluidUnits.Allowed(Units.Dimension.Pressure);
        if (Array.IndexOf(allowed, unitText) < 0)
        {
            throw Fail(line, key, $"wrong pressure unit '{unitText}'; allowed: {string.Join(", ", allowed)}");
        }

        return FluidUnits.Get(unitText).ToSi(value);
    }

    /// <summary>Converts an entry to SI; null when the entry is absent.</summary>
    private SourcedValue? ToSi(string key, double? molarMass)
    {
        if (!_quantities.TryGetValue(key, out RawQuantity? raw))
        {
            return null;
        }

        if (raw.Unit is null)
        {
            return new SourcedValue(raw.Number, raw.Source, raw.Uncertainty);
        }

        Unit unit = FluidUnits.Get(raw.Unit);
        double value;
        double? uncertainty;
        switch (unit.Dimension)
        {
            case Dimension.MassDensity:
                // ρ[mol/m³] = ρ[kg/m³] / M[kg/mol]; the molar mass's own uncertainty is not propagated.
                double m = molarMass ?? throw Fail(raw.Line, key, $"unit '{raw.Unit}' needs the molar mass, which is not given ('{KeyMolarMass}')");
                value = unit.ToSi(raw.Number) / m;
                uncertainty = raw.Uncertainty is double um ? unit.ToSi(um) / m : null;
                break;
            case Dimension.SpecificEnergy or Dimension.SpecificEntropy:
                // Per kilogram → per mole: times the molar mass (its own uncertainty not propagated).
                double mass = molarMass ?? throw Fail(raw.Line, key, $"unit '{raw.Unit}' needs the molar mass, which is not given ('{KeyMolarMass}')");
                value = unit.ToSi(raw.Number) * mass;
                uncertainty = raw.Uncertainty is double ue ? unit.ToSi(ue) * mass : null;
                break;
            case Dimension.MolarVolume when QuantityOfKey[key] == Quantity.SignedMolarVolume:
                // A volume change stays a volume (m³/mol); it is not inverted like a critical molar volume.
                value = unit.ToSi(raw.Number);
                uncertainty = raw.Uncertainty is double uc ? unit.ToSi(uc) : null;
                break;
            case Dimension.MolarVolume:
                // Molar volume V → ρ = 1/V; first-order propagation u(ρ) = u(V)/V².
                double volume = unit.ToSi(raw.Number);
                value = 1.0 / volume;
                uncertainty = raw.Uncertainty is double uv ? unit.ToSi(uv) / (volume * volume) : null;
                break;
            default:
                // A pure factor (CheckUnit takes no offset scale here), so the uncertainty converts like the value.
                value = unit.ToSi(raw.Number);
                uncertainty = raw.Uncertainty is double us ? unit.ToSi(us) : null;
                break;
        }

        return new SourcedValue(value, raw.Source, uncertainty);
    }

    private static string? ClosestKey(string key)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (string candidate in AllKeys)
        {
            int distance = FluidNames.EditDistance(key.ToLowerInvariant(), candidate);
            if (distance < bestDistance)
            {
                bestDistance = distance;
                best = candidate;
            }
        }

        return bestDistance <= Math.Max(2, key.Length / 3) ? best : null;
    }

    private static string Show(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private FluidDataException Fail(int line, string? field, string problem) =>
        new(_origin, line, field, problem);
}
