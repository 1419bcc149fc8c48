using System.Globalization;

namespace PhaseSlope.Cli.Output;

/// <summary>Number formatting shared by every writer; always the invariant culture.</summary>
internal static class NumberText
{
    /// <summary>Shortest text that parses back to the same double (CSV).</summary>
    public static string RoundTrip(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Seven significant digits, for tables read by people.</summary>
    public static string Table(double value) => value.ToString("G7", CultureInfo.InvariantCulture);
}
