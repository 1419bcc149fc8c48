using System.Globalization;
using Xunit.Sdk;

namespace PhaseSlope.Core.Tests.TestSupport;

/// <summary>Tolerance assertions for floating-point results. A failure names the quantity and
/// shows the expected and actual values (round-trip precision) and their relative difference,
/// so a failing numerical test says by how much it missed.</summary>
internal static class AssertClose
{
    /// <summary>Passes when |actual − expected| ≤ tolerance·|expected|. NaN never passes.</summary>
    public static void Relative(double expected, double actual, double tolerance, string what)
    {
        double difference = Math.Abs(actual - expected);
        if (!(difference <= tolerance * Math.Abs(expected)))
        {
            throw new XunitException(
                $"{what}: expected {Show(expected)}, actual {Show(actual)}, relative difference {Show(RelativeDifference(expected, actual))} exceeds {Show(tolerance)}");
        }
    }

    /// <summary>Passes when |actual − expected| ≤ tolerance (in the unit of the values). NaN never passes.</summary>
    public static void Absolute(double expected, double actual, double tolerance, string what)
    {
        double difference = Math.Abs(actual - expected);
        if (!(difference <= tolerance))
        {
            throw new XunitException(
                $"{what}: expected {Show(expected)}, actual {Show(actual)}, difference {Show(difference)} exceeds {Show(tolerance)} (relative difference {Show(RelativeDifference(expected, actual))})");
        }
    }

    /// <summary>Passes when <paramref name="actual"/> lies in [low, high]. NaN never passes.</summary>
    public static void InRange(double low, double high, double actual, string what)
    {
        if (!(actual >= low && actual <= high))
        {
            throw new XunitException($"{what}: actual {Show(actual)} is outside [{Show(low)}, {Show(high)}]");
        }
    }

    /// <summary>|actual − expected|/|expected|; +∞ when expected is 0 and actual is not.</summary>
    public static double RelativeDifference(double expected, double actual)
    {
        double difference = Math.Abs(actual - expected);
        return difference == 0 ? 0 : difference / Math.Abs(expected);
    }

    private static string Show(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
