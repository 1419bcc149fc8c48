using System.Globalization;
using System.Text.RegularExpressions;

namespace PhaseSlope.Core.Units;

/// <summary>A value read from text: the value in the SI unit of its unit's dimension, and the
/// unit it was written in.</summary>
/// <param name="Value">The value in the SI unit of <see cref="Unit"/>'s dimension.</param>
/// <param name="Unit">The unit written, or the SI unit for a bare number.</param>
public readonly record struct ParsedQuantity(double Value, Unit Unit);

/// <summary>Reads text such as <c>300 K</c>, <c>40.70degC</c>, <c>1.2e5</c> or <c>2 MPa</c>
/// into an SI value through the <see cref="UnitTable"/>.</summary>
/// <remarks>
/// <para>The number is read with the invariant culture (a dot is the decimal separator, an
/// exponent is allowed, a comma, NaN and infinity are refused), then, where decimal holds it,
/// converted in decimal arithmetic and rounded to a double once: <c>40.70 degC</c> gives the
/// double nearest to 313.85, the same as a data file or a fluid file would. Numbers outside
/// decimal's range are converted in double arithmetic. A bare number is in the SI unit of the
/// first accepted dimension. Units are matched case-sensitively (<see cref="UnitTable"/>).</para>
/// </remarks>
public static partial class QuantityText
{
    /// <summary>A leading number in invariant form: optional sign, digits with an optional dot
    /// fraction (or a bare fraction), optional exponent. The rest of the text is the unit.</summary>
    [GeneratedRegex(@"^(?<num>[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)(?<rest>.*)$",
        RegexOptions.CultureInvariant | RegexOptions.Singleline)]
    private static partial Regex LeadingNumber();

    /// <summary>Reads a value with an optional unit.</summary>
    /// <param name="text">The text, e.g. <c>26.85 degC</c>; the typographic minus (U+2212) is
    /// read as a minus.</param>
    /// <param name="quantity">The quantity's name for messages (e.g. "pressure").</param>
    /// <param name="dimensions">The accepted dimensions; the first one gives the unit of a bare
    /// number.</param>
    /// <param name="parsed">The value and unit, when the text is valid.</param>
    /// <param name="problem">What is wrong, when it is not (e.g. "unknown pressure unit 'mpa'").</param>
    /// <param name="hint">A hint to follow the problem (e.g. "; did you mean MPa or mPa?" or
    /// "(use …)"), or null.</param>
    /// <returns>Whether the text is a finite number with an accepted unit.</returns>
    public static bool TryParse(string? text, string quantity, Dimension[] dimensions,
        out ParsedQuantity parsed, out string problem, out string? hint)
    {
        ArgumentNullException.ThrowIfNull(dimensions);
        if (dimensions.Length == 0)
        {
            throw new ArgumentException("at least one dimension is needed", nameof(dimensions));
        }

        parsed = default;
        hint = null;
        if (string.IsNullOrWhiteSpace(text))
        {
            problem = $"no {quantity} given";
            hint = "(give a number with an optional unit)";
            return false;
        }

        string trimmed = text.Trim().Replace('\u2212', '-');
        Match match = LeadingNumber().Match(trimmed);
        if (!match.Success)
        {
            string unsigned = trimmed.TrimStart('+', '-');
            bool nonFinite = unsigned.StartsWith("nan", StringComparison.OrdinalIgnoreCase)
                || unsigned.StartsWith("inf", StringComparison.OrdinalIgnoreCase)
                || unsigned.StartsWith('\u221E');
            (problem, hint) = nonFinite
                ? ("NaN and infinity are not accepted", "(give a finite number)")
                : ($"expected {("aeiou".Contains(quantity[0], StringComparison.Ordinal) ? "an" : "a")} {quantity} starting with a number", "(use a dot as the decimal separator, e.g. '1.5')");
            return false;
        }

        string rest = match.Groups["rest"].Value.TrimStart();
        if (rest.StartsWith(','))
        {
            (problem, hint) = ("comma in number", "(use a dot as the decimal separator and no digit grouping, e.g. '1.5')");
            return false;
        }

        if (rest.Length > 0 && (char.IsAsciiDigit(rest[0]) || rest[0] == '.' || rest[0] == '+' || rest[0] == '-'))
        {
            (problem, hint) = ("malformed number", "(give one number, with a dot as the decimal separator, then an optional unit)");
            return false;
        }

        string numberText = match.Groups["num"].Value;
        double number = double.Parse(numberText, NumberStyles.Float, CultureInfo.InvariantCulture);
        if (!double.IsFinite(number))
        {
            (problem, hint) = ("number is too large", "(give a finite number)");
            return false;
        }

        string spelling = rest.TrimEnd();
        Unit unit;
        if (spelling.Length == 0)
        {
            unit = UnitTable.Si(dimensions[0]);
        }
        else if (dimensions.Contains(Dimension.Pressure) && UnitTable.IsGauge(spelling))
        {
            problem = $"gauge pressures are not accepted ('{spelling}')";
            hint = "(give an absolute pressure, e.g. in Pa, kPa, MPa, bar, psia or atm)";
            return false;
        }
        else if (!UnitTable.TryFind(spelling, out Unit? found, dimensions))
        {
            IReadOnlyList<string> near = UnitTable.NearMatches(spelling, dimensions);
            problem = $"unknown {quantity} unit '{spelling}'";
            hint = near.Count > 0
                ? $"; did you mean {UnitTable.JoinOr(near)}?"
                : $"(use {UnitTable.JoinOr([.. UnitTable.Of(dimensions).Select(u => u.Symbol)])})";
            return false;
        }
        else
        {
            unit = found!;
        }

        parsed = new ParsedQuantity(Convert(numberText, number, unit), unit);
        problem = string.Empty;
        return true;
    }

    /// <summary>Splits text such as <c>369.89K</c> or <c>4.2512 MPa</c> into its leading number,
    /// as written, and the rest (the unit spelling, trimmed; empty for a bare number).</summary>
    /// <param name="text">The text; the typographic minus (U+2212) is read as a minus.</param>
    /// <param name="number">The number text (invariant form), when the text starts with one.</param>
    /// <param name="unit">The rest of the text, trimmed.</param>
    /// <returns>Whether the text starts with a number.</returns>
    public static bool TrySplit(string text, out string number, out string unit)
    {
        ArgumentNullException.ThrowIfNull(text);
        Match match = LeadingNumber().Match(text.Trim().Replace('\u2212', '-'));
        number = match.Success ? match.Groups["num"].Value : "";
        unit = match.Success ? match.Groups["rest"].Value.Trim() : "";
        return match.Success;
    }

    /// <summary>Converts a number, given as its text and its double reading, to the SI unit:
    /// in decimal where the text fits a decimal, in double otherwise.</summary>
    /// <param name="numberText">The number as written (invariant culture).</param>
    /// <param name="number">Its double reading.</param>
    /// <param name="unit">The unit it is written in.</param>
    /// <returns>The SI value; infinite when it overflows a double.</returns>
    public static double Convert(string numberText, double number, Unit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        if (Unit.ExactDecimal(numberText.Trim(), number) is decimal exact && unit.ToSi(exact) is double si)
        {
            return si;
        }

        return unit.ToSi(number);
    }
}
