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
        var name = new Option<string>("--name") { Description = "Canonical name of the fluid (lower case)", Required = true };
        var formula = new Option<string>("--formula") { Description = "Chemical formula such as C7H8 (also gives the molar mass)" };
        var cas = new Option<string>("--cas") { Description = "CAS registry number" };
        var family = new Option<string>("--family") { Description = "Family, e.g. alkane, ketone" };
        var synonyms = new Option<string>("--synonyms") { Description = "Other names separated by ';'" };
        var molarMass = new Option<string>("--molar-mass") { Description = "Molar mass with its unit, e.g. '72.15 g/mol' (bare number: refused, give g/mol or kg/mol; default: from --formula)" };
        var groups = new Option<string>("--groups")
        {
            Description = "Joback groups as ID:COUNT pairs, e.g. 'CH3:2,CH2:3'; IDs: " + string.Join(", ", Joback.Groups.Select(g => g.Id)),
        };
        var tc = new Option<string>("--tc") { Description = "Critical temperature, if known (bare number: K; else estimated by Joback)" };
        var pc = new Option<string>("--pc") { Description = "Critical pressure, if known (bare number: Pa; else estimated by Joback)" };
        var tb = new Option<string>("--tb") { Description = "Normal boiling point, if known (bare number: K; else estimated by Joback)" };
        var omega = new Option<string>("--omega") { Description = "Acentric factor, if known (a bare number, dimensionless; else estimated from a vapour pressure)" };
        var vapourPressure = new Option<string>("--vapour-pressure")
        {
            Description = "One measured vapour pressure 'T, P' (e.g. '350 K, 45 kPa'; bare numbers: K and Pa) for the acentric factor; default: the normal boiling point",
        };
        var method = new Option<string>("--omega-method")
        {
            Description = "How the acentric factor follows from the vapour pressure: definition (needs T/Tc = 0.7), edmister, lee-kesler, ambrose-walton",
            DefaultValueFactory = _ => "ambrose-walton",
        };
        var output = new Option<string>("--out", "-o") { Description = "Write the fluid file here (atomically) instead of printing it" };
        var command = new Command("estimate", "Estimate missing constants (Joback; acentric factor from one vapour pressure) and write a fluid file");
        foreach (var option in new Option[] { name, formula, cas, family, synonyms, molarMass, groups, tc, pc, tb, omega, vapourPressure, method, output })
        {
            command.Options.Add(option);
        }

        command.SetAction(parse => io.Guard(() =>
        {
            string fluidName = parse.GetValue(name)!.Trim();
            string? formulaText = parse.GetValue(formula);
            var joback = parse.GetValue(groups) is string g ? Joback.Estimate(ParseGroups(g)) : null;
            double? tbGiven = Temperature(parse.GetValue(tb), "--tb");
            if (joback is not null && tbGiven is not null)
            {
                // The method's authors recommend the measured Tb in the Tc relation.
                joback = Joback.Estimate(ParseGroups(parse.GetValue(groups)!), tbGiven);
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

            var tcValue = Pick(Temperature(parse.GetValue(tc), "--tc"), j => j.CriticalTemperature, "--tc");
            var pcValue = Pick(parse.GetValue(pc) is string pcText ? QuantityParser.ParsePressure(pcText, "--pc") : null, j => j.CriticalPressure, "--pc");
            SourcedValue? tbValue = tbGiven is double t0 ? new SourcedValue(t0, Given)
                : joback is not null ? new SourcedValue(joback.NormalBoilingPoint, jobackSource) : null;
            var mass = MolarMass(parse.GetValue(molarMass), formulaText);
            if (parse.GetValue(omega) is not null)
            {
                foreach (var option in new Option[] { vapourPressure, method })
                {
                    if (CommonOptions.Given(parse, option))
                    {
                        throw new UsageException($"{option.Name}: conflicts with --omega (it estimates the acentric factor that --omega gives); give one or the other");
                    }
                }
            }

            var omegaValue = parse.GetValue(omega) is string omegaText
                ? new SourcedValue(Number(omegaText, "--omega"), Given)
                : EstimateOmega(parse.GetValue(vapourPressure), parse.GetValue(method)!, tcValue.Value, pcValue.Value, tbValue);

            var fluid = new Fluid
            {
                Name = fluidName,
                Synonyms = parse.GetValue(synonyms) is string s ? s.Split(';', StringSplitOptions.TrimEntries | StringSplitOptions.RemoveEmptyEntries) : [],
                Formula = formulaText,
                CasNumber = parse.GetValue(cas),
                Family = parse.GetValue(family),
                MolarMass = mass,
                CriticalTemperature = tcValue,
                CriticalPressure = pcValue,
                AcentricFactor = omegaValue,
                CriticalDensity = joback is null ? null : new SourcedValue(1 / joback.CriticalVolume, jobackSource),
                NormalBoilingPoint = tbValue,
                IdealGasHeatCapacity = joback?.IdealGasHeatCapacity,
            };
            string text = FluidFileWriter.Format(fluid, "Written by 'phaseslope fluids estimate'. Estimated values are labelled with their method: check them against measured data.");
            string? path = parse.GetValue(output);
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
                io.Note($"wrote fluid file for {fluidName} to {path}");
            }
        }));
        return command;
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

    private static SourcedValue EstimateOmega(string? point, string methodText, double tc, double pc, SourcedValue? tb)
    {
        var method = methodText.ToLowerInvariant() switch
        {
            "definition" => AcentricFactorMethod.Definition,
            "edmister" => AcentricFactorMethod.Edmister,
            "lee-kesler" => AcentricFactorMethod.LeeKesler,
            "ambrose-walton" => AcentricFactorMethod.AmbroseWalton,
            _ => throw new UsageException($"--omega-method: unknown method '{methodText}' (use definition, edmister, lee-kesler or ambrose-walton)"),
        };
        double t;
        double p;
        string where;
        if (point is not null)
        {
            string[] parts = point.Split(',', StringSplitOptions.TrimEntries);
            if (parts.Length != 2)
            {
                throw new UsageException($"--vapour-pressure: give 'T, P', e.g. '350 K, 45 kPa', not '{point}'");
            }

            t = QuantityParser.ParseTemperature(parts[0], "--vapour-pressure");
            p = QuantityParser.ParsePressure(parts[1], "--vapour-pressure");
            where = $"the vapour pressure {NumberText.Table(p)} Pa at {NumberText.Table(t)} K given by the user";
        }
        else if (tb is not null)
        {
            t = tb.Value;
            p = Core.Constants.StandardAtmosphere;
            where = $"the normal boiling point {NumberText.Table(t)} K ({tb.Source})";
        }
        else
        {
            throw new UsageException("--omega: not given, and no --vapour-pressure or boiling point to estimate it from");
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
