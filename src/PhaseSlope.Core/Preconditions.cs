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

    /// <summary>Formats a number the same way in every message (round-trip, invariant culture).</summary>
    public static string Format(double value) => value.ToString("G7", System.Globalization.CultureInfo.InvariantCulture);
}
