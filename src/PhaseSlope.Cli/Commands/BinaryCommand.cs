using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope binary MIXTURE (--temperature V | --pressure V) [--points N]</c>: the
/// P–x–y (at T) or T–x–y (at P) diagram of a binary as numbers, with its azeotrope.</summary>
internal static class BinaryCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new BinaryOptions();
        var command = new Command("binary", "The bubble points of a binary across every liquid composition (x1, y1 and P at a temperature, or T at a pressure) "
            + "and its azeotrope where it has one");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var diagram = request.Compute();
            options.Out.Emit(io, parse, BinaryDiagramWriter.Render(request, diagram), "the binary diagram");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>binary</c> (and of the binary diagrams of <c>plot</c>).</summary>
/// <param name="Input">The two-component mixture and model choice (its fractions are not used).</param>
/// <param name="Temperature">The fixed T in K (P–x–y), or null.</param>
/// <param name="Pressure">The fixed P in Pa (T–x–y), or null.</param>
/// <param name="Points">The number of liquid compositions, the ends included.</param>
/// <param name="Output">The output format and the units of table and CSV.</param>
internal sealed record BinaryRequest(MixtureInput Input, double? Temperature, double? Pressure, int Points, OutputChoice Output)
{
    /// <summary>The diagram from the core.</summary>
    public BinaryDiagram Compute()
    {
        var engine = new MixtureEquilibrium(Input.CreateModel(), Input.Mixture.Components);
        return Temperature is double t ? BinaryDiagram.AtTemperature(engine, t, Points) : BinaryDiagram.AtPressure(engine, Pressure!.Value, Points);
    }

    /// <summary>The chart of <c>plot --diagram p-xy|t-xy|x-y</c>.</summary>
    public OxyPlot.PlotModel Chart(Plots.DiagramKind kind, Plots.PlotUnits units)
        => Plots.Diagrams.BinaryDiagramChart.Build(kind, Compute(), Input.Mixture.Components[0], Input.Mixture.Components[1],
            Core.Models.ModelRegistry.Title(Input.Model.Kind), units);
}

/// <summary>The options of <c>binary</c>: MIXTURE, --kij, --eos, --alpha, --temperature or
/// --pressure, --points, --format, --units, --out. --mass-fractions and --volume-shift are not offered:
/// the diagram spans every composition, and a Péneloux shift does not move a bubble point.</summary>
internal sealed class BinaryOptions
{
    /// <summary>Creates the group.</summary>
    public BinaryOptions() => Mixture = new MixtureOptions(Common);

    /// <summary>--eos, --alpha, --format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>MIXTURE and --kij (the argument and option objects of the shared group).</summary>
    public MixtureOptions Mixture { get; }

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "Temperature of a P-x-y diagram, e.g. 300 K, 25 degC (bare number: K); below both critical temperatures" };

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure", "-P") { Description = "Pressure of a T-x-y diagram, e.g. 101.325 kPa, 1 atm (bare number: Pa); below both critical pressures" };

    /// <summary>--points.</summary>
    public Option<string> Points { get; } = new("--points")
    {
        Description = $"Liquid compositions from x1 = 0 to 1, the ends included, denser towards the ends ({BinaryDiagram.MinimumPoints} to {BinaryDiagram.MaximumPoints}; default {BinaryDiagram.DefaultPoints}); an azeotrope adds one",
    };

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Mixture.Mixture);
        command.Options.Add(Mixture.Kij);
        command.Options.Add(Common.Eos);
        command.Options.Add(Common.Alpha);
        command.Options.Add(Temperature);
        command.Options.Add(Pressure);
        command.Options.Add(Points);
        command.Options.Add(Common.Format);
        Common.Units.Description = CommonOptions.TemperaturePressureUnitsDescription;
        command.Options.Add(Common.Units);
        Out.AddTo(command);
    }

    /// <summary>Parses and checks every option, then resolves the mixture (two components).</summary>
    public BinaryRequest Bind(ParseResult parse) => Bind(parse, Common.BindOutput(parse, csvUnits: true), "binary");

    /// <summary>Binds with a given output choice (plot binds its own); <paramref name="command"/> names the command in messages.</summary>
    public BinaryRequest Bind(ParseResult parse, OutputChoice output, string command)
    {
        string? tText = parse.GetValue(Temperature);
        string? pText = parse.GetValue(Pressure);
        if ((tText is null) == (pText is null))
        {
            throw new UsageException($"{command}: give exactly one of --temperature (P-x-y) and --pressure (T-x-y)");
        }

        double? t = tText is null ? null : QuantityParser.ParseTemperature(tText, "--temperature");
        double? p = pText is null ? null : QuantityParser.ParsePressure(pText, "--pressure");
        int points = ParsePoints(parse.GetValue(Points));
        var model = Common.BindModel(parse);
        var kij = MixtureResolver.ParseKij(parse.GetValue(Mixture.Kij) ?? []);
        var resolved = MixtureResolver.Resolve(parse.GetValue(Mixture.Mixture) ?? "", massFractions: false, kij);
        if (resolved.Mixture.Count != 2)
        {
            throw new UsageException($"MIXTURE: {command} needs a binary (two components); got {resolved.Mixture.Count} ({string.Join(", ", resolved.Mixture.Components.Select(c => c.Name))})");
        }

        return new BinaryRequest(new MixtureInput(resolved.Mixture, resolved.Name, resolved.Origin, model), t, p, points, output);
    }

    private static int ParsePoints(string? text)
    {
        if (text is null)
        {
            return BinaryDiagram.DefaultPoints;
        }

        return int.TryParse(text.Trim(), System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int n)
            && n >= BinaryDiagram.MinimumPoints && n <= BinaryDiagram.MaximumPoints
            ? n
            : throw new UsageException($"--points: '{text}' is not a whole number from {BinaryDiagram.MinimumPoints} to {BinaryDiagram.MaximumPoints}");
    }
}
