using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope curve FLUID [--from V] [--to V] [--points N] [--out FILE]</c>: a saturation table.</summary>
internal static class CurveCommand
{
    /// <summary>Largest accepted --points.</summary>
    public const int MaxPoints = 100_000;

    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var fluid = CommonOptions.FluidArgument();
        var from = new Option<string>("--from") { Description = "First temperature, e.g. 250 K or -20 degC (bare number: K; default: the lowest valid temperature, 0.3 Tc or the triple point)" };
        var to = new Option<string>("--to") { Description = "Last temperature (bare number: K; default: the critical temperature; the last state is then the critical point)" };
        var points = new Option<int>("--points", "-n")
        {
            Description = $"Number of states, 2 to {MaxPoints}; spaced evenly in sqrt(Tc - T) so the near-critical region is resolved",
            DefaultValueFactory = _ => CoexistenceCurve.DefaultPoints,
        };
        var output = new Option<string>("--out", "-o") { Description = "Write to this file instead of the terminal (format from --format, else from the extension .csv/.json, else table)" };
        var reference = ReferenceOption.Create();
        var common = new CommonOptions();
        var diagnostics = new DiagnosticsOption();
        var command = new Command("curve", "The saturation curve as a table of coexistence states");
        command.Arguments.Add(fluid);
        command.Options.Add(from);
        command.Options.Add(to);
        command.Options.Add(points);
        command.Options.Add(output);
        command.Options.Add(reference);
        common.AddTo(command, withEos: true);
        diagnostics.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var model = common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
            string? outPath = parse.GetValue(output);
            var (format, units) = common.BindOutput(parse, common.FormatGiven(parse) || outPath is null ? common.OutputFormat(parse) : FormatFromExtension(outPath));
            int n = parse.GetValue(points);
            if (n < 2 || n > MaxPoints)
            {
                throw new UsageException($"--points: must be between 2 and {MaxPoints}, got {n}");
            }

            double? tFrom = parse.GetValue(from) is string f ? QuantityParser.ParseTemperature(f, "--from") : null;
            double? tTo = parse.GetValue(to) is string tt ? QuantityParser.ParseTemperature(tt, "--to") : null;
            if (outPath is not null && string.IsNullOrWhiteSpace(outPath))
            {
                throw new UsageException("--out: the file name is empty");
            }

            var zero = ReferenceOption.Parse(parse.GetValue(reference)!);
            var data = FluidResolver.Resolve(parse.GetValue(fluid)!);
            var context = CoexistenceContext.Create(data, diagnostics.Begin(parse, model.For(data)), zero);
            var solver = context.Solver;
            double tc = solver.CriticalTemperature;
            double start = tFrom ?? solver.MinimumTemperature;
            double end = tTo ?? tc;
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

            var curve = CoexistenceCurve.Trace(solver, start, end, n);
            string text = CoexistenceWriter.Render(curve.Select(context.Row).ToArray(), single: false, format, data, solver.Model, zero, units);
            if (outPath is null)
            {
                io.Out.Write(text);
            }
            else
            {
                AtomicFile.WriteAllText(outPath, text);
                io.Note($"wrote {curve.Count} coexistence states to {outPath}");
            }

            diagnostics.End(io, curve);
        }));
        return command;
    }

    private static OutputFormat FormatFromExtension(string path) => Path.GetExtension(path).ToLowerInvariant() switch
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
