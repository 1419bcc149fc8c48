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

        var listCommon = new CommonOptions();
        var family = new Option<string>("--family") { Description = "Only fluids of this family (e.g. alkane, alcohol, hydrofluorocarbon)" };
        var fragment = new Option<string>("--name") { Description = "Only fluids whose name or a synonym contains this text (case-insensitive)" };
        var list = new Command("list", "List the catalog fluids with their critical constants");
        list.Options.Add(family);
        list.Options.Add(fragment);
        listCommon.AddTo(list, withEos: false);
        var listOutput = new OutputOption();
        listOutput.AddTo(list);
        list.SetAction(parse => io.Guard(() =>
        {
            var (format, units) = listCommon.BindOutput(parse);
            string? familyText = parse.GetValue(family);
            string? nameText = parse.GetValue(fragment);
            var fluids = FluidCatalog.Embedded.All
                .Where(f => familyText is null || string.Equals(f.Family, familyText.Trim(), StringComparison.OrdinalIgnoreCase))
                .Where(f => nameText is null || f.Synonyms.Prepend(f.Name).Any(n => FluidNames.Normalise(n).Contains(FluidNames.Normalise(nameText), StringComparison.Ordinal)))
                .ToArray();
            if (fluids.Length == 0)
            {
                string families = string.Join(", ", FluidCatalog.Embedded.All.Select(f => f.Family).OfType<string>().Distinct(StringComparer.OrdinalIgnoreCase).Order(StringComparer.Ordinal));
                throw new UsageException($"fluids list: no catalog fluid matches{(familyText is null ? "" : $" family '{familyText}'")}{(nameText is null ? "" : $" name '{nameText}'")} (families: {families})");
            }

            listOutput.Emit(io, parse, FluidWriter.Render(fluids, single: false, format, units), $"{fluids.Length} fluids");
        }));

        var showCommon = new CommonOptions();
        var fluid = CommonOptions.FluidArgument();
        var show = new Command("show", "Show every constant of one fluid with its source and uncertainty");
        show.Arguments.Add(fluid);
        showCommon.AddTo(show, withEos: false);
        var showOutput = new OutputOption();
        showOutput.AddTo(show);
        show.SetAction(parse => io.Guard(() =>
        {
            var (format, units) = showCommon.BindOutput(parse);
            var data = FluidResolver.Resolve(parse.GetValue(fluid)!);
            showOutput.Emit(io, parse, FluidWriter.Render([data], single: true, format, units), $"the constants of {data.Name}");
        }));

        group.Subcommands.Add(list);
        group.Subcommands.Add(show);
        group.Subcommands.Add(FluidsCheckCommand.Create(io));
        group.Subcommands.Add(FluidsEstimateCommand.Create(io));
        return group;
    }
}
