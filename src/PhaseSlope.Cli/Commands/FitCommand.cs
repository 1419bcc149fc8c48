using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fit DATA.csv --form FORM [--fluid FLUID]</c>: fit a vapour-pressure correlation.</summary>
internal static class FitCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new FitOptions();
        var command = new Command("fit", "Fit a vapour-pressure correlation to measured P-T data by weighted least squares in ln P");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var fits = CorrelationOptions.Fit(request.Forms, request.Auto, request.Data);
            options.Out.Emit(io, parse, text => FitWriter.Fit(text, fits[0], fits, request.Format), $"the {fits[0].Form.Id} fit to {request.Data.Count} points");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>fit</c>.</summary>
/// <param name="Forms">The candidate forms (one, or every form the inputs support for auto).</param>
/// <param name="Auto">Whether --form is auto (the best candidate by AICc is reported).</param>
/// <param name="Data">The measured points, below the critical point when one is given.</param>
/// <param name="Format">The output format (the table is in K, kPa and %).</param>
internal sealed record FitRequest(IReadOnlyList<VapourPressureForm> Forms, bool Auto, IReadOnlyList<VapourPressurePoint> Data, OutputFormat Format);

/// <summary>The options of <c>fit</c>, bound to a <see cref="FitRequest"/>.</summary>
internal sealed class FitOptions
{
    /// <summary>DATA, --form, --fluid, --tc, --pc and the data units.</summary>
    public CorrelationOptions Correlation { get; } = new("auto");

    /// <summary>--format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Correlation.AddTo(command);
        Common.AddTo(command, withEos: false, withUnits: false); // the table is in K, kPa and %
        Out.AddTo(command);
    }

    /// <summary>Parses and checks every option, then reads the data file and checks it against
    /// the critical point.</summary>
    public FitRequest Bind(ParseResult parse)
    {
        var format = Common.OutputFormat(parse);
        var fluid = Correlation.FluidOf(parse);
        // Options first, then the data file: a bad --form is a usage error whatever the file holds.
        var forms = Correlation.Forms(parse, fluid, out bool auto);
        var data = Correlation.ReadData(parse);
        Correlation.RequireDataBelowCriticalPoint(parse, fluid, data);
        return new FitRequest(forms, auto, data, format);
    }
}
