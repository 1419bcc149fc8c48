using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope curve FLUID [--from V] [--to V] [--points N] [--out FILE]</c>: a saturation table.</summary>
internal static class CurveCommand
{
    /// <summary>Largest accepted --points.</summary>
    public const int MaxPoints = 100_000;

    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new CurveOptions();
        var command = new Command("curve", "The saturation curve as a table of coexistence states");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var (data, zero, outPath) = (request.Fluid, request.Reference, request.OutPath);
            var context = CoexistenceContext.Create(data, options.Diagnostics.Begin(request.Diagnostics, request.Model.For(data)), zero);
            var solver = context.Solver;
            double tc = solver.CriticalTemperature;
            double start = request.From ?? solver.MinimumTemperature;
            double end = request.To ?? tc;
            // A value below the limit only by rounding (0.01 degC is 273.15999999999997 K, below a
            // 273.16 K triple point) is accepted, as the solver itself accepts it (1e-12 relative).
            if (start < solver.MinimumTemperature * (1 - 1e-12))
            {
                var (given, limit) = Apart(start, solver.MinimumTemperature);
                throw new Core.Errors.InvalidInputException("from temperature", start,
                    $"--from: {given} K is below the lowest valid temperature {limit} K of {data.Name}");
            }

            if (start >= tc)
            {
                throw new Core.Errors.InvalidInputException("from temperature", start,
                    $"--from: {NumberText.Table(start)} K is at or above the critical temperature {NumberText.Table(tc)} K of {data.Name}");
            }

            if (end > tc)
            {
                throw new Core.Errors.InvalidInputException("to temperature", end,
                    $"--to: {NumberText.Table(end)} K is above the critical temperature {NumberText.Table(tc)} K of {data.Name}");
            }

            if (end < solver.MinimumTemperature * (1 - 1e-12))
            {
                var (given, limit) = Apart(end, solver.MinimumTemperature);
                throw new Core.Errors.InvalidInputException("to temperature", end,
                    $"--to: {given} K is below the lowest valid temperature {limit} K of {data.Name}");
            }

            if (!(start < end))
            {
                throw new UsageException($"--from ({NumberText.Table(start)} K) must be below --to ({NumberText.Table(end)} K)");
            }

            var curve = CoexistenceCurve.Trace(solver, start, end, request.Points);
            var rows = curve.Select(context.Row).ToArray();
            UncertaintySummary? summary = null;
            if (request.Uncertainty is { } choice)
            {
                var parameters = UncertaintyRun.Parameters(request.Model, data);
                var values = UncertaintyRun.AtTemperatures(io, choice, parameters, curve);
                rows = rows.Select((r, i) => r with { Uncertainty = values[i] }).ToArray();
                summary = UncertaintyRun.Summary(choice, parameters);
            }

            string text = CoexistenceWriter.Render(rows, single: false, request.Output.Format, data, solver.Model, zero, request.Output.Units, summary);
            if (outPath is null)
            {
                io.Out.Write(text);
            }
            else
            {
                AtomicFile.WriteAllText(outPath, text);
                io.Note($"wrote {curve.Count} coexistence states to {outPath}");
            }

            options.Diagnostics.End(io, curve);
        }));
        return command;
    }

    /// <summary>The format implied by the extension of an --out path.</summary>
    internal static OutputFormat FormatFromExtension(string path) => Path.GetExtension(path).ToLowerInvariant() switch
    {
        ".csv" => OutputFormat.Csv,
        ".json" => OutputFormat.Json,
        _ => OutputFormat.Table,
    };

    /// <summary>Two compared values with enough digits to show them different (the table's
    /// digits when those already do, else round-trip).</summary>
    private static (string, string) Apart(double first, double second)
    {
        string a = NumberText.Table(first), b = NumberText.Table(second);
        return a != b ? (a, b)
            : (first.ToString("R", System.Globalization.CultureInfo.InvariantCulture), second.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
    }
}

/// <summary>The checked inputs of <c>curve</c>.</summary>
/// <param name="Fluid">The resolved fluid.</param>
/// <param name="From">The first temperature in K, or null for the lowest valid temperature.</param>
/// <param name="To">The last temperature in K, or null for the critical temperature.</param>
/// <param name="Points">The number of states.</param>
/// <param name="OutPath">The --out file, or null for standard output.</param>
/// <param name="Reference">The zero of h and s.</param>
/// <param name="Model">The model choice.</param>
/// <param name="Output">The output format and units.</param>
/// <param name="Diagnostics">Whether --diagnostics was given.</param>
/// <param name="Uncertainty">How to propagate input uncertainties, or null for none.</param>
internal sealed record CurveRequest(Fluid Fluid, double? From, double? To, int Points, string? OutPath, ReferenceState Reference,
    ModelChoice Model, OutputChoice Output, bool Diagnostics, UncertaintyChoice? Uncertainty = null);

/// <summary>The options of <c>curve</c>, bound to a <see cref="CurveRequest"/>.</summary>
internal sealed class CurveOptions
{
    /// <summary>FLUID.</summary>
    public Argument<string> Fluid { get; } = CommonOptions.FluidArgument();

    /// <summary>--from.</summary>
    public Option<string> From { get; } = new("--from") { Description = "First temperature, e.g. 250 K or -20 degC (bare number: K; default: the lowest valid temperature, 0.3 Tc or the triple point)" };

    /// <summary>--to.</summary>
    public Option<string> To { get; } = new("--to") { Description = "Last temperature (bare number: K; default: the critical temperature; the last state is then the critical point)" };

    /// <summary>--points.</summary>
    public Option<int> Points { get; } = new("--points", "-n")
    {
        Description = $"Number of states, 2 to {CurveCommand.MaxPoints}; spaced evenly in sqrt(Tc - T) so the near-critical region is resolved",
        DefaultValueFactory = _ => CoexistenceCurve.DefaultPoints,
    };

    /// <summary>--out (its format follows the extension when --format is not given).</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "Write to this file instead of the terminal (format from --format, else from the extension .csv/.json, else table)" };

    /// <summary>--reference.</summary>
    public Option<string> Reference { get; } = ReferenceOption.Create();

    /// <summary>--eos, --alpha, --volume-shift, --format, --units.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--diagnostics.</summary>
    public DiagnosticsOption Diagnostics { get; } = new();

    /// <summary>--uncertainty, --samples, --seed.</summary>
    public UncertaintyOptions Uncertainty { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Fluid);
        command.Options.Add(From);
        command.Options.Add(To);
        command.Options.Add(Points);
        command.Options.Add(Out);
        command.Options.Add(Reference);
        Common.AddTo(command, withEos: true);
        Diagnostics.AddTo(command);
        Uncertainty.AddTo(command);
    }

    /// <summary>Parses and checks every option, then resolves the fluid; the temperature range is
    /// checked against the fluid's limits by the command.</summary>
    public CurveRequest Bind(ParseResult parse)
    {
        var model = Common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
        string? outPath = parse.GetValue(Out);
        var output = Common.BindOutput(parse, Common.FormatGiven(parse) || outPath is null ? Common.OutputFormat(parse) : CurveCommand.FormatFromExtension(outPath));
        int n = parse.GetValue(Points);
        if (n < 2 || n > CurveCommand.MaxPoints)
        {
            throw new UsageException($"--points: must be between 2 and {CurveCommand.MaxPoints}, got {n}");
        }

        double? tFrom = parse.GetValue(From) is string f ? QuantityParser.ParseTemperature(f, "--from") : null;
        double? tTo = parse.GetValue(To) is string tt ? QuantityParser.ParseTemperature(tt, "--to") : null;
        if (outPath is not null && string.IsNullOrWhiteSpace(outPath))
        {
            throw new UsageException("--out: the file name is empty");
        }

        var reference = ReferenceOption.Parse(parse.GetValue(Reference)!);
        var uncertainty = Uncertainty.Bind(parse);
        var fluid = FluidResolver.Resolve(parse.GetValue(Fluid)!);
        output.RequireMolarMassFor(fluid);
        return new CurveRequest(fluid, tFrom, tTo, n, outPath, reference, model, output, Diagnostics.Given(parse), uncertainty);
    }
}
