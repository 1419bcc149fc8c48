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
        var options = new DeriveOptions();
        var command = new Command("derive", "A partial derivative (dX/dY) at constant Z, exact, at a single-phase state");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var (engine, state) = request.Point.Evaluate("a partial derivative");
            if (PartialDerivatives.NeedsIdealGas(state, request.Of, request.By, request.Hold))
            {
                // Decided from the Jacobian's dependence on cv and s, not from a list.
                engine.RequireIdealGas($"(d{request.Of}/d{request.By}) at constant {request.Hold}, through cv or the absolute entropy,");
            }

            double value = PartialDerivatives.Of(state, request.Of, request.By, request.Hold);
            options.Out.Emit(io, parse, StateWriter.Derivative(engine, state, request.Of, request.By, request.Hold, value, request.Format), "the derivative");
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>derive</c>.</summary>
/// <param name="Point">The state.</param>
/// <param name="Of">The function differentiated (--of).</param>
/// <param name="By">The variable it is differentiated by (--by).</param>
/// <param name="Hold">The variable held constant (--hold).</param>
/// <param name="Format">The output format (the value is always in SI units).</param>
internal sealed record DeriveRequest(StatePoint Point, StateVariable Of, StateVariable By, StateVariable Hold, OutputFormat Format);

/// <summary>The options of <c>derive</c>, bound to a <see cref="DeriveRequest"/>.</summary>
internal sealed class DeriveOptions
{
    private const string Variables = "T, P, V (molar volume), U, H, S, A or G";

    /// <summary>--of.</summary>
    public Option<string> Of { get; } = new("--of") { Description = $"The function X differentiated: {Variables}", Required = true };

    /// <summary>--by.</summary>
    public Option<string> By { get; } = new("--by") { Description = $"The variable Y it is differentiated by: {Variables}", Required = true };

    /// <summary>--hold.</summary>
    public Option<string> Hold { get; } = new("--hold") { Description = $"The variable Z held constant: {Variables}", Required = true };

    /// <summary>FLUID and the options that pick the state.</summary>
    public StateOptions State { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Options.Add(Of);
        command.Options.Add(By);
        command.Options.Add(Hold);
        State.AddTo(command, withUnits: false); // one value, always printed in SI
        Out.AddTo(command);
    }

    /// <summary>Parses and checks every option, then binds the state.</summary>
    public DeriveRequest Bind(ParseResult parse)
    {
        var format = State.Common.OutputFormat(parse);
        var x = Variable(parse.GetValue(Of)!, "--of");
        var y = Variable(parse.GetValue(By)!, "--by");
        var z = Variable(parse.GetValue(Hold)!, "--hold");
        if (y == z)
        {
            throw new UsageException($"--hold: the variable held constant ({z}) must differ from --by ({y})");
        }

        return new DeriveRequest(State.BindPoint(parse), x, y, z, format);
    }

    private static StateVariable Variable(string text, string option)
        => Enum.TryParse<StateVariable>(text.Trim(), ignoreCase: true, out var v) && Enum.IsDefined(v) && !int.TryParse(text, out _)
            ? v
            : throw new UsageException($"{option}: unknown variable '{text}' (use T, P, V, U, H, S, A or G)");
}
