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
}
