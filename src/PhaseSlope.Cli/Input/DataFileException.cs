using System.Globalization;
using System.Text;

namespace PhaseSlope.Cli.Input;

/// <summary>A data file that cannot be read as it stands. The message is one line:
/// <c>origin:line: column 'header': problem</c>, where the line and the column are left out when
/// the problem has none (a file without a header row has neither).</summary>
internal sealed class DataFileException : Exception
{
    /// <summary>Creates the exception and builds its one-line message.</summary>
    /// <param name="origin">The file path or other name the caller gave for the input.</param>
    /// <param name="line">1-based physical line of the problem, or null for the whole file.</param>
    /// <param name="column">Header text of the column at fault, or null.</param>
    /// <param name="problem">What is wrong, on one line.</param>
    /// <param name="inner">The cause, if any.</param>
    public DataFileException(string origin, int? line, string? column, string problem, Exception? inner = null)
        : base(Compose(origin, line, column, problem), inner)
    {
        Origin = origin;
        Line = line;
        Column = column;
    }

    /// <summary>The file path or name given by the caller.</summary>
    public string Origin { get; }

    /// <summary>1-based physical line of the problem, or null when it concerns the whole file.</summary>
    public int? Line { get; }

    /// <summary>Header text of the column at fault, or null.</summary>
    public string? Column { get; }

    private static string Compose(string origin, int? line, string? column, string problem)
    {
        var text = new StringBuilder(OneLine(origin));
        if (line is int number)
        {
            text.Append(CultureInfo.InvariantCulture, $":{number}");
        }
        text.Append(": ");
        if (column is not null)
        {
            text.Append(CultureInfo.InvariantCulture, $"column '{OneLine(column)}': ");
        }
        text.Append(OneLine(problem));
        return text.ToString();
    }

    /// <summary>Shows control characters (line breaks, tabs, NUL) and invisible format
    /// characters (bidirectional overrides such as U+202E, zero-width characters) as \uXXXX
    /// escapes, so that text from the user cannot break a message over several lines or reorder
    /// what the terminal shows.</summary>
    internal static string OneLine(string text)
    {
        if (!text.Any(Unprintable))
        {
            return text;
        }
        var builder = new StringBuilder(text.Length + 8);
        foreach (char c in text)
        {
            if (Unprintable(c))
            {
                builder.Append(CultureInfo.InvariantCulture, $"\\u{(int)c:X4}");
            }
            else
            {
                builder.Append(c);
            }
        }
        return builder.ToString();
    }

    private static bool Unprintable(char c)
        => char.IsControl(c) || CharUnicodeInfo.GetUnicodeCategory(c) == UnicodeCategory.Format;
}
