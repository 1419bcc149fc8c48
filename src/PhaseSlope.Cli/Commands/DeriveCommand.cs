using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope derive FLUID --of X --by Y --hold Z --temperature V --pressure V</c>:
/// any first partial derivative at a state.</summary>
internal static class DeriveCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new StateOptions();
        const string variables = "T, P, V (molar volume), U, H, S, A or G";
        var of = new Option<string>("--of") { Description = $"The function X differentiated: {variables}", Required = true };
        var by = new Option<string>("--by") { Description = $"The variable Y it is differentiated by: {variables}", Required = true };
        var hold = new Option<string>("--hold") { Description = $"The variable Z held constant: {variables}", Required = true };
        var command = new Command("derive", "A partial derivative (dX/dY) at constant Z, exact, at a single-phase state");
        command.Options.Add(of);
        command.Options.Add(by);
        command.Options.Add(hold);
        options.AddTo(command, withUnits: false); // one value, always printed in SI
        var output = new OutputOption();
        output.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var format = options.Common.OutputFormat(parse);
            var x = Variable(parse.GetValue(of)!, "--of");
            var y = Variable(parse.GetValue(by)!, "--by");
            var z = Variable(parse.GetValue(hold)!, "--hold");
            if (y == z)
            {
                throw new UsageException($"--hold: the variable held constant ({z}) must differ from --by ({y})");
            }

            var (engine, state) = options.Resolve(parse);
            double value = PartialDerivatives.Of(state, x, y, z);
            output.Emit(io, parse, StateWriter.Derivative(engine, state, x, y, z, value, format), "the derivative");
        }));
        return command;
    }

    private static StateVariable Variable(string text, string option)
        => Enum.TryParse<StateVariable>(text.Trim(), ignoreCase: true, out var v) && Enum.IsDefined(v) && !int.TryParse(text, out _)
            ? v
            : throw new UsageException($"{option}: unknown variable '{text}' (use T, P, V, U, H, S, A or G)");
}
