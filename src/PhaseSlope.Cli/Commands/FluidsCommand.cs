using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fluids list</c> and <c>phaseslope fluids show FLUID</c>.</summary>
internal static class FluidsCommand
{
    /// <summary>Builds the command group; actions write to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var group = new Command("fluids", "The fluid catalog: list it, or show one fluid with every source");

        var listCommon = new CommonOptions();
        var list = new Command("list", "List the catalog fluids with their critical constants");
        listCommon.AddTo(list, withEos: false);
        list.SetAction(parse => io.Guard(() =>
        {
            var format = listCommon.OutputFormat(parse);
            var units = listCommon.UnitSystem(parse);
            io.Out.Write(FluidWriter.Render(FluidCatalog.Embedded.All, single: false, format, units));
        }));

        var showCommon = new CommonOptions();
        var fluid = CommonOptions.FluidArgument();
        var show = new Command("show", "Show every constant of one fluid with its source and uncertainty");
        show.Arguments.Add(fluid);
        showCommon.AddTo(show, withEos: false);
        show.SetAction(parse => io.Guard(() =>
        {
            var format = showCommon.OutputFormat(parse);
            var units = showCommon.UnitSystem(parse);
            var data = FluidResolver.Resolve(parse.GetValue(fluid)!);
            io.Out.Write(FluidWriter.Render([data], single: true, format, units));
        }));

        group.Subcommands.Add(list);
        group.Subcommands.Add(show);
        return group;
    }
}
