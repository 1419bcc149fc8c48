using System.Text.Json;

namespace PhaseSlope.Cli.Output;

/// <summary>CSV from the JSON a command writes, so the two cannot drift apart: every JSON member
/// becomes a column, a nested object's members are named with its key as a prefix
/// (<c>liquid_density_mol_m3</c>), null is an empty cell, numbers keep their round-trip text.</summary>
internal static class JsonColumns
{
    /// <summary>One JSON object flattened to (column, cell) pairs in document order.</summary>
    public static List<(string Key, string Cell)> Flatten(string json)
    {
        using var document = JsonDocument.Parse(json);
        var cells = new List<(string, string)>();
        Add(cells, "", document.RootElement);
        return cells;
    }

    private static void Add(List<(string, string)> cells, string prefix, JsonElement element)
    {
        foreach (var member in element.EnumerateObject())
        {
            string key = prefix.Length == 0 ? member.Name : $"{prefix}_{member.Name}";
            var value = member.Value;
            switch (value.ValueKind)
            {
                case JsonValueKind.Object:
                    Add(cells, key, value);
                    break;
                case JsonValueKind.Null:
                    cells.Add((key, ""));
                    break;
                case JsonValueKind.String:
                    cells.Add((key, value.GetString()!));
                    break;
                default:
                    // Numbers keep the writer's round-trip text; true/false and arrays their JSON text.
                    cells.Add((key, value.GetRawText()));
                    break;
            }
        }
    }

    /// <summary>CSV of flattened rows: the union of their columns in first-seen order, a missing
    /// cell empty. A column that is only ever empty and is the prefix of other columns (a phase
    /// object that is null in single-phase rows) is left out.</summary>
    public static string Csv(IReadOnlyList<List<(string Key, string Cell)>> rows)
    {
        var keys = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var row in rows)
        {
            foreach (var (key, _) in row)
            {
                if (seen.Add(key))
                {
                    keys.Add(key);
                }
            }
        }

        var lookups = rows.Select(r => r.ToDictionary(c => c.Key, c => c.Cell, StringComparer.Ordinal)).ToList();
        keys.RemoveAll(k => keys.Any(other => other.StartsWith(k + "_", StringComparison.Ordinal))
                            && lookups.All(l => !l.TryGetValue(k, out var cell) || cell.Length == 0));
        return CsvText.Write(keys, lookups.Select(l => (IReadOnlyList<string>)[.. keys.Select(k => l.TryGetValue(k, out var cell) ? cell : "")]));
    }
}
