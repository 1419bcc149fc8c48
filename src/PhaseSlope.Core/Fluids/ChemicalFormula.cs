using System.Globalization;
using System.Text.RegularExpressions;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Fluids;

/// <summary>Molar mass from a simple chemical formula such as <c>C7H8</c> or <c>CH2F2</c>.</summary>
/// <remarks>Standard atomic weights of IUPAC 2005 (Wieser, Pure Appl. Chem. 78, 2051 (2006);
/// from memory), the values the catalog's molar masses were computed with. Formulas are element
/// symbols with optional counts; no brackets, charges or hydrates.</remarks>
public static partial class ChemicalFormula
{
    private static readonly Dictionary<string, double> AtomicWeights = new(StringComparer.Ordinal)
    {
        ["H"] = 1.00794, ["He"] = 4.002602, ["C"] = 12.0107, ["N"] = 14.0067, ["O"] = 15.9994,
        ["F"] = 18.9984032, ["Ne"] = 20.1797, ["S"] = 32.065, ["Cl"] = 35.453, ["Ar"] = 39.948,
        ["Br"] = 79.904, ["Kr"] = 83.798, ["I"] = 126.90447, ["Xe"] = 131.293,
    };

    [GeneratedRegex("([A-Z][a-z]?)([0-9]*)", RegexOptions.CultureInvariant)]
    private static partial Regex Element();

    /// <summary>The molar mass in kg/mol.</summary>
    /// <exception cref="InvalidInputException">An empty formula, an unknown element, or text that is not a formula.</exception>
    public static double MolarMass(string formula)
    {
        ArgumentNullException.ThrowIfNull(formula);
        double grams = 0;
        int consumed = 0;
        foreach (Match m in Element().Matches(formula))
        {
            if (m.Index != consumed)
            {
                break;
            }

            consumed += m.Length;
            if (!AtomicWeights.TryGetValue(m.Groups[1].Value, out double weight))
            {
                throw new InvalidInputException("formula", double.NaN, $"formula '{formula}': unknown element '{m.Groups[1].Value}'");
            }

            int count = m.Groups[2].Value.Length == 0 ? 1 : int.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture);
            grams += weight * count;
        }

        if (consumed != formula.Length || consumed == 0)
        {
            throw new InvalidInputException("formula", double.NaN, $"'{formula}' is not a formula of element symbols and counts (such as C7H8)");
        }

        return grams / 1000.0;
    }
}
