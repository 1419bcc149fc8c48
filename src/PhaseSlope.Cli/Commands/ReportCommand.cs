using System.CommandLine;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Reporting;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope report FLUID|MIXTURE --out FILE.html [--data FILE.csv]</c>: one
/// self-contained HTML page with every number about a fluid (or a mixture), where it came from
/// and how far to trust it.</summary>
internal static class ReportCommand
{
    /// <summary>Builds the command; its action writes the page to the --out file only.</summary>
    public static Command Create(CliIo io)
    {
        var options = new ReportOptions();
        var command = new Command("report", "Write one self-contained HTML report of a fluid or mixture: constants with sources and uncertainties, the model, "
            + "the saturation table, latent heat, Clapeyron slope, vapour-line class and figures; with --data the fit, its residuals, the latent heat from "
            + "the data and the audit; for a mixture its envelope");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            // Built in memory first: a failure never touches the output file.
            string html = request.Mixture is { } mixture ? MixtureReport.Build(mixture, request) : FluidReport.Build(request, io);
            AtomicFile.WriteAllText(request.Path, html);
            io.Note($"wrote the report to {request.Path}");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>report</c>.</summary>
/// <param name="Path">The HTML file.</param>
/// <param name="Fluid">The pure fluid, or null for a mixture.</param>
/// <param name="Mixture">The mixture, or null for a pure fluid.</param>
/// <param name="Model">--eos, --alpha and --volume-shift.</param>
/// <param name="Units">Units of the tables and figures.</param>
/// <param name="Step">The saturation table's temperature step in K, or null for a round step giving about
/// <see cref="ReportOptions.DefaultRows"/> rows.</param>
/// <param name="Data">The measured vapour pressures, or null.</param>
/// <param name="DataPath">The data file as given, or null.</param>
/// <param name="Command">The command line without --out, shown in the report.</param>
/// <param name="DataDescription">The data file's leading '#' lines (its own description), or empty.</param>
internal sealed record ReportRequest(string Path, Fluid? Fluid, MixtureInput? Mixture, ModelChoice Model, UnitSystem Units, double? Step,
    IReadOnlyList<VapourPressurePoint>? Data, string? DataPath, string Command, IReadOnlyList<string> DataDescription);

/// <summary>The options of <c>report</c>, bound to a <see cref="ReportRequest"/>.</summary>
internal sealed class ReportOptions
{
    /// <summary>Rows of the saturation table when no --step is given (the step is the 1-2-5 value
    /// at or above a fifteenth of the range).</summary>
    public const int DefaultRows = 20;

    /// <summary>Most leading comment lines of a data file shown as its description.</summary>
    public const int MaximumDescriptionLines = 40;

    /// <summary>--eos, --alpha, --volume-shift, --units.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>FLUID or MIXTURE.</summary>
    public Argument<string> Subject { get; } = new("FLUID")
    {
        Description = "Catalog name, fluid file or inline:... definition; or a MIXTURE: NAME=FRACTION,NAME=FRACTION,... (mole fractions) or a mixture file",
    };

    /// <summary>--out (the HTML file).</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "The HTML file to write (.html or .htm); written atomically, an existing file is replaced only when the report is complete", Required = true };

    /// <summary>--data.</summary>
    public Option<string> Data { get; } = new("--data") { Description = "CSV of measured vapour pressures (as for fit): adds the fit, its residuals, the latent heat from the data with its band and the audit of the fitted correlation (pure fluids)" };

    /// <summary>--temperature-unit (the data file's).</summary>
    public Option<string> TemperatureUnit { get; } = CorrelationOptions.DataTemperatureUnit();

    /// <summary>--pressure-unit (the data file's).</summary>
    public Option<string> PressureUnit { get; } = CorrelationOptions.DataPressureUnit();

    /// <summary>--step.</summary>
    public Option<string> Step { get; } = new("--step")
    {
        Description = $"Temperature step of the saturation table, e.g. 10 K (bare number: K); the table starts at the first multiple of the step, in the table's unit, above the lowest valid temperature and ends at the critical point; default: the 1-2-5 step giving at most about {DefaultRows} rows (pure fluids)",
    };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Subject);
        command.Options.Add(Out);
        command.Options.Add(Data);
        command.Options.Add(TemperatureUnit);
        command.Options.Add(PressureUnit);
        command.Options.Add(Step);
        command.Options.Add(Common.Eos);
        command.Options.Add(Common.Alpha);
        command.Options.Add(Common.VolumeShift);
        Common.Units.Description = "Units of the tables and figures: si (K, kPa, mol/m3, J/mol) or engineering (degC, bar, kg/m3, kJ/kg)";
        command.Options.Add(Common.Units);
    }

    /// <summary>The command line as typed, without --out and its file (where the page is written
    /// is not part of what it shows).</summary>
    private static string CommandLine(ParseResult parse)
    {
        var words = new List<string>();
        var tokens = parse.Tokens;
        for (int i = 0; i < tokens.Count; i++)
        {
            if (tokens[i].Value is "--out" or "-o")
            {
                i++;
                continue;
            }

            if (tokens[i].Value.StartsWith("--out=", StringComparison.Ordinal) || tokens[i].Value.StartsWith("-o=", StringComparison.Ordinal))
            {
                continue;
            }

            string value = tokens[i].Value;
            words.Add(value.Contains(' ', StringComparison.Ordinal) ? $"\"{value}\"" : value);
        }

        return "phaseslope " + string.Join(' ', words);
    }

    /// <summary>Whether the argument names a mixture: a mixture file, or NAME=FRACTION,... (an
    /// inline fluid also has '=' but starts with its own prefix).</summary>
    public static bool IsMixture(string argument)
    {
        string text = argument.Trim();
        return !InlineFluid.IsInline(text)
            && (text.EndsWith(Core.Mixtures.MixtureFile.Extension, StringComparison.OrdinalIgnoreCase) || text.Contains('=', StringComparison.Ordinal));
    }

    /// <summary>Parses and checks every option, then resolves the fluid or mixture and reads the data.</summary>
    public ReportRequest Bind(ParseResult parse)
    {
        string path = parse.GetValue(Out) ?? "";
        if (string.IsNullOrWhiteSpace(path))
        {
            throw new UsageException("--out: the file name is empty");
        }

        string extension = System.IO.Path.GetExtension(path).ToLowerInvariant();
        if (extension is not (".html" or ".htm"))
        {
            throw new UsageException($"--out: '{path}' must end in .html or .htm (the report is one HTML file)");
        }

        var model = Common.BindModel(parse);
        var units = Common.UnitSystem(parse);
        string subject = parse.GetValue(Subject) ?? "";
        bool mixture = IsMixture(subject);
        string? dataPath = parse.GetValue(Data);
        string? temperatureUnit = parse.GetValue(TemperatureUnit), pressureUnit = parse.GetValue(PressureUnit);
        if (dataPath is null && (temperatureUnit is not null || pressureUnit is not null))
        {
            throw new UsageException($"{(temperatureUnit is not null ? "--temperature-unit" : "--pressure-unit")}: is the unit of a --data column; give --data too");
        }

        string? stepText = parse.GetValue(Step);
        double? step = stepText is null ? null : QuantityParser.ParseTemperatureDifference(stepText, "--step");
        string command = CommandLine(parse);
        if (mixture)
        {
            if (dataPath is not null)
            {
                throw new UsageException("--data: measured vapour pressures belong to a pure fluid; a mixture's report shows its envelope");
            }

            if (step is not null)
            {
                throw new UsageException("--step: the saturation table is a pure fluid's; a mixture's report shows its envelope");
            }

            if (!model.ShiftSuitsMixture)
            {
                throw new UsageException($"--volume-shift: a mixture takes fluid, none or peneloux (each component's own), not one volume '{model.VolumeShiftText}' for every component");
            }

            var resolved = MixtureResolver.Resolve(subject, massFractions: false, kij: []);
            var input = new MixtureInput(resolved.Mixture, resolved.Name, resolved.Origin, model, resolved.Remarks);
            new OutputChoice(OutputFormat.Table, units).RequireMolarMassFor(input.Mixture);
            return new ReportRequest(path, null, input, model, units, null, null, null, command, []);
        }

        var fluid = FluidResolver.Resolve(subject);
        _ = model.For(fluid); // a model the fluid cannot take (constants missing for --alpha) is refused before any work
        new OutputChoice(OutputFormat.Table, units).RequireMolarMassFor(fluid);
        IReadOnlyList<VapourPressurePoint>? data = null;
        IReadOnlyList<string> description = [];
        if (dataPath is not null)
        {
            // One opening of the file (it may be a pipe): its text, within the data-file limit, is
            // parsed as fit parses it, and its leading '#' lines are the data's own description.
            string text = BoundedInput.ReadDataFile(dataPath, reader => reader.ReadToEnd());
            var options = new VapourPressureCsvOptions(temperatureUnit, pressureUnit, VapourPressureCsv.MinimumRows);
            using (var reader = new StringReader(text))
            {
                data = CorrelationOptions.Points(VapourPressureCsv.Read(reader, dataPath, options));
            }

            description = [.. text.Split('\n').Select(l => l.TrimEnd('\r')).TakeWhile(l => l.TrimStart().StartsWith('#')).Take(MaximumDescriptionLines)];
            VapourPressureFitter.RequireBelowCriticalPoint(data, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value);
        }

        return new ReportRequest(path, fluid, null, model, units, step, data, dataPath, command, description);
    }
}
