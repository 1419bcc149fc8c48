using System.CommandLine;
using System.Globalization;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fluids estimate ...</c>: fill the gaps of a new fluid with published
/// estimation methods and write a fluid file in our schema.</summary>
internal static class FluidsEstimateCommand
{
    private const string Given = "given by the user";

    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new FluidsEstimateOptions();
        var command = new Command("estimate", "Estimate missing constants (Joback; acentric factor from one vapour pressure) and write a fluid file");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var omegaValue = request.Omega ?? EstimateOmega(request.OmegaMethod, request.VapourPressure, request.CriticalTemperature.Value,
                request.CriticalPressure.Value, request.NormalBoilingPoint);
            var fluid = new Fluid
            {
                Name = request.Name,
                Synonyms = request.Synonyms,
                Formula = request.Formula,
                CasNumber = request.Cas,
                Family = request.Family,
                MolarMass = request.MolarMass,
                CriticalTemperature = request.CriticalTemperature,
                CriticalPressure = request.CriticalPressure,
                AcentricFactor = omegaValue,
                CriticalDensity = request.Joback is null ? null : new SourcedValue(1 / request.Joback.CriticalVolume, request.Joback.IdealGasHeatCapacity.Source),
                NormalBoilingPoint = request.NormalBoilingPoint,
                IdealGasHeatCapacity = request.Joback?.IdealGasHeatCapacity,
            };
            string text = FluidFileWriter.Format(fluid, "Written by 'phaseslope fluids estimate'. Estimated values are labelled with their method: check them against measured data.");
            // --out is checked when written, after the estimate (as every command's --out is).
            string? path = request.OutPath;
            if (path is not null && string.IsNullOrWhiteSpace(path))
            {
                throw new UsageException("--out: the file name is empty");
            }

            // Read the text back: the same validation a user's file gets. A problem is the fault of
            // the option that gave the value, not of the output file, so the message names the option.
            try
            {
                FluidFile.Parse(new StringReader(text), "(estimate)");
            }
            catch (Core.Errors.FluidDataException ex)
            {
                throw new UsageException($"{OptionOf(ex.Field)}: {ex.Problem}");
            }

            if (path is null)
            {
                io.Out.Write(text);
            }
            else
            {
                AtomicFile.WriteAllText(path, text);
                io.Note($"wrote fluid file for {request.Name} to {path}");
            }
        }));
        return command;
    }

    /// <summary>Binds the options of <c>fluids estimate</c> in the order they were always checked.</summary>
    internal static FluidsEstimateRequest Bind(FluidsEstimateOptions o, ParseResult parse)
    {
        string fluidName = parse.GetValue(o.Name)!.Trim();
        string? formulaText = parse.GetValue(o.Formula);
        var joback = parse.GetValue(o.Groups) is string g ? Joback.Estimate(ParseGroups(g)) : null;
        double? tbGiven = Temperature(parse.GetValue(o.Tb), "--tb");
        if (joback is not null && tbGiven is not null)
        {
            // The method's authors recommend the measured Tb in the Tc relation.
            joback = Joback.Estimate(ParseGroups(parse.GetValue(o.Groups)!), tbGiven);
        }

        string jobackSource = joback?.IdealGasHeatCapacity.Source ?? "";
        SourcedValue Pick(double? given, Func<JobackEstimate, double> estimate, string option)
        {
            if (given is double v)
            {
                return new SourcedValue(v, Given);
            }

            return joback is not null
                ? new SourcedValue(estimate(joback), jobackSource)
                : throw new UsageException($"{option}: not given, and no --groups to estimate it from");
        }

        var tcValue = Pick(Temperature(parse.GetValue(o.Tc), "--tc"), j => j.CriticalTemperature, "--tc");
        var pcValue = Pick(parse.GetValue(o.Pc) is string pcText ? QuantityParser.ParsePressure(pcText, "--pc") : null, j => j.CriticalPressure, "--pc");
        SourcedValue? tbValue = tbGiven is double t0 ? new SourcedValue(t0, Given)
            : joback is not null ? new SourcedValue(joback.NormalBoilingPoint, jobackSource) : null;
        var mass = MolarMass(parse.GetValue(o.MolarMass), formulaText);
        SourcedValue? omega = null;
        AcentricFactorMethod method = AcentricFactorMethod.AmbroseWalton;
        (double T, double P)? point = null;
        if (parse.GetValue(o.Omega) is string omegaText)
        {
            foreach (var option in new Option[] { o.VapourPressure, o.Method })
            {
                if (CommonOptions.Given(parse, option))
                {
                    throw new UsageException($"{option.Name}: conflicts with --omega (it estimates the acentric factor that --omega gives); give one or the other");
                }
            }

            omega = new SourcedValue(Number(omegaText, "--omega"), Given);
        }
        else
        {
            method = ParseMethod(parse.GetValue(o.Method)!);
            point = VapourPressure(parse.GetValue(o.VapourPressure));
            if (point is null && tbValue is null)
            {
                throw new UsageException("--omega: not given, and no --vapour-pressure or boiling point to estimate it from");
            }
        }

        string[] synonyms = parse.GetValue(o.Synonyms) is string s ? s.Split(';', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries) : [];
        return new FluidsEstimateRequest(fluidName, formulaText, parse.GetValue(o.Cas), parse.GetValue(o.Family), synonyms, mass, joback,
            tcValue, pcValue, tbValue, omega, method, point, parse.GetValue(o.Out));
    }

    /// <summary>The option that supplied a fluid-file field (the estimated ones come from --groups).</summary>
    private static string OptionOf(string? field) => field switch
    {
        "name" => "--name",
        "synonyms" => "--synonyms",
        "formula" => "--formula",
        "cas" => "--cas",
        "family" => "--family",
        "molar_mass" => "--molar-mass",
        "critical_temperature" => "--tc",
        "critical_pressure" => "--pc",
        "acentric_factor" => "--omega",
        "normal_boiling_point" => "--tb",
        _ => "--groups",
    };

    private static IReadOnlyList<(JobackGroup, int)> ParseGroups(string text)
    {
        var result = new List<(JobackGroup, int)>();
        foreach (string item in text.Split(',', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries))
        {
            string[] parts = item.Split(':', StringSplitOptions.TrimEntries);
            if (parts.Length != 2 || !int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int count) || count < 1)
            {
                throw new UsageException($"--groups: '{item}' is not ID:COUNT with a count of at least 1 (e.g. 'CH3:2')");
            }

            if (!Joback.TryFindGroup(parts[0], out var group))
            {
                throw new UsageException($"--groups: unknown group '{parts[0]}' (use {string.Join(", ", Joback.Groups.Select(g => g.Id))})");
            }

            result.Add((group!, count));
        }

        return result.Count > 0 ? result : throw new UsageException("--groups: no groups given");
    }

    private static double? Temperature(string? text, string option) => text is null ? null : QuantityParser.ParseTemperature(text, option);

    private static SourcedValue MolarMass(string? text, string? formula)
    {
        if (text is not null)
        {
            return new SourcedValue(QuantityParser.ParseMolarMass(text, "--molar-mass"), Given);
        }

        if (formula is not null)
        {
            try
            {
                return new SourcedValue(ChemicalFormula.MolarMass(formula.Trim()), "computed from the formula with the IUPAC 2005 standard atomic weights (Wieser, Pure Appl. Chem. 78, 2051 (2006)); from memory");
            }
            catch (Core.Errors.InvalidInputException ex)
            {
                throw new UsageException($"--formula: {ex.Message}");
            }
        }

        throw new UsageException("--molar-mass: not given, and no --formula to compute it from");
    }

    private static AcentricFactorMethod ParseMethod(string methodText) => methodText.ToLowerInvariant() switch
    {
        "definition" => AcentricFactorMethod.Definition,
        "edmister" => AcentricFactorMethod.Edmister,
        "lee-kesler" => AcentricFactorMethod.LeeKesler,
        "ambrose-walton" => AcentricFactorMethod.AmbroseWalton,
        _ => throw new UsageException($"--omega-method: unknown method '{methodText}' (use definition, edmister, lee-kesler or ambrose-walton)"),
    };

    private static (double T, double P)? VapourPressure(string? point)
    {
        if (point is null)
        {
            return null;
        }

        string[] parts = point.Split(',', StringSplitOptions.TrimEntries);
        if (parts.Length != 2)
        {
            throw new UsageException($"--vapour-pressure: give 'T, P', e.g. '350 K, 45 kPa', not '{point}'");
        }

        return (QuantityParser.ParseTemperature(parts[0], "--vapour-pressure"), QuantityParser.ParsePressure(parts[1], "--vapour-pressure"));
    }

    private static SourcedValue EstimateOmega(AcentricFactorMethod method, (double T, double P)? point, double tc, double pc, SourcedValue? tb)
    {
        double t;
        double p;
        string where;
        if (point is (double pt, double pp))
        {
            (t, p) = (pt, pp);
            where = $"the vapour pressure {NumberText.Table(p)} Pa at {NumberText.Table(t)} K given by the user";
        }
        else
        {
            t = tb!.Value;
            p = Core.Constants.StandardAtmosphere;
            where = $"the normal boiling point {NumberText.Table(t)} K ({tb.Source})";
        }

        string methodName = method switch
        {
            AcentricFactorMethod.Definition => "its definition at T/Tc = 0.7 (Pitzer 1955)",
            AcentricFactorMethod.Edmister => "the Edmister (1958) relation",
            AcentricFactorMethod.LeeKesler => "the Lee-Kesler (1975) vapour-pressure relation",
            _ => "the Ambrose-Walton (1989) vapour-pressure relation",
        };
        double omega = CorrespondingStates.AcentricFactor(method, tc, pc, t, p);
        return new SourcedValue(omega, $"estimated by {methodName} from {where}");
    }

    private static double Number(string text, string option)
        => double.TryParse(text.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out double v) && double.IsFinite(v)
            ? v
            : throw new UsageException($"{option}: '{text}' is not a number");
}

/// <summary>The checked inputs of <c>fluids estimate</c>: the values given, the Joback estimate
/// when --groups is given, and how to estimate the acentric factor when --omega is not.</summary>
/// <param name="Name">--name, trimmed.</param>
/// <param name="Formula">--formula.</param>
/// <param name="Cas">--cas.</param>
/// <param name="Family">--family.</param>
/// <param name="Synonyms">--synonyms, split.</param>
/// <param name="MolarMass">The molar mass, given or from the formula.</param>
/// <param name="Joback">The group-contribution estimate, or null without --groups.</param>
/// <param name="CriticalTemperature">Tc, given or estimated.</param>
/// <param name="CriticalPressure">Pc, given or estimated.</param>
/// <param name="NormalBoilingPoint">Tb, given or estimated, or null.</param>
/// <param name="Omega">The acentric factor given by --omega, or null to estimate it.</param>
/// <param name="OmegaMethod">The estimation method (when <paramref name="Omega"/> is null).</param>
/// <param name="VapourPressure">The measured vapour pressure (T in K, P in Pa), or null to use Tb.</param>
/// <param name="OutPath">--out as given (checked when written), or null for standard output.</param>
internal sealed record FluidsEstimateRequest(string Name, string? Formula, string? Cas, string? Family, string[] Synonyms,
    SourcedValue MolarMass, JobackEstimate? Joback, SourcedValue CriticalTemperature, SourcedValue CriticalPressure,
    SourcedValue? NormalBoilingPoint, SourcedValue? Omega, AcentricFactorMethod OmegaMethod, (double T, double P)? VapourPressure,
    string? OutPath);

/// <summary>The options of <c>fluids estimate</c>, bound to a <see cref="FluidsEstimateRequest"/>.</summary>
internal sealed class FluidsEstimateOptions
{
    /// <summary>--name.</summary>
    public Option<string> Name { get; } = new("--name") { Description = "Canonical name of the fluid (lower case)", Required = true };

    /// <summary>--formula.</summary>
    public Option<string> Formula { get; } = new("--formula") { Description = "Chemical formula such as C7H8 (also gives the molar mass)" };

    /// <summary>--cas.</summary>
    public Option<string> Cas { get; } = new("--cas") { Description = "CAS registry number" };

    /// <summary>--family.</summary>
    public Option<string> Family { get; } = new("--family") { Description = "Family, e.g. alkane, ketone" };

    /// <summary>--synonyms.</summary>
    public Option<string> Synonyms { get; } = new("--synonyms") { Description = "Other names separated by ';'" };

    /// <summary>--molar-mass.</summary>
    public Option<string> MolarMass { get; } = new("--molar-mass") { Description = "Molar mass with its unit, e.g. '72.15 g/mol' (bare number: refused, give g/mol or kg/mol; default: from --formula)" };

    /// <summary>--groups.</summary>
    public Option<string> Groups { get; } = new("--groups")
    {
        Description = "Joback groups as ID:COUNT pairs, e.g. 'CH3:2,CH2:3'; IDs: " + string.Join(", ", Joback.Groups.Select(g => g.Id)),
    };

    /// <summary>--tc.</summary>
    public Option<string> Tc { get; } = new("--tc") { Description = "Critical temperature, if known (bare number: K; else estimated by Joback)" };

    /// <summary>--pc.</summary>
    public Option<string> Pc { get; } = new("--pc") { Description = "Critical pressure, if known (bare number: Pa; else estimated by Joback)" };

    /// <summary>--tb.</summary>
    public Option<string> Tb { get; } = new("--tb") { Description = "Normal boiling point, if known (bare number: K; else estimated by Joback)" };

    /// <summary>--omega.</summary>
    public Option<string> Omega { get; } = new("--omega") { Description = "Acentric factor, if known (a bare number, dimensionless; else estimated from a vapour pressure)" };

    /// <summary>--vapour-pressure.</summary>
    public Option<string> VapourPressure { get; } = new("--vapour-pressure")
    {
        Description = "One measured vapour pressure 'T, P' (e.g. '350 K, 45 kPa'; bare numbers: K and Pa) for the acentric factor; default: the normal boiling point",
    };

    /// <summary>--omega-method.</summary>
    public Option<string> Method { get; } = new("--omega-method")
    {
        Description = "How the acentric factor follows from the vapour pressure: definition (needs T/Tc = 0.7), edmister, lee-kesler, ambrose-walton",
        DefaultValueFactory = _ => "ambrose-walton",
    };

    /// <summary>--out.</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "Write the fluid file here (atomically) instead of printing it" };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        foreach (var option in new Option[] { Name, Formula, Cas, Family, Synonyms, MolarMass, Groups, Tc, Pc, Tb, Omega, VapourPressure, Method, Out })
        {
            command.Options.Add(option);
        }
    }

    /// <summary>Parses and checks every option and makes the Joback estimate when --groups is given.</summary>
    public FluidsEstimateRequest Bind(ParseResult parse) => FluidsEstimateCommand.Bind(this, parse);
}
