using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope state FLUID</c> with any two of T, P, ρ (or v), h, s, u and the quality:
/// one equilibrium state, single-phase or two-phase.</summary>
internal static class StateCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new StateOptions();
        var command = new Command("state", "One state from any two of temperature, pressure, density (or volume), enthalpy, entropy, internal energy and quality: every property of a single phase, or the two-phase mixture and its saturated phases");
        options.AddTo(command, withUnits: true);
        var outFile = new OutputOption();
        outFile.AddTo(command);
        var uncertainty = new UncertaintyOptions();
        uncertainty.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var choice = uncertainty.Bind(parse);
            var request = options.Bind(parse);
            var spec = request.Point.Spec;
            if (choice is not null && (spec.Temperature is null || (spec.Pressure is null && spec.Density is null)))
            {
                throw new UsageException("--uncertainty: propagates to a state given by --temperature with --pressure or --density");
            }

            var (engine, state) = request.Point.EvaluateAny();
            StateUncertaintyText? text = null;
            if (choice is not null)
            {
                var single = !state.Region.HasQuality() ? state.Single! : throw new Core.Errors.InvalidInputException("uncertainty", state.Quality ?? double.NaN,
                    $"--uncertainty: the state is {state.Region.Id()}; uncertainties are propagated to single-phase states (see coexist --uncertainty for the saturated phases)");
                text = Uncertainty(io, choice, request.Point, single);
            }

            outFile.Emit(io, parse, StateWriter.State(engine, state, request.Output.Format, request.Output.Units, text), "the state");
        }));
        return command;
    }

    /// <summary>The state's uncertainties: linear from the nominal state's density, or Monte
    /// Carlo re-evaluating the same (T, P) or (T, ρ) with the same phase rule for every sample.</summary>
    private static StateUncertaintyText Uncertainty(CliIo io, UncertaintyChoice choice, StatePoint point, ThermodynamicState state)
    {
        var parameters = UncertaintyRun.Parameters(point.Model, point.Fluid);
        bool densityGiven = point.Spec.Pressure is null;
        StateUncertainty values;
        if (state.Critical)
        {
            values = new StateUncertainty(choice.Method, null, null, null, null, null,
                "the state is the model's critical point, where the properties are not differentiable in Tc and Pc");
        }
        else if (choice.Method == PropagationMethod.Linear)
        {
            values = StatePropagation.Linear(parameters, state.Temperature, state.Density, densityGiven, state.IsobaricHeatCapacity, state.IsobaricExpansivity, state.SpeedOfSound);
        }
        else
        {
            using var bar = new ProgressBar(io, choice.Samples, "Monte Carlo");
            values = StatePropagation.MonteCarlo(parameters, x =>
            {
                var sample = point with { Setting = point.Setting with { Fluid = parameters.FluidFor(x) } };
                var (_, s) = sample.Evaluate("a Monte Carlo sample of the state");
                return new StateValues(s.Density, point.Spec.Pressure ?? s.Pressure, s.CompressibilityFactor, s.ResidualEnthalpy,
                    s.ResidualEntropy ?? throw new Core.Errors.InvalidInputException("state", s.Density, "residual entropy undefined"),
                    s.IsobaricHeatCapacity, s.IsochoricHeatCapacity, s.IsothermalCompressibility, s.IsobaricExpansivity, s.JouleThomsonCoefficient, s.SpeedOfSound);
            }, choice.Samples, choice.Seed, bar);
        }

        return new StateUncertaintyText(values, UncertaintyRun.Summary(choice, parameters));
    }
}
