using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope latent DATA.csv ...</c>: enthalpy of vaporization from P–T data by the
/// Clapeyron equation, with its uncertainty from the fit.</summary>
internal static class LatentCommand
{
    /// <summary>Default number of temperatures when a range is given.</summary>
    public const int DefaultPoints = 11;

    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new CorrelationOptions("auto");
        var common = new CommonOptions();
        var volume = new Option<string>("--volume-model")
        {
            Description = "Volume change: ideal-gas (vapour ideal, liquid neglected), eos (the model's compressibility change for --fluid; the default with --fluid), "
                + "haggenmacher (corresponding states from Tc and Pc; the default with --tc/--pc only)",
        };
        var temperature = new Option<string>("--temperature", "-T") { Description = "One temperature, e.g. 300 K or 26.85 degC (bare number: K)" };
        var from = new Option<string>("--from") { Description = "First temperature of a range (bare number: K; default: the lowest data temperature)" };
        var to = new Option<string>("--to") { Description = "Last temperature of a range (bare number: K; default: the highest data temperature)" };
        var points = new Option<int>("--points", "-n") { Description = $"Temperatures in the range, 2 to 10000 (default {DefaultPoints})", DefaultValueFactory = _ => DefaultPoints };
        var command = new Command("latent", "Enthalpy of vaporization from P-T data via Clapeyron, dH = T dv dP/dT, with a standard uncertainty");
        options.AddTo(command);
        command.Options.Add(volume);
        command.Options.Add(temperature);
        command.Options.Add(from);
        command.Options.Add(to);
        command.Options.Add(points);
        // --eos and --alpha choose the model behind --volume-model eos; a volume shift moves both
        // coexisting volumes alike and cannot change a latent heat, so it is not offered.
        command.Options.Add(common.Eos);
        command.Options.Add(common.Alpha);
        common.AddTo(command, withEos: false, withUnits: false); // the table is in K, kPa and J/mol
        var output = new OutputOption();
        output.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var format = common.OutputFormat(parse);
            var fluid = options.FluidOf(parse);
            int n = parse.GetValue(points);
            if (n < 2 || n > 10_000)
            {
                throw new UsageException($"--points: must be between 2 and 10000, got {n}");
            }

            if (parse.GetValue(temperature) is not null && (parse.GetValue(from) is not null || parse.GetValue(to) is not null))
            {
                throw new UsageException("latent: give --temperature or --from/--to, not both");
            }

            if (parse.GetValue(temperature) is not null && CommonOptions.Given(parse, points))
            {
                throw new UsageException("--points: applies to a range (--from/--to or the data range), not to one --temperature");
            }

            var modelChoice = common.BindModel(parse);

            bool criticalGiven = parse.GetValue(options.CriticalTemperature) is not null && parse.GetValue(options.CriticalPressure) is not null;
            string volumeText = parse.GetValue(volume) ?? (fluid is not null ? "eos" : criticalGiven ? "haggenmacher" : "ideal-gas");
            var model = volumeText.ToLowerInvariant() switch
            {
                "ideal-gas" => VolumeChangeModel.IdealGas,
                "eos" => VolumeChangeModel.EquationOfState,
                "haggenmacher" => VolumeChangeModel.Haggenmacher,
                _ => throw new UsageException($"--volume-model: unknown model '{volumeText}' (use ideal-gas, eos or haggenmacher)"),
            };
            if (model == VolumeChangeModel.EquationOfState && fluid is null)
            {
                throw new UsageException("--volume-model eos: needs --fluid (the coexisting volumes come from its model)");
            }

            if (model == VolumeChangeModel.Haggenmacher && fluid is null && !criticalGiven)
            {
                throw new UsageException("--volume-model haggenmacher: needs --fluid, or --tc and --pc");
            }

            if (model != VolumeChangeModel.EquationOfState)
            {
                foreach (var option in new Option[] { common.Eos, common.Alpha })
                {
                    if (CommonOptions.Given(parse, option))
                    {
                        throw new UsageException($"{option.Name}: chooses the model of --volume-model eos only (the volume model here is {FitWriter.VolumeModelId(model)})");
                    }
                }
            }

            // Options first, then the data file: a bad --form is a usage error whatever the file holds.
            var forms = options.Forms(parse, fluid, out bool auto, criticalPointUsedElsewhere: model != VolumeChangeModel.IdealGas);
            var data = options.ReadData(parse);
            options.RequireDataBelowCriticalPoint(parse, fluid, data);
            var fits = CorrelationOptions.Fit(forms, auto, data);
            var fit = fits[0];
            var solver = fluid is not null && model == VolumeChangeModel.EquationOfState
                ? new CoexistenceSolver(modelChoice.For(fluid), CoexistenceSolver.LowestValidTemperature(fluid))
                : null;
            double? tc = fluid?.CriticalTemperature.Value ?? (criticalGiven ? QuantityParser.ParseTemperature(parse.GetValue(options.CriticalTemperature)!, "--tc") : null);
            double? pc = fluid?.CriticalPressure.Value ?? (criticalGiven ? QuantityParser.ParsePressure(parse.GetValue(options.CriticalPressure)!, "--pc") : null);
            var estimator = new LatentHeatEstimator(fit, model, solver, tc, pc);

            double[] temperatures;
            if (parse.GetValue(temperature) is string tText)
            {
                temperatures = [QuantityParser.ParseTemperature(tText, "--temperature")];
            }
            else
            {
                double start = parse.GetValue(from) is string f ? QuantityParser.ParseTemperature(f, "--from") : fit.MinimumTemperature;
                double end = parse.GetValue(to) is string e ? QuantityParser.ParseTemperature(e, "--to") : fit.MaximumTemperature;
                if (!(start < end))
                {
                    throw new UsageException($"--from ({NumberText.Table(start)} K) must be below --to ({NumberText.Table(end)} K)");
                }

                temperatures = [.. Enumerable.Range(0, n).Select(i => i == n - 1 ? end : start + (end - start) * i / (n - 1))];
            }

            var results = temperatures.Select(estimator.At).ToArray();
            output.Emit(io, parse, FitWriter.Latent(fit, model, results, fits, format, solver?.Model.Identity), $"{results.Count()} latent heats");
        }));
        return command;
    }
}
