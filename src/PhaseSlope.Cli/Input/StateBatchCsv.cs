using System.Text.RegularExpressions;
using CsvHelper;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Input;

/// <summary>One row of a batch of states: its physical line and either its two properties or
/// the reason it could not be read.</summary>
/// <param name="Line">1-based physical line in the file.</param>
/// <param name="Spec">The two properties in molar SI, or null when the row is bad.</param>
/// <param name="Error">Why the row is bad (naming the column), or null.</param>
internal sealed record StateBatchRow(int Line, StateSpecification? Spec, string? Error);

/// <summary>Reads a batch of states for <c>state --batch</c>: a CSV whose header names exactly two
/// property columns, each with its unit in square brackets as in data files (<c>P [bar]</c>,
/// <c>h [kJ/kg]</c>); a header without a unit means the molar SI unit, as a bare number on the
/// command line does. Other columns are ignored; comment lines start with <c>#</c>.</summary>
/// <remarks>A header problem (not two property columns, an unknown unit) stops the whole file
/// (<see cref="DataFileException"/>); a bad cell makes only its row a <see cref="StateBatchRow"/>
/// with the error, named by line and column.</remarks>
internal static partial class StateBatchCsv
{
    /// <summary>The most rows a batch may have (memory stays bounded: every result is held until
    /// the output is written whole).</summary>
    internal const int MaximumRows = 100_000;

    [GeneratedRegex(@"^(?<name>[^\[\]]*?)\s*(?:\[(?<unit>[^\[\]]*)\])?$", RegexOptions.CultureInvariant)]
    private static partial Regex HeaderCell();

    /// <summary>Column names of each property (matched ignoring case); a density column may also
    /// be a molar or specific volume.</summary>
    private static readonly (string[] Names, StateProperty Property, bool IsVolume)[] Names =
    [
        (["T", "temperature"], StateProperty.Temperature, false),
        (["P", "pressure"], StateProperty.Pressure, false),
        (["rho", "density"], StateProperty.Density, false),
        (["v", "volume"], StateProperty.Density, true),
        (["h", "enthalpy"], StateProperty.Enthalpy, false),
        (["s", "entropy"], StateProperty.Entropy, false),
        (["u", "internal energy", "internal_energy"], StateProperty.InternalEnergy, false),
        (["x", "quality"], StateProperty.Quality, false),
    ];

    private sealed record Column(int Index, string Header, StateProperty Property, bool IsVolume, string? Unit);

    /// <summary>Reads every row of the file.</summary>
    /// <param name="reader">The file's text; left open.</param>
    /// <param name="origin">The file path that starts every message.</param>
    /// <param name="fluid">The fluid (values per kilogram need its molar mass).</param>
    /// <exception cref="DataFileException">The file is not CSV, has no header, a header without
    /// exactly two property columns or with an unknown unit, no rows, or too many.</exception>
    public static IReadOnlyList<StateBatchRow> Read(TextReader reader, string origin, Fluid fluid)
    {
        var options = VapourPressureCsv.ReaderOptions();
        Column[]? columns = null;
        var rows = new List<StateBatchRow>();
        try
        {
            using var csv = CsvReader.Create(reader, options, true);
            while (csv.Read())
            {
                if (VapourPressureCsv.IsCommentOrBlank(csv.RawRecord))
                {
                    continue;
                }

                int line = checked((int)csv.LineNumber);
                string[] fields = [.. Enumerable.Range(0, csv.FieldCount).Select(csv.GetString)];
                if (columns is null)
                {
                    columns = Header(fields, origin, line, fluid);
                    continue;
                }

                if (rows.Count == MaximumRows)
                {
                    throw new DataFileException(origin, line, null, $"more than {MaximumRows} rows (the limit for a batch of states)");
                }

                rows.Add(Row(fields, columns, origin, line, fluid));
            }
        }
        catch (CsvFormatException e)
        {
            throw new DataFileException(origin, e.LineNumber > 0 ? checked((int)e.LineNumber) : null, null, $"not readable as CSV: {e.Message}", e);
        }

        if (columns is null)
        {
            throw new DataFileException(origin, null, null, "no header row: the first line that is not a comment must name two property columns, e.g. 'P [bar],h [kJ/kg]'");
        }

        return rows.Count > 0 ? rows : throw new DataFileException(origin, null, null, "no rows after the header");
    }

    private static Column[] Header(string[] cells, string origin, int line, Fluid fluid)
    {
        var columns = new List<Column>();
        for (int i = 0; i < cells.Length; i++)
        {
            var match = HeaderCell().Match(cells[i]);
            if (!match.Success)
            {
                continue;
            }

            string name = match.Groups["name"].Value.Trim();
            string? unit = match.Groups["unit"].Success ? match.Groups["unit"].Value.Trim() : null;
            var known = Names.FirstOrDefault(n => n.Names.Contains(name, StringComparer.OrdinalIgnoreCase));
            if (known.Names is null)
            {
                continue;
            }

            if (unit is { Length: 0 })
            {
                throw new DataFileException(origin, line, cells[i], "empty unit in brackets (write the unit, or leave out the brackets for the molar SI unit)");
            }

            var column = new Column(i, cells[i], known.Property, known.IsVolume, unit);
            if (unit is not null && known.Property != StateProperty.Quality)
            {
                // The unit is checked once, on the header, with a sample value of 1.
                try
                {
                    StateOptions.Value(column.Property, "unit", $"1 {unit}", fluid, column.IsVolume);
                }
                catch (UsageException e)
                {
                    throw new DataFileException(origin, line, cells[i], e.Message);
                }
            }
            else if (unit is not null && unit != "-")
            {
                throw new DataFileException(origin, line, cells[i], "a quality is a bare fraction from 0 to 1; give no unit (or '-')");
            }

            columns.Add(column);
        }

        if (columns.Count != 2 || columns[0].Property == columns[1].Property)
        {
            throw new DataFileException(origin, line, null,
                $"the header must name exactly two different properties (T, P, rho or v, h, s, u, x, with units in brackets, e.g. 'P [bar],h [kJ/kg]'); found {(columns.Count == 0 ? "none" : string.Join(", ", columns.Select(c => $"'{c.Header}'")))}");
        }

        return [.. columns];
    }

    private static StateBatchRow Row(string[] fields, Column[] columns, string origin, int line, Fluid fluid)
    {
        var values = new double[2];
        for (int k = 0; k < 2; k++)
        {
            var column = columns[k];
            string cell = column.Index < fields.Length ? fields[column.Index] : "";
            string where = $"{origin}:{line}: column '{column.Header}'";
            if (cell.Length == 0)
            {
                return new StateBatchRow(line, null, $"{where}: empty cell");
            }

            string text = column.Unit is null || column.Property == StateProperty.Quality ? cell : $"{cell} {column.Unit}";
            try
            {
                values[k] = StateOptions.Value(column.Property, where, text, fluid, column.IsVolume);
            }
            catch (UsageException e)
            {
                return new StateBatchRow(line, null, e.Message);
            }
        }

        return new StateBatchRow(line, new StateSpecification(columns[0].Property, values[0], columns[1].Property, values[1]), null);
    }
}
