using System.CommandLine;
using System.Globalization;
using System.Security.Cryptography;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tuning;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope tune DATA.csv (--fluid FLUID | --tc V --pc V [--omega V] [--molar-mass V] --name NAME) --out FILE</c>:
/// tunes the model to measured vapour pressures and writes the tuned fluid file.</summary>
internal static class TuneCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new TuneOptions();
        var command = new Command("tune", "Tune the model to measured vapour pressures: the acentric factor from one point, an alpha function's parameters from several; writes a fluid file with the parameters, their covariance and provenance, and prints the before/after comparison");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var result = AlphaTuner.Tune(request.Tuning);
            string text = FluidFileWriter.Format(result.Tuned, "Written by 'phaseslope tune'. The alpha parameters (or the acentric factor) were tuned to the data named in 'provenance'.");
            // Read the text back: the same validation any fluid file gets; a problem here is a
            // value the options gave (the name), so the message names the option.
            try
            {
                FluidFile.Parse(new StringReader(text), "(tuned)");
            }
            catch (FluidDataException ex)
            {
                throw new UsageException($"{OptionOf(ex.Field)}: {ex.Problem}");
            }

            string report = TuneWriter.Report(result, request.Format, request.OutPath);
            AtomicFile.WriteAllText(request.OutPath, text);
            io.Note($"wrote the tuned fluid {result.Tuned.Name} to {request.OutPath}");
            io.Out.Write(report);
        }));
        return command;
    }

    /// <summary>The option that gave a fluid-file field of the tuned fluid (the others come from
    /// --fluid's own file, which was read and checked before).</summary>
    private static string OptionOf(string? field) => field switch
    {
        "name" => "--name",
        "critical_temperature" => "--tc",
        "critical_pressure" => "--pc",
        "acentric_factor" => "--omega",
        "molar_mass" => "--molar-mass",
        _ => field ?? "the tuned fluid",
    };
}

/// <summary>The checked inputs of <c>tune</c>.</summary>
/// <param name="Tuning">What to tune.</param>
/// <param name="Format">Report format: table or json.</param>
/// <param name="OutPath">Where the fluid file goes.</param>
internal sealed record TuneRequest(TuningRequest Tuning, OutputFormat Format, string OutPath);

/// <summary>The options of <c>tune</c>, bound to a <see cref="TuneRequest"/>.</summary>
internal sealed class TuneOptions
{
    /// <summary>DATA.csv.</summary>
    public Argument<string> Data { get; } = new("DATA") { Description = "CSV file of measured vapour pressures, as fit reads it (see docs/data-files.md)" };

    /// <summary>--fluid.</summary>
    public Option<string> Fluid { get; } = new("--fluid") { Description = "Catalog fluid or fluid file to start from (its Tc and Pc are kept)" };

    /// <summary>--tc.</summary>
    public Option<string> CriticalTemperature { get; } = new("--tc") { Description = "Critical temperature when no --fluid is given, e.g. 540 K (bare number: K)" };

    /// <summary>--pc.</summary>
    public Option<string> CriticalPressure { get; } = new("--pc") { Description = "Critical pressure when no --fluid is given, e.g. 2.9 MPa (bare number: Pa)" };

    /// <summary>--omega.</summary>
    public Option<string> Omega { get; } = new("--omega") { Description = "Acentric factor when no --fluid is given (the start of an alpha tuning; omit it to take it from the data point nearest 0.7 Tc)" };

    /// <summary>--molar-mass.</summary>
    public Option<string> MolarMass { get; } = new("--molar-mass") { Description = "Molar mass with its unit when no --fluid is given, e.g. '86.18 g/mol' (bare number: refused, give g/mol or kg/mol); optional, needed later only for mass units" };

    /// <summary>--name.</summary>
    public Option<string> Name { get; } = new("--name") { Description = "Name of the tuned fluid, lower case (needed without --fluid; default with --fluid: its name with '-tuned')" };

    /// <summary>--alpha.</summary>
    public Option<string> Alpha { get; } = new("--alpha") { Description = "What to tune: soave (m), mathias-copeman (c1, c2, c3) or twu (L, M, N); default: the acentric factor for one point, soave for 2-3 points, mathias-copeman for 4 or more" };

    /// <summary>--eos.</summary>
    public Option<string> Eos { get; } = new("--eos") { Description = "Cubic model: pr, pr78 or srk (the models with a choice of alpha function)", DefaultValueFactory = _ => "pr" };

    /// <summary>--temperature-unit.</summary>
    public Option<string> TemperatureUnit { get; } = CorrelationOptions.DataTemperatureUnit();

    /// <summary>--pressure-unit.</summary>
    public Option<string> PressureUnit { get; } = CorrelationOptions.DataPressureUnit();

    /// <summary>--format.</summary>
    public Option<string> Format { get; } = new("--format") { Description = "Report format: table or json (the fluid file goes to --out)", DefaultValueFactory = _ => "table" };

    /// <summary>--out.</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "The tuned fluid file to write (atomically)", Required = true };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Data);
        foreach (var option in new Option[] { Fluid, CriticalTemperature, CriticalPressure, Omega, MolarMass, Name, Alpha, Eos, TemperatureUnit, PressureUnit, Format, Out })
        {
            command.Options.Add(option);
        }
    }

    /// <summary>Parses and checks every option, then reads the fluid and the data file.</summary>
    public TuneRequest Bind(ParseResult parse)
    {
        string fmt = (parse.GetValue(Format) ?? "table").Trim().ToLowerInvariant();
        var format = fmt switch
        {
            "table" => OutputFormat.Table,
            "json" => OutputFormat.Json,
            _ => throw new UsageException($"--format: unknown format '{fmt}' (use table or json)"),
        };
        string eosText = parse.GetValue(Eos) ?? "pr";
        if (!ModelRegistry.TryParse(eosText, out var kind))
        {
            throw new UsageException($"--eos: unknown model '{eosText}' (use {string.Join(", ", ModelRegistry.Ids)})");
        }

        if (!kind.Entry().AcceptsAlphaChoice)
        {
            throw new UsageException($"--eos: {kind.Title()} has no alpha function to tune (use pr, pr78 or srk)");
        }

        string? alphaText = parse.GetValue(Alpha);
        var form = alphaText?.Trim().ToLowerInvariant() switch
        {
            null => AlphaForm.Default,
            "soave" => AlphaForm.Soave,
            "twu" => AlphaForm.Twu,
            "mathias-copeman" => AlphaForm.MathiasCopeman,
            _ => throw new UsageException($"--alpha: unknown alpha function '{alphaText}' (use soave, twu or mathias-copeman)"),
        };

        string outPath = parse.GetValue(Out)!;
        if (string.IsNullOrWhiteSpace(outPath))
        {
            throw new UsageException("--out: the file name is empty");
        }

        string? fluidText = parse.GetValue(Fluid);
        string? name = parse.GetValue(Name)?.Trim();
        var bare = new Option[] { CriticalTemperature, CriticalPressure, Omega, MolarMass };
        Fluid baseFluid;
        double? omegaGiven = null;
        if (fluidText is not null)
        {
            if (bare.FirstOrDefault(o => parse.GetValue((Option<string>)o) is not null) is Option given)
            {
                throw new UsageException($"{given.Name}: conflicts with --fluid, which gives the fluid's constants; give --fluid, or --tc and --pc");
            }

            baseFluid = FluidResolver.Resolve(fluidText);
            name ??= baseFluid.Name + "-tuned";
        }
        else
        {
            string tcText = parse.GetValue(CriticalTemperature) ?? throw new UsageException("tune: give --fluid, or --tc and --pc (the critical point the model is built on)");
            string pcText = parse.GetValue(CriticalPressure) ?? throw new UsageException("--tc: needs --pc too (the critical point is both)");
            if (name is null)
            {
                throw new UsageException("--name: needed with --tc and --pc (the tuned fluid's name)");
            }

            double tc = QuantityParser.ParseTemperature(tcText, "--tc");
            double pc = QuantityParser.ParsePressure(pcText, "--pc");
            if (parse.GetValue(Omega) is string o)
            {
                omegaGiven = double.TryParse(o, NumberStyles.Float, CultureInfo.InvariantCulture, out double w) && double.IsFinite(w)
                    ? w : throw new UsageException($"--omega: '{o}' is not a number");
                if (!(omegaGiven >= FluidFile.AcentricFactorLowest && omegaGiven <= FluidFile.AcentricFactorHighest))
                {
                    // The fluid files' range, checked here so that nothing is tuned from a start outside it.
                    throw new UsageException($"--omega: unphysical value {o}; expected between {FluidFile.AcentricFactorLowest.ToString(CultureInfo.InvariantCulture)} and {FluidFile.AcentricFactorHighest.ToString(CultureInfo.InvariantCulture)}");
                }
            }

            const string given = "given on the command line of phaseslope tune";
            SourcedValue? molarMass = parse.GetValue(MolarMass) is string molarMassText
                ? new SourcedValue(QuantityParser.ParseMolarMass(molarMassText, "--molar-mass"), given)
                : null;
            baseFluid = new Fluid
            {
                Name = name,
                MolarMass = molarMass,
                CriticalTemperature = new SourcedValue(tc, given),
                CriticalPressure = new SourcedValue(pc, given),
                AcentricFactor = new SourcedValue(omegaGiven ?? 0, given),
                Origin = "(command line)",
            };
        }

        string dataPath = parse.GetValue(Data)!;
        var today = DateOnly.FromDateTime(DateTime.UtcNow);
        var records = CorrelationOptions.ReadDataRecords(dataPath, parse.GetValue(TemperatureUnit), parse.GetValue(PressureUnit), minimumRows: 1);
        IReadOnlyList<VapourPressurePoint> data = [.. records.Select(r => new VapourPressurePoint(r.Temperature, r.Pressure, r.StandardUncertainty, r.Weight))];
        var densities = new List<LiquidDensityPoint>();
        foreach (var r in records.Where(r => r.LiquidDensity is not null))
        {
            var d = r.LiquidDensity!;
            double molar = d.PerMass
                ? d.Value / (baseFluid.MolarMass?.Value ?? throw new DataFileException(dataPath, r.Line, null,
                    "a liquid density in mass units needs the molar mass: give --molar-mass (or a fluid that has one), or write rho_L in mol/L"))
                : d.Value;
            densities.Add(new LiquidDensityPoint(r.Temperature, molar));
        }

        if (fluidText is null && omegaGiven is null)
        {
            if (data.Count == 1 && form != AlphaForm.Default)
            {
                throw new UsageException("--alpha: one data point tunes the acentric factor only; leave --alpha out, or give more points");
            }

            if (data.Count > 1)
            {
                // No ω given: the one-point tuning at the datum nearest 0.7·Tc (where ω is defined) gives the start.
                double tc = baseFluid.CriticalTemperature.Value;
                var nearest = data.MinBy(d => Math.Abs(d.Temperature - 0.7 * tc))!;
                var start = AlphaTuner.Tune(new TuningRequest { BaseFluid = baseFluid, Kind = kind, VapourPressures = [nearest], Date = today });
                baseFluid = baseFluid with { AcentricFactor = new SourcedValue(start.Tuned.AcentricFactor.Value, $"from the data point at {NumberText.Table(nearest.Temperature)} K (the one nearest 0.7 Tc), tuned by phaseslope tune") };
            }
        }
        else if (fluidText is null && data.Count == 1)
        {
            throw new UsageException("--omega: with one data point the acentric factor is what tune finds; leave --omega out");
        }

        return new TuneRequest(new TuningRequest
        {
            BaseFluid = baseFluid,
            Kind = kind,
            Form = form,
            VapourPressures = data,
            LiquidDensities = densities,
            DataOrigin = $"{Path.GetFileName(dataPath)}, sha256 {Checksum(dataPath)}",
            Date = today,
            Name = name,
        }, format, outPath);
    }

    /// <summary>The SHA-256 of the data file, hex, so the provenance names exactly the data used.</summary>
    private static string Checksum(string path)
    {
        using var stream = BoundedInput.Open(path, BoundedInput.DataFileLimit);
        return Convert.ToHexStringLower(SHA256.HashData(stream));
    }
}
