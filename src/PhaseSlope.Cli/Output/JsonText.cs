using System.Globalization;
using System.Text.Encodings.Web;
using System.Text.Json;

namespace PhaseSlope.Cli.Output;

/// <summary>The JSON writer settings every command uses.</summary>
internal static class JsonText
{
    /// <summary>Indented; source texts keep '&amp;', apostrophes and non-ASCII letters readable
    /// (the output is data for scripts, never embedded in HTML, so HTML-safe escaping is not needed).</summary>
    public static JsonWriterOptions Options { get; } = new()
    {
        Indented = true,
        Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
    };

    /// <summary>Runs <paramref name="write"/> on a writer with <see cref="Options"/> and returns
    /// the text with a final line break.</summary>
    public static string Write(Action<Utf8JsonWriter> write)
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        Write(text, write);
        return text.ToString();
    }

    /// <summary>Like <see cref="Write(Action{Utf8JsonWriter})"/> on one line, without the line
    /// break (for diagnostics lines on standard error).</summary>
    public static string WriteLine(Action<Utf8JsonWriter> write)
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        Write(text, write, Options with { Indented = false });
        return text.ToString();
    }

    /// <summary>Runs <paramref name="write"/> on a writer with <see cref="Options"/> that streams
    /// its text, then a final line break, to <paramref name="output"/> in blocks of a few
    /// kilobytes (for results too long to hold as one string).</summary>
    public static void Write(TextWriter output, Action<Utf8JsonWriter> write)
    {
        Write(output, write, Options);
        output.Write(Environment.NewLine);
    }

    private static void Write(TextWriter output, Action<Utf8JsonWriter> write, JsonWriterOptions options)
    {
        var buffer = new Utf8TextBufferWriter(output);
        using (var json = new Utf8JsonWriter(buffer, options))
        {
            write(json);
        }

        buffer.Complete();
    }
}
