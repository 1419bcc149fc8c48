using System.Globalization;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Cycles;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Cli.Commands;

/// <summary>The <c>--cycle</c> value of <c>plot</c>: a simple vapour-compression cycle as
/// <c>key=value</c> items separated by commas, such as
/// <c>evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=0.75</c>.</summary>
/// <remarks>evaporating and condensing (saturation temperatures, any temperature unit; a bare
/// number is K) are required; superheat and subcooling (temperature differences in K) default to
/// 0; efficiency (the compressor's isentropic efficiency, a fraction in (0, 1] or a percentage
/// such as 75 %) defaults to 1.</remarks>
internal static class CycleOption
{
    /// <summary>The option's name.</summary>
    public const string Name = "--cycle";

    /// <summary>The keys, in the order written in messages.</summary>
    public static readonly IReadOnlyList<string> Keys = ["evaporating", "condensing", "superheat", "subcooling", "efficiency"];

    /// <summary>Parses and checks the value (everything that needs no fluid).</summary>
    /// <exception cref="UsageException">Malformed item, unknown or repeated key, a missing
    /// required key, a bad value, or an impossible combination.</exception>
    public static VapourCompressionSpecification Parse(string text) => Parse(text, Name);

    /// <summary>Parses and checks the value, naming <paramref name="name"/> (an option or an
    /// argument) in messages.</summary>
    /// <exception cref="UsageException">As <see cref="Parse(string)"/>.</exception>
    public static VapourCompressionSpecification Parse(string text, string name)
    {
        var values = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (string item in text.Split(',', StringSplitOptions.TrimEntries))
        {
            int eq = item.IndexOf('=', StringComparison.Ordinal);
            string key = eq < 0 ? item : item[..eq].Trim().ToLowerInvariant();
            if (eq < 0 || !Keys.Contains(key))
            {
                throw new UsageException($"{name}: '{Input.DataFileException.OneLine(item)}' is not key=value with a key of {string.Join(", ", Keys)}");
            }

            if (!values.TryAdd(key, item[(eq + 1)..].Trim()))
            {
                throw new UsageException($"{name}: '{key}' is given twice");
            }
        }

        foreach (string required in Keys.Take(2))
        {
            if (!values.ContainsKey(required))
            {
                throw new UsageException($"{name}: '{required}' (a saturation temperature) is required, e.g. '{required}={(required == "evaporating" ? "-10" : "40")} degC'");
            }
        }

        double evaporating = QuantityParser.ParseTemperature(values["evaporating"], $"{name} evaporating");
        double condensing = QuantityParser.ParseTemperature(values["condensing"], $"{name} condensing");
        double superheat = values.TryGetValue("superheat", out string? sh) ? QuantityParser.ParseTemperatureDifference(sh, $"{name} superheat", allowZero: true) : 0;
        double subcooling = values.TryGetValue("subcooling", out string? sc) ? QuantityParser.ParseTemperatureDifference(sc, $"{name} subcooling", allowZero: true) : 0;
        double efficiency = values.TryGetValue("efficiency", out string? eff) ? Efficiency(eff, name) : 1;
        var specification = new VapourCompressionSpecification(evaporating, condensing, superheat, subcooling, efficiency);
        try
        {
            specification.Validate();
        }
        catch (InvalidInputException ex)
        {
            throw new UsageException($"{name}: {ex.Message}");
        }

        return specification;
    }

    private static double Efficiency(string text, string name)
    {
        string t = text.Trim();
        bool percent = t.EndsWith('%');
        string number = percent ? t[..^1].Trim() : t;
        return double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) && double.IsFinite(value)
            ? (percent ? value / 100 : value)
            : throw new UsageException($"{name} efficiency: expected a fraction such as 0.75 or a percentage such as 75 %, got '{Input.DataFileException.OneLine(text)}'");
    }
}
