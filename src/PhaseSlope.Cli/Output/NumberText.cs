using System.Globalization;

namespace PhaseSlope.Cli.Output;

/// <summary>Number formatting shared by every writer; always the invariant culture, never NaN or
/// infinity (see <see cref="FiniteNumbers"/>).</summary>
/// <remarks>
/// <para>CSV and JSON carry round-trip numbers (<see cref="RoundTrip"/>): parsing the text gives
/// back the double computed. Tables are for people: values with <see cref="Digits"/> significant
/// digits, standard uncertainties and standard errors with <see cref="UncertaintyDigits"/>, so the
/// binary noise of a double (273.15000000000003) never shows, and a negative zero prints as 0.</para>
/// <para>A quantity whose zero is a cancellation (an enthalpy at its reference state, the latent
/// heat at the critical point) can come out as round-off, -1.9e-14 J/mol where the column holds
/// thousands. <see cref="Table(double, double)"/> prints 0 for a value below
/// <see cref="ZeroTolerance"/> times the scale it is read against (its column's largest
/// magnitude): round-off of sums of terms of that size is a few 1e-16 of it, and the value is far
/// below the 1e-5 of the scale that the largest entry shows at six digits, so nothing a reader
/// could see is lost. Positive quantities (T, P, densities) are never cancellations and are
/// printed whatever their size, so a vapour pressure eleven decades below the critical one is
/// shown as computed.</para>
/// </remarks>
internal static class NumberText
{
    /// <summary>Significant digits of a value in a table.</summary>
    public const int Digits = 6;

    /// <summary>Significant digits of an uncertainty or standard error in a table (two, as the
    /// GUM, JCGM 100:2008 section 7.2.6, recommends at most).</summary>
    public const int UncertaintyDigits = 2;

    /// <summary>Significant digits of a given value (<see cref="Given"/>): more than any data
    /// file in the catalog carries, far fewer than the 15 a double holds exactly.</summary>
    public const int GivenDigits = 10;

    /// <summary>Below this fraction of its column's scale a cancellation prints as 0 (see the remarks).</summary>
    public const double ZeroTolerance = 1e-9;

    /// <summary>Shortest text that parses back to the same double (CSV, JSON).</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string RoundTrip(double value) => FiniteNumbers.Check(value, "a value").ToString("R", CultureInfo.InvariantCulture);

    /// <summary><see cref="Digits"/> significant digits, for tables read by people.</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string Table(double value) => Significant(value, Digits);

    /// <summary>A value the user or a data file gave (a catalog constant), with up to
    /// <see cref="GivenDigits"/> significant digits: the digits as written (44.09562 g/mol), where
    /// <see cref="Table(double)"/> would drop the seventh; binary noise, at the sixteenth digit,
    /// never shows.</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string Given(double value) => Significant(value, GivenDigits);

    /// <summary>As <see cref="Table(double)"/>, but 0 for a value below <see cref="ZeroTolerance"/>
    /// times <paramref name="scale"/> (the largest magnitude of its column; 0 for no such rule).</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string Table(double value, double scale)
        => Math.Abs(FiniteNumbers.Check(value, "a value")) < ZeroTolerance * scale ? "0" : Table(value);

    /// <summary>The scale of a column: its largest magnitude among finite values (0 when none).</summary>
    public static double Scale(IEnumerable<double> values) => values.Where(double.IsFinite).Select(Math.Abs).DefaultIfEmpty(0).Max();

    /// <summary>An uncertainty or standard error with <see cref="UncertaintyDigits"/> significant
    /// digits, without an exponent from 1e-4 up to 1e6 (1200, not 1.2E+03; 3.0, not 3).</summary>
    /// <exception cref="NonFiniteResultException">The value is not finite.</exception>
    public static string Uncertainty(double value)
    {
        double v = FiniteNumbers.Check(value, "an uncertainty");
        if (v == 0)
        {
            return "0";
        }

        // Rounded to two digits first, so 99.6 is 100 (three figures, no exponent), not 1E+02.
        double rounded = double.Parse(v.ToString("G" + UncertaintyDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        // Fixed notation from 1e-4 up to 1e6 keeps a significant trailing zero (3.0, 0.050).
        int exponent = (int)Math.Floor(Math.Log10(Math.Abs(rounded)));
        // Outside it, exponent form with the same two digits kept (5.0E+06, not 5E+06).
        return exponent >= -4 && exponent < 6
            ? rounded.ToString("F" + Math.Max(0, UncertaintyDigits - 1 - exponent).ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture)
            : rounded.ToString("0." + new string('0', UncertaintyDigits - 1) + "E+00", CultureInfo.InvariantCulture);
    }

    /// <summary><see cref="RoundTrip"/>, or an empty CSV cell where the value is undefined.</summary>
    public static string RoundTripOrEmpty(double? value) => FiniteNumbers.IsDefined(value) ? RoundTrip(value!.Value) : "";

    /// <summary><see cref="Table(double)"/>, or "undefined" where the value is undefined.</summary>
    public static string TableOrUndefined(double? value) => FiniteNumbers.IsDefined(value) ? Table(value!.Value) : "undefined";

    /// <summary><see cref="Uncertainty"/>, or "undefined" where the value is undefined.</summary>
    public static string UncertaintyOrUndefined(double? value) => FiniteNumbers.IsDefined(value) ? Uncertainty(value!.Value) : "undefined";

    /// <summary>General format with <paramref name="digits"/> significant digits (trailing zeros
    /// dropped); + 0.0 turns a negative zero into 0.</summary>
    private static string Significant(double value, int digits)
    {
        string text = (FiniteNumbers.Check(value, "a value") + 0.0).ToString("G" + digits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return text == "-0" ? "0" : text;
    }
}
