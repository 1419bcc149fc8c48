using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fluids list</c> and <c>phaseslope fluids show FLUID</c>.</summary>
internal static class FluidsCommand
{
    /// <summary>Builds the command group; actions write to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var group = new Command("fluids", "The fluid catalog: list, show, check a fluid file, or estimate a new fluid");

        var listOptions = new FluidsListOptions();
        var list = new Command("list", "List the catalog fluids with their critical constants");
        listOptions.AddTo(list);
        list.SetAction(parse => io.Guard(() =>
        {
            var request = listOptions.Bind(parse);
            listOptions.Out.Emit(io, parse, FluidWriter.Render(request.Fluids, single: false, request.Output.Format, request.Output.Units), $"{request.Fluids.Count} fluids");
        }));

        var showOptions = new FluidsShowOptions();
        var show = new Command("show", "Show every constant of one fluid with its source and uncertainty");
        showOptions.AddTo(show);
        show.SetAction(parse => io.Guard(() =>
        {
            var request = showOptions.Bind(parse);
            showOptions.Out.Emit(io, parse, FluidWriter.Render([request.Fluid], single: true, request.Output.Format, request.Output.Units), $"the constants of {request.Fluid.Name}");
        }));

        group.Subcommands.Add(list);
        group.Subcommands.Add(show);
        group.Subcommands.Add(FluidsCheckCommand.Create(io));
        group.Subcommands.Add(FluidsEstimateCommand.Create(io));
        return group;
    }
}

/// <summary>The checked inputs of <c>fluids list</c>: the catalog fluids selected, never none.</summary>
/// <param name="Fluids">The fluids matching --family and --name.</param>
/// <param name="Output">The output format and units.</param>
internal sealed record FluidsListRequest(IReadOnlyList<Fluid> Fluids, OutputChoice Output);

/// <summary>The options of <c>fluids list</c>, bound to a <see cref="FluidsListRequest"/>.</summary>
internal sealed class FluidsListOptions
{
    /// <summary>--family.</summary>
    public Option<string> Family { get; } = new("--family") { Description = "Only fluids of this family (e.g. alkane, alcohol, hydrofluorocarbon)" };

    /// <summary>--name.</summary>
    public Option<string> Name { get; } = new("--name") { Description = "Only fluids whose name or a synonym contains this text (case-insensitive)" };

    /// <summary>--format, --units.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Options.Add(Family);
        command.Options.Add(Name);
        Common.AddTo(command, withEos: false);
        Out.AddTo(command);
    }

    /// <summary>Parses the options and selects the fluids; a selection that matches nothing is a
    /// usage error naming the families.</summary>
    public FluidsListRequest Bind(ParseResult parse)
    {
        var output = Common.BindOutput(parse);
        string? familyText = parse.GetValue(Family);
        string? nameText = parse.GetValue(Name);
        var fluids = FluidCatalog.Embedded.All
            .Where(f => familyText is null || string.Equals(f.Family, familyText.Trim(), StringComparison.OrdinalIgnoreCase))
            .Where(f => nameText is null || f.Synonyms.Prepend(f.Name).Any(n => FluidNames.Normalise(n).Contains(FluidNames.Normalise(nameText), StringComparison.Ordinal)))
            .ToArray();
        if (fluids.Length == 0)
        {
            string families = string.Join(", ", FluidCatalog.Embedded.All.Select(f => f.Family).OfType<string>().Distinct(StringComparer.OrdinalIgnoreCase).Order(StringComparer.Ordinal));
            throw new UsageException($"fluids list: no catalog fluid matches{(familyText is null ? "" : $" family '{familyText}'")}{(nameText is null ? "" : $" name '{nameText}'")} (families: {families})");
        }

        return new FluidsListRequest(fluids, output);
    }
}

/// <summary>The checked inputs of <c>fluids show</c>.</summary>
/// <param name="Fluid">The resolved fluid.</param>
/// <param name="Output">The output format and units.</param>
internal sealed record FluidsShowRequest(Fluid Fluid, OutputChoice Output);

/// <summary>The options of <c>fluids show</c>, bound to a <see cref="FluidsShowRequest"/>.</summary>
internal sealed class FluidsShowOptions
{
    /// <summary>FLUID.</summary>
    public Argument<string> Fluid { get; } = CommonOptions.FluidArgument();

    /// <summary>--format, --units.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Fluid);
        Common.AddTo(command, withEos: false);
        Out.AddTo(command);
    }

    /// <summary>Parses the options, then resolves the fluid.</summary>
    public FluidsShowRequest Bind(ParseResult parse)
    {
        var output = Common.BindOutput(parse);
        var fluid = FluidResolver.Resolve(parse.GetValue(Fluid)!);
        output.RequireMolarMassFor(fluid);
        return new FluidsShowRequest(fluid, output);
    }
}
