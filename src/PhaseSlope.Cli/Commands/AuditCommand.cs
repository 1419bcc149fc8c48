using System.CommandLine;
using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope audit --form FORM --coefficients A,B,C ...</c>: checks a published
/// vapour-pressure correlation in its own convention; exit 8 when a check fails.</summary>
internal static class AuditCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var form = new Option<string>("--form") { Description = $"Printed form: {string.Join(", ", PublishedCorrelation.FormIds)}", Required = true };
        var coefficients = new Option<string>("--coefficients") { Description = "Coefficients as printed, comma-separated (A,B,C for antoine and kirchhoff, A,B for clausius-clapeyron, A,B,C,D for riedel); bare numbers in the printed form's own units", Required = true };
        var logBase = new Option<string>("--log-base") { Description = "Logarithm of the printed form: 10 or e (omit to detect)" };
        var pressureUnit = new Option<string>("--correlation-pressure-unit") { Description = "Pressure unit of the printed form: Pa, kPa, MPa, bar, mmHg (conventional, 133.322387415 Pa), torr, atm, psi (omit to detect; detection never picks torr)" };
        var temperatureUnit = new Option<string>("--correlation-temperature-unit") { Description = "Temperature of the printed form: K or degC (degC for antoine only; omit to detect)" };
        var range = new Option<string>("--range") { Description = "Stated range TMIN,TMAX (bare numbers in --correlation-temperature-unit if given, else K; or with units, e.g. \"1 degC,100 degC\")" };
        var data = new Option<string>("--data") { Description = "CSV file of measured vapour pressures with units in the headers (see docs/data-files.md)" };
        var fluid = new Option<string>("--fluid") { Description = "Catalog fluid or fluid file: normal boiling point, Tc and the model's vapour pressure to test against" };
        var against = new Option<string>("--against") { Description = "Form of a second correlation to compare with" };
        var coefficients2 = new Option<string>("--coefficients2") { Description = "Coefficients of the second correlation, as printed (bare numbers in its own convention: --log-base2, --correlation-pressure-unit2, --correlation-temperature-unit2)" };
        var logBase2 = new Option<string>("--log-base2") { Description = "Log base of the second correlation (default: the first's)" };
        var pressureUnit2 = new Option<string>("--correlation-pressure-unit2") { Description = "Pressure unit of the second correlation (default: the first's)" };
        var temperatureUnit2 = new Option<string>("--correlation-temperature-unit2") { Description = "Temperature unit of the second correlation (default: the first's)" };
        var threshold = new Option<string>("--threshold") { Description = "Difference above which the two correlations disagree (bare number: percent; default 1)" };
        var format = new Option<string>("--format") { Description = "Output format: table or json", DefaultValueFactory = _ => "table" };
        var common = new CommonOptions();
        var eos = common.Eos;
        eos.Description += "; the model whose vapour pressure --fluid's checks use (needs --fluid)";
        var command = new Command("audit", "Audit a published vapour-pressure correlation in its own convention: detect or confirm log base and units, and check it; exit 8 when a check fails");
        var output = new OutputOption();
        foreach (var o in new Option[] { form, coefficients, logBase, pressureUnit, temperatureUnit, range, data, fluid, against, coefficients2, logBase2, pressureUnit2, temperatureUnit2, threshold, format, eos, output.Option })
        {
            command.Options.Add(o);
        }

        command.SetAction(parse =>
        {
            AuditReport? report = null;
            int code = io.Guard(() =>
            {
                string fmt = (parse.GetValue(format) ?? "table").ToLowerInvariant();
                if (fmt is not ("table" or "json"))
                {
                    throw new UsageException($"--format: unknown format '{fmt}' (use table or json)");
                }

                var correlation = Correlation(parse.GetValue(form)!, parse.GetValue(coefficients)!, "--form", "--coefficients");
                var lb = parse.GetValue(logBase) is string b ? Base(b, "--log-base") : (LogBase?)null;
                var pu = parse.GetValue(pressureUnit) is string p ? Pressure(p, "--correlation-pressure-unit") : (PublishedPressureUnit?)null;
                var tu = parse.GetValue(temperatureUnit) is string t ? Temperature(t, "--correlation-temperature-unit", correlation) : (PublishedTemperatureUnit?)null;
                (double, double)? tRange = parse.GetValue(range) is string r ? Range(r, tu) : null;
                PublishedCorrelation? second = null;
                if (parse.GetValue(against) is string a)
                {
                    second = Correlation(a, parse.GetValue(coefficients2) ?? throw new UsageException("--against: needs --coefficients2"), "--against", "--coefficients2");
                }
                else if (parse.GetValue(coefficients2) is not null || parse.GetValue(logBase2) is not null || parse.GetValue(pressureUnit2) is not null || parse.GetValue(temperatureUnit2) is not null || parse.GetValue(threshold) is not null)
                {
                    throw new UsageException("--coefficients2, --log-base2, --correlation-pressure-unit2, --correlation-temperature-unit2 and --threshold need --against");
                }

                double limit = 0.01;
                if (parse.GetValue(threshold) is string th)
                {
                    limit = double.TryParse(th, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v) && v > 0 && v < 100
                        ? v / 100 : throw new UsageException($"--threshold: '{th}' is not a percentage between 0 and 100");
                }

                // --eos is read (and checked) before the fluid; it chooses the model the fluid's checks use.
                var kind = common.ModelKind(parse);
                if (CommonOptions.Given(parse, eos) && parse.GetValue(fluid) is null)
                {
                    throw new UsageException("--eos: needs --fluid (the model's vapour pressure is computed for that fluid)");
                }

                var theFluid = parse.GetValue(fluid) is string f ? FluidResolver.Resolve(f) : null;
                var dataPoints = parse.GetValue(data) is string path ? ReadData(path) : null;
                if (tRange is null && dataPoints is null && theFluid is null)
                {
                    throw new UsageException("audit: give --range, --data or --fluid (there is no temperature range to audit)");
                }

                var solver = theFluid is null ? null : new CoexistenceSolver(Core.Models.CubicModel.For(kind, theFluid), CoexistenceSolver.LowestValidTemperature(theFluid));
                report = CorrelationAuditor.Audit(new AuditRequest
                {
                    Correlation = correlation,
                    LogBase = lb,
                    PressureUnit = pu,
                    TemperatureUnit = tu,
                    Range = tRange,
                    Data = dataPoints,
                    Fluid = theFluid,
                    Solver = solver,
                    Against = second,
                    AgainstLogBase = parse.GetValue(logBase2) is string b2 ? Base(b2, "--log-base2") : null,
                    AgainstPressureUnit = parse.GetValue(pressureUnit2) is string p2 ? Pressure(p2, "--correlation-pressure-unit2") : null,
                    AgainstTemperatureUnit = parse.GetValue(temperatureUnit2) is string t2 && second is not null ? Temperature(t2, "--correlation-temperature-unit2", second) : null,
                    AgainstThreshold = limit,
                });
                output.Emit(io, parse, fmt == "json" ? Json(report, solver?.Model.Identity) : Table(report), "the audit report");
            });
            return code == ExitCodes.Success && report is { Failed: true } ? ExitCodes.AuditFailed : code;
        });
        return command;
    }

    private static PublishedCorrelation Correlation(string formText, string coefficientText, string formOption, string coefficientOption)
    {
        string id = formText.Trim().ToLowerInvariant();
        if (!PublishedCorrelation.FormIds.Contains(id))
        {
            throw new UsageException($"{formOption}: unknown form '{formText}' (use {string.Join(", ", PublishedCorrelation.FormIds)})");
        }

        var values = new List<double>();
        foreach (string part in coefficientText.Split(','))
        {
            values.Add(double.TryParse(part.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v)
                ? v : throw new UsageException($"{coefficientOption}: '{part.Trim()}' is not a number (comma-separated, dot as decimal separator)"));
        }

        int expected = PublishedCorrelation.CoefficientCount(id);
        return values.Count == expected
            ? new PublishedCorrelation(id, values)
            : throw new UsageException($"{coefficientOption}: the {id} form takes {expected} coefficients, got {values.Count}");
    }

    private static LogBase Base(string text, string option)
        => PublishedConvention.TryParseLogBase(text, out var b) ? b : throw new UsageException($"{option}: unknown log base '{text}' (use 10 or e)");

    private static PublishedPressureUnit Pressure(string text, string option)
        => PublishedConvention.TryParsePressureUnit(text, out var u) ? u : throw new UsageException(
            UnitTable.TryFind(text, out _, Dimension.Pressure)
                ? $"{option}: pressure unit '{DataFileException.OneLine(text.Trim())}' is not offered for published correlations (use Pa, kPa, MPa, bar, mmHg, torr, atm or psi)"
                : $"{option}: {DataFileException.OneLine(UnitTable.UnknownMessage(text, "pressure", Dimension.Pressure))}");

    private static PublishedTemperatureUnit Temperature(string text, string option, PublishedCorrelation correlation)
    {
        if (!PublishedConvention.TryParseTemperatureUnit(text, out var u))
        {
            throw new UsageException(UnitTable.TryFind(text, out _, Dimension.Temperature)
                ? $"{option}: temperature unit '{DataFileException.OneLine(text.Trim())}' is not offered for published correlations (use K or degC)"
                : $"{option}: {DataFileException.OneLine(UnitTable.UnknownMessage(text, "temperature", Dimension.Temperature))}");
        }

        return u == PublishedTemperatureUnit.Celsius && !correlation.AllowsCelsius
            ? throw new UsageException($"{option}: the {correlation.FormId} form takes T in K only")
            : u;
    }

    private static (double, double) Range(string text, PublishedTemperatureUnit? unit)
    {
        string[] parts = text.Split(',');
        if (parts.Length != 2)
        {
            throw new UsageException($"--range: expected TMIN,TMAX, got '{text}'");
        }

        double Parse(string s)
        {
            string v = s.Trim();
            bool bare = double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out _);
            return QuantityParser.ParseTemperature(bare && unit == PublishedTemperatureUnit.Celsius ? v + " degC" : v, "--range");
        }

        double lo = Parse(parts[0]);
        double hi = Parse(parts[1]);
        return hi > lo ? (lo, hi) : throw new UsageException($"--range: TMIN ({NumberText.Table(lo)} K) must be below TMAX ({NumberText.Table(hi)} K)");
    }

    private static List<VapourPressurePoint> ReadData(string path)
    {
        IReadOnlyList<VapourPressureRecord> records;
        try
        {
            using var reader = new StreamReader(BoundedInput.Open(path, BoundedInput.DataFileLimit));
            records = VapourPressureCsv.Read(reader, path, new VapourPressureCsvOptions());
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new DataFileException(path, null, null, "data file not found", ex);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new DataFileException(path, null, null, $"cannot read data file: {ex.Message}", ex);
        }

        return [.. records.Select(r => new VapourPressurePoint(r.Temperature, r.Pressure, r.StandardUncertainty, r.Weight))];
    }

    private static string Severity(AuditSeverity s) => s switch { AuditSeverity.Pass => "pass", AuditSeverity.Warn => "warn", _ => "fail" };

    private static string Table(AuditReport report)
    {
        var text = new StringBuilder();
        text.AppendLine(report.Convention is null
            ? "convention: not determined"
            : $"convention: {report.Convention} ({(report.Detected ? "detected" : "stated")})");
        if (report.SiCoefficients is double[] si)
        {
            text.AppendLine("SI form (ln(P/Pa), T in K): " + string.Join(", ", si.Select(NumberText.RoundTrip)));
        }

        text.AppendLine($"range: {NumberText.Table(report.MinimumTemperature)} K to {NumberText.Table(report.MaximumTemperature)} K");
        var table = new TextTable(["check", "severity", "message"], [false, false, false]);
        foreach (var f in report.Findings)
        {
            table.Add(f.Check, Severity(f.Severity), f.Message);
        }

        text.Append(table.Render());
        text.AppendLine("Caution: a wrong convention or an extrapolated correlation can give pressures off by orders of magnitude; for vessels and relief systems rely on measured data and your local codes.");
        return text.ToString();
    }

    private static string Json(AuditReport report, Core.Models.ModelIdentity? model)
    {
        return JsonText.Write(w =>
        {
            w.WriteStartObject();
            if (model is not null)
            {
                // The model whose vapour pressure the --fluid checks used, named in full.
                ModelText.WriteJson(w, model);
            }

            w.WritePropertyName("detected");
            if (report.Convention is PublishedConvention c)
            {
                WriteConvention(w, c);
            }
            else
            {
                w.WriteStartObject();
                w.WriteNull("log_base");
                w.WriteNull("pressure_unit");
                w.WriteNull("temperature_unit");
                w.WriteEndObject();
            }

            w.WriteBoolean("inferred", report.Detected);
            w.WriteStartArray("evidence");
            foreach (var candidate in new[] { report.Best, report.RunnerUp })
            {
                if (candidate is null)
                {
                    continue;
                }

                w.WriteStartObject();
                w.WritePropertyName("convention");
                WriteConvention(w, candidate.Convention);
                Number(w, "score", candidate.Score);
                w.WriteStartArray("anchors");
                foreach (var e in candidate.Evidence)
                {
                    w.WriteStartObject();
                    w.WriteString("anchor", e.Anchor);
                    Number(w, "deviation_percent", e.Percent);
                    w.WriteEndObject();
                }

                w.WriteEndArray();
                w.WriteEndObject();
            }

            w.WriteEndArray();
            if (report.RunnerUp is not null)
            {
                w.WritePropertyName("runner_up");
                WriteConvention(w, report.RunnerUp.Convention);
            }

            if (report.SiCoefficients is double[] si)
            {
                w.WriteStartArray("si_coefficients");
                foreach (double v in si)
                {
                    w.WriteFiniteValue(v, "si_coefficients");
                }

                w.WriteEndArray();
            }

            Number(w, "range_min_K", report.MinimumTemperature);
            Number(w, "range_max_K", report.MaximumTemperature);
            w.WriteStartArray("findings");
            foreach (var f in report.Findings)
            {
                w.WriteStartObject();
                w.WriteString("check", f.Check);
                w.WriteString("severity", Severity(f.Severity));
                w.WriteString("message", f.Message);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        });
    }

    private static void Number(Utf8JsonWriter w, string name, double v)
    {
        if (double.IsFinite(v))
        {
            w.WriteFinite(name, v);
        }
        else
        {
            w.WriteNull(name);
        }
    }

    private static void WriteConvention(Utf8JsonWriter w, PublishedConvention c)
    {
        w.WriteStartObject();
        w.WriteString("log_base", PublishedConvention.Symbol(c.LogBase));
        w.WriteString("pressure_unit", PublishedConvention.Symbol(c.PressureUnit));
        w.WriteString("temperature_unit", PublishedConvention.Symbol(c.TemperatureUnit));
        w.WriteEndObject();
    }
}
