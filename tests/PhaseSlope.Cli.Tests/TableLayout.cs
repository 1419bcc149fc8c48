namespace PhaseSlope.Cli.Tests;

/// <summary>One aligned table found in the tool's text output: a header line, a rule line of
/// dashes, and the rows up to the next blank line.</summary>
internal sealed record TableBlock(string Header, string Rule, IReadOnlyList<string> Rows, IReadOnlyList<(int Start, int End)> Columns)
{
    /// <summary>The trimmed header cells, one per column.</summary>
    public string[] HeaderCells => Cells(Header);

    /// <summary>The trimmed cells of a line, cut at the rule's column boundaries.</summary>
    public string[] Cells(string line)
        => [.. Columns.Select(c => c.Start >= line.Length ? "" : line[c.Start..Math.Min(c.End, line.Length)].Trim())];
}

/// <summary>Finds aligned tables in text and checks that every line keeps the header's columns.</summary>
internal static class TableLayout
{
    /// <summary>Every table in <paramref name="text"/>: a line made of dashes and spaces only is a
    /// rule; the line above it is the header; the rows run to the next blank line.</summary>
    public static List<TableBlock> Find(string text)
    {
        string[] lines = text.Split('\n');
        var blocks = new List<TableBlock>();
        for (int i = 1; i < lines.Length; i++)
        {
            string rule = lines[i];
            if (rule.Length == 0 || !rule.Contains('-') || rule.Any(ch => ch is not ('-' or ' ')))
            {
                continue;
            }

            var columns = new List<(int, int)>();
            for (int c = 0; c < rule.Length;)
            {
                if (rule[c] == '-')
                {
                    int start = c;
                    while (c < rule.Length && rule[c] == '-')
                    {
                        c++;
                    }

                    columns.Add((start, c));
                }
                else
                {
                    c++;
                }
            }

            var rows = new List<string>();
            for (int r = i + 1; r < lines.Length && lines[r].Length > 0; r++)
            {
                rows.Add(lines[r]);
            }

            blocks.Add(new TableBlock(lines[i - 1], rule, rows, columns));
        }

        return blocks;
    }

    /// <summary>Asserts that the header and every row respect the rule's column boundaries: the
    /// two-space gaps between columns are blank, nothing runs past the last column, and every
    /// non-empty cell touches its column's left edge (text) or right edge (numbers).</summary>
    public static void AssertAligned(TableBlock block)
    {
        Assert.True(block.Columns.Count >= 2, $"a table needs two columns: '{block.Rule}'");
        Assert.NotEmpty(block.Rows);
        for (int c = 1; c < block.Columns.Count; c++)
        {
            Assert.True(block.Columns[c].Start - block.Columns[c - 1].End == 2, $"columns must be two spaces apart: '{block.Rule}'");
        }

        foreach (string line in block.Rows.Prepend(block.Header))
        {
            Assert.True(line.Length <= block.Columns[^1].End, $"line runs past the last column:\n{line}\n{block.Rule}");
            Assert.Equal(line, line.TrimEnd());
            for (int c = 0; c < block.Columns.Count; c++)
            {
                (int start, int end) = block.Columns[c];
                if (c > 0)
                {
                    for (int g = block.Columns[c - 1].End; g < start && g < line.Length; g++)
                    {
                        Assert.True(line[g] == ' ', $"gap before column {c} is not blank at {g}:\n{line}\n{block.Rule}");
                    }
                }

                if (start >= line.Length)
                {
                    continue;
                }

                string cell = line[start..Math.Min(end, line.Length)];
                if (cell.Trim().Length == 0)
                {
                    continue;
                }

                bool left = cell[0] != ' ';
                bool right = end <= line.Length && cell[^1] != ' ';
                Assert.True(left || right, $"cell '{cell}' of column {c} touches neither edge:\n{line}\n{block.Rule}");
            }
        }
    }
}
