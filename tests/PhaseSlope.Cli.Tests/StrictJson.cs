using System.Text.Json;

namespace PhaseSlope.Cli.Tests;

/// <summary>The one way the tests read the tool's JSON: strictly. A repeated property name in any
/// object, a NaN or Infinity literal, a comment or a trailing comma is a parse error, so every test
/// that reads an output also checks that it is well-formed JSON with distinct keys.</summary>
internal static class StrictJson
{
    private static readonly JsonDocumentOptions Options = new()
    {
        AllowDuplicateProperties = false,
        AllowTrailingCommas = false,
        CommentHandling = JsonCommentHandling.Disallow,
    };

    /// <summary>Parses <paramref name="json"/>; throws <see cref="JsonException"/> on anything not strict JSON.</summary>
    public static JsonDocument Parse(string json) => JsonDocument.Parse(json, Options);
}
