using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Solids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope curve FLUID [--line vaporization|sublimation|melting] [--from V] [--to V] [--points N | --step V] | --temperatures LIST | --pressures LIST [--out FILE]</c>:
/// a saturation table, or a table of the sublimation or melting line.</summary>
internal static class CurveCommand
{
    /// <summary>Largest accepted --points.</summary>
    public const int MaxPoints = 100_000;

    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new CurveOptions();
        var command = new Command("curve", "The saturation curve as a table of coexistence states, or the sublimation or melting line (--line)");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            if (request.Line != PhaseLineKind.Vaporization)
            {
                var line = SolidLine(request);
                string solidText = PhaseLineWriter.Render(line, request.Output.Format, request.Output.Units);
                if (request.OutPath is null)
                {
                    io.Out.Write(solidText);
                }
                else
                {
                    AtomicFile.WriteAllText(request.OutPath, solidText);
                    io.Note($"wrote {line.Points.Count} {line.LineName} point{(line.Points.Count == 1 ? "" : "s")} to {request.OutPath}");
                }

                return;
            }

            var (data, zero, outPath) = (request.Fluid, request.Reference, request.OutPath);
            var context = CoexistenceContext.Create(data, options.Diagnostics.Begin(request.Diagnostics, request.Model.For(data)), zero);
            var solver = context.Solver;
            var curve = request.Pressures is { } pressures ? ByPressure(solver, pressures) : ByTemperature(request, solver, data);
            var rows = curve.Select(context.Row).ToArray();
            UncertaintySummary? summary = null;
            if (request.Uncertainty is { } choice)
            {
                var parameters = UncertaintyRun.Parameters(request.Model, data);
                var values = request.Pressures is null
                    ? UncertaintyRun.AtTemperatures(io, choice, parameters, curve)
                    : curve.Select(point => UncertaintyRun.AtPressure(io, choice, parameters, point)).ToArray();
                rows = rows.Select((r, i) => r with { Uncertainty = values[i] }).ToArray();
                summary = UncertaintyRun.Summary(choice, parameters);
            }

            string text = CoexistenceWriter.Render(rows, single: false, request.Output.Format, data, solver.Model, zero, request.Output.Units, summary,
                byPressure: request.Pressures is not null);
            if (outPath is null)
            {
                io.Out.Write(text);
            }
            else
            {
                AtomicFile.WriteAllText(outPath, text);
                io.Note($"wrote {curve.Count} coexistence state{(curve.Count == 1 ? "" : "s")} to {outPath}");
            }

            options.Diagnostics.End(io, curve);
        }));
        return command;
    }

    /// <summary>The lower end of the table for a refusal: the fluid's triple point (naming the solid)
    /// where the solver starts there, else its lowest valid temperature.</summary>
    private static string LowerEnd(CoexistenceSolver solver, Fluid data, string limit) => solver.TriplePoint is not null
        ? $"the triple point {limit} K of {data.Name}: no liquid exists below it, the solid sublimes (see curve --line sublimation)"
        : $"the lowest valid temperature {limit} K of {data.Name}";

    /// <summary>The states at the temperatures of the table, increasing: the explicit list, the
    /// stepped range or the --points spacing, each checked against the fluid's limits.</summary>
    private static IReadOnlyList<CoexistencePoint> ByTemperature(CurveRequest request, CoexistenceSolver solver, Fluid data)
    {
        double tc = solver.CriticalTemperature;
        if (request.Temperatures is { } list)
        {
            foreach (double t in list)
            {
                if (t < solver.MinimumTemperature * (1 - 1e-12))
                {
                    var (given, limit) = Apart(t, solver.MinimumTemperature);
                    throw new Core.Errors.InvalidInputException("temperatures", t,
                        $"--temperatures: {given} K is below {LowerEnd(solver, data, limit)}");
                }

                if (t > tc)
                {
                    var (given, limit) = Apart(t, tc);
                    throw new Core.Errors.InvalidInputException("temperatures", t,
                        $"--temperatures: {given} K is above the critical temperature {limit} K of {data.Name}");
                }
            }

            return CoexistenceCurve.Through(solver, list);
        }

        double start = request.From ?? solver.MinimumTemperature;
        double end = request.To ?? tc;
        // A value below the limit only by rounding (0.01 degC is 273.15999999999997 K, below a
        // 273.16 K triple point) is accepted, as the solver itself accepts it (1e-12 relative).
        if (start < solver.MinimumTemperature * (1 - 1e-12))
        {
            var (given, limit) = Apart(start, solver.MinimumTemperature);
            throw new Core.Errors.InvalidInputException("from temperature", start,
                $"--from: {given} K is below {LowerEnd(solver, data, limit)}");
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
                $"--to: {given} K is below {LowerEnd(solver, data, limit)}");
        }

        if (!(start < end))
        {
            throw new UsageException($"--from ({NumberText.Table(start)} K) must be below --to ({NumberText.Table(end)} K)");
        }

        return request.Step is double step
            ? CoexistenceCurve.Through(solver, Stepped(start, end, step))
            : CoexistenceCurve.Trace(solver, start, end, request.Points);
    }

    /// <summary>The sublimation or melting line at the requested temperatures, each checked against
    /// the line's range (<see cref="SolidPhaseLines.DefaultRange"/>: a published equation's stated
    /// range, else from the triple point as far as the Clapeyron route is offered).</summary>
    /// <exception cref="Core.Errors.FluidDataException">The fluid lacks what the line needs (exit 3,
    /// naming the fluid-file key).</exception>
    private static PhaseLineTable SolidLine(CurveRequest request)
        => SolidLine(request.Fluid, request.Model.For(request.Fluid), request.Line, request.From, request.To, request.Points, request.Step, request.Temperatures);

    /// <summary>The sublimation or melting line as <c>curve --line</c> computes it, from its options
    /// (null for each one not given); <c>report</c> calls it with the defaults.</summary>
    /// <exception cref="Core.Errors.FluidDataException">The fluid lacks what the line needs.</exception>
    internal static PhaseLineTable SolidLine(Fluid fluid, Core.Models.CubicModel model, PhaseLineKind kind, double? from, double? to, int pointCount, double? stepSize, IReadOnlyList<double>? temperatureList)
    {
        RequireSolidData(fluid, kind);
        var lines = new SolidPhaseLines(fluid, new CoexistenceSolver(model, fluid));
        var (low, high) = ValidRange(lines, fluid, kind);
        var (defaultLow, defaultHigh) = lines.DefaultRange(kind);
        string name = kind == PhaseLineKind.Sublimation ? "sublimation" : "melting";
        string range = $"{NumberText.Table(low)}-{NumberText.Table(high)} K";
        // A value outside the range only by rounding (a temperature given in degC) is accepted, as
        // the line itself accepts it (1e-12 relative).
        bool Outside(double t) => t < low * (1 - 1e-12) || t > high * (1 + 1e-12);
        void Require(double t, string option, string field)
        {
            if (Outside(t))
            {
                throw new Core.Errors.InvalidInputException(field, t,
                    $"{option}: {NumberText.Table(t)} K is outside the {name} line of {fluid.Name}, {range} ({RangeReason(lines, fluid, kind)})");
            }
        }

        IReadOnlyList<double> temperatures;
        if (temperatureList is { } list)
        {
            foreach (double t in list)
            {
                Require(t, "--temperatures", "temperatures");
            }

            temperatures = list;
        }
        else
        {
            // The default start is the default range's, or the whole range's when --to lies below it
            // (water's sublimation table to 150 K starts at the equation's 50 K, not at 0.7 T_t).
            double end = to ?? defaultHigh;
            double start = from ?? (end <= defaultLow ? low : defaultLow);
            if (from is not null)
            {
                Require(start, "--from", "from temperature");
            }

            if (to is not null)
            {
                Require(end, "--to", "to temperature");
            }

            if (!(start < end))
            {
                throw new UsageException($"--from ({NumberText.Table(start)} K) must be below --to ({NumberText.Table(end)} K)");
            }

            temperatures = stepSize is double step
                ? Stepped(start, end, step)
                : Enumerable.Range(0, pointCount).Select(i => i == pointCount - 1 ? end : start + (end - start) * i / (pointCount - 1)).ToArray();
        }

        var points = temperatures.Select(t => kind == PhaseLineKind.Sublimation ? lines.Sublimation(t) : lines.Melting(t)).ToArray();
        var (check, reason) = FluidWriter.TriplePointCheckOf(fluid, lines);
        return new PhaseLineTable(fluid, model, kind, lines, check, reason, points);
    }

    /// <summary>The temperatures a solid line is given at: a published sublimation equation's whole
    /// stated range up to the triple point (the default range starts higher, at 0.7 T_t); otherwise
    /// the default range, which is where the Clapeyron route or the published melting equation holds.</summary>
    private static (double Low, double High) ValidRange(SolidPhaseLines lines, Fluid fluid, PhaseLineKind kind)
        => kind == PhaseLineKind.Sublimation && fluid.SublimationPressureEquation is { } equation
            ? (equation.LowestTemperature, Math.Min(lines.TriplePointTemperature, equation.HighestTemperature))
            : lines.DefaultRange(kind);

    /// <summary>Why a solid line ends where it does, for the refusal of a temperature beyond it.</summary>
    private static string RangeReason(SolidPhaseLines lines, Fluid fluid, PhaseLineKind kind)
    {
        if (kind == PhaseLineKind.Sublimation)
        {
            return fluid.SublimationPressureEquation is not null
                ? "the published sublimation equation's range, up to the triple point"
                : string.Create(System.Globalization.CultureInfo.InvariantCulture,
                    $"from {SolidPhaseLines.SublimationDefaultStart} of the triple-point temperature, where the Clapeyron route from the triple point is offered, up to the triple point");
        }

        return fluid.MeltingPressureEquation is not null
            ? "the published melting equation's stated range"
            : string.Create(System.Globalization.CultureInfo.InvariantCulture,
                $"from the triple point to where the constant-dh, constant-dv Clapeyron line reaches {SolidPhaseLines.ClapeyronMeltingLimit / 1e6:G6} MPa");
    }

    /// <summary>The fluid-file data a solid line needs, each missing one refused naming its key:
    /// the triple point always; the sublimation line without a published equation Δh_fus; the
    /// melting line without one Δh_fus and Δv_fus.</summary>
    /// <exception cref="Core.Errors.FluidDataException">A key is missing.</exception>
    internal static void RequireSolidData(Fluid fluid, PhaseLineKind kind)
    {
        string line = kind == PhaseLineKind.Sublimation ? "sublimation" : "melting";
        void Missing(string key, string why) => throw new Core.Errors.FluidDataException(fluid.Origin, 0, key, $"fluid '{fluid.Name}' gives no {key}, which {why}");
        if (fluid.TriplePointTemperature is null)
        {
            Missing("triple_point_temperature", $"the {line} line starts from");
        }

        if (fluid.TriplePointPressure is null)
        {
            Missing("triple_point_pressure", $"the {line} line starts from");
        }

        bool published = kind == PhaseLineKind.Sublimation ? fluid.SublimationPressureEquation is not null : fluid.MeltingPressureEquation is not null;
        if (published)
        {
            return;
        }

        string equation = kind == PhaseLineKind.Sublimation ? "sublimation_pressure_equation" : "melting_pressure_equation";
        if (fluid.EnthalpyOfFusion is null)
        {
            Missing("enthalpy_of_fusion", $"the Clapeyron route to the {line} line needs (or give a {equation})");
        }

        if (kind == PhaseLineKind.Melting && fluid.FusionVolumeChange is null)
        {
            Missing("fusion_volume_change", $"the Clapeyron route to the melting line needs (or give solid_density with triple_point_liquid_density, or a {equation})");
        }
    }

    /// <summary>start, start + step, … up to <paramref name="end"/>, which is always the last state:
    /// where the steps do not land on it, it is added as a shorter last step.</summary>
    /// <remarks>The sums are formed in decimal from the shortest text of each double, so
    /// -40 degC + 5 K is the double nearest 238.15 K (shown as -35 degC), not a sum carrying
    /// the binary error of 233.15. A step within 1e-9 K of the end counts as landing on it (a
    /// step in degF is not a finite decimal in K; 1e-9 K is far below any temperature the
    /// tool reads or prints, and far above the accumulated rounding of 1e5 decimal sums).</remarks>
    internal static IReadOnlyList<double> Stepped(double start, double end, double step)
    {
        // The count is checked in double first, so a step too small (or too large) for decimal
        // arithmetic never reaches it: a step at or above the range gives its two ends.
        if ((end - start) / step > MaxPoints - 1)
        {
            throw new UsageException($"--step: {NumberText.Table(step)} K from {NumberText.Table(start)} K to {NumberText.Table(end)} K gives more than {MaxPoints} states (the limit of --points)");
        }

        if (step >= end - start)
        {
            return [start, end];
        }

        decimal first = Exact(start), increment = Exact(step), last = Exact(end);
        decimal count = decimal.Floor((last - first) / increment + 1e-12m);

        var temperatures = new List<double>((int)count + 2);
        for (int i = 0; i <= (int)count; i++)
        {
            temperatures.Add(Nearest(first + i * increment));
        }

        if (Math.Abs(temperatures[^1] - end) <= 1e-9)
        {
            temperatures[^1] = end;
        }
        else
        {
            temperatures.Add(end);
        }

        return temperatures;
    }

    private static decimal Exact(double value) => decimal.Parse(value.ToString("R", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.NumberStyles.Float, System.Globalization.CultureInfo.InvariantCulture);

    private static double Nearest(decimal value) => double.Parse(value.ToString(System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>The coexistence states at the given pressures (Pa, increasing), each started from its
    /// predecessor; a pressure at or above the critical pressure or below the lowest valid
    /// temperature's is refused by the solver (exit 4).</summary>
    private static IReadOnlyList<CoexistencePoint> ByPressure(CoexistenceSolver solver, IReadOnlyList<double> pressures)
    {
        var points = new List<CoexistencePoint>(pressures.Count);
        foreach (double p in pressures)
        {
            try
            {
                points.Add(solver.AtPressure(p, points.Count > 0 ? points[^1] : null));
            }
            catch (Core.Errors.InvalidInputException ex)
            {
                // The solver names the pressure and the limit; the option is named here.
                throw new Core.Errors.InvalidInputException(ex.Field, ex.Value, $"--pressures: {ex.Message}");
            }
        }

        return points;
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
/// <param name="Step">The --step temperature difference in K, or null for --points spacing.</param>
/// <param name="Temperatures">The --temperatures list in K (increasing), or null.</param>
/// <param name="Pressures">The --pressures list in Pa (increasing), or null.</param>
/// <param name="Line">Which line (--line): the saturation curve or a solid line.</param>
internal sealed record CurveRequest(Fluid Fluid, double? From, double? To, int Points, string? OutPath, ReferenceState Reference,
    ModelChoice Model, OutputChoice Output, bool Diagnostics, UncertaintyChoice? Uncertainty = null,
    double? Step = null, IReadOnlyList<double>? Temperatures = null, IReadOnlyList<double>? Pressures = null, PhaseLineKind Line = PhaseLineKind.Vaporization);

/// <summary>The options of <c>curve</c>, bound to a <see cref="CurveRequest"/>.</summary>
internal sealed class CurveOptions
{
    /// <summary>FLUID.</summary>
    public Argument<string> Fluid { get; } = CommonOptions.FluidArgument();

    /// <summary>--line.</summary>
    public Option<string> Line { get; } = new("--line")
    {
        Description = "Which line: vaporization (liquid-vapour, triple point to critical point; default), sublimation (solid-vapour, below the triple point) "
            + "or melting (solid-liquid); the solid lines need the fluid's triple-point pressure and a published equation or the enthalpy of fusion (melting: and the volume change)",
        DefaultValueFactory = _ => "vaporization",
    };

    /// <summary>--from.</summary>
    public Option<string> From { get; } = new("--from")
    {
        Description = "First temperature, e.g. 250 K or -20 degC (bare number: K; default: the lowest valid temperature, 0.3 Tc or the triple point; "
            + "with --line sublimation or melting, the start of the line's range)",
    };

    /// <summary>--to.</summary>
    public Option<string> To { get; } = new("--to")
    {
        Description = "Last temperature (bare number: K; default: the critical temperature, the last state then the critical point; "
            + "with --line sublimation or melting, the end of the line's range)",
    };

    /// <summary>--points.</summary>
    public Option<int> Points { get; } = new("--points", "-n")
    {
        Description = $"Number of states, 2 to {CurveCommand.MaxPoints}; spaced evenly in sqrt(Tc - T) so the near-critical region is resolved (solid lines: evenly in T)",
        DefaultValueFactory = _ => CoexistenceCurve.DefaultPoints,
    };

    /// <summary>--step.</summary>
    public Option<string> Step { get; } = new("--step")
    {
        Description = "Temperature step instead of --points, a difference: 5 (K), 5 K, 5 degC = 5 K, 10 degF = 10/1.8 K; rows from --from in equal steps, "
            + "the last row always --to (a shorter last step where the steps do not land on it)",
    };

    /// <summary>--temperatures.</summary>
    public Option<string> Temperatures { get; } = new("--temperatures")
    {
        Description = "A table at these temperatures, increasing, separated by commas, one unit after the last for all: \"-40,-30,-20 degC\" (bare: K); "
            + "the critical temperature gives the critical point",
    };

    /// <summary>--pressures.</summary>
    public Option<string> Pressures { get; } = new("--pressures")
    {
        Description = "A table by pressure: the coexistence state at each of these pressures, increasing, separated by commas, "
            + "one unit after the last for all: \"1,2,5,10 bar\" (bare: Pa); each below the critical pressure",
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
        command.Options.Add(Line);
        command.Options.Add(From);
        command.Options.Add(To);
        command.Options.Add(Points);
        command.Options.Add(Step);
        command.Options.Add(Temperatures);
        command.Options.Add(Pressures);
        command.Options.Add(Out);
        command.Options.Add(Reference);
        Common.AddTo(command, withEos: true);
        Common.Units.Description = CommonOptions.UnitsWithCsvDescription;
        Diagnostics.AddTo(command);
        Uncertainty.AddTo(command);
    }

    /// <summary>Parses and checks every option, then resolves the fluid; the temperature range is
    /// checked against the fluid's limits by the command.</summary>
    public CurveRequest Bind(ParseResult parse)
    {
        var model = Common.BindModel(parse); // reject a bad --eos, --alpha or --volume-shift before the fluid is resolved
        string? outPath = parse.GetValue(Out);
        var output = Common.BindOutput(parse, Common.FormatGiven(parse) || outPath is null ? Common.OutputFormat(parse) : CurveCommand.FormatFromExtension(outPath), csvUnits: true);
        int n = parse.GetValue(Points);
        if (n < 2 || n > CurveCommand.MaxPoints)
        {
            throw new UsageException($"--points: must be between 2 and {CurveCommand.MaxPoints}, got {n}");
        }

        var line = ParseLine(parse.GetValue(Line)!);
        // One way of choosing the rows: a range (--from/--to with --points or --step), or a list.
        bool pointsGiven = CommonOptions.Given(parse, Points);
        string? stepText = parse.GetValue(Step), tList = parse.GetValue(Temperatures), pList = parse.GetValue(Pressures);
        if (line != PhaseLineKind.Vaporization)
        {
            // What only the saturation curve has: a table by pressure, the zero of h and s of its
            // phases, the solver's diagnostics and propagated input uncertainties.
            string lineName = line == PhaseLineKind.Sublimation ? "sublimation" : "melting";
            string? refused = pList is not null ? "--pressures"
                : CommonOptions.Given(parse, Reference) ? "--reference"
                : Diagnostics.Given(parse) ? "--diagnostics"
                : parse.GetValue(Uncertainty.Method) is not null ? "--uncertainty"
                : CommonOptions.Given(parse, Uncertainty.Samples) ? "--samples"
                : CommonOptions.Given(parse, Uncertainty.Seed) ? "--seed"
                : null;
            if (refused is not null)
            {
                throw new UsageException($"{refused}: applies to --line vaporization only, not to the {lineName} line");
            }
        }

        if (stepText is not null && pointsGiven)
        {
            throw new UsageException("--step: conflicts with --points (give the number of states or the step, not both)");
        }

        if (tList is not null && pList is not null)
        {
            throw new UsageException("--pressures: conflicts with --temperatures (a table is by temperature or by pressure)");
        }

        if ((tList ?? pList) is not null)
        {
            string list = tList is not null ? "--temperatures" : "--pressures";
            string? other = parse.GetValue(From) is not null ? "--from" : parse.GetValue(To) is not null ? "--to" : pointsGiven ? "--points" : stepText is not null ? "--step" : null;
            if (other is not null)
            {
                throw new UsageException($"{list}: conflicts with {other} (the list gives every row)");
            }
        }

        double? tFrom = parse.GetValue(From) is string f ? QuantityParser.ParseTemperature(f, "--from") : null;
        double? tTo = parse.GetValue(To) is string tt ? QuantityParser.ParseTemperature(tt, "--to") : null;
        double? step = stepText is null ? null : QuantityParser.ParseTemperatureDifference(stepText, "--step");
        var temperatures = tList is null ? null : Increasing(QuantityParser.ParseTemperatureList(tList, "--temperatures"), "--temperatures", "K");
        var pressures = pList is null ? null : Increasing(QuantityParser.ParsePressureList(pList, "--pressures"), "--pressures", "Pa");
        if (outPath is not null && string.IsNullOrWhiteSpace(outPath))
        {
            throw new UsageException("--out: the file name is empty");
        }

        var reference = ReferenceOption.Parse(parse.GetValue(Reference)!);
        var uncertainty = Uncertainty.Bind(parse);
        var fluid = FluidResolver.Resolve(parse.GetValue(Fluid)!);
        output.RequireMolarMassFor(fluid);
        return new CurveRequest(fluid, tFrom, tTo, n, outPath, reference, model, output, Diagnostics.Given(parse), uncertainty, step, temperatures, pressures, line);
    }

    /// <summary>The --line value.</summary>
    private static PhaseLineKind ParseLine(string text) => text.Trim().ToLowerInvariant() switch
    {
        "vaporization" => PhaseLineKind.Vaporization,
        "sublimation" => PhaseLineKind.Sublimation,
        "melting" => PhaseLineKind.Melting,
        _ => throw new UsageException($"--line: unknown line '{text}' (use vaporization, sublimation or melting)"),
    };

    /// <summary>A list of at most <see cref="CurveCommand.MaxPoints"/> values, strictly increasing
    /// (the table is traced in order, each state started from the one before; a repeated or
    /// unsorted value is more likely a typing error than a wish).</summary>
    private static IReadOnlyList<double> Increasing(IReadOnlyList<double> values, string option, string unit)
    {
        if (values.Count > CurveCommand.MaxPoints)
        {
            throw new UsageException($"{option}: {values.Count} values, more than the limit of {CurveCommand.MaxPoints}");
        }

        for (int i = 1; i < values.Count; i++)
        {
            if (!(values[i] > values[i - 1]))
            {
                throw new UsageException($"{option}: the values must increase, but value {i + 1} ({NumberText.Table(values[i])} {unit}) is not above value {i} ({NumberText.Table(values[i - 1])} {unit})");
            }
        }

        return values;
    }
}
