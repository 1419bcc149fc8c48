using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Units;

/// <summary>Comma-separated lists and ranges of quantities on the command line, such as
/// <c>"-20,0,20,40 degC"</c>, <c>"1,2,5,10 bar"</c> or <c>"100,450 kJ/kg"</c>.</summary>
/// <remarks>Each item is a number with an optional unit, read as <see cref="QuantityParser"/>
/// reads one value; an item without a unit takes the unit of the last item, so a unit written
/// once at the end applies to the whole list (<c>"1, 2, 500 kPa"</c> is 1, 2 and 500 kPa). Bare
/// numbers throughout are in SI (K, Pa, J/mol, J/(mol·K), mol/m³).</remarks>
internal static class QuantityList
{
    /// <summary>The items of a list, each with its unit written out.</summary>
    /// <exception cref="UsageException">An empty item, or more than <paramref name="most"/> items.</exception>
    public static IReadOnlyList<string> Items(string text, string optionName, int most)
    {
        string[] parts = text.Split(',', StringSplitOptions.TrimEntries);
        if (parts.Any(p => p.Length == 0))
        {
            throw new UsageException($"{optionName}: an empty value in the comma-separated list '{Clean(text)}'");
        }

        if (parts.Length > most)
        {
            throw new UsageException($"{optionName}: at most {most} values, got {parts.Length}");
        }

        QuantityText.TrySplit(parts[^1], out _, out string unit);
        return [.. parts.Select(p => unit.Length > 0 && QuantityText.TrySplit(p, out string number, out string own) && own.Length == 0 ? $"{number} {unit}" : p)];
    }

    /// <summary>A range "LOW,HIGH UNIT": exactly two items, each parsed by <paramref name="parse"/>, low below high.</summary>
    /// <exception cref="UsageException">Not two items, a bad item, or low not below high.</exception>
    public static (double Low, double High) Range(string text, string optionName, Func<string, string, double> parse)
    {
        var items = Items(text, optionName, int.MaxValue);
        if (items.Count != 2)
        {
            throw new UsageException($"{optionName}: give the low and the high end separated by a comma, such as '-40,100 degC', got '{Clean(text)}'");
        }

        double low = parse(items[0], optionName), high = parse(items[1], optionName);
        if (!(low < high))
        {
            throw new UsageException($"{optionName}: the low end '{Clean(items[0])}' must be below the high end '{Clean(items[1])}'");
        }

        return (low, high);
    }

    /// <summary>An energy per amount (enthalpy) or an entropy: a value of either sign, molar or
    /// per mass; the unit is kept so that a mass value can be converted once the fluid's molar
    /// mass is known.</summary>
    /// <exception cref="UsageException">Malformed, unknown unit, not finite.</exception>
    public static ParsedQuantity Parse(string text, string optionName, string quantity, Dimension molar, Dimension perMass)
        => QuantityParser.ParseQuantity(text, optionName, quantity, molar, perMass);

    /// <summary>The molar value of a parsed energy or entropy (J/mol or J/(mol·K)).</summary>
    public static double Molar(ParsedQuantity parsed, Dimension perMass, Func<double> molarMass)
        => parsed.Unit.Dimension == perMass ? parsed.Value * molarMass() : parsed.Value;

    private static string Clean(string text) => Input.DataFileException.OneLine(text);
}
