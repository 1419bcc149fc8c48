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
        common.AddTo(command, withEos: false);
        command.SetAction(parse => io.Guard(() =>
        {
            var format = common.OutputFormat(parse);
            var fluid = options.FluidOf(parse);
            // Options first, then the data file: a bad --form is a usage error whatever the file holds.
            var forms = options.Forms(parse, fluid, out bool auto);
            var data = options.ReadData(parse);
            options.RequireDataBelowCriticalPoint(parse, fluid, data);
            var fits = CorrelationOptions.Fit(forms, auto, data);
            FitWriter.Fit(io.Out, fits[0], fits, format);
        }));
        return command;
    }
}
