using System.CommandLine;
using PhaseSlope.Cli.Output;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fit DATA.csv --form FORM [--fluid FLUID]</c>: fit a vapour-pressure correlation.</summary>
internal static class FitCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new CorrelationOptions("auto");
        var common = new CommonOptions();
        var command = new Command("fit", "Fit a vapour-pressure correlation to measured P-T data by weighted least squares in ln P");
        options.AddTo(command);
        common.AddTo(command, withEos: false, withUnits: false); // the table is in K, kPa and %
        var output = new OutputOption();
        output.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var format = common.OutputFormat(parse);
            var fluid = options.FluidOf(parse);
            // Options first, then the data file: a bad --form is a usage error whatever the file holds.
            var forms = options.Forms(parse, fluid, out bool auto);
            var data = options.ReadData(parse);
            options.RequireDataBelowCriticalPoint(parse, fluid, data);
            var fits = CorrelationOptions.Fit(forms, auto, data);
            output.Emit(io, parse, text => FitWriter.Fit(text, fits[0], fits, format), $"the {fits[0].Form.Id} fit to {data.Count} points");
        }));
        return command;
    }
}
