using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope bubble MIXTURE (--temperature V | --pressure V)</c> and
/// <c>phaseslope dew MIXTURE (…)</c>: a mixture's bubble or dew point, with the temperature glide
/// at the given pressure.</summary>
internal static class SaturationCommand
{
    /// <summary>Builds <c>bubble</c> or <c>dew</c>; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io, MixtureSaturationKind kind)
    {
        bool bubble = kind == MixtureSaturationKind.Bubble;
        var options = new SaturationOptions(bubble ? "bubble" : "dew");
        var command = new Command(bubble ? "bubble" : "dew", bubble
            ? "Bubble point of a mixture (the first bubble of vapour) at a given temperature or pressure, with the incipient vapour and, at a given pressure, the temperature glide"
            : "Dew point of a mixture (the first drop of liquid) at a given temperature or pressure, with the incipient liquid and, at a given pressure, the temperature glide");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var engine = new MixtureEquilibrium(request.Input.CreateModel(), request.Input.Mixture.Components);
            var z = request.Input.Mixture.MoleFractions;
            MixtureSaturationPoint point;
            double? glide = null;
            string? reason = MixtureEquilibriumWriter.GlideAtTemperatureReason;
            if (request.Temperature is double t)
            {
                point = bubble ? engine.BubbleAtTemperature(t, z) : engine.DewAtTemperature(t, z);
            }
            else
            {
                double p = request.Pressure!.Value;
                point = bubble ? engine.BubbleAtPressure(p, z) : engine.DewAtPressure(p, z);
                (glide, reason) = Glide(engine, point, p, z, bubble);
            }

            options.Out.Emit(io, parse, MixtureEquilibriumWriter.Render(request.Input, point, glide, reason, request.Output),
                $"the {(bubble ? "bubble" : "dew")} point");
        }));
        return command;
    }

    /// <summary>The glide at P from the other point, or null with the reason it could not be found.</summary>
    private static (double?, string?) Glide(MixtureEquilibrium engine, MixtureSaturationPoint point, double pressure, IReadOnlyList<double> z, bool bubble)
    {
        try
        {
            var other = bubble ? engine.DewAtPressure(pressure, z) : engine.BubbleAtPressure(pressure, z);
            return (bubble ? other.Temperature - point.Temperature : point.Temperature - other.Temperature, null);
        }
        catch (ConvergenceException ex)
        {
            return (null, $"the {(bubble ? "dew" : "bubble")} point at this pressure was not found: {ex.Message}");
        }
    }
}

/// <summary>The checked inputs of <c>bubble</c> and <c>dew</c>.</summary>
/// <param name="Input">The mixture and model choice.</param>
/// <param name="Temperature">The given temperature in K, or null.</param>
/// <param name="Pressure">The given pressure in Pa, or null.</param>
/// <param name="Output">table, csv or json, and the units of table and CSV.</param>
internal sealed record SaturationRequest(MixtureInput Input, double? Temperature, double? Pressure, OutputChoice Output);

/// <summary>The options of <c>bubble</c> and <c>dew</c>, bound to a <see cref="SaturationRequest"/>.</summary>
internal sealed class SaturationOptions
{
    private readonly string _command;

    /// <summary>Creates the group for the named command.</summary>
    public SaturationOptions(string command)
    {
        _command = command;
        Mixture = new MixtureOptions(Common);
    }

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "Temperature, e.g. 250 K, -20 degC (bare number: K); the point's pressure is found" };

    /// <summary>--pressure.</summary>
    public Option<string> Pressure { get; } = new("--pressure", "-P") { Description = "Pressure, e.g. 101.325 kPa, 5 bar (bare number: Pa); the point's temperature and the glide at this pressure are found" };

    /// <summary>--eos, --alpha, --volume-shift, --format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>MIXTURE, --mass-fractions, --kij and the model options.</summary>
    public MixtureOptions Mixture { get; }

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Mixture.AddTo(command);
        command.Options.Add(Temperature);
        command.Options.Add(Pressure);
        command.Options.Add(Common.Format);
        Common.Units.Description = CommonOptions.MixtureUnitsDescription;
        command.Options.Add(Common.Units);
        Out.AddTo(command);
    }

    /// <summary>Checks the options (exactly one of --temperature and --pressure; table or json),
    /// then resolves the mixture.</summary>
    public SaturationRequest Bind(ParseResult parse)
    {
        string? tText = parse.GetValue(Temperature);
        string? pText = parse.GetValue(Pressure);
        if ((tText is null) == (pText is null))
        {
            throw new UsageException($"{_command}: give exactly one of --temperature and --pressure");
        }

        var format = Common.OutputFormat(parse);
        double? t = tText is null ? null : QuantityParser.ParseTemperature(tText, "--temperature");
        double? p = pText is null ? null : QuantityParser.ParsePressure(pText, "--pressure");
        _ = Out.Path(parse);
        var output = Common.BindOutput(parse, format, csvUnits: true);
        var input = Mixture.Bind(parse);
        output.RequireMolarMassFor(input.Mixture);
        return new SaturationRequest(input, t, p, output);
    }
}
