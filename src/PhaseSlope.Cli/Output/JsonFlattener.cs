using System.Buffers;
using System.Text.Json;

namespace PhaseSlope.Cli.Output;

/// <summary>One field of a flattened JSON object: its key (the path of names joined by
/// <c>_</c>), the names of the objects it sits in, and its value as JSON wrote it.</summary>
/// <param name="Key">The flat key, e.g. <c>liquid_density_mol_m3</c>.</param>
/// <param name="Parents">The enclosing member names from the outside in (empty at the top level),
/// e.g. <c>["liquid"]</c>; array indices are not parents.</param>
/// <param name="Kind">Number, String, True, False or Null.</param>
/// <param name="Text">A number's JSON text (the round-trip digits the writer wrote), a string's
/// value, <c>true</c>/<c>false</c>, or empty for null.</param>
internal readonly record struct FlatField(string Key, IReadOnlyList<string> Parents, JsonValueKind Kind, string Text);

/// <summary>Turns the JSON a writer writes into an ordered list of (key, value) fields, one per
/// leaf, so a CSV row carries exactly the members of the JSON object and the two cannot drift
/// apart: the CSV is made from the JSON, not beside it.</summary>
/// <remarks>Nested objects are flattened with their member name and <c>_</c> as a prefix
/// (<c>"liquid": {"density_mol_m3"}</c> becomes <c>liquid_density_mol_m3</c>); array elements take
/// their index (<c>inputs_0_name</c>). Leaves keep JSON's text, so numbers stay round-trip.</remarks>
internal static class JsonFlattener
{
    /// <summary>Runs <paramref name="write"/> (which writes one JSON object) and flattens what it
    /// wrote.</summary>
    public static IReadOnlyList<FlatField> Flatten(Action<Utf8JsonWriter> write)
    {
        var buffer = new ArrayBufferWriter<byte>();
        using (var json = new Utf8JsonWriter(buffer))
        {
            write(json);
        }

        using var document = JsonDocument.Parse(buffer.WrittenMemory);
        return Flatten(document.RootElement);
    }

    /// <summary>The leaves of a JSON object in document order.</summary>
    /// <exception cref="ArgumentException">The element is not an object.</exception>
    public static IReadOnlyList<FlatField> Flatten(JsonElement root)
    {
        if (root.ValueKind != JsonValueKind.Object)
        {
            throw new ArgumentException($"a {root.ValueKind} cannot be flattened into one row; an object is needed", nameof(root));
        }

        var fields = new List<FlatField>();
        Walk(root, "", "", [], fields);
        return fields;
    }

    private static void Walk(JsonElement element, string prefix, string name, IReadOnlyList<string> parents, List<FlatField> fields)
    {
        switch (element.ValueKind)
        {
            case JsonValueKind.Object:
                IReadOnlyList<string> inner = prefix.Length == 0 ? parents : [.. parents, name];
                foreach (var member in element.EnumerateObject())
                {
                    Walk(member.Value, Join(prefix, member.Name), member.Name, inner, fields);
                }

                break;
            case JsonValueKind.Array:
                int index = 0;
                foreach (var item in element.EnumerateArray())
                {
                    Walk(item, Join(prefix, index.ToString(System.Globalization.CultureInfo.InvariantCulture)), name, parents, fields);
                    index++;
                }

                break;
            case JsonValueKind.Number:
                fields.Add(new FlatField(prefix, parents, JsonValueKind.Number, element.GetRawText()));
                break;
            case JsonValueKind.String:
                fields.Add(new FlatField(prefix, parents, JsonValueKind.String, element.GetString()!));
                break;
            case JsonValueKind.True:
            case JsonValueKind.False:
                fields.Add(new FlatField(prefix, parents, element.ValueKind, element.ValueKind == JsonValueKind.True ? "true" : "false"));
                break;
            default:
                fields.Add(new FlatField(prefix, parents, JsonValueKind.Null, ""));
                break;
        }
    }

    private static string Join(string prefix, string name) => prefix.Length == 0 ? name : $"{prefix}_{name}";
}
