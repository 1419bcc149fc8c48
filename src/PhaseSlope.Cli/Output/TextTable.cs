using System.Text;

namespace PhaseSlope.Cli.Output;

/// <summary>A plain-text table with aligned columns: text left-aligned, numbers right-aligned.</summary>
internal sealed class TextTable
{
    private readonly string[] _headers;
    private readonly bool[] _numeric;
    private readonly List<string[]> _rows = [];

    /// <summary>Creates a table; <paramref name="numeric"/>[i] right-aligns column i.</summary>
    public TextTable(IReadOnlyList<string> headers, IReadOnlyList<bool> numeric)
    {
        _headers = [.. headers];
        _numeric = [.. numeric];
    }

    /// <summary>Appends a row; it must have one cell per header.</summary>
    public void Add(params string[] cells)
    {
        if (cells.Length != _headers.Length)
        {
            throw new ArgumentException($"row has {cells.Length} cells, table has {_headers.Length} columns", nameof(cells));
        }

        _rows.Add(cells);
    }

    /// <summary>Renders the table with two spaces between columns and a rule under the header.</summary>
    public string Render()
    {
        int[] width = new int[_headers.Length];
        for (int c = 0; c < width.Length; c++)
        {
            width[c] = _rows.Select(r => r[c].Length).Prepend(_headers[c].Length).Max();
        }

        var text = new StringBuilder();
        AppendRow(text, _headers, width);
        text.AppendLine(string.Join("  ", width.Select(w => new string('-', w))));
        foreach (var row in _rows)
        {
            AppendRow(text, row, width);
        }

        return text.ToString();
    }

    private void AppendRow(StringBuilder text, string[] cells, int[] width)
    {
        var padded = cells.Select((cell, c) => _numeric[c] ? cell.PadLeft(width[c]) : cell.PadRight(width[c]));
        text.AppendLine(string.Join("  ", padded).TrimEnd());
    }
}
