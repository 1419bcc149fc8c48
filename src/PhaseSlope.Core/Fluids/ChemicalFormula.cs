using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Fluids;

/// <summary>Simple chemical formulas such as <c>C7H8</c> or <c>CH3CH2OH</c>: their element counts,
/// molar mass and the Hill-order spelling.</summary>
/// <remarks>Standard atomic weights of IUPAC 2005 (Wieser, Pure Appl. Chem. 78, 2051 (2006);
/// from memory), the values the catalog's molar masses were computed with. Formulas are element
/// symbols with optional counts; an element may appear more than once (its counts are added); no
/// brackets, charges or hydrates.</remarks>
public static partial class ChemicalFormula
{
    private static readonly Dictionary<string, double> AtomicWeights = new(StringComparer.Ordinal)
    {
        ["H"] = 1.00794, ["He"] = 4.002602, ["C"] = 12.0107, ["N"] = 14.0067, ["O"] = 15.9994,
        ["F"] = 18.9984032, ["Ne"] = 20.1797, ["S"] = 32.065, ["Cl"] = 35.453, ["Ar"] = 39.948,
        ["Br"] = 79.904, ["Kr"] = 83.798, ["I"] = 126.90447, ["Xe"] = 131.293,
    };

    /// <summary>Largest count of one element in a formula (far above any fluid this tool models;
    /// it keeps the sums and the molar mass finite).</summary>
    public const int MaximumCount = 100_000;

    [GeneratedRegex("([A-Z][a-z]?)([0-9]*)", RegexOptions.CultureInvariant)]
    private static partial Regex Element();

    /// <summary>The molar mass in kg/mol.</summary>
    /// <exception cref="InvalidInputException">An empty formula, an unknown element, or text that is not a formula.</exception>
    public static double MolarMass(string formula) => MolarMass(Parse(formula));

    /// <summary>The molar mass in kg/mol of the given element counts.</summary>
    /// <exception cref="InvalidInputException">An element without a standard atomic weight here, or a count below 1.</exception>
    public static double MolarMass(IReadOnlyDictionary<string, int> counts)
    {
        ArgumentNullException.ThrowIfNull(counts);
        double grams = 0;
        foreach (var (element, count) in counts)
        {
            if (!AtomicWeights.TryGetValue(element, out double weight))
            {
                throw new InvalidInputException("formula", double.NaN, $"unknown element '{element}'");
            }

            if (count < 1)
            {
                throw new InvalidInputException("formula", count, $"element {element} has count {count}; counts must be at least 1");
            }

            grams += weight * count;
        }

        return grams / 1000.0;
    }

    /// <summary>The element counts of a formula, each element once (repeated symbols added up).</summary>
    /// <exception cref="InvalidInputException">An empty formula, an unknown element, a count of 0
    /// or above <see cref="MaximumCount"/>, or text that is not a formula.</exception>
    public static IReadOnlyDictionary<string, int> Parse(string formula)
    {
        ArgumentNullException.ThrowIfNull(formula);
        var counts = new SortedDictionary<string, int>(StringComparer.Ordinal);
        int consumed = 0;
        foreach (Match m in Element().Matches(formula))
        {
            if (m.Index != consumed)
            {
                break;
            }

            consumed += m.Length;
            string element = m.Groups[1].Value;
            if (!AtomicWeights.ContainsKey(element))
            {
                throw new InvalidInputException("formula", double.NaN, $"formula '{formula}': unknown element '{element}'");
            }

            string digits = m.Groups[2].Value;
            int count = 1;
            if (digits.Length > 0 && (!int.TryParse(digits, NumberStyles.None, CultureInfo.InvariantCulture, out count) || count < 1 || count > MaximumCount))
            {
                throw new InvalidInputException("formula", double.NaN, $"formula '{formula}': the count '{digits}' of {element} is not between 1 and {MaximumCount}");
            }

            counts[element] = counts.GetValueOrDefault(element) + count;
            if (counts[element] > MaximumCount)
            {
                throw new InvalidInputException("formula", double.NaN, $"formula '{formula}': more than {MaximumCount} atoms of {element}");
            }
        }

        if (consumed != formula.Length || consumed == 0)
        {
            throw new InvalidInputException("formula", double.NaN, $"'{formula}' is not a formula of element symbols and counts (such as C7H8)");
        }

        return counts;
    }

    /// <summary>The formula in Hill order: C first, then H, then the other elements alphabetically;
    /// without carbon, all elements alphabetically (Hill, J. Am. Chem. Soc. 22, 478 (1900)). A
    /// count of 1 is not written.</summary>
    public static string Hill(IReadOnlyDictionary<string, int> counts)
    {
        ArgumentNullException.ThrowIfNull(counts);
        var order = counts.ContainsKey("C")
            ? counts.Keys.OrderBy(e => e switch { "C" => 0, "H" => 1, _ => 2 }).ThenBy(e => e, StringComparer.Ordinal)
            : counts.Keys.OrderBy(e => e, StringComparer.Ordinal);
        var text = new StringBuilder();
        foreach (string element in order)
        {
            text.Append(element);
            if (counts[element] != 1)
            {
                text.Append(counts[element].ToString(CultureInfo.InvariantCulture));
            }
        }

        return text.ToString();
    }

    /// <summary>The elements whose counts differ between two compositions, as text such as
    /// "C 3 vs 4, H 8 vs 10" (first count from <paramref name="first"/>), or null when they agree.</summary>
    public static string? Difference(IReadOnlyDictionary<string, int> first, IReadOnlyDictionary<string, int> second)
    {
        ArgumentNullException.ThrowIfNull(first);
        ArgumentNullException.ThrowIfNull(second);
        var elements = first.Keys.Union(second.Keys).OrderBy(e => e switch { "C" => 0, "H" => 1, _ => 2 }).ThenBy(e => e, StringComparer.Ordinal);
        var parts = elements
            .Where(e => first.GetValueOrDefault(e) != second.GetValueOrDefault(e))
            .Select(e => $"{e} {first.GetValueOrDefault(e).ToString(CultureInfo.InvariantCulture)} vs {second.GetValueOrDefault(e).ToString(CultureInfo.InvariantCulture)}")
            .ToList();
        return parts.Count == 0 ? null : string.Join(", ", parts);
    }
}
