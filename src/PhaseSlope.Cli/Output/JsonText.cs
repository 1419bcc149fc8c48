using System.Text;
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
    public static string Write(Action<Utf8JsonWriter> write) => Write(write, Options) + Environment.NewLine;

    /// <summary>Like <see cref="Write(Action{Utf8JsonWriter})"/> on one line, without the line
    /// break (for diagnostics lines on standard error).</summary>
    public static string WriteLine(Action<Utf8JsonWriter> write) => Write(write, Options with { Indented = false });

    private static string Write(Action<Utf8JsonWriter> write, JsonWriterOptions options)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, options))
        {
            write(json);
        }

        return Encoding.UTF8.GetString(stream.ToArray());
    }
}
