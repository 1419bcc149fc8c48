using System.Buffers;
using System.Globalization;
using System.Text;
using System.Text.Json;

namespace PhaseSlope.Cli.Output;

/// <summary>One field of a flattened JSON object: its key (the path of names joined by
/// <c>_</c>), the names of the objects it sits in, and its value as JSON wrote it.</summary>
/// <param name="Key">The flat key, e.g. <c>liquid_density_mol_m3</c>.</param>
/// <param name="Parents">The names of the enclosing members from the outside in (empty at the top
/// level), e.g. <c>["liquid"]</c>; an array element's parent is the array's name.</param>
/// <param name="Kind">Number, String, True, False or Null.</param>
/// <param name="Text">A number's JSON text (the round-trip digits the writer wrote), a string's
/// value, <c>true</c>/<c>false</c>, or empty for null.</param>
internal readonly record struct FlatField(string Key, IReadOnlyList<string> Parents, JsonValueKind Kind, string Text);

/// <summary>Turns the JSON a writer writes into an ordered list of (key, value) fields, one per
/// leaf, so a CSV row carries exactly the members of the JSON object and the two cannot drift
/// apart: the CSV is made from the JSON, not beside it.</summary>
/// <remarks>Nested objects are flattened with their member name and <c>_</c> as a prefix
/// (<c>"liquid": {"density_mol_m3"}</c> becomes <c>liquid_density_mol_m3</c>); array elements take
/// their index (<c>inputs_0_name</c>). Leaves keep JSON's text, so numbers stay round-trip. One
/// instance reuses its buffer from row to row (not thread-safe); the JSON is read back with a
/// forward-only reader, not a document, and the member names and flat keys of the previous row
/// are reused where the structure repeats (rows of one table share it), so a long table does not
/// allocate its keys again for every row.</remarks>
internal sealed class JsonFlattener
{
    private readonly ArrayBufferWriter<byte> _buffer = new(1 << 14);
    private readonly Utf8JsonWriter _json;

    // Member names by their position in the previous row, and flat keys by position with the
    // prefix and own name they were made from.
    private readonly List<string> _names = [];
    private readonly List<(string Prefix, string Own, string Key)> _keys = [];
    private static readonly string[] Indices = [.. Enumerable.Range(0, 64).Select(i => i.ToString(CultureInfo.InvariantCulture))];

    /// <summary>A flattener with an empty buffer.</summary>
    public JsonFlattener() => _json = new Utf8JsonWriter(_buffer);

    /// <summary>Runs <paramref name="write"/> (which writes one JSON object) and flattens what it
    /// wrote.</summary>
    /// <exception cref="ArgumentException">What was written is not one object.</exception>
    public IReadOnlyList<FlatField> Flatten(Action<Utf8JsonWriter> write)
    {
        _buffer.ResetWrittenCount();
        _json.Reset(_buffer);
        write(_json);
        _json.Flush();
        return Read(_buffer.WrittenSpan);
    }

    /// <summary>The leaves of a JSON object in document order.</summary>
    /// <exception cref="ArgumentException">The element is not an object.</exception>
    public static IReadOnlyList<FlatField> Flatten(JsonElement root) => new JsonFlattener().Read(Encoding.UTF8.GetBytes(root.GetRawText()));

    /// <summary>One open object or array: its flat key (the prefix of its members), the parents of
    /// its members, and for an array the index of the next element.</summary>
    private sealed class Frame(string prefix, IReadOnlyList<string> parents, bool isArray)
    {
        public string Prefix { get; } = prefix;

        public IReadOnlyList<string> Parents { get; } = parents;

        public bool IsArray { get; } = isArray;

        public int Index { get; set; }
    }

    private List<FlatField> Read(ReadOnlySpan<byte> utf8)
    {
        var reader = new Utf8JsonReader(utf8);
        if (!reader.Read() || reader.TokenType != JsonTokenType.StartObject)
        {
            throw new ArgumentException("only a JSON object can be flattened into one row", nameof(utf8));
        }

        var fields = new List<FlatField>(128);
        var stack = new Stack<Frame>();
        stack.Push(new Frame("", [], isArray: false));
        string? name = null; // the member whose value comes next
        int nameIndex = 0, keyIndex = 0;
        while (reader.Read())
        {
            var frame = stack.Peek();
            switch (reader.TokenType)
            {
                case JsonTokenType.PropertyName:
                    if (nameIndex < _names.Count && reader.ValueTextEquals(_names[nameIndex]))
                    {
                        name = _names[nameIndex];
                    }
                    else
                    {
                        name = reader.GetString()!;
                        Store(_names, nameIndex, name);
                    }

                    nameIndex++;
                    continue;
                case JsonTokenType.EndObject:
                case JsonTokenType.EndArray:
                    stack.Pop();
                    continue;
            }

            string own = !frame.IsArray ? name! : frame.Index < Indices.Length ? Indices[frame.Index] : frame.Index.ToString(CultureInfo.InvariantCulture);
            frame.Index++;
            string key = Key(keyIndex++, frame.Prefix, own);
            switch (reader.TokenType)
            {
                case JsonTokenType.StartObject:
                case JsonTokenType.StartArray:
                    // Members of an object (or elements of an array) sit in it; an array's elements
                    // and their members have the array's name as their innermost parent.
                    var parents = frame.IsArray ? frame.Parents : [.. frame.Parents, own];
                    stack.Push(new Frame(key, parents, reader.TokenType == JsonTokenType.StartArray));
                    break;
                case JsonTokenType.Number:
                    fields.Add(new FlatField(key, frame.Parents, JsonValueKind.Number, Encoding.UTF8.GetString(reader.ValueSpan)));
                    break;
                case JsonTokenType.String:
                    fields.Add(new FlatField(key, frame.Parents, JsonValueKind.String, reader.GetString()!));
                    break;
                case JsonTokenType.True:
                    fields.Add(new FlatField(key, frame.Parents, JsonValueKind.True, "true"));
                    break;
                case JsonTokenType.False:
                    fields.Add(new FlatField(key, frame.Parents, JsonValueKind.False, "false"));
                    break;
                default:
                    fields.Add(new FlatField(key, frame.Parents, JsonValueKind.Null, ""));
                    break;
            }
        }

        return fields;
    }

    /// <summary>The flat key of a member: the previous row's at this position when made from the
    /// same prefix and name, else made and remembered.</summary>
    private string Key(int index, string prefix, string own)
    {
        if (index < _keys.Count && ReferenceEquals(_keys[index].Prefix, prefix) && _keys[index].Own == own)
        {
            return _keys[index].Key;
        }

        string key = prefix.Length == 0 ? own : $"{prefix}_{own}";
        Store(_keys, index, (prefix, own, key));
        return key;
    }

    private static void Store<T>(List<T> list, int index, T value)
    {
        if (index < list.Count)
        {
            list[index] = value;
        }
        else
        {
            list.Add(value);
        }
    }
}
