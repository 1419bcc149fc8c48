using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core;

/// <summary>Argument checks at the public boundary; the messages live here, in one place.</summary>
internal static class Preconditions
{
    /// <summary>Rejects values that are not finite and strictly positive (NaN included).</summary>
    public static void Positive(double value, string field)
    {
        if (!(value > 0) || double.IsInfinity(value))
        {
            throw new InvalidInputException(field, value, $"{field} must be a finite positive number, got {Format(value)}");
        }
    }

    /// <summary>Rejects values that are not finite (NaN, ±∞).</summary>
    public static void Finite(double value, string field)
    {
        if (!double.IsFinite(value))
        {
            throw new InvalidInputException(field, value, $"{field} must be a finite number, got {Format(value)}");
        }
    }

    /// <summary>Formats two numbers that a message compares ("x is below the limit y") with
    /// the fewest significant digits, from 7 up to round-trip, that show them different, so a
    /// message never reads "273.16 K is below 273.16 K".</summary>
    public static (string First, string Second) Apart(double first, double second)
    {
        for (int digits = 7; digits <= 17; digits++)
        {
            string format = "G" + digits.ToString(System.Globalization.CultureInfo.InvariantCulture);
            string a = first.ToString(format, System.Globalization.CultureInfo.InvariantCulture);
            string b = second.ToString(format, System.Globalization.CultureInfo.InvariantCulture);
            if (a != b || digits == 17)
            {
                return (a, b);
            }
        }

        return (Format(first), Format(second));
    }

    /// <summary>Formats a number the same way in every message (round-trip, invariant culture).</summary>
    public static string Format(double value) => value.ToString("G7", System.Globalization.CultureInfo.InvariantCulture);
}
