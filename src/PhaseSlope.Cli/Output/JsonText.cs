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
    public static string Write(Action<Utf8JsonWriter> write)
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, Options))
        {
            write(json);
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + Environment.NewLine;
    }
}
