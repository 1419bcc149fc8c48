using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope mixture MIXTURE</c>: the resolved mixture, its composition on both
/// bases, its model constants per component and its k_ij with their sources.</summary>
internal static class MixtureCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new MixtureCommandOptions();
        var command = new Command("mixture", "Show a mixture as it will be used: mole and mass fractions, molar mass, each component's model, "
            + "the k_ij of every pair with its source, and the pseudo-critical constants (Kay's rule)");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var model = request.Input.CreateModel();
            options.Out.Emit(io, parse, MixtureWriter.Render(request.Input, model, request.Output.Format), "the mixture");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>mixture</c>.</summary>
/// <param name="Input">The mixture and model choice.</param>
/// <param name="Output">The output format (table or json).</param>
internal sealed record MixtureRequest(MixtureInput Input, OutputChoice Output);

/// <summary>The options of <c>mixture</c>, bound to a <see cref="MixtureRequest"/>.</summary>
internal sealed class MixtureCommandOptions
{
    /// <summary>Creates the group.</summary>
    public MixtureCommandOptions() => Mixture = new MixtureOptions(Common);

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
        Common.Format.Description = "Output format: table or json";
        command.Options.Add(Common.Format);
        Out.AddTo(command);
    }

    /// <summary>Checks --format (table or json), then binds the mixture.</summary>
    public MixtureRequest Bind(ParseResult parse)
    {
        var format = Common.OutputFormat(parse);
        if (format == OutputFormat.Csv)
        {
            throw new UsageException("--format: mixture writes table or json (its result is not one table)");
        }

        _ = Out.Path(parse);
        var output = Common.BindOutput(parse, format);
        return new MixtureRequest(Mixture.Bind(parse), output);
    }
}
