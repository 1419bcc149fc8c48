using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Correlations.Audit;

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
            if (request.Convention is PublishedConvention convention)
            {
                // With auto the form is known only now; the named form was checked before the fit.
                FitOptions.RequirePrintable(fits[0].Form, convention, request.Auto);
            }

            options.Out.Emit(io, parse, text => FitWriter.Fit(text, fits[0], fits, request.Format, request.Convention), $"the {fits[0].Form.Id} fit to {request.Data.Count} points");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>fit</c>.</summary>
/// <param name="Forms">The candidate forms (one, or every form the inputs support for auto).</param>
/// <param name="Auto">Whether --form is auto (the best candidate by AICc is reported).</param>
/// <param name="Data">The measured points, below the critical point when one is given.</param>
/// <param name="Format">The output format (the table is in K, kPa and %).</param>
/// <param name="Convention">The published convention to print the coefficients in as well, or null.</param>
internal sealed record FitRequest(IReadOnlyList<VapourPressureForm> Forms, bool Auto, IReadOnlyList<VapourPressurePoint> Data, OutputFormat Format, PublishedConvention? Convention);

/// <summary>The options of <c>fit</c>, bound to a <see cref="FitRequest"/>.</summary>
internal sealed class FitOptions
{
    /// <summary>DATA, --form, --fluid, --tc, --pc and the data units.</summary>
    public CorrelationOptions Correlation { get; } = new("auto");

    /// <summary>--format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>--log-base: as audit's, the logarithm of the printed correlation.</summary>
    public Option<string> LogBase { get; } = new("--log-base") { Description = "Print the coefficients also for log base 10 or e, as audit reads them (with --correlation-pressure-unit and --correlation-temperature-unit; parts not given stay e, Pa, K); e only for the Wagner forms" };

    /// <summary>--correlation-pressure-unit: as audit's, the printed correlation's pressure unit.</summary>
    public Option<string> PressureUnit { get; } = new("--correlation-pressure-unit") { Description = "Print the coefficients also for P in Pa, kPa, MPa, bar, mmHg (conventional), torr, atm or psi (the Wagner forms: Pc in it)" };

    /// <summary>--correlation-temperature-unit: as audit's, the printed correlation's temperature scale.</summary>
    public Option<string> TemperatureUnit { get; } = new("--correlation-temperature-unit") { Description = "Print the coefficients also for T in K, degC, degF or degR (degC and degF for antoine only; the Wagner forms: Tc in it)" };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Correlation.AddTo(command);
        Common.AddTo(command, withEos: false, withUnits: false); // the table is in K, kPa and %
        command.Options.Add(LogBase);
        command.Options.Add(PressureUnit);
        command.Options.Add(TemperatureUnit);
        Out.AddTo(command);
    }

    /// <summary>Refuses a form that cannot be printed in the convention: a predictive form (no
    /// coefficients), or a log base or scale its algebra does not allow.</summary>
    public static void RequirePrintable(VapourPressureForm form, PublishedConvention convention, bool auto)
    {
        string chosen = auto ? $"auto chose the {form.Id} form, and " : "";
        if (!PublishedCorrelation.FormIds.Contains(form.Id) || form.ParameterCount == 0)
        {
            throw new UsageException($"--log-base/--correlation-pressure-unit/--correlation-temperature-unit: {chosen}the {form.Id} form has no fitted coefficients to print");
        }

        if (PublishedCorrelation.Refusal(form.Id, convention.LogBase, null) is string baseWhy)
        {
            throw new UsageException($"--log-base: {chosen}{baseWhy}" + (auto ? "; name a --form" : ""));
        }

        if (PublishedCorrelation.Refusal(form.Id, null, convention.TemperatureUnit) is string scaleWhy)
        {
            throw new UsageException($"--correlation-temperature-unit: {chosen}{scaleWhy}" + (auto ? "; name a --form" : ""));
        }
    }

    /// <summary>The convention to print in, or null when none of its options is given.</summary>
    private PublishedConvention? Convention(ParseResult parse, OutputFormat format)
    {
        string? b = parse.GetValue(LogBase);
        string? p = parse.GetValue(PressureUnit);
        string? t = parse.GetValue(TemperatureUnit);
        if (b is null && p is null && t is null)
        {
            return null;
        }

        var convention = new PublishedConvention(
            b is null ? Core.Correlations.Audit.LogBase.E : AuditCommand.Base(b, "--log-base"),
            p is null ? PublishedPressureUnit.Pa : AuditCommand.Pressure(p, "--correlation-pressure-unit"),
            t is null ? PublishedTemperatureUnit.Kelvin : AuditCommand.Temperature(t, "--correlation-temperature-unit"));
        if (format == OutputFormat.Csv)
        {
            string option = b is not null ? "--log-base" : p is not null ? "--correlation-pressure-unit" : "--correlation-temperature-unit";
            throw new UsageException($"{option}: the CSV output holds the residuals only, not the coefficients; use --format table or json");
        }

        return convention;
    }

    /// <summary>Parses and checks every option, then reads the data file and checks it against
    /// the critical point.</summary>
    public FitRequest Bind(ParseResult parse)
    {
        var format = Common.OutputFormat(parse);
        var fluid = Correlation.FluidOf(parse);
        // Options first, then the data file: a bad --form is a usage error whatever the file holds.
        var forms = Correlation.Forms(parse, fluid, out bool auto);
        var convention = Convention(parse, format);
        if (convention is not null && !auto)
        {
            RequirePrintable(forms[0], convention, auto: false);
        }

        var data = Correlation.ReadData(parse);
        Correlation.RequireDataBelowCriticalPoint(parse, fluid, data);
        return new FitRequest(forms, auto, data, format, convention);
    }
}
