using System.CommandLine;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary>Options shared by <c>fit</c> and <c>latent</c>: the data file, its units, the
/// correlation form and the fluid or critical point the Tc-based forms need.</summary>
internal sealed class CorrelationOptions
{
    /// <summary>The forms that need a critical point.</summary>
    private static readonly string[] CriticalForms = ["wagner-3-6", "wagner-2.5-5", "wagner-6", "lee-kesler", "ambrose-walton"];

    /// <summary>Every form identifier.</summary>
    public static readonly string[] FormIds = ["clausius-clapeyron", "antoine", "kirchhoff", "riedel", .. CriticalForms];

    /// <summary>DATA.csv.</summary>
    public Argument<string> Data { get; } = new("DATA") { Description = "CSV file of measured vapour pressures (see docs/data-files.md)" };

    /// <summary>--form.</summary>
    public Option<string> Form { get; }

    /// <summary>--fluid.</summary>
    public Option<string> Fluid { get; } = new("--fluid") { Description = "Catalog fluid or fluid file: gives Tc, Pc and omega for the Wagner and predictive forms, and the model for the eos volume change" };

    /// <summary>--tc.</summary>
    public Option<string> CriticalTemperature { get; } = new("--tc") { Description = "Critical temperature for the Wagner forms when no --fluid is given, e.g. 369.89 K (bare number: K)" };

    /// <summary>--pc.</summary>
    public Option<string> CriticalPressure { get; } = new("--pc") { Description = "Critical pressure for the Wagner forms when no --fluid is given, e.g. 4.2512 MPa (bare number: Pa)" };

    /// <summary>--temperature-unit.</summary>
    public Option<string> TemperatureUnit { get; } = DataTemperatureUnit();

    /// <summary>--pressure-unit.</summary>
    public Option<string> PressureUnit { get; } = DataPressureUnit();

    /// <summary>A new --temperature-unit option: the unit of a data file's temperature column.</summary>
    public static Option<string> DataTemperatureUnit() => new("--temperature-unit") { Description = "Unit of a temperature column whose header gives none: K, degC, degF or degR (data cells are bare numbers in this unit)" };

    /// <summary>A new --pressure-unit option: the unit of a data file's pressure column.</summary>
    public static Option<string> DataPressureUnit() => new("--pressure-unit") { Description = "Unit of a pressure column whose header gives none: Pa, kPa, MPa, bar, psi, atm, mmHg, torr, ... (data cells are bare numbers in this unit)" };

    /// <summary>Creates the options with the default form.</summary>
    public CorrelationOptions(string defaultForm)
    {
        Form = new Option<string>("--form")
        {
            Description = $"Correlation form: {string.Join(", ", FormIds)}, or auto (every form the data support, chosen by AICc)",
            DefaultValueFactory = _ => defaultForm,
        };
    }

    /// <summary>Adds the options to a command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Data);
        command.Options.Add(Form);
        command.Options.Add(Fluid);
        command.Options.Add(CriticalTemperature);
        command.Options.Add(CriticalPressure);
        command.Options.Add(TemperatureUnit);
        command.Options.Add(PressureUnit);
    }

    /// <summary>Reads and converts the data file.</summary>
    public IReadOnlyList<VapourPressurePoint> ReadData(ParseResult parse)
        => ReadDataFile(parse.GetValue(Data)!, parse.GetValue(TemperatureUnit), parse.GetValue(PressureUnit));

    /// <summary>Reads and converts a data file of measured vapour pressures (also used by <c>plot --data</c>).</summary>
    /// <exception cref="DataFileException">The file is missing, unreadable or invalid.</exception>
    public static IReadOnlyList<VapourPressurePoint> ReadDataFile(string path, string? temperatureUnit, string? pressureUnit, int minimumRows = VapourPressureCsv.MinimumRows)
        => Points(ReadDataRecords(path, temperatureUnit, pressureUnit, minimumRows));

    /// <summary>The measured points of a data file's rows.</summary>
    public static IReadOnlyList<VapourPressurePoint> Points(IEnumerable<VapourPressureRecord> records)
        => [.. records.Select(r => new VapourPressurePoint(r.Temperature, r.Pressure, r.StandardUncertainty, r.Weight))];

    /// <summary>Reads a data file's rows as written (with any liquid densities, which only
    /// <c>tune</c> uses).</summary>
    /// <exception cref="DataFileException">The file is missing, unreadable or invalid.</exception>
    public static IReadOnlyList<VapourPressureRecord> ReadDataRecords(string path, string? temperatureUnit, string? pressureUnit, int minimumRows = VapourPressureCsv.MinimumRows)
    {
        var options = new VapourPressureCsvOptions(temperatureUnit, pressureUnit, minimumRows);
        return BoundedInput.ReadDataFile(path, reader => VapourPressureCsv.Read(reader, path, options));
    }

    /// <summary>The fluid, when --fluid is given. A fluid brings its own Tc and Pc, so --tc or
    /// --pc beside it is refused rather than one of them silently winning; --tc and --pc go together.</summary>
    public Fluid? FluidOf(ParseResult parse)
    {
        string? fluid = parse.GetValue(Fluid);
        bool tc = parse.GetValue(CriticalTemperature) is not null;
        bool pc = parse.GetValue(CriticalPressure) is not null;
        if (fluid is not null && (tc || pc))
        {
            throw new UsageException($"{(tc ? "--tc" : "--pc")}: conflicts with --fluid, which gives the critical point; give --fluid, or --tc and --pc");
        }

        if (tc != pc)
        {
            throw new UsageException($"{(tc ? "--tc" : "--pc")}: needs {(tc ? "--pc" : "--tc")} too (the critical point is both)");
        }

        return fluid is not null ? FluidResolver.Resolve(fluid) : null;
    }

    /// <summary>Whether --fluid, or --tc and --pc, were given.</summary>
    public bool CriticalPointGiven(ParseResult parse)
        => parse.GetValue(Fluid) is not null || parse.GetValue(CriticalTemperature) is not null;

    /// <summary>Refuses data at or above the critical point given by the fluid or by --tc/--pc,
    /// whichever form is then fitted (the critical constants must be consistent with the data
    /// even when auto selection settles on a form that does not use them).</summary>
    public void RequireDataBelowCriticalPoint(ParseResult parse, Fluid? fluid, IReadOnlyList<VapourPressurePoint> data)
    {
        var (tc, pc) = CriticalPoint(parse, fluid);
        VapourPressureFitter.RequireBelowCriticalPoint(data, tc, pc);
    }

    /// <summary>Tc in K and Pc in Pa from the fluid, or from --tc and --pc; null where neither gives one.</summary>
    public (double? Temperature, double? Pressure) CriticalPoint(ParseResult parse, Fluid? fluid)
        => (fluid?.CriticalTemperature.Value ?? (parse.GetValue(CriticalTemperature) is string t ? QuantityParser.ParseTemperature(t, "--tc") : null),
            fluid?.CriticalPressure.Value ?? (parse.GetValue(CriticalPressure) is string p ? QuantityParser.ParsePressure(p, "--pc") : null));

    /// <summary>The candidate forms: the one named, or every form for auto.</summary>
    /// <param name="parse">The parsed command line.</param>
    /// <param name="fluid">The --fluid, if given.</param>
    /// <param name="auto">Set when --form is auto.</param>
    /// <param name="criticalPointUsedElsewhere">Whether the command uses the fluid or the critical
    /// point for more than the forms (latent's volume change); when it does not, a critical point
    /// given with a form that has no use for it is refused.</param>
    public IReadOnlyList<VapourPressureForm> Forms(ParseResult parse, Fluid? fluid, out bool auto, bool criticalPointUsedElsewhere = false)
    {
        string id = (parse.GetValue(Form) ?? "auto").Trim().ToLowerInvariant();
        auto = id == "auto";
        if (!auto && !FormIds.Contains(id))
        {
            throw new UsageException($"--form: unknown form '{id}' (use {string.Join(", ", FormIds)} or auto)");
        }

        if (!auto && !CriticalForms.Contains(id) && !criticalPointUsedElsewhere && CriticalPointGiven(parse))
        {
            throw new UsageException($"{(parse.GetValue(Fluid) is null ? "--tc" : "--fluid")}: the {id} form does not use a critical point; leave it out, or choose a form that does ({string.Join(", ", CriticalForms)})");
        }

        var (tc, pc) = CriticalPoint(parse, fluid);
        double? omega = fluid?.AcentricFactor.Value;
        var forms = new List<VapourPressureForm>();
        foreach (string candidate in auto ? FormIds : [id])
        {
            bool critical = CriticalForms.Contains(candidate);
            bool predictive = candidate is "lee-kesler" or "ambrose-walton";
            if (auto && predictive)
            {
                continue; // nothing to fit: not a candidate for selection
            }

            if (critical && (tc is null || pc is null || (predictive && omega is null)))
            {
                if (auto)
                {
                    continue;
                }

                throw new UsageException(predictive
                    ? $"--form {candidate}: needs --fluid (for Tc, Pc and omega)"
                    : $"--form {candidate}: needs Tc and Pc: give --fluid, or --tc and --pc");
            }

            forms.Add(Create(candidate, tc, pc, omega));
        }

        return forms;
    }

    /// <summary>The candidates of <c>--form auto</c> for a fluid (its Tc and Pc admit the Wagner
    /// forms; the predictive forms have nothing to fit), as <see cref="Forms"/> chooses them.</summary>
    public static IReadOnlyList<VapourPressureForm> AutoForms(Fluid fluid)
        => [.. FormIds.Where(id => id is not ("lee-kesler" or "ambrose-walton"))
            .Select(id => Create(id, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value, fluid.AcentricFactor.Value))];

    private static VapourPressureForm Create(string id, double? tc, double? pc, double? omega) => id switch
    {
        "clausius-clapeyron" => new ClausiusClapeyronForm(),
        "antoine" => new AntoineForm(),
        "kirchhoff" => new KirchhoffForm(),
        "riedel" => new RiedelForm(),
        "wagner-3-6" => WagnerForm.ThreeSix(tc!.Value, pc!.Value),
        "wagner-2.5-5" => WagnerForm.TwoHalfFive(tc!.Value, pc!.Value),
        "wagner-6" => WagnerForm.SixTerm(tc!.Value, pc!.Value),
        "lee-kesler" => CorrespondingStatesForm.LeeKesler(tc!.Value, pc!.Value, omega!.Value),
        _ => CorrespondingStatesForm.AmbroseWalton(tc!.Value, pc!.Value, omega!.Value),
    };

    /// <summary>Fits the named form, or every candidate for auto (best first).</summary>
    public static IReadOnlyList<VapourPressureFit> Fit(IReadOnlyList<VapourPressureForm> forms, bool auto, IReadOnlyList<VapourPressurePoint> data)
        => auto ? VapourPressureFitter.FitAll(forms, data) : [VapourPressureFitter.Fit(forms[0], data)];
}
