using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope latent DATA.csv ...</c>: enthalpy of vaporization from P–T data by the
/// Clapeyron equation, with its uncertainty from the fit.</summary>
internal static class LatentCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new LatentOptions();
        var command = new Command("latent", "Enthalpy of vaporization from P-T data via Clapeyron, dH = T dv dP/dT, with a standard uncertainty");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var fits = CorrelationOptions.Fit(request.Forms, request.Auto, request.Data);
            var fit = fits[0];
            var estimator = new LatentHeatEstimator(fit, request.VolumeModel, request.Solver, request.CriticalTemperature, request.CriticalPressure);
            var (band, inputs) = Band(request, estimator);
            var temperatures = request.Temperatures.Resolve(fit.MinimumTemperature, fit.MaximumTemperature);
            IReadOnlyList<LatentHeatPoint> results;
            if (request.Uncertainty is { } choice)
            {
                using var bar = new ProgressBar(io, choice.Samples, "Monte Carlo");
                results = band.MonteCarlo(temperatures, choice.Samples, choice.Seed, bar);
            }
            else
            {
                results = band.Linear(temperatures);
            }

            options.Out.Emit(io, parse, FitWriter.Latent(fit, request.VolumeModel, results, fits, request.Format, request.Solver?.Model.Identity,
                new LatentBandText(request.Uncertainty, inputs, band)), $"{results.Count} latent heats");
        }));
        return command;
    }

    /// <summary>The band: the estimator rebuilt for a moved Tc or Pc refits the same form with
    /// them and, for the eos volume model, solves the fluid's model with them.</summary>
    internal static (LatentHeatBand Band, IReadOnlyList<UncertainInput> Inputs) Band(LatentRequest request, LatentHeatEstimator nominal)
    {
        if (request.CriticalTemperature is not double tc || request.CriticalPressure is not double pc)
        {
            return (new LatentHeatBand((_, _) => nominal, nominal, 0, 0), []);
        }

        IReadOnlyList<UncertainInput> inputs;
        if (request.Fluid is { } fluid)
        {
            inputs = FamilyUncertainty.CriticalConstants(fluid).Take(2).ToArray();
        }
        else
        {
            var unknown = FamilyUncertainty.Unknown;
            string source = $"family default (given with --tc and --pc: {unknown.Basis})";
            inputs = [new UncertainInput("critical_temperature_K", tc, unknown.CriticalTemperature, source),
                new UncertainInput("critical_pressure_Pa", pc, unknown.CriticalPressureRelative * pc, source)];
        }

        var fit = nominal.Fit;
        var parameters = request.Solver is not null && request.Fluid is not null && request.Model is not null
            ? UncertaintyRun.Parameters(request.Model, request.Fluid)
            : null;
        LatentHeatEstimator Build(double t, double p)
        {
            var refit = fit.Form.UsesCriticalPoint ? VapourPressureFitter.Fit(fit.Form.WithCriticalPoint(t, p), fit.Data) : fit;
            var solver = parameters is null ? null
                : new CoexistenceSolver(parameters.Build([t, p, parameters.Inputs[2].Value]), parameters.MinimumTemperature);
            return new LatentHeatEstimator(refit, nominal.VolumeModel, solver, t, p);
        }

        return (new LatentHeatBand(Build, nominal, inputs[0].StandardUncertainty, inputs[1].StandardUncertainty), inputs);
    }
}

/// <summary>The temperatures <c>latent</c> reports at: one, or <see cref="Count"/> evenly spaced
/// from <see cref="From"/> to <see cref="To"/>, either end defaulting to the data's.</summary>
/// <param name="Single">The one temperature in K (--temperature), or null for a range.</param>
/// <param name="From">The first temperature in K (--from), or null for the lowest data temperature.</param>
/// <param name="To">The last temperature in K (--to), or null for the highest data temperature.</param>
/// <param name="Count">How many temperatures in the range.</param>
internal sealed record LatentTemperatures(double? Single, double? From, double? To, int Count)
{
    /// <summary>The temperatures in K, the range's open ends taken from the data.</summary>
    /// <exception cref="UsageException">The range is empty.</exception>
    public double[] Resolve(double dataMinimum, double dataMaximum)
    {
        if (Single is double t)
        {
            return [t];
        }

        double start = From ?? dataMinimum;
        double end = To ?? dataMaximum;
        if (!(start < end))
        {
            throw new UsageException($"{(From is null ? "the lowest data temperature" : "--from")} ({NumberText.Table(start)} K) must be below "
                + $"{(To is null ? "the highest data temperature" : "--to")} ({NumberText.Table(end)} K)");
        }

        return [.. Enumerable.Range(0, Count).Select(i => i == Count - 1 ? end : start + (end - start) * i / (Count - 1))];
    }
}

/// <summary>The checked inputs of <c>latent</c>.</summary>
/// <param name="Forms">The candidate forms (one, or every form the inputs support for auto).</param>
/// <param name="Auto">Whether --form is auto.</param>
/// <param name="Data">The measured points, below the critical point when one is given.</param>
/// <param name="VolumeModel">Where the volume change comes from.</param>
/// <param name="Solver">The fluid's coexistence solver for the eos volume change, else null.</param>
/// <param name="CriticalTemperature">Tc in K from the fluid or --tc, else null.</param>
/// <param name="CriticalPressure">Pc in Pa from the fluid or --pc, else null.</param>
/// <param name="Temperatures">Where to report.</param>
/// <param name="Format">The output format (the table is in K, kPa and J/mol).</param>
/// <param name="Fluid">The --fluid, or null.</param>
/// <param name="Model">The model choice behind --volume-model eos.</param>
/// <param name="Uncertainty">--uncertainty monte-carlo with its samples and seed, or null for the linear band.</param>
internal sealed record LatentRequest(
    IReadOnlyList<VapourPressureForm> Forms,
    bool Auto,
    IReadOnlyList<VapourPressurePoint> Data,
    VolumeChangeModel VolumeModel,
    CoexistenceSolver? Solver,
    double? CriticalTemperature,
    double? CriticalPressure,
    LatentTemperatures Temperatures,
    OutputFormat Format,
    Fluid? Fluid = null,
    ModelChoice? Model = null,
    UncertaintyChoice? Uncertainty = null);

/// <summary>The options of <c>latent</c>, bound to a <see cref="LatentRequest"/>.</summary>
internal sealed class LatentOptions
{
    /// <summary>Default number of temperatures when a range is given.</summary>
    public const int DefaultPoints = 11;

    /// <summary>DATA, --form, --fluid, --tc, --pc and the data units.</summary>
    public CorrelationOptions Correlation { get; } = new("auto");

    /// <summary>--eos, --alpha and --format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>--volume-model.</summary>
    public Option<string> Volume { get; } = new("--volume-model")
    {
        Description = "Volume change: ideal-gas (vapour ideal, liquid neglected), eos (the model's compressibility change for --fluid; the default with --fluid), "
            + "haggenmacher (corresponding states from Tc and Pc; the default with --tc/--pc only)",
    };

    /// <summary>--temperature.</summary>
    public Option<string> Temperature { get; } = new("--temperature", "-T") { Description = "One temperature, e.g. 300 K or 26.85 degC (bare number: K)" };

    /// <summary>--from.</summary>
    public Option<string> From { get; } = new("--from") { Description = "First temperature of a range (bare number: K; default: the lowest data temperature)" };

    /// <summary>--to.</summary>
    public Option<string> To { get; } = new("--to") { Description = "Last temperature of a range (bare number: K; default: the highest data temperature)" };

    /// <summary>--points.</summary>
    public Option<int> Points { get; } = new("--points", "-n") { Description = $"Temperatures in the range, 2 to 10000 (default {DefaultPoints})", DefaultValueFactory = _ => DefaultPoints };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        Correlation.AddTo(command);
        command.Options.Add(Volume);
        command.Options.Add(Temperature);
        command.Options.Add(From);
        command.Options.Add(To);
        command.Options.Add(Points);
        // --eos and --alpha choose the model behind --volume-model eos; a volume shift moves both
        // coexisting volumes alike and cannot change a latent heat, so it is not offered.
        command.Options.Add(Common.Eos);
        command.Options.Add(Common.Alpha);
        Common.AddTo(command, withEos: false, withUnits: false); // the table is in K, kPa and J/mol
        Out.AddTo(command);
        Uncertainty.AddTo(command);
    }

    /// <summary>--uncertainty, --samples, --seed.</summary>
    public UncertaintyOptions Uncertainty { get; } = new();

    /// <summary>Parses and checks every option (the temperatures included), then reads the data
    /// file and checks it against the critical point.</summary>
    public LatentRequest Bind(ParseResult parse)
    {
        var format = Common.OutputFormat(parse);
        var uncertainty = Uncertainty.Bind(parse); // options before the fluid file and the data
        var fluid = Correlation.FluidOf(parse);
        var temperatures = BindTemperatures(parse);
        var modelChoice = Common.BindModel(parse);

        bool criticalGiven = parse.GetValue(Correlation.CriticalTemperature) is not null && parse.GetValue(Correlation.CriticalPressure) is not null;
        string volumeText = parse.GetValue(Volume) ?? (fluid is not null ? "eos" : criticalGiven ? "haggenmacher" : "ideal-gas");
        var model = volumeText.Trim().ToLowerInvariant() switch
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
            foreach (var option in new Option[] { Common.Eos, Common.Alpha })
            {
                if (CommonOptions.Given(parse, option))
                {
                    throw new UsageException($"{option.Name}: chooses the model of --volume-model eos only (the volume model here is {FitWriter.VolumeModelId(model)})");
                }
            }
        }

        // Options first, then the data file: a bad --form is a usage error whatever the file holds.
        var forms = Correlation.Forms(parse, fluid, out bool auto, criticalPointUsedElsewhere: model != VolumeChangeModel.IdealGas);
        var data = Correlation.ReadData(parse);
        Correlation.RequireDataBelowCriticalPoint(parse, fluid, data);
        var solver = fluid is not null && model == VolumeChangeModel.EquationOfState
            ? new CoexistenceSolver(modelChoice.For(fluid), fluid)
            : null;
        var (tc, pc) = Correlation.CriticalPoint(parse, fluid);
        return new LatentRequest(forms, auto, data, model, solver, tc, pc, temperatures, format, fluid, modelChoice, uncertainty);
    }

    private LatentTemperatures BindTemperatures(ParseResult parse)
    {
        int n = parse.GetValue(Points);
        if (n < 2 || n > 10_000)
        {
            throw new UsageException($"--points: must be between 2 and 10000, got {n}");
        }

        string? single = parse.GetValue(Temperature);
        string? from = parse.GetValue(From);
        string? to = parse.GetValue(To);
        if (single is not null && (from is not null || to is not null))
        {
            throw new UsageException("latent: give --temperature or --from/--to, not both");
        }

        if (single is not null && CommonOptions.Given(parse, Points))
        {
            throw new UsageException("--points: applies to a range (--from/--to or the data range), not to one --temperature");
        }

        var temperatures = new LatentTemperatures(
            single is null ? null : QuantityParser.ParseTemperature(single, "--temperature"),
            from is null ? null : QuantityParser.ParseTemperature(from, "--from"),
            to is null ? null : QuantityParser.ParseTemperature(to, "--to"),
            n);
        if (temperatures is { From: double f, To: double t } && !(f < t))
        {
            throw new UsageException($"--from ({NumberText.Table(f)} K) must be below --to ({NumberText.Table(t)} K)");
        }

        return temperatures;
    }
}
