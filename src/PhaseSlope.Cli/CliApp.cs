using System.CommandLine;
using PhaseSlope.Cli.Commands;

namespace PhaseSlope.Cli;

/// <summary>Builds the command tree and runs one command line.</summary>
internal static class CliApp
{
    /// <summary>Runs <paramref name="args"/>, writing results to <paramref name="output"/> and
    /// messages to <paramref name="error"/>; returns the exit code (see <see cref="ExitCodes"/>).</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var io = new CliIo(output, error);
        var root = Root(io);
        if (args.Length == 0)
        {
            return io.Fail("no command given; 'phaseslope --help' lists the commands", ExitCodes.Usage);
        }

        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            // An unknown word is more telling than the "required command" error it also causes.
            var first = parse.Errors.FirstOrDefault(e => e.Message.StartsWith("Unrecognized", StringComparison.Ordinal)) ?? parse.Errors[0];
            return io.Fail(first.Message, ExitCodes.Usage);
        }

        var config = new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false };
        return parse.Invoke(config);
    }

    /// <summary>The command tree, its actions writing to <paramref name="io"/> (the tests walk it
    /// to check that every offered option is honoured).</summary>
    public static RootCommand Root(CliIo io)
    {
        var root = new RootCommand("phaseslope: liquid-vapour coexistence of pure fluids from cubic equations of state");
        root.Subcommands.Add(CoexistCommand.Create(io));
        root.Subcommands.Add(CurveCommand.Create(io));
        root.Subcommands.Add(StateCommand.Create(io));
        root.Subcommands.Add(CycleCommand.Create(io));
        root.Subcommands.Add(DeriveCommand.Create(io));
        root.Subcommands.Add(FitCommand.Create(io));
        root.Subcommands.Add(LatentCommand.Create(io));
        root.Subcommands.Add(TuneCommand.Create(io));
        root.Subcommands.Add(AuditCommand.Create(io));
        root.Subcommands.Add(PlotCommand.Create(io));
        root.Subcommands.Add(FluidsCommand.Create(io));
        root.Subcommands.Add(MixtureCommand.Create(io));
        root.Subcommands.Add(BinaryCommand.Create(io));
        root.Subcommands.Add(FitKijCommand.Create(io));
        root.Subcommands.Add(EnvelopeCommand.Create(io));
        root.Subcommands.Add(SaturationCommand.Create(io, Core.Mixtures.MixtureSaturationKind.Bubble));
        root.Subcommands.Add(SaturationCommand.Create(io, Core.Mixtures.MixtureSaturationKind.Dew));
        root.Subcommands.Add(FlashCommand.Create(io));
        root.Subcommands.Add(ReportCommand.Create(io));
        return root;
    }
}
