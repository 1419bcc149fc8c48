using System.Text.Json;

namespace PhaseSlope.Cli.Output;

/// <summary>The one guard that keeps NaN and infinity out of every table, CSV and JSON output.</summary>
/// <remarks>A value that a writer must show (a temperature, a fitted parameter) goes through
/// <see cref="Check"/>: if it is not finite the result has overflowed, and the command fails with
/// <see cref="NonFiniteResultException"/> (exit 4) before anything is written. A value that may
/// legitimately be undefined (cp at the critical point, the standard errors of a fit whose
/// covariance is singular) is written as JSON <c>null</c>, an empty CSV cell or "undefined" in a
/// table, and the writer states why beside it.</remarks>
internal static class FiniteNumbers
{
    /// <summary><paramref name="value"/> when it is finite.</summary>
    /// <exception cref="NonFiniteResultException">It is NaN or infinite; the message names
    /// <paramref name="what"/>.</exception>
    public static double Check(double value, string what)
        => double.IsFinite(value) ? value : throw new NonFiniteResultException(what, value);

    /// <summary>Whether a value is present and finite.</summary>
    public static bool IsDefined(double? value) => value is double v && double.IsFinite(v);

    /// <summary>Writes a member that must be finite (see <see cref="Check"/>).</summary>
    public static void WriteFinite(this Utf8JsonWriter json, string key, double value) => json.WriteNumber(key, Check(value, key));

    /// <summary>Writes an array element that must be finite; <paramref name="what"/> names it in the error.</summary>
    public static void WriteFiniteValue(this Utf8JsonWriter json, double value, string what) => json.WriteNumberValue(Check(value, what));

    /// <summary>Writes a square matrix as an array of rows, every element finite.</summary>
    public static void WriteFiniteMatrix(this Utf8JsonWriter json, string key, double[,] matrix)
    {
        json.WriteStartArray(key);
        for (int i = 0; i < matrix.GetLength(0); i++)
        {
            json.WriteStartArray();
            for (int j = 0; j < matrix.GetLength(1); j++)
            {
                json.WriteFiniteValue(matrix[i, j], key);
            }

            json.WriteEndArray();
        }

        json.WriteEndArray();
    }

    /// <summary>Writes a member that may be undefined: a number when finite, else <c>null</c>.</summary>
    public static void WriteNumberOrNull(this Utf8JsonWriter json, string key, double? value)
    {
        if (IsDefined(value))
        {
            json.WriteNumber(key, value!.Value);
        }
        else
        {
            json.WriteNull(key);
        }
    }

    /// <summary>Writes a text member that may be absent: the text, else <c>null</c>.</summary>
    public static void WriteStringOrNull(this Utf8JsonWriter json, string key, string? value)
    {
        if (value is null)
        {
            json.WriteNull(key);
        }
        else
        {
            json.WriteString(key, value);
        }
    }
}

/// <summary>A result that must be a number came out NaN or infinite (an overflow).</summary>
internal sealed class NonFiniteResultException(string what, double value)
    : Exception($"the result overflows: {what} is {(double.IsNaN(value) ? "not a number" : "infinite")}; check the magnitudes of the inputs");
