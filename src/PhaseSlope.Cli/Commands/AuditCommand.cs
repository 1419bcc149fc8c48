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
        var options = new AuditOptions();
        var command = new Command("audit", "Audit a published vapour-pressure correlation in its own convention: detect or confirm log base and units, and check it; exit 8 when a check fails");
        options.AddTo(command);
        command.SetAction(parse =>
        {
            AuditReport? report = null;
            int code = io.Guard(() =>
            {
                var run = options.Bind(parse);
                report = CorrelationAuditor.Audit(run.Request);
                options.Out.Emit(io, parse, run.Format == OutputFormat.Json ? Json(report, run.Request.Solver?.Model.Identity) : Table(report), "the audit report");
            });
            return code == ExitCodes.Success && report is { Failed: true } ? ExitCodes.AuditFailed : code;
        });
        return command;
    }

    internal static PublishedCorrelation Correlation(string formText, string coefficientText, string formOption, string coefficientOption)
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

        var names = PublishedCorrelation.CoefficientNames(id);
        return values.Count == names.Count
            ? new PublishedCorrelation(id, values)
            : throw new UsageException($"{coefficientOption}: the {id} form takes {names.Count} coefficients ({string.Join(",", names)}), got {values.Count}");
    }

    /// <summary>Refuses a stated log base or temperature scale the form cannot be printed in.</summary>
    internal static void RequireAdmitted(string formId, LogBase? logBase, string logBaseOption, PublishedTemperatureUnit? temperatureUnit, string temperatureOption)
    {
        if (PublishedCorrelation.Refusal(formId, logBase, null) is string baseWhy)
        {
            throw new UsageException($"{logBaseOption}: {baseWhy}");
        }

        if (PublishedCorrelation.Refusal(formId, null, temperatureUnit) is string scaleWhy)
        {
            throw new UsageException($"{temperatureOption}: {scaleWhy}");
        }
    }

    internal static LogBase Base(string text, string option)
        => PublishedConvention.TryParseLogBase(text, out var b) ? b : throw new UsageException($"{option}: unknown log base '{text}' (use 10 or e)");

    internal static PublishedPressureUnit Pressure(string text, string option)
        => PublishedConvention.TryParsePressureUnit(text, out var u) ? u : throw new UsageException(
            UnitTable.TryFind(text, out _, Dimension.Pressure)
                ? $"{option}: pressure unit '{DataFileException.OneLine(text.Trim())}' is not offered for published correlations (use Pa, kPa, MPa, bar, mmHg, torr, atm or psi)"
                : $"{option}: {DataFileException.OneLine(UnitTable.UnknownMessage(text, "pressure", Dimension.Pressure))}");

    /// <summary>K, degC, degF or degR: every temperature unit of the one table is offered.</summary>
    internal static PublishedTemperatureUnit Temperature(string text, string option)
        => PublishedConvention.TryParseTemperatureUnit(text, out var u) ? u
            : throw new UsageException($"{option}: {DataFileException.OneLine(UnitTable.UnknownMessage(text, "temperature", Dimension.Temperature))}");

    internal static (double, double) Range(string text, PublishedTemperatureUnit? unit)
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
            return QuantityParser.ParseTemperature(bare && unit is PublishedTemperatureUnit u ? $"{v} {PublishedConvention.Symbol(u)}" : v, "--range");
        }

        double lo = Parse(parts[0]);
        double hi = Parse(parts[1]);
        return hi > lo ? (lo, hi) : throw new UsageException($"--range: TMIN ({NumberText.Table(lo)} K) must be below TMAX ({NumberText.Table(hi)} K)");
    }

    private static string Severity(AuditSeverity s) => s switch { AuditSeverity.Pass => "pass", AuditSeverity.Warn => "warn", _ => "fail" };

    /// <summary>The audit report as the table output prints it (the HTML report shows the same text).</summary>
    internal static string Table(AuditReport report)
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
                Number(w, "separation", candidate.Separation);
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

/// <summary>The checked inputs of <c>audit</c>: the core's request and the output format.</summary>
/// <param name="Request">What to audit and against what.</param>
/// <param name="Format">Table or JSON.</param>
internal sealed record AuditRun(AuditRequest Request, OutputFormat Format);

/// <summary>The options of <c>audit</c>, bound to an <see cref="AuditRun"/>.</summary>
internal sealed class AuditOptions
{
    /// <summary>--form.</summary>
    public Option<string> Form { get; } = new("--form") { Description = $"Printed form: {string.Join(", ", PublishedCorrelation.FormIds)}", Required = true };

    /// <summary>--coefficients.</summary>
    public Option<string> Coefficients { get; } = new("--coefficients") { Description = "Coefficients as printed, comma-separated (A,B,C for antoine and kirchhoff, A,B for clausius-clapeyron, A,B,C,D for riedel, A,B,C,D,E,F,G for antoine-extended, a,b,c,d,Tc,Pc for wagner-3-6 and wagner-2.5-5, a,b,c,d,e,f,Tc,Pc for wagner-6); bare numbers in the printed form's own units (Tc and Pc in the correlation's temperature and pressure units)", Required = true };

    /// <summary>--log-base.</summary>
    public Option<string> LogBase { get; } = new("--log-base") { Description = "Logarithm of the printed form: 10 or e (e only for the Wagner forms; omit to detect)" };

    /// <summary>--correlation-pressure-unit.</summary>
    public Option<string> PressureUnit { get; } = new("--correlation-pressure-unit") { Description = "Pressure unit of the printed form: Pa, kPa, MPa, bar, mmHg (conventional, 133.322387415 Pa), torr, atm, psi (omit to detect; detection never picks torr)" };

    /// <summary>--correlation-temperature-unit.</summary>
    public Option<string> TemperatureUnit { get; } = new("--correlation-temperature-unit") { Description = "Temperature of the printed form: K, degC, degF or degR (degC and degF for antoine, and for the Wagner forms' Tc; omit to detect, which tries K and degC)" };

    /// <summary>--range.</summary>
    public Option<string> Range { get; } = new("--range") { Description = "Stated range TMIN,TMAX (bare numbers in --correlation-temperature-unit if given, else K; or with units, e.g. \"1 degC,100 degC\")" };

    /// <summary>--data.</summary>
    public Option<string> Data { get; } = new("--data") { Description = "CSV file of measured vapour pressures with units in the headers (see docs/data-files.md)" };

    /// <summary>--fluid.</summary>
    public Option<string> Fluid { get; } = new("--fluid") { Description = "Catalog fluid or fluid file: normal boiling point, Tc and the model's vapour pressure to test against" };

    /// <summary>--against.</summary>
    public Option<string> Against { get; } = new("--against") { Description = "Form of a second correlation to compare with" };

    /// <summary>--coefficients2.</summary>
    public Option<string> Coefficients2 { get; } = new("--coefficients2") { Description = "Coefficients of the second correlation, as printed (bare numbers in its own convention: --log-base2, --correlation-pressure-unit2, --correlation-temperature-unit2)" };

    /// <summary>--log-base2.</summary>
    public Option<string> LogBase2 { get; } = new("--log-base2") { Description = "Log base of the second correlation (default: the first's)" };

    /// <summary>--correlation-pressure-unit2.</summary>
    public Option<string> PressureUnit2 { get; } = new("--correlation-pressure-unit2") { Description = "Pressure unit of the second correlation (default: the first's)" };

    /// <summary>--correlation-temperature-unit2.</summary>
    public Option<string> TemperatureUnit2 { get; } = new("--correlation-temperature-unit2") { Description = "Temperature unit of the second correlation (default: the first's)" };

    /// <summary>--threshold.</summary>
    public Option<string> Threshold { get; } = new("--threshold") { Description = "Difference above which the two correlations disagree (bare number: percent; default 1)" };

    /// <summary>--format (table or json; there is no audit CSV).</summary>
    public Option<string> Format { get; } = new("--format") { Description = "Output format: table or json", DefaultValueFactory = _ => "table" };

    /// <summary>--eos.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Common.Eos.Description += "; the model whose vapour pressure --fluid's checks use (needs --fluid)";
        foreach (var o in new Option[] { Form, Coefficients, LogBase, PressureUnit, TemperatureUnit, Range, Data, Fluid, Against, Coefficients2, LogBase2, PressureUnit2, TemperatureUnit2, Threshold, Format, Common.Eos, Out.Option })
        {
            command.Options.Add(o);
        }
    }

    /// <summary>Parses and checks every option, then reads the fluid and the data file.</summary>
    public AuditRun Bind(ParseResult parse)
    {
        string fmt = (parse.GetValue(Format) ?? "table").Trim().ToLowerInvariant();
        var format = fmt switch
        {
            "table" => OutputFormat.Table,
            "json" => OutputFormat.Json,
            _ => throw new UsageException($"--format: unknown format '{fmt}' (use table or json)"),
        };

        var correlation = AuditCommand.Correlation(parse.GetValue(Form)!, parse.GetValue(Coefficients)!, "--form", "--coefficients");
        var logBase = parse.GetValue(LogBase) is string b ? AuditCommand.Base(b, "--log-base") : (LogBase?)null;
        var pressureUnit = parse.GetValue(PressureUnit) is string p ? AuditCommand.Pressure(p, "--correlation-pressure-unit") : (PublishedPressureUnit?)null;
        var temperatureUnit = parse.GetValue(TemperatureUnit) is string t ? AuditCommand.Temperature(t, "--correlation-temperature-unit") : (PublishedTemperatureUnit?)null;
        AuditCommand.RequireAdmitted(correlation.FormId, logBase, "--log-base", temperatureUnit, "--correlation-temperature-unit");
        (double, double)? range = parse.GetValue(Range) is string r ? AuditCommand.Range(r, temperatureUnit) : null;
        PublishedCorrelation? second = null;
        if (parse.GetValue(Against) is string a)
        {
            second = AuditCommand.Correlation(a, parse.GetValue(Coefficients2) ?? throw new UsageException("--against: needs --coefficients2"), "--against", "--coefficients2");
        }
        else if (new[] { Coefficients2, LogBase2, PressureUnit2, TemperatureUnit2, Threshold }.Any(o => parse.GetValue(o) is not null))
        {
            throw new UsageException("--coefficients2, --log-base2, --correlation-pressure-unit2, --correlation-temperature-unit2 and --threshold need --against");
        }

        double limit = 0.01;
        if (parse.GetValue(Threshold) is string th)
        {
            limit = double.TryParse(th, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v) && v > 0 && v < 100
                ? v / 100 : throw new UsageException($"--threshold: '{th}' is not a percentage between 0 and 100");
        }

        var againstLogBase = parse.GetValue(LogBase2) is string b2 ? AuditCommand.Base(b2, "--log-base2") : (LogBase?)null;
        var againstPressureUnit = parse.GetValue(PressureUnit2) is string p2 ? AuditCommand.Pressure(p2, "--correlation-pressure-unit2") : (PublishedPressureUnit?)null;
        var againstTemperatureUnit = parse.GetValue(TemperatureUnit2) is string t2 && second is not null ? AuditCommand.Temperature(t2, "--correlation-temperature-unit2") : (PublishedTemperatureUnit?)null;
        if (second is not null)
        {
            AuditCommand.RequireAdmitted(second.FormId, againstLogBase, "--log-base2", againstTemperatureUnit, "--correlation-temperature-unit2");
        }

        // --eos is read (and checked) before the fluid; it chooses the model the fluid's checks use.
        var kind = Common.ModelKind(parse);
        if (CommonOptions.Given(parse, Common.Eos) && parse.GetValue(Fluid) is null)
        {
            throw new UsageException("--eos: needs --fluid (the model's vapour pressure is computed for that fluid)");
        }

        if (range is null && parse.GetValue(Data) is null && parse.GetValue(Fluid) is null)
        {
            throw new UsageException("audit: give --range, --data or --fluid (there is no temperature range to audit)");
        }

        _ = Out.Path(parse);
        var fluid = parse.GetValue(Fluid) is string f ? FluidResolver.Resolve(f) : null;
        var data = parse.GetValue(Data) is string path ? CorrelationOptions.ReadDataFile(path, null, null) : null;
        var solver = fluid is null ? null : new CoexistenceSolver(Core.Models.CubicModel.For(kind, fluid), fluid);
        return new AuditRun(new AuditRequest
        {
            Correlation = correlation,
            LogBase = logBase,
            PressureUnit = pressureUnit,
            TemperatureUnit = temperatureUnit,
            Range = range,
            Data = data,
            Fluid = fluid,
            Solver = solver,
            Against = second,
            AgainstLogBase = againstLogBase,
            AgainstPressureUnit = againstPressureUnit,
            AgainstTemperatureUnit = againstTemperatureUnit,
            AgainstThreshold = limit,
        }, format);
    }
}
