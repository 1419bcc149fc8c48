using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
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
        var batch = new Option<string>("--batch") { Description = "CSV of states, one per row: a header naming two property columns with units in brackets (e.g. 'P [bar],h [kJ/kg]'); writes one result per row, a bad row reported by line and column" };
        command.Options.Add(batch);
        command.SetAction(parse => io.Guard(() =>
        {
            if (parse.GetValue(batch) is string file)
            {
                return Batch(io, parse, options, outFile, file, uncertainty);
            }

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
            return ExitCodes.Success;
        }));
        return command;
    }

    /// <summary><c>state --batch FILE</c>: every row of the file, each refused row named on
    /// standard error and in its output row; exit <see cref="ExitCodes.BatchRowsFailed"/> when any was.</summary>
    private static int Batch(CliIo io, ParseResult parse, StateOptions options, OutputOption outFile, string file, UncertaintyOptions uncertainty)
    {
        if (options.AnyPropertyGiven(parse))
        {
            throw new UsageException("--batch: the states come from the file; give no property options with it");
        }

        if (CommonOptions.Given(parse, options.Phase) || uncertainty.Bind(parse) is not null)
        {
            throw new UsageException($"--batch: {(CommonOptions.Given(parse, options.Phase) ? "--phase" : "--uncertainty")} applies to a single state, not to a batch");
        }

        var output = options.Common.BindOutput(parse, csvUnits: true);
        var setting = options.BindSetting(parse);
        output.RequireMolarMassFor(setting.Fluid);
        var rows = BoundedInput.ReadDataFile(file, reader => StateBatchCsv.Read(reader, file, setting.Fluid));
        var engine = setting.Engine();
        var results = new List<StateBatchResult>(rows.Count);
        foreach (var row in rows)
        {
            if (row.Spec is null)
            {
                results.Add(new StateBatchResult(row.Line, null, row.Error));
                continue;
            }

            try
            {
                results.Add(new StateBatchResult(row.Line, row.Spec.Evaluate(engine, PhaseChoice.Stable), null));
            }
            catch (Exception ex) when (ex is InvalidInputException or ConvergenceException or FluidDataException)
            {
                results.Add(new StateBatchResult(row.Line, null, $"{file}:{row.Line}: {ex.Message}"));
            }
        }

        outFile.Emit(io, parse, StateWriter.Batch(engine, results, output.Format, output.Units), "the states");
        var failed = results.Where(r => r.Error is not null).ToList();
        foreach (var failure in failed)
        {
            io.Fail(failure.Error!, ExitCodes.BatchRowsFailed);
        }

        return failed.Count == 0 ? ExitCodes.Success : ExitCodes.BatchRowsFailed;
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
