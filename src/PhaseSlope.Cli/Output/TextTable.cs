using System.Globalization;

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

    /// <summary>The column headers.</summary>
    public IReadOnlyList<string> Headers => _headers;

    /// <summary>Whether column i holds numbers (right-aligned).</summary>
    public IReadOnlyList<bool> Numeric => _numeric;

    /// <summary>The rows added so far, one cell per header (the report renders them as HTML).</summary>
    public IReadOnlyList<IReadOnlyList<string>> Rows => _rows;

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
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        Write(text, _headers, _numeric, _rows.Count, i => _rows[i]);
        return text.ToString();
    }

    /// <summary>Writes a table as <see cref="Render"/> does, with rows made on demand: for a
    /// table too long to hold, <paramref name="row"/> is called twice per row, once to measure the
    /// columns and once to write, and no row is kept.</summary>
    /// <param name="output">Where the text goes.</param>
    /// <param name="headers">The column headers.</param>
    /// <param name="numeric">Whether column i is right-aligned.</param>
    /// <param name="count">Number of rows.</param>
    /// <param name="row">The cells of row i, one per header; the same on both calls.</param>
    public static void Write(TextWriter output, IReadOnlyList<string> headers, IReadOnlyList<bool> numeric, int count, Func<int, IReadOnlyList<string>> row)
    {
        int[] width = [.. headers.Select(h => h.Length)];
        for (int i = 0; i < count; i++)
        {
            var cells = row(i);
            if (cells.Count != headers.Count)
            {
                throw new ArgumentException($"row {i} has {cells.Count} cells, table has {headers.Count} columns", nameof(row));
            }

            for (int c = 0; c < width.Length; c++)
            {
                width[c] = Math.Max(width[c], cells[c].Length);
            }
        }

        WriteRow(output, headers, numeric, width);
        output.Write(string.Join("  ", width.Select(w => new string('-', w))));
        output.Write(Environment.NewLine);
        for (int i = 0; i < count; i++)
        {
            WriteRow(output, row(i), numeric, width);
        }
    }

    private static void WriteRow(TextWriter output, IReadOnlyList<string> cells, IReadOnlyList<bool> numeric, int[] width)
    {
        var padded = cells.Select((cell, c) => numeric[c] ? cell.PadLeft(width[c]) : cell.PadRight(width[c]));
        output.Write(string.Join("  ", padded).TrimEnd());
        output.Write(Environment.NewLine);
    }
}
