using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope envelope MIXTURE</c>: the phase envelope of a mixture of fixed
/// composition (bubble and dew lines from the lowest pressure through the critical point), its
/// critical point (cross-checked by the Heidemann–Khalil criteria), cricondenbar and cricondentherm.</summary>
internal static class EnvelopeCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new EnvelopeCommandOptions();
        var command = new Command("envelope", "Trace a mixture's phase envelope: bubble and dew lines through the critical point, "
            + "with the critical point (checked by the Heidemann-Khalil criteria), cricondenbar and cricondentherm");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var model = request.Input.CreateModel();
            var tracer = new EnvelopeTracer(model, EnvelopeOptions.Default with { StartPressure = request.MinimumPressure, EndPressure = request.MinimumPressure });
            var composition = request.Input.Mixture.MoleFractions;
            var envelope = tracer.Trace(composition);
            var criteria = CriticalPointCriteria.Locate(model, composition);
            options.Out.Emit(io, parse, EnvelopeWriter.Render(request.Input, envelope, criteria, request.Output), "the envelope");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>envelope</c>.</summary>
/// <param name="Input">The mixture and model choice.</param>
/// <param name="MinimumPressure">Where the bubble line starts and the dew line ends, Pa.</param>
/// <param name="Output">The output format (table, csv or json) and the units of table and CSV.</param>
internal sealed record EnvelopeRequest(MixtureInput Input, double MinimumPressure, OutputChoice Output);

/// <summary>The options of <c>envelope</c>, bound to an <see cref="EnvelopeRequest"/>.</summary>
internal sealed class EnvelopeCommandOptions
{
    /// <summary>Creates the group.</summary>
    public EnvelopeCommandOptions() => Mixture = new MixtureOptions(Common);

    /// <summary>--eos, --alpha, --volume-shift, --format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>MIXTURE, --mass-fractions, --kij and the model options.</summary>
    public MixtureOptions Mixture { get; }

    /// <summary>--min-pressure.</summary>
    public Option<string> MinimumPressure { get; } = new("--min-pressure")
    {
        Description = "Pressure where the bubble line starts and the dew line ends (default 100 kPa), e.g. 50 kPa, 2 bar (bare number: Pa)",
    };

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Mixture.AddTo(command);
        command.Options.Add(MinimumPressure);
        command.Options.Add(Common.Format);
        Common.Units.Description = CommonOptions.TemperaturePressureUnitsDescription;
        command.Options.Add(Common.Units);
        Out.AddTo(command);
    }

    /// <summary>Checks --format and --min-pressure, then binds the mixture.</summary>
    public EnvelopeRequest Bind(ParseResult parse)
    {
        var format = Common.OutputFormat(parse);
        string? text = parse.GetValue(MinimumPressure);
        double minimum = text is null ? EnvelopeOptions.Default.StartPressure : QuantityParser.ParsePressure(text, "--min-pressure");
        if (!(minimum <= 1e7))
        {
            throw new UsageException($"--min-pressure: '{text}' is above 10 MPa; the envelope is traced from low pressure, where Wilson's K-values start it");
        }

        _ = Out.Path(parse);
        var output = Common.BindOutput(parse, format, csvUnits: true);
        var input = Mixture.Bind(parse);
        if (input.Mixture.Count < 2)
        {
            throw new UsageException($"MIXTURE: a phase envelope needs at least two components, got only '{input.Mixture.Components[0].Name}' (a pure fluid has a saturation curve: phaseslope curve)");
        }

        return new EnvelopeRequest(input, minimum, output);
    }
}
