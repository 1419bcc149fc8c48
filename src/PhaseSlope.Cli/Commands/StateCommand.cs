using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Uncertainty;

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
        var uncertainty = new UncertaintyOptions();
        uncertainty.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var choice = uncertainty.Bind(parse);
            var request = options.Bind(parse);
            var (engine, state) = request.Point.Evaluate();
            var text = choice is null ? null : Uncertainty(io, choice, request.Point, state);
            outFile.Emit(io, parse, StateWriter.State(engine, state, request.Output.Format, request.Output.Units, text), "the state");
        }));
        return command;
    }

    /// <summary>The state's uncertainties: linear from the nominal state's density, or Monte
    /// Carlo re-evaluating the same (T, P) or (T, ρ) with the same phase rule for every sample.</summary>
    private static StateUncertaintyText Uncertainty(CliIo io, UncertaintyChoice choice, StatePoint point, ThermodynamicState state)
    {
        var parameters = UncertaintyRun.Parameters(point.Model, point.Fluid);
        bool densityGiven = point.Density is not null;
        StateUncertainty values;
        if (state.Critical)
        {
            values = new StateUncertainty(choice.Method, null, null, null, null, null,
                "the state is the model's critical point, where the properties are not differentiable in Tc and Pc");
        }
        else if (choice.Method == PropagationMethod.Linear)
        {
            values = StatePropagation.Linear(parameters, point.Temperature, state.Density, densityGiven, state.IsobaricHeatCapacity, state.IsobaricExpansivity, state.SpeedOfSound);
        }
        else
        {
            using var bar = new ProgressBar(io, choice.Samples, "Monte Carlo");
            values = StatePropagation.MonteCarlo(parameters, x =>
            {
                var sample = point with { Fluid = parameters.FluidFor(x) };
                var (_, s) = sample.Evaluate();
                return new StateValues(s.Density, point.Pressure ?? s.Pressure, s.CompressibilityFactor, s.ResidualEnthalpy,
                    s.ResidualEntropy ?? throw new Core.Errors.InvalidInputException("state", s.Density, "residual entropy undefined"),
                    s.IsobaricHeatCapacity, s.IsochoricHeatCapacity, s.IsothermalCompressibility, s.IsobaricExpansivity, s.JouleThomsonCoefficient, s.SpeedOfSound);
            }, choice.Samples, choice.Seed, bar);
        }

        return new StateUncertaintyText(values, UncertaintyRun.Summary(choice, parameters));
    }
}
