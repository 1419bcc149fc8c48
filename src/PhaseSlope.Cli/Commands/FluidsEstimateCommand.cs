using System.CommandLine;
using System.Globalization;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fluids estimate ...</c>: fill the gaps of a new fluid with published
/// estimation methods and write a fluid file in our schema (or, with --format table|json, the
/// estimate report with the Lydersen cross-check).</summary>
internal static class FluidsEstimateCommand
{
    private const string Given = "given by the user";

    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new FluidsEstimateOptions();
        var command = new Command("estimate", "Estimate missing constants (Joback groups, cross-checked by Lydersen's method; acentric factor from one vapour pressure) and write a fluid file or a report");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var omegaValue = request.Omega ?? EstimateOmega(request.OmegaMethod, request.VapourPressure, request.CriticalTemperature.Value,
                request.CriticalPressure.Value, request.NormalBoilingPoint);
            var crossCheck = request.Joback is null ? null : CrossCheck(request, omegaValue);
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
                CriticalDensity = request.Joback?.CriticalVolume is double vc ? new SourcedValue(1 / vc, request.Joback.Source) : null,
                NormalBoilingPoint = request.NormalBoilingPoint,
                IdealGasHeatCapacity = request.Joback?.IdealGasHeatCapacity,
            };
            string comment = "Written by 'phaseslope fluids estimate'. Estimated values are labelled with their method: check them against measured data.";
            if (crossCheck is not null)
            {
                comment += "\n" + string.Join("\n", crossCheck.Select(CrossCheckComment));
            }

            string text = FluidFileWriter.Format(fluid, comment);
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

            string output = request.Format switch
            {
                EstimateFormat.Table => EstimateReport.Table(fluid, request, crossCheck),
                EstimateFormat.Json => EstimateReport.Json(fluid, request, crossCheck),
                _ => text,
            };
            if (path is null)
            {
                io.Out.Write(output);
            }
            else
            {
                AtomicFile.WriteAllText(path, output);
                io.Note($"wrote {(request.Format == EstimateFormat.Fluid ? "fluid file" : "estimate report")} for {request.Name} to {path}");
            }

            // A used estimate on which the two methods disagree beyond their combined typical error
            // is a finding: one line each on standard error, whatever the format (also in the report).
            foreach (var item in crossCheck ?? [])
            {
                if (item.Finding is string finding)
                {
                    io.Note($"warning: {finding}");
                }
            }
        }));
        return command;
    }

    /// <summary>Binds the options of <c>fluids estimate</c> in the order they were always checked
    /// (--format, new, after them).</summary>
    internal static FluidsEstimateRequest Bind(FluidsEstimateOptions o, ParseResult parse)
    {
        string fluidName = parse.GetValue(o.Name)!.Trim();
        string? formulaText = parse.GetValue(o.Formula);
        var groups = parse.GetValue(o.Groups) is string g ? ParseGroups(g) : null;
        double? tbGiven = Temperature(parse.GetValue(o.Tb), "--tb");
        // The method's authors recommend the measured Tb in the Tc relation.
        var joback = groups is null ? null : JobackOf(groups, tbGiven);
        string jobackSource = joback?.Source ?? "";
        SourcedValue Pick(double? given, Func<JobackEstimate, double?> estimate, Func<JobackGroup, object?> contribution, string option, string what)
        {
            if (given is double v)
            {
                return new SourcedValue(v, Given);
            }

            if (joback is null)
            {
                throw new UsageException($"{option}: not given, and no --groups to estimate it from");
            }

            return estimate(joback) is double e
                ? new SourcedValue(e, jobackSource)
                : throw new UsageException($"{option}: not given, and the Joback table has no {what} contribution for group {joback.GroupsWithout(contribution)}: give {option}");
        }

        var tcValue = Pick(Temperature(parse.GetValue(o.Tc), "--tc"), j => j.CriticalTemperature, x => x.Tc, "--tc", "Tc");
        var pcValue = Pick(parse.GetValue(o.Pc) is string pcText ? QuantityParser.ParsePressure(pcText, "--pc") : null, j => j.CriticalPressure, x => x.Pc, "--pc", "Pc");
        SourcedValue? tbValue = tbGiven is double t0 ? new SourcedValue(t0, Given)
            : joback is not null ? new SourcedValue(joback.NormalBoilingPoint, jobackSource) : null;
        var (formula, mass) = FormulaAndMolarMass(parse.GetValue(o.MolarMass), formulaText, joback);
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

        var format = ParseFormat(parse.GetValue(o.Format)!);
        string[] synonyms = parse.GetValue(o.Synonyms) is string s ? s.Split(';', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries) : [];
        return new FluidsEstimateRequest(fluidName, formula, formulaText is not null, parse.GetValue(o.Cas), parse.GetValue(o.Family), synonyms, mass, joback,
            tcValue, pcValue, tbValue, omega, method, point, format, parse.GetValue(o.Out));
    }

    // The Joback estimate; its refusals (sums outside the relations' domain) are the fault of --groups.
    private static JobackEstimate JobackOf(IReadOnlyList<(JobackGroup, int)> groups, double? tbGiven)
    {
        try
        {
            return Joback.Estimate(groups, tbGiven);
        }
        catch (Core.Errors.InvalidInputException ex) when (ex.Field == "groups")
        {
            throw new UsageException($"--groups: {ex.Message}");
        }
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
            if (parts.Length != 2 || !int.TryParse(parts[1], NumberStyles.None, CultureInfo.InvariantCulture, out int count) || count < 1 || count > Joback.MaximumCount)
            {
                throw new UsageException($"--groups: '{item}' is not ID:COUNT with a count from 1 to {Joback.MaximumCount} (e.g. 'CH3:2')");
            }

            if (!Joback.TryFindGroup(parts[0], out var group))
            {
                throw new UsageException($"--groups: unknown group '{parts[0]}' (use {string.Join(", ", Joback.Groups.Select(g => g.Id))}; docs/estimation.md draws each)");
            }

            if (result.Any(r => r.Item1 == group))
            {
                throw new UsageException($"--groups: group '{group!.Id}' is listed twice; give its total count once");
            }

            result.Add((group!, count));
        }

        return result.Count > 0 ? result : throw new UsageException("--groups: no groups given");
    }

    private static double? Temperature(string? text, string option) => text is null ? null : QuantityParser.ParseTemperature(text, option);

    private const string AtomicWeightsSource = "IUPAC 2005 standard atomic weights (Wieser, Pure Appl. Chem. 78, 2051 (2006)); from memory";

    /// <summary>Largest relative difference accepted between a given molar mass and the one computed
    /// from the formula's atoms.</summary>
    /// <remarks>The computed value is good to about 1e-5 (the atomic weights); a typed molar mass
    /// rounded to three or four digits ("100 g/mol" for heptane's 100.20) is off by up to 0.25 %;
    /// one hydrogen atom more or less moves a molar mass of 200 g/mol by 0.5 %, so a larger
    /// difference means another molecule.</remarks>
    internal const double MolarMassTolerance = 0.005;

    /// <summary>The formula written (given, or derived from the groups) and the molar mass (given,
    /// or computed from the atoms); a formula that differs from the groups' atoms, or a given molar
    /// mass that differs from the atoms' by more than <see cref="MolarMassTolerance"/>, is refused.</summary>
    private static (string? Formula, SourcedValue MolarMass) FormulaAndMolarMass(string? massText, string? formulaText, JobackEstimate? joback)
    {
        double? given = massText is null ? null : QuantityParser.ParseMolarMass(massText, "--molar-mass");
        IReadOnlyDictionary<string, int>? atoms = null;
        string? formula = null;
        string what = "";
        if (formulaText is not null)
        {
            formula = formulaText.Trim();
            try
            {
                atoms = ChemicalFormula.Parse(formula);
            }
            catch (Core.Errors.InvalidInputException ex)
            {
                throw new UsageException($"--formula: {ex.Message}");
            }

            what = "the formula";
            if (joback is not null && ChemicalFormula.Difference(atoms, joback.Composition) is string difference)
            {
                throw new UsageException($"--formula: {formula} is not the molecule of --groups ({joback.Formula}): {difference} (formula vs groups)");
            }
        }
        else if (joback is not null)
        {
            atoms = joback.Composition;
            formula = joback.Formula;
            what = "the atoms of the Joback groups";
        }

        double? computed = atoms is null ? null : ChemicalFormula.MolarMass(atoms);
        if (given is double m)
        {
            if (computed is double c && Math.Abs(m - c) > MolarMassTolerance * c)
            {
                throw new UsageException($"--molar-mass: {NumberText.Given(m * 1000)} g/mol is not the molar mass of {formula}, {NumberText.Given(c * 1000)} g/mol (more than {NumberText.Table(MolarMassTolerance * 100)} % apart)");
            }

            return (formula, new SourcedValue(m, Given));
        }

        return computed is double value
            ? (formula, new SourcedValue(value, $"computed from {what} ({formula}) with the {AtomicWeightsSource}"))
            : throw new UsageException("--molar-mass: not given, and no --formula or --groups to compute it from");
    }

    private static EstimateFormat ParseFormat(string text) => text.ToLowerInvariant() switch
    {
        "fluid" => EstimateFormat.Fluid,
        "table" => EstimateFormat.Table,
        "json" => EstimateFormat.Json,
        _ => throw new UsageException($"--format: unknown format '{text}' (use fluid, table or json)"),
    };

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

    /// <summary>Lydersen's constants on the same groups beside Joback's, and the acentric factor
    /// from each pair by the same relation and vapour-pressure point.</summary>
    private static IReadOnlyList<EstimateCheck> CrossCheck(FluidsEstimateRequest r, SourcedValue omega)
    {
        var joback = r.Joback!;
        // Lydersen's Tc uses the Tb Joback's Tc used (measured when given), so the comparison is of
        // the two Tc/Tb relations, and M is the molar mass written.
        double tb = r.NormalBoilingPoint!.Value;
        LydersenEstimate lydersen;
        try
        {
            lydersen = Lydersen.Estimate(joback.Groups, tb, r.MolarMass.Value);
        }
        catch (Core.Errors.InvalidInputException ex)
        {
            lydersen = new LydersenEstimate(null, null, null, ex.Message);
        }

        bool tcUsed = r.CriticalTemperature.Source != Given;
        bool pcUsed = r.CriticalPressure.Source != Given;
        var items = EstimateCrossCheck.Compare(joback, lydersen);
        var checks = new List<EstimateCheck>
        {
            new(items[0], tcUsed),
            new(items[1], pcUsed),
            new(items[2], joback.CriticalVolume is not null),
        };
        CrossCheckItem omegaItem;
        if (r.Omega is not null)
        {
            omegaItem = EstimateCrossCheck.AcentricFactor(null, null, "given by the user (--omega)");
        }
        else if (!tcUsed && !pcUsed)
        {
            omegaItem = EstimateCrossCheck.AcentricFactor(null, null, "Tc and Pc given by the user");
        }
        else if ((tcUsed ? lydersen.CriticalTemperature : r.CriticalTemperature.Value) is double tcL
            && (pcUsed ? lydersen.CriticalPressure : r.CriticalPressure.Value) is double pcL)
        {
            try
            {
                double omegaL = EstimateOmega(r.OmegaMethod, r.VapourPressure, tcL, pcL, r.NormalBoilingPoint).Value;
                omegaItem = EstimateCrossCheck.AcentricFactor(omega.Value, omegaL, null);
            }
            catch (Core.Errors.InvalidInputException ex)
            {
                omegaItem = EstimateCrossCheck.AcentricFactor(omega.Value, null, $"none from Lydersen's Tc and Pc: {ex.Message}");
            }
        }
        else
        {
            omegaItem = EstimateCrossCheck.AcentricFactor(omega.Value, null, lydersen.Unavailable);
        }

        checks.Add(new EstimateCheck(omegaItem, r.Omega is null && (tcUsed || pcUsed)));
        return checks;
    }

    private static string CrossCheckComment(EstimateCheck check)
    {
        var item = check.Item;
        string head = $"Cross-check of the {check.Label} (Lydersen 1955 on the same groups): ";
        if (item.Difference is not double d)
        {
            return head + $"none ({item.Unavailable})";
        }

        string compared = item.Quantity == "acentric_factor"
            ? $"{check.WithUnit(item.CrossCheck!.Value)} from Lydersen's Tc and Pc against {check.WithUnit(item.Joback!.Value)} from the file's"
            : $"{check.WithUnit(item.CrossCheck!.Value)} against Joback's {check.WithUnit(item.Joback!.Value)}";
        string line = head + $"{compared} ({check.DifferenceText}, threshold {check.ThresholdText})";
        return check.Finding is string finding ? line + ". FINDING: " + finding
            : check.Used ? line
            : line + "; the file takes the value given by the user";
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
/// <param name="Formula">--formula (checked against the groups), or the formula of the groups' atoms.</param>
/// <param name="FormulaGiven">True when the formula is --formula, false when derived from the groups.</param>
/// <param name="Cas">--cas.</param>
/// <param name="Family">--family.</param>
/// <param name="Synonyms">--synonyms, split.</param>
/// <param name="MolarMass">The molar mass, given (checked against the atoms) or computed from the atoms.</param>
/// <param name="Joback">The group-contribution estimate, or null without --groups.</param>
/// <param name="CriticalTemperature">Tc, given or estimated.</param>
/// <param name="CriticalPressure">Pc, given or estimated.</param>
/// <param name="NormalBoilingPoint">Tb, given or estimated, or null.</param>
/// <param name="Omega">The acentric factor given by --omega, or null to estimate it.</param>
/// <param name="OmegaMethod">The estimation method (when <paramref name="Omega"/> is null).</param>
/// <param name="VapourPressure">The measured vapour pressure (T in K, P in Pa), or null to use Tb.</param>
/// <param name="Format">--format: the fluid file, or the estimate report as a table or JSON.</param>
/// <param name="OutPath">--out as given (checked when written), or null for standard output.</param>
internal sealed record FluidsEstimateRequest(string Name, string? Formula, bool FormulaGiven, string? Cas, string? Family, string[] Synonyms,
    SourcedValue MolarMass, JobackEstimate? Joback, SourcedValue CriticalTemperature, SourcedValue CriticalPressure,
    SourcedValue? NormalBoilingPoint, SourcedValue? Omega, AcentricFactorMethod OmegaMethod, (double T, double P)? VapourPressure,
    EstimateFormat Format, string? OutPath);

/// <summary>What <c>fluids estimate</c> writes.</summary>
internal enum EstimateFormat
{
    /// <summary>The fluid file (the default).</summary>
    Fluid,

    /// <summary>The estimate report as aligned columns: each value, its source, and the cross-check.</summary>
    Table,

    /// <summary>The estimate report as JSON.</summary>
    Json,
}

/// <summary>The options of <c>fluids estimate</c>, bound to a <see cref="FluidsEstimateRequest"/>.</summary>
internal sealed class FluidsEstimateOptions
{
    /// <summary>--name.</summary>
    public Option<string> Name { get; } = new("--name") { Description = "Canonical name of the fluid (lower case)", Required = true };

    /// <summary>--formula.</summary>
    public Option<string> Formula { get; } = new("--formula") { Description = "Chemical formula such as C7H8 (also gives the molar mass; must match the atoms of --groups; default: from --groups)" };

    /// <summary>--cas.</summary>
    public Option<string> Cas { get; } = new("--cas") { Description = "CAS registry number" };

    /// <summary>--family.</summary>
    public Option<string> Family { get; } = new("--family") { Description = "Family, e.g. alkane, ketone" };

    /// <summary>--synonyms.</summary>
    public Option<string> Synonyms { get; } = new("--synonyms") { Description = "Other names separated by ';'" };

    /// <summary>--molar-mass.</summary>
    public Option<string> MolarMass { get; } = new("--molar-mass") { Description = "Molar mass with its unit, e.g. '72.15 g/mol' (bare number: refused, give g/mol or kg/mol; default: from --formula or --groups; must agree with them to 0.5 %)" };

    /// <summary>--groups.</summary>
    public Option<string> Groups { get; } = new("--groups")
    {
        Description = "Joback groups as ID:COUNT pairs, e.g. 'CH3:2,CH2:3' (quote the list: '#CH' starts a shell comment); IDs (docs/estimation.md): " + string.Join(", ", Joback.Groups.Select(g => g.Id)),
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

    /// <summary>--format.</summary>
    public Option<string> Format { get; } = new("--format")
    {
        Description = "What to write: fluid (the fluid file), table or json (the estimate report: each value with its source, and the Lydersen cross-check of the Joback values)",
        DefaultValueFactory = _ => "fluid",
    };

    /// <summary>--out.</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "Write the fluid file (or report) here (atomically) instead of printing it" };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        foreach (var option in new Option[] { Name, Formula, Cas, Family, Synonyms, MolarMass, Groups, Tc, Pc, Tb, Omega, VapourPressure, Method, Format, Out })
        {
            command.Options.Add(option);
        }
    }

    /// <summary>Parses and checks every option and makes the Joback estimate when --groups is given.</summary>
    public FluidsEstimateRequest Bind(ParseResult parse) => FluidsEstimateCommand.Bind(this, parse);
}
