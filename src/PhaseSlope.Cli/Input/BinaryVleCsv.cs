using System.Globalization;
using System.Text.RegularExpressions;
using CsvHelper;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Input;

/// <summary>Reads measured VLE points of a binary from a CSV file (docs/data-files.md): columns
/// <c>T [unit]</c>, <c>P [unit]</c>, <c>x1</c> and, optionally, <c>y1</c> (an empty y1 cell: not
/// measured). The separator, numbers, comments and header rules are those of the vapour-pressure
/// files (<see cref="VapourPressureCsv"/>); here the units must be in the headers.</summary>
internal static partial class BinaryVleCsv
{
    /// <summary>The most data rows a file may have (each row costs a bubble point per objective evaluation).</summary>
    internal const int MaximumRows = 10_000;

    [GeneratedRegex(@"^(?<name>[^\[\]]*?)\s*(?:\[(?<unit>[^\[\]]*)\])?$", RegexOptions.CultureInvariant)]
    private static partial Regex HeaderCell();

    [GeneratedRegex(@"^[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex InvariantNumber();

    /// <summary>Reads every data row, converted to K and Pa, in file order.</summary>
    /// <exception cref="DataFileException">The file breaks a rule of the format.</exception>
    public static IReadOnlyList<BinaryVlePoint> Read(TextReader reader, string origin)
    {
        ArgumentNullException.ThrowIfNull(reader);
        int tColumn = -1, pColumn = -1, xColumn = -1, yColumn = -1;
        Unit? tUnit = null, pUnit = null;
        string[] headers = [];
        int headerLine = 0;
        var points = new List<BinaryVlePoint>();
        try
        {
            using var csv = CsvReader.Create(reader, VapourPressureCsv.ReaderOptions(), true);
            while (csv.Read())
            {
                if (VapourPressureCsv.IsCommentOrBlank(csv.RawRecord))
                {
                    continue;
                }

                int line = checked((int)csv.LineNumber);
                var fields = new string[csv.FieldCount];
                for (int i = 0; i < fields.Length; i++)
                {
                    fields[i] = csv.GetString(i);
                }

                if (headerLine == 0)
                {
                    headerLine = line;
                    headers = fields;
                    for (int i = 0; i < fields.Length; i++)
                    {
                        var match = HeaderCell().Match(fields[i]);
                        string name = match.Success ? match.Groups["name"].Value : fields[i];
                        string? unit = match.Success && match.Groups["unit"].Success ? match.Groups["unit"].Value.Trim() : null;
                        switch (name)
                        {
                            case "T" or "temperature":
                                tColumn = Once(origin, line, fields[i], tColumn, i);
                                tUnit = unit is null ? throw new DataFileException(origin, line, fields[i], "the temperature column needs its unit in the header, e.g. 'T [K]' or 'T [degC]'")
                                    : DataUnits.TryTemperature(unit, out var t) ? t : throw new DataFileException(origin, line, fields[i], DataUnits.UnknownTemperature(unit));
                                break;
                            case "P" or "pressure":
                                pColumn = Once(origin, line, fields[i], pColumn, i);
                                if (unit is not null && DataUnits.IsGauge(unit))
                                {
                                    throw new DataFileException(origin, line, fields[i], $"gauge pressures are not accepted (use an absolute unit: {DataUnits.PressureChoices})");
                                }

                                pUnit = unit is null ? throw new DataFileException(origin, line, fields[i], "the pressure column needs its unit in the header, e.g. 'P [kPa]'")
                                    : DataUnits.TryPressure(unit, out var p) ? p : throw new DataFileException(origin, line, fields[i], DataUnits.UnknownPressure(unit));
                                break;
                            case "x1":
                                xColumn = Once(origin, line, fields[i], xColumn, i);
                                break;
                            case "y1":
                                yColumn = Once(origin, line, fields[i], yColumn, i);
                                break;
                        }
                    }

                    if (tColumn < 0 || pColumn < 0 || xColumn < 0)
                    {
                        throw new DataFileException(origin, line, null,
                            $"the header needs columns 'T [unit]', 'P [unit]' and 'x1' (and 'y1' where measured); found {string.Join(", ", fields.Select(f => $"'{DataFileException.OneLine(f)}'"))}");
                    }

                    continue;
                }

                if (points.Count == MaximumRows)
                {
                    throw new DataFileException(origin, line, null, $"more than {MaximumRows} data rows (the limit for VLE data files)");
                }

                double temperature = DataUnits.ToSi(tUnit!, Number(origin, line, headers, fields, tColumn), fields[tColumn]);
                double pressure = DataUnits.ToSi(pUnit!, Number(origin, line, headers, fields, pColumn), fields[pColumn]);
                double x = Number(origin, line, headers, fields, xColumn);
                double? y = yColumn >= 0 && yColumn < fields.Length && fields[yColumn].Length == 0 ? null : yColumn < 0 ? null : Number(origin, line, headers, fields, yColumn);
                if (!(temperature > 0))
                {
                    throw new DataFileException(origin, line, headers[tColumn], "the temperature must be above absolute zero");
                }

                if (!(pressure > 0))
                {
                    throw new DataFileException(origin, line, headers[pColumn], "the pressure must be positive");
                }

                if (!(x >= 0 && x <= 1))
                {
                    throw new DataFileException(origin, line, headers[xColumn], $"x1 = {x.ToString("G", CultureInfo.InvariantCulture)} is not a mole fraction from 0 to 1");
                }

                if (y is double yv && !(yv >= 0 && yv <= 1))
                {
                    throw new DataFileException(origin, line, headers[yColumn], $"y1 = {yv.ToString("G", CultureInfo.InvariantCulture)} is not a mole fraction from 0 to 1");
                }

                points.Add(new BinaryVlePoint(temperature, pressure, x, y));
            }
        }
        catch (CsvFormatException e)
        {
            throw new DataFileException(origin, e.LineNumber > 0 ? checked((int)e.LineNumber) : null, null, $"not readable as CSV: {e.Message}", e);
        }

        if (headerLine == 0)
        {
            throw new DataFileException(origin, null, null, "no header row (the first line that is not a comment must name the columns, e.g. 'T [K],P [kPa],x1,y1')");
        }

        if (points.Count < 2)
        {
            throw new DataFileException(origin, headerLine, null, $"{points.Count} data {(points.Count == 1 ? "row" : "rows")} after the header; at least 2 are needed to fit k_ij and its standard error");
        }

        return points;
    }

    private static int Once(string origin, int line, string header, int existing, int index)
        => existing < 0 ? index : throw new DataFileException(origin, line, header, "this column is given twice; give it once");

    private static double Number(string origin, int line, string[] headers, string[] fields, int column)
    {
        if (column >= fields.Length || fields[column].Length == 0)
        {
            throw new DataFileException(origin, line, headers[column], "the cell is empty");
        }

        string text = fields[column];
        if (!InvariantNumber().IsMatch(text))
        {
            throw new DataFileException(origin, line, headers[column], $"'{DataFileException.OneLine(text)}' is not a number (write it with a dot decimal separator, no digit grouping)");
        }

        return double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
    }
}
