using System.CommandLine;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Plots;

namespace PhaseSlope.Cli.Commands;

/// <summary>The options of <c>plot</c> for the binary diagrams p-xy, t-xy and x-y: --temperature,
/// --pressure, --points and --kij (FLUID is then a two-component MIXTURE, as <c>binary</c> takes
/// it). They are refused with any other diagram, and the other diagrams' options with these.</summary>
internal sealed class BinaryPlotOptions
{
    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature") { Description = "Temperature of a p-xy (or x-y) diagram of a binary mixture, e.g. 300 K, 25 degC (bare number: K)" };

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure") { Description = "Pressure of a t-xy (or x-y) diagram of a binary mixture, e.g. 1 atm, 101.325 kPa (bare number: Pa)" };

    /// <summary>--points.</summary>
    public Option<string> Points { get; } = new("--points")
    {
        Description = $"Liquid compositions of p-xy, t-xy and x-y, the ends included ({BinaryDiagram.MinimumPoints} to {BinaryDiagram.MaximumPoints}; default {BinaryDiagram.DefaultPoints})",
    };

    /// <summary>--kij.</summary>
    public Option<string[]> Kij { get; } = new("--kij")
    {
        Description = "k_ij of the binary in p-xy, t-xy and x-y, \"A,B=VALUE\"; overrides a mixture file and the published table",
        AllowMultipleArgumentsPerToken = false,
    };

    /// <summary>Adds the four options.</summary>
    public void AddTo(Command command)
    {
        command.Options.Add(Temperature);
        command.Options.Add(Pressure);
        command.Options.Add(Points);
        command.Options.Add(Kij);
    }

    /// <summary>Refuses these options for a diagram that is not a binary's.</summary>
    public void RefuseFor(DiagramKind kind, ParseResult parse)
    {
        foreach (Option option in new Option[] { Temperature, Pressure, Points, Kij })
        {
            if (CommonOptions.Given(parse, option))
            {
                throw new UsageException($"{option.Name}: applies to the binary diagrams p-xy, t-xy and x-y, not {kind.Id()}");
            }
        }
    }

    /// <summary>Binds a binary diagram: refuses the options it does not honour, checks T or P
    /// against the kind, then resolves the two-component mixture <paramref name="mixture"/>.</summary>
    /// <param name="parse">The parse.</param>
    /// <param name="kind">p-xy, t-xy or x-y.</param>
    /// <param name="mixture">The FLUID argument, read as a MIXTURE.</param>
    /// <param name="common">plot's --eos and --alpha.</param>
    /// <param name="notHonoured">plot's options that a binary diagram does not take.</param>
    public BinaryRequest Bind(ParseResult parse, DiagramKind kind, string mixture, CommonOptions common, IEnumerable<Option> notHonoured)
    {
        foreach (var option in notHonoured)
        {
            if (CommonOptions.Given(parse, option))
            {
                throw new UsageException($"{option.Name}: not used by the {kind.Id()} diagram of a binary mixture");
            }
        }

        string? tText = parse.GetValue(Temperature);
        string? pText = parse.GetValue(Pressure);
        if ((tText is null) == (pText is null) || (kind == DiagramKind.PressureComposition && tText is null) || (kind == DiagramKind.TemperatureComposition && pText is null))
        {
            throw new UsageException(kind switch
            {
                DiagramKind.PressureComposition => "--temperature: the p-xy diagram needs a temperature (and no --pressure)",
                DiagramKind.TemperatureComposition => "--pressure: the t-xy diagram needs a pressure (and no --temperature)",
                _ => "x-y: give exactly one of --temperature and --pressure",
            });
        }

        double? t = tText is null ? null : QuantityParser.ParseTemperature(tText, "--temperature");
        double? p = pText is null ? null : QuantityParser.ParsePressure(pText, "--pressure");
        string? pointsText = parse.GetValue(Points);
        int points = pointsText is null ? BinaryDiagram.DefaultPoints
            : int.TryParse(pointsText.Trim(), System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int n)
                && n >= BinaryDiagram.MinimumPoints && n <= BinaryDiagram.MaximumPoints
                ? n
                : throw new UsageException($"--points: '{pointsText}' is not a whole number from {BinaryDiagram.MinimumPoints} to {BinaryDiagram.MaximumPoints}");
        var model = common.BindModel(parse);
        var kij = MixtureResolver.ParseKij(parse.GetValue(Kij) ?? []);
        var resolved = MixtureResolver.Resolve(mixture, massFractions: false, kij);
        if (resolved.Mixture.Count != 2)
        {
            throw new UsageException($"FLUID: the {kind.Id()} diagram needs a binary mixture (A=x,B=1-x or a mixture file of two components); got {resolved.Mixture.Count} component{(resolved.Mixture.Count == 1 ? "" : "s")}");
        }

        return new BinaryRequest(new MixtureInput(resolved.Mixture, resolved.Name, resolved.Origin, model), t, p, points,
            new OutputChoice(Output.OutputFormat.Table, Units.UnitSystem.Si));
    }
}
