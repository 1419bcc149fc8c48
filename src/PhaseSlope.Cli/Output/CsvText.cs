using System.Globalization;
using CsvHelper;

namespace PhaseSlope.Cli.Output;

/// <summary>Writes a header and rows of already-formatted cells as RFC 4180 CSV with CsvHelper.</summary>
internal static class CsvText
{
    /// <summary>Renders the CSV text.</summary>
    public static string Write(IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows)
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        Write(text, header, rows);
        return text.ToString();
    }

    /// <summary>Writes the CSV text to <paramref name="output"/> row by row (left open).</summary>
    public static void Write(TextWriter output, IReadOnlyList<string> header, IEnumerable<IReadOnlyList<string>> rows)
    {
        var options = new CsvWriterOptions { FormatProvider = CultureInfo.InvariantCulture, NewLine = "\n" };
        using var csv = CsvWriter.Create(output, options, true);
        csv.WriteRecord([.. header]);
        foreach (var row in rows)
        {
            csv.WriteRecord([.. row]);
        }

        csv.Flush();
    }
}
