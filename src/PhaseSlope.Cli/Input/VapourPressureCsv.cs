using System.Globalization;
using System.Text.RegularExpressions;
using CsvHelper;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Input;

/// <summary>Reads measured vapour pressures from a CSV file (format: docs/data-files.md).</summary>
/// <remarks>
/// <para>The separator is always a comma and numbers are always read with the invariant culture
/// (a dot decimal separator), whatever the machine's locale. Lines whose first non-blank character
/// is <c>#</c> are comments, anywhere in the file; blank lines are skipped. The first other line is
/// the header, which names the columns; they may come in any order, and columns with other names
/// are ignored.</para>
/// <para>Every problem is a <see cref="DataFileException"/> whose one-line message names the
/// origin, the 1-based physical line (comments and blank lines counted) and the column.</para>
/// </remarks>
internal static partial class VapourPressureCsv
{
    /// <summary>The fewest data rows a file must have.</summary>
    internal const int MinimumRows = 2;

    /// <summary>The most data rows a file may have: twice the documented 1 000 000-point fit, so
    /// that memory stays bounded (every row is held for the fit).</summary>
    internal const int MaximumRows = 2_000_000;

    private enum Role
    {
        Temperature,
        Pressure,
        Uncertainty,
        Weight,
        LiquidDensity,
    }

    private enum UncertaintyKind
    {
        Absolute,
        RelativeFraction,
        RelativePercent,
    }

    /// <summary>A recognised column: where it is, what it holds, and its unit.</summary>
    private sealed record Column(int Index, string Header, Role Role)
    {
        public Unit? TemperatureUnit { get; init; }

        public Unit? PressureUnit { get; init; }

        public UncertaintyKind Uncertainty { get; init; }

        public Unit? DensityUnit { get; init; }
    }

    /// <summary>The columns found in the header row.</summary>
    private sealed record Layout(int HeaderLine, int FieldCount, string[] Headers, Column Temperature, Column Pressure, Column? Uncertainty, Column? Weight, Column? LiquidDensity);

    /// <summary>A header cell: a name, then optionally a unit in square brackets.</summary>
    [GeneratedRegex(@"^(?<name>[^\[\]]*?)\s*(?:\[(?<unit>[^\[\]]*)\])?$", RegexOptions.CultureInvariant)]
    private static partial Regex HeaderCell();

    /// <summary>A number in invariant form: optional sign, digits with an optional dot fraction (or
    /// a bare fraction), optional exponent. No digit grouping, no comma, no NaN or infinity.</summary>
    [GeneratedRegex(@"^[+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?$", RegexOptions.CultureInvariant)]
    private static partial Regex InvariantNumber();

    private static readonly string[] TemperatureNames = ["T", "temperature"];
    private static readonly string[] PressureNames = ["P", "pressure", "Psat"];
    private static readonly string[] UncertaintyNames = ["u(P)", "uncertainty", "sigma_P"];
    private const string RelativeUncertaintyName = "u_r(P)";
    private const string WeightName = "weight";
    private static readonly string[] LiquidDensityNames = ["rho_L", "liquid density"];

    /// <summary>Reads every data row of the file, converted to K and Pa and sorted by temperature.</summary>
    /// <param name="reader">The file's text; left open.</param>
    /// <param name="origin">The file path or other name that starts every error message.</param>
    /// <param name="options">Units for columns whose header gives none.</param>
    /// <param name="maximumRows">The most data rows accepted (<see cref="MaximumRows"/>).</param>
    /// <returns>At least <see cref="MinimumRows"/> points with distinct temperatures, in increasing
    /// temperature.</returns>
    /// <exception cref="DataFileException">The file breaks a rule of the format.</exception>
    /// <exception cref="UsageException">A unit in <paramref name="options"/> is unknown.</exception>
    public static IReadOnlyList<VapourPressureRecord> Read(TextReader reader, string origin, VapourPressureCsvOptions options, int maximumRows = MaximumRows)
    {
        ArgumentNullException.ThrowIfNull(reader);
        ArgumentNullException.ThrowIfNull(origin);
        ArgumentNullException.ThrowIfNull(options);
        Unit? defaultTemperature = OptionTemperatureUnit(options.TemperatureUnit);
        Unit? defaultPressure = OptionPressureUnit(options.PressureUnit);

        var csvOptions = ReaderOptions();

        Layout? layout = null;
        var records = new List<VapourPressureRecord>();
        var lineOfTemperature = new Dictionary<double, int>();
        try
        {
            using var csv = CsvReader.Create(reader, csvOptions, true);
            while (csv.Read())
            {
                if (IsCommentOrBlank(csv.RawRecord))
                {
                    continue;
                }

                int line = checked((int)csv.LineNumber);
                string[] fields = new string[csv.FieldCount];
                for (int i = 0; i < fields.Length; i++)
                {
                    fields[i] = csv.GetString(i);
                }

                if (layout is null)
                {
                    layout = ReadHeader(fields, origin, line, defaultTemperature, defaultPressure);
                    continue;
                }

                if (records.Count == maximumRows)
                {
                    throw new DataFileException(origin, line, null, $"more than {maximumRows} data rows (the limit for data files)");
                }

                VapourPressureRecord record = ReadRow(fields, layout, origin, line);
                if (lineOfTemperature.TryGetValue(record.Temperature, out int earlier))
                {
                    throw new DataFileException(origin, line, layout.Temperature.Header,
                        $"temperature {Format(record.Temperature)} K is the same as on line {earlier} (each temperature may appear once)");
                }
                lineOfTemperature.Add(record.Temperature, line);
                records.Add(record);
            }
        }
        catch (CsvFormatException e)
        {
            int? line = e.LineNumber > 0 ? checked((int)e.LineNumber) : null;
            throw new DataFileException(origin, line, null, $"not readable as CSV: {e.Message}", e);
        }

        if (layout is null)
        {
            throw new DataFileException(origin, null, null,
                "no header row: the file holds only comments and blank lines (the first other line must name the columns, e.g. 'T [K],P [kPa]')");
        }
        if (records.Count < options.MinimumRows)
        {
            throw new DataFileException(origin, layout.HeaderLine, null,
                $"{records.Count} data {(records.Count == 1 ? "row" : "rows")} after the header; at least {options.MinimumRows} {(options.MinimumRows == 1 ? "is" : "are")} needed");
        }

        records.Sort((a, b) => a.Temperature.CompareTo(b.Temperature));
        return records;
    }

    /// <summary>The reader settings of every data file (vapour pressures, batches of states): comma
    /// separated, invariant numbers, '#' comments, line numbers tracked; the header is found by the
    /// caller, after the comments it skips itself (those with blanks before the '#').</summary>
    internal static CsvReaderOptions ReaderOptions() => new()
    {
        HasHeader = false,
        Separator = ',',
        CommentPrefix = '#',
        TrimWhitespace = true,
        SkipEmptyLines = true,
        TrackLineNumbers = true,
        DetectSeparatorHint = false,
        FormatProvider = CultureInfo.InvariantCulture,
    };

    /// <summary>Whether a record is a comment (first non-blank character '#') or blank.</summary>
    internal static bool IsCommentOrBlank(ReadOnlySpan<byte> raw)
    {
        ReadOnlySpan<byte> text = raw.TrimStart(" \t"u8);
        return text.IsEmpty || text[0] == (byte)'#';
    }

    private static Unit? OptionTemperatureUnit(string? symbol)
    {
        if (symbol is null)
        {
            return null;
        }
        if (!DataUnits.TryTemperature(symbol, out var unit))
        {
            throw new UsageException(
                $"--temperature-unit: {DataFileException.OneLine(DataUnits.UnknownTemperature(symbol))}");
        }
        return unit;
    }

    private static Unit? OptionPressureUnit(string? symbol)
    {
        if (symbol is null)
        {
            return null;
        }
        if (DataUnits.IsGauge(symbol))
        {
            throw new UsageException(
                $"--pressure-unit: gauge pressures are not accepted ('{DataFileException.OneLine(symbol)}') (use an absolute unit: {DataUnits.PressureChoices})");
        }
        if (!DataUnits.TryPressure(symbol, out var unit))
        {
            throw new UsageException(
                $"--pressure-unit: {DataFileException.OneLine(DataUnits.UnknownPressure(symbol))}");
        }
        return unit;
    }

    private static Layout ReadHeader(string[] cells, string origin, int line,
        Unit? defaultTemperature, Unit? defaultPressure)
    {
        if (cells.Any(cell => cell.Length > 0) && cells.All(cell => cell.Length == 0 || InvariantNumber().IsMatch(cell)))
        {
            throw new DataFileException(origin, line, null,
                "the first row holds numbers, not column names: a header row is required (e.g. 'T [K],P [kPa]')");
        }

        Column? temperature = null, pressure = null, uncertainty = null, weight = null, density = null;
        for (int index = 0; index < cells.Length; index++)
        {
            Column? column = ReadHeaderCell(index, cells[index], origin, line, defaultTemperature, defaultPressure);
            if (column is null)
            {
                continue;
            }

            ref Column? slot = ref temperature;
            switch (column.Role)
            {
                case Role.Pressure:
                    slot = ref pressure;
                    break;
                case Role.Uncertainty:
                    slot = ref uncertainty;
                    break;
                case Role.Weight:
                    slot = ref weight;
                    break;
                case Role.LiquidDensity:
                    slot = ref density;
                    break;
            }
            if (slot is not null)
            {
                throw new DataFileException(origin, line, column.Header,
                    $"ambiguous header: column '{slot.Header}' already holds the {Describe(column.Role)}; give it once");
            }
            slot = column;
        }

        if (temperature is null)
        {
            throw Missing(origin, line, cells, "temperature", "'T [unit]' or 'temperature [unit]'");
        }
        if (pressure is null)
        {
            throw Missing(origin, line, cells, "pressure", "'P [unit]', 'pressure [unit]' or 'Psat [unit]'");
        }
        if (uncertainty is not null && weight is not null)
        {
            throw new DataFileException(origin, line, weight.Header,
                $"give an uncertainty or a weight, not both: column '{uncertainty.Header}' already gives the uncertainty");
        }
        return new Layout(line, cells.Length, cells, temperature, pressure, uncertainty, weight, density);
    }

    private static DataFileException Missing(string origin, int line, string[] cells, string quantity, string forms)
    {
        string found = string.Join(", ", cells.Select(cell => $"'{cell}'"));
        return new DataFileException(origin, line, null,
            $"no {quantity} column: name one {forms} (the header has {found})");
    }

    private static string Describe(Role role) => role switch
    {
        Role.Temperature => "temperature",
        Role.Pressure => "pressure",
        Role.Uncertainty => "uncertainty of the pressure",
        Role.LiquidDensity => "saturated-liquid density",
        _ => "weight",
    };

    /// <summary>Recognises one header cell; null for a column this reader ignores.</summary>
    private static Column? ReadHeaderCell(int index, string header, string origin, int line,
        Unit? defaultTemperature, Unit? defaultPressure)
    {
        Match match = HeaderCell().Match(header);
        if (!match.Success)
        {
            return null;
        }
        string name = match.Groups["name"].Value;
        string? unit = match.Groups["unit"].Success ? match.Groups["unit"].Value.Trim() : null;
        if (unit is { Length: 0 })
        {
            bool known = Is(name, TemperatureNames) || Is(name, PressureNames) || Is(name, UncertaintyNames)
                || Is(name, [RelativeUncertaintyName, WeightName]) || Is(name, LiquidDensityNames);
            if (known)
            {
                throw new DataFileException(origin, line, header, "empty unit in brackets (write the unit, or leave out the brackets)");
            }
            return null;
        }

        if (Is(name, TemperatureNames))
        {
            return new Column(index, header, Role.Temperature)
            {
                TemperatureUnit = TemperatureUnitOf(unit, header, origin, line, defaultTemperature),
            };
        }
        if (Is(name, PressureNames))
        {
            return new Column(index, header, Role.Pressure)
            {
                PressureUnit = PressureUnitOf(unit, header, origin, line, defaultPressure),
            };
        }
        if (Is(name, UncertaintyNames))
        {
            return unit == "%"
                ? new Column(index, header, Role.Uncertainty) { Uncertainty = UncertaintyKind.RelativePercent }
                : new Column(index, header, Role.Uncertainty)
                {
                    Uncertainty = UncertaintyKind.Absolute,
                    PressureUnit = PressureUnitOf(unit, header, origin, line, defaultPressure),
                };
        }
        if (Is(name, [RelativeUncertaintyName]))
        {
            return unit switch
            {
                null => new Column(index, header, Role.Uncertainty) { Uncertainty = UncertaintyKind.RelativeFraction },
                "%" => new Column(index, header, Role.Uncertainty) { Uncertainty = UncertaintyKind.RelativePercent },
                _ => throw new DataFileException(origin, line, header,
                    $"a relative uncertainty has no unit other than '%' (found '{unit}'; without a unit it is a fraction, e.g. 0.003)"),
            };
        }
        if (Is(name, LiquidDensityNames))
        {
            if (unit is null || !UnitTable.TryFind(unit, out var densityUnit, Dimension.AmountDensity, Dimension.MassDensity) || densityUnit is null)
            {
                throw new DataFileException(origin, line, header,
                    unit is null ? "no density unit: write it in brackets (e.g. 'rho_L [kg/m3]' or 'rho_L [mol/L]')" : $"'{unit}' is not a density unit (use mol/m3, mol/L, kg/m3 or g/cm3)");
            }

            return new Column(index, header, Role.LiquidDensity) { DensityUnit = densityUnit };
        }
        if (Is(name, [WeightName]))
        {
            if (unit is not null and not "-" and not "1")
            {
                throw new DataFileException(origin, line, header, $"a weight is dimensionless (found the unit '{unit}')");
            }
            return new Column(index, header, Role.Weight);
        }
        return null;
    }

    private static bool Is(string name, string[] names)
        => names.Any(candidate => string.Equals(candidate, name, StringComparison.OrdinalIgnoreCase));

    private static Unit TemperatureUnitOf(string? unit, string header, string origin, int line,
        Unit? fallback)
    {
        if (unit is null)
        {
            return fallback ?? throw new DataFileException(origin, line, header,
                "no temperature unit: write it in brackets (e.g. 'T [K]' or 'T [degC]') or give --temperature-unit");
        }
        if (!DataUnits.TryTemperature(unit, out var found))
        {
            throw new DataFileException(origin, line, header,
                DataUnits.UnknownTemperature(unit));
        }

        RequireAgreement(found, fallback, "--temperature-unit", header, origin, line);
        return found;
    }

    /// <summary>An option that names a column's unit and a header that names another one
    /// contradict each other: refused, not silently resolved in favour of either.</summary>
    private static void RequireAgreement(Unit header, Unit? option, string optionName, string column, string origin, int line)
    {
        if (option is not null && option != header)
        {
            throw new DataFileException(origin, line, column,
                $"the header gives the unit '{header.Symbol}' but {optionName} says '{option.Symbol}': give the unit in one place");
        }
    }

    private static Unit PressureUnitOf(string? unit, string header, string origin, int line,
        Unit? fallback)
    {
        if (unit is null)
        {
            return fallback ?? throw new DataFileException(origin, line, header,
                "no pressure unit: write it in brackets (e.g. 'P [kPa]') or give --pressure-unit");
        }
        if (DataUnits.IsGauge(unit))
        {
            throw new DataFileException(origin, line, header,
                $"gauge pressures are not accepted ('{unit}'; use an absolute unit: {DataUnits.PressureChoices})");
        }
        if (!DataUnits.TryPressure(unit, out var found))
        {
            throw new DataFileException(origin, line, header,
                DataUnits.UnknownPressure(unit));
        }

        RequireAgreement(found, fallback, "--pressure-unit", header, origin, line);
        return found;
    }

    private static VapourPressureRecord ReadRow(string[] fields, Layout layout, string origin, int line)
    {
        if (fields.Length < layout.FieldCount)
        {
            throw new DataFileException(origin, line, layout.Headers[fields.Length],
                $"missing: the row has {fields.Length} {Fields(fields.Length)}, the header has {layout.FieldCount}");
        }
        if (fields.Length > layout.FieldCount)
        {
            throw new DataFileException(origin, line, null,
                $"the row has {fields.Length} {Fields(fields.Length)}, the header has {layout.FieldCount} (the separator is a comma: write decimals with a dot, and quote a note that holds a comma)");
        }

        Column t = layout.Temperature;
        (double tValue, string tExact) = Number(fields, t, origin, line);
        double temperature = DataUnits.ToSi(t.TemperatureUnit!, tValue, tExact);
        if (!(temperature > 0.0))
        {
            throw new DataFileException(origin, line, t.Header,
                $"temperature is {Format(temperature)} K, not above absolute zero");
        }

        Column p = layout.Pressure;
        (double pValue, string pExact) = Number(fields, p, origin, line);
        double pressure = DataUnits.ToSi(p.PressureUnit!, pValue, pExact);
        if (!(pressure > 0.0) || !double.IsFinite(pressure))
        {
            throw new DataFileException(origin, line, p.Header,
                double.IsFinite(pressure) ? "pressure is not above zero (an absolute pressure must be > 0)" : "pressure is too large");
        }

        double? uncertainty = null;
        if (layout.Uncertainty is Column u)
        {
            (double uValue, string uExact) = Number(fields, u, origin, line);
            if (!(uValue > 0.0))
            {
                throw new DataFileException(origin, line, u.Header, "the uncertainty must be greater than zero");
            }
            uncertainty = u.Uncertainty switch
            {
                UncertaintyKind.Absolute => DataUnits.ToSi(u.PressureUnit!, uValue, uExact),
                UncertaintyKind.RelativeFraction => uValue * pressure,
                _ => uValue / 100.0 * pressure,
            };
            if (!double.IsFinite(uncertainty.Value) || uncertainty.Value <= 0.0)
            {
                throw new DataFileException(origin, line, u.Header,
                    $"the uncertainty is {Format(uncertainty.Value)} Pa, not a usable positive number");
            }
        }

        double? weight = null;
        if (layout.Weight is Column w)
        {
            (double wValue, _) = Number(fields, w, origin, line);
            if (!(wValue > 0.0))
            {
                throw new DataFileException(origin, line, w.Header, "the weight must be greater than zero");
            }
            weight = wValue;
        }

        LiquidDensity? liquidDensity = null;
        if (layout.LiquidDensity is Column d && fields[d.Index].Length > 0)
        {
            // An empty cell: no density measured at this temperature.
            (double dValue, string dExact) = Number(fields, d, origin, line);
            double si = DataUnits.ToSi(d.DensityUnit!, dValue, dExact);
            if (!(si > 0.0) || !double.IsFinite(si))
            {
                throw new DataFileException(origin, line, d.Header, "the liquid density must be a positive number");
            }
            liquidDensity = new LiquidDensity(si, d.DensityUnit!.Dimension == Dimension.MassDensity);
        }

        return new VapourPressureRecord(temperature, pressure, uncertainty, weight, line) { LiquidDensity = liquidDensity };
    }

    private static string Fields(int count) => count == 1 ? "field" : "fields";

    /// <summary>Reads a cell as an invariant-culture number: its double value, and its decimal
    /// text (for exact decimal unit conversion).</summary>
    private static (double Value, string Text) Number(string[] fields, Column column, string origin, int line)
    {
        string text = fields[column.Index];
        if (text.Length == 0)
        {
            throw new DataFileException(origin, line, column.Header, "empty cell");
        }
        if (!InvariantNumber().IsMatch(text))
        {
            throw new DataFileException(origin, line, column.Header,
                $"'{text}' is not a number (use a dot as the decimal separator and no digit grouping, e.g. '101.325')");
        }

        const NumberStyles style = NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent;
        double value = double.Parse(text, style, CultureInfo.InvariantCulture);
        if (!double.IsFinite(value))
        {
            throw new DataFileException(origin, line, column.Header, $"'{text}' is too large");
        }
        return (value, text);
    }

    private static string Format(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
