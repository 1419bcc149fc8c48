using System.CommandLine;
using PhaseSlope.Cli.Output;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope state FLUID --temperature V --pressure V | --density V</c>: one single-phase state.</summary>
internal static class StateCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new StateOptions();
        var command = new Command("state", "Every single-phase property at a temperature and a pressure (or density)");
        options.AddTo(command, withUnits: true);
        var outFile = new OutputOption();
        outFile.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var (engine, state) = request.Point.Evaluate();
            outFile.Emit(io, parse, StateWriter.State(engine, state, request.Output.Format, request.Output.Units), "the state");
        }));
        return command;
    }
}
