using System.Globalization;

namespace PhaseSlope.Cli.Output;

/// <summary>Number formatting shared by every writer; always the invariant culture, never NaN or
/// infinity (see <see cref="FiniteNumbers"/>).</summary>
internal static class NumberText
{
    /// <summary>Shortest text that parses back to the same double (CSV).</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string RoundTrip(double value) => FiniteNumbers.Check(value, "a value").ToString("R", CultureInfo.InvariantCulture);

    /// <summary>Seven significant digits, for tables read by people.</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string Table(double value) => FiniteNumbers.Check(value, "a value").ToString("G7", CultureInfo.InvariantCulture);

    /// <summary><see cref="RoundTrip"/>, or an empty CSV cell where the value is undefined.</summary>
    public static string RoundTripOrEmpty(double? value) => FiniteNumbers.IsDefined(value) ? RoundTrip(value!.Value) : "";

    /// <summary><see cref="Table"/>, or "undefined" where the value is undefined.</summary>
    public static string TableOrUndefined(double? value) => FiniteNumbers.IsDefined(value) ? Table(value!.Value) : "undefined";
}
