using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Solids;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders the mixture equilibrium results of <c>bubble</c>, <c>dew</c> and <c>flash</c>
/// as a table, CSV or JSON (JSON: SI, molar basis; mole fractions as objects keyed by component
/// name). Table and CSV follow --units: in engineering units each phase's per-kilogram values use
/// that phase's own molar mass Σ x_i M_i (liquid, vapour and feed differ), the whole feed's use the
/// feed's; the glide stays a temperature difference in K.</summary>
internal static class MixtureEquilibriumWriter
{
    /// <summary>The note on the convention of h and s.</summary>
    public const string ConventionNote =
        "h and s are molar, zero for each pure component as ideal gas at 298.15 K and 1 bar (the ideal-gas reference); s includes the ideal entropy of mixing";

    /// <summary>The note on the convention of h and s in engineering units (table and CSV).</summary>
    public const string EngineeringConventionNote =
        "h and s are per kilogram of each phase (of the feed for the whole-feed values), zero for each pure component as ideal gas at 298.15 K and 1 bar (the ideal-gas reference); s includes the ideal entropy of mixing";

    /// <summary>Why the glide is null at a given temperature.</summary>
    public const string GlideAtTemperatureReason = "the glide is the dew minus the bubble temperature at one pressure: give --pressure";

    /// <summary>A bubble or dew point, with the glide at its pressure (or why there is none).</summary>
    public static string Render(MixtureInput input, MixtureSaturationPoint point, double? glide, string? glideReason, OutputChoice output) => output.Format switch
    {
        OutputFormat.Json => Json(input, point, glide, glideReason),
        OutputFormat.Csv => Csv(Json(input, point, glide, glideReason), input, point.Liquid, point.Vapour, output.Units),
        _ => Table(input, point, glide, glideReason, output.Units),
    };

    /// <summary>A flash result.</summary>
    public static string Render(MixtureInput input, MixtureFlashResult flash, OutputChoice output) => output.Format switch
    {
        OutputFormat.Json => Json(input, flash),
        OutputFormat.Csv => Csv(Json(input, flash), input, flash.Liquid, flash.Vapour, output.Units),
        _ => Table(input, flash, output.Units),
    };

    /// <summary>The JSON object as one CSV row (every key a column, nested objects and arrays
    /// flattened); the glide is a temperature difference. In engineering units a member of the
    /// <c>liquid</c> or <c>vapour</c> object is per kilogram of that phase (its own molar mass),
    /// any other (the flash's whole-feed density, h and s) per kilogram of feed.</summary>
    private static string Csv(string json, MixtureInput input, MixturePhase? liquid, MixturePhase? vapour, UnitSystem units)
    {
        double liquidMass = MolarMass(input, liquid), vapourMass = MolarMass(input, vapour), feedMass = input.Mixture.MolarMass ?? double.NaN;
        double Of(FlatField field) => field.Parents.Count == 0 ? feedMass
            : field.Parents[0] switch
            {
                "liquid" => liquidMass,
                "vapour" => vapourMass,
                _ => feedMass,
            };
        using var document = System.Text.Json.JsonDocument.Parse(json);
        // The JSON's note says h and s are molar; converted to per kilogram, the note says so.
        var row = JsonFlattener.Flatten(document.RootElement)
            .Select(f => units == UnitSystem.Engineering && f.Kind == JsonValueKind.String && f.Text == ConventionNote ? f with { Text = EngineeringConventionNote } : f)
            .ToList();
        return FlatCsv.WriteByPhase([row], units, Of, new HashSet<string>(StringComparer.Ordinal) { "glide_K" });
    }

    /// <summary>A phase's molar mass Σ x_i M_i in kg/mol; NaN for an absent phase or without
    /// molar masses (engineering units were then refused: SI does not use it).</summary>
    private static double MolarMass(MixtureInput input, MixturePhase? phase)
        => phase is null ? double.NaN : input.Mixture.MolarMassOf(phase.MoleFractions) ?? double.NaN;

    /// <summary>A unit label as the tables write it ("J/(mol K)", "kJ/(kg K)").</summary>
    private static string Label(DisplayQuantity quantity, UnitSystem units) => UnitFormatter.Label(quantity, units).Replace('·', ' ');

    private static string KindName(MixtureSaturationKind kind) => kind == MixtureSaturationKind.Bubble ? "bubble" : "dew";

    /// <summary>"liquid", "vapour" or "two-phase".</summary>
    public static string PhaseName(MixtureFlashResult flash) => flash.IsTwoPhase ? "two-phase" : flash.Liquid is not null ? "liquid" : "vapour";

    private static string Json(MixtureInput input, MixtureSaturationPoint point, double? glide, string? glideReason)
        => JsonText.WriteLine(json =>
        {
            json.WriteStartObject();
            Header(json, input);
            json.WriteString("point", KindName(point.Kind));
            json.WriteFinite("temperature_K", point.Temperature);
            json.WriteFinite("pressure_Pa", point.Pressure);
            json.WriteNumberOrNull("glide_K", glide);
            json.WriteStringOrNull("glide_unavailable_reason", glideReason);

            Fractions(json, "liquid_mole_fractions", input, point.Liquid);
            Fractions(json, "vapour_mole_fractions", input, point.Vapour);
            Phase(json, "liquid", point.Liquid);
            Phase(json, "vapour", point.Vapour);
            Report(json, point.Report);
            Footer(json, input, point.Liquid.Enthalpy is null ? "h and s need cp°" : null, point.Temperature);
            json.WriteEndObject();
        });

    private static string Json(MixtureInput input, MixtureFlashResult flash)
        => JsonText.WriteLine(json =>
        {
            json.WriteStartObject();
            Header(json, input);
            json.WriteString("phase", PhaseName(flash));
            json.WriteFinite("temperature_K", flash.Temperature);
            json.WriteFinite("pressure_Pa", flash.Pressure);
            json.WriteFinite("vapour_fraction", flash.VapourFraction);
            json.WriteFinite("density_mol_m3", flash.Density);
            json.WriteNumberOrNull("enthalpy_J_mol", flash.Enthalpy);
            json.WriteNumberOrNull("entropy_J_molK", flash.Entropy);
            Fractions(json, "liquid_mole_fractions", input, flash.Liquid);
            Fractions(json, "vapour_mole_fractions", input, flash.Vapour);
            Phase(json, "liquid", flash.Liquid);
            Phase(json, "vapour", flash.Vapour);
            json.WriteStartObject("stability");
            json.WriteBoolean("feed_stable", flash.Stability.IsStable);
            json.WriteFinite("tangent_plane_distance", flash.Stability.TangentPlaneDistance);
            json.WriteFinite("gibbs_energy_change_per_RT", flash.GibbsEnergyChange);
            json.WriteEndObject();
            Report(json, flash.Report);
            Footer(json, input, flash.Enthalpy is null ? "h and s need cp°" : null, flash.Temperature);
            json.WriteEndObject();
        });

    private static void Header(Utf8JsonWriter json, MixtureInput input)
    {
        json.WriteString("mixture", input.DisplayName);
        json.WriteString("eos", input.Model.Kind.Id());
        json.WriteStartObject("feed_mole_fractions");
        for (int i = 0; i < input.Mixture.Count; i++)
        {
            json.WriteFinite(input.Mixture.Components[i].Name, input.Mixture.MoleFractions[i]);
        }

        json.WriteEndObject();
    }

    private static void Fractions(Utf8JsonWriter json, string key, MixtureInput input, MixturePhase? phase)
    {
        if (phase is null)
        {
            json.WriteNull(key);
            return;
        }

        json.WriteStartObject(key);
        for (int i = 0; i < input.Mixture.Count; i++)
        {
            json.WriteFinite(input.Mixture.Components[i].Name, phase.MoleFractions[i]);
        }

        json.WriteEndObject();
    }

    private static void Phase(Utf8JsonWriter json, string key, MixturePhase? phase)
    {
        if (phase is null)
        {
            json.WriteNull(key);
            return;
        }

        json.WriteStartObject(key);
        json.WriteFinite("density_mol_m3", phase.Density);
        json.WriteFinite("compressibility_factor", phase.CompressibilityFactor);
        json.WriteNumberOrNull("enthalpy_J_mol", phase.Enthalpy);
        json.WriteNumberOrNull("entropy_J_molK", phase.Entropy);
        json.WriteEndObject();
    }

    private static void Report(Utf8JsonWriter json, MixtureSolverReport report)
    {
        json.WriteStartObject("solver");
        json.WriteNumber("substitution_steps", report.SubstitutionSteps);
        json.WriteNumber("accelerated_steps", report.AcceleratedSteps);
        json.WriteNumber("newton_steps", report.NewtonSteps);
        json.WriteNumber("temperature_steps", report.OuterSteps);
        json.WriteNumber("model_evaluations", report.ModelEvaluations);
        json.WriteFinite("fugacity_residual", report.FugacityResidual);
        json.WriteEndObject();
    }

    private static void Footer(Utf8JsonWriter json, MixtureInput input, string? caloricMissing, double temperature)
    {
        MixtureWriter.WriteInteractions(json, input.Mixture, input.Interactions);
        json.WriteStartArray("notes");
        foreach (string note in MixtureWriter.InteractionNotes(input.Interactions))
        {
            json.WriteStringValue(note);
        }

        foreach (string caution in SolidCaution.BelowTriplePoints(input.Mixture.Components, temperature))
        {
            json.WriteStringValue(caution);
        }

        json.WriteStringValue(caloricMissing is null ? ConventionNote : "enthalpy and entropy are null: a component has no ideal-gas heat capacity cp°");
        json.WriteEndArray();
        json.WriteString("caution", CoexistenceWriter.Caution);
    }

    private static string Table(MixtureInput input, MixtureSaturationPoint point, double? glide, string? glideReason, UnitSystem units)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"{KindName(point.Kind)} point of {input.DisplayName} ({input.Model.Kind.Title()})\n");
        AppendConditions(text, point.Temperature, point.Pressure, units);
        // The glide is a temperature difference: 1 K is 1 degC, so it is written in K in either system.
        text.Append(glide is double g
            ? string.Create(CultureInfo.InvariantCulture, $"glide at this pressure: {NumberText.Table(g)} K (dew minus bubble temperature{(units == UnitSystem.Si ? "" : "; a difference, 1 K = 1 degC")})\n")
            : $"glide: n/a ({glideReason})\n");
        text.Append('\n');
        text.Append(PhaseTable(input, point.Liquid, point.Vapour, units));
        text.Append(CultureInfo.InvariantCulture,
            $"\nsolver: {point.Report.SubstitutionSteps} substitution and {point.Report.NewtonSteps} Newton steps, {point.Report.ModelEvaluations} model evaluations\n");
        AppendNotes(text, input, point.Liquid.Enthalpy is null, units, point.Temperature);
        return text.ToString();
    }

    private static string Table(MixtureInput input, MixtureFlashResult flash, UnitSystem units)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"flash of {input.DisplayName} ({input.Model.Kind.Title()})\n");
        AppendConditions(text, flash.Temperature, flash.Pressure, units);
        text.Append(CultureInfo.InvariantCulture, $"phase: {PhaseName(flash)}, vapour fraction {NumberText.Table(flash.VapourFraction)} (mol/mol)\n");
        if (flash.Enthalpy is double h && flash.Entropy is double s)
        {
            // The whole feed's values are per mole, or per kilogram, of feed.
            double m = input.Mixture.MolarMass ?? double.NaN;
            text.Append(CultureInfo.InvariantCulture,
                $"h: {NumberText.Table(UnitFormatter.MolarEnergy(h, m, units))} {Label(DisplayQuantity.MolarEnergy, units)}, "
                + $"s: {NumberText.Table(UnitFormatter.MolarEntropy(s, m, units))} {Label(DisplayQuantity.MolarEntropy, units)} (whole feed)\n");
        }

        text.Append('\n');
        text.Append(PhaseTable(input, flash.Liquid, flash.Vapour, units));
        text.Append(CultureInfo.InvariantCulture,
            $"\nstability: tangent-plane distance {NumberText.Table(flash.Stability.TangentPlaneDistance)} ({(flash.Stability.IsStable ? "feed stable" : "feed splits")})\n");
        text.Append(CultureInfo.InvariantCulture,
            $"solver: {flash.Report.SubstitutionSteps} substitution ({flash.Report.AcceleratedSteps} accelerated), {flash.Report.NewtonSteps} Newton, {flash.Report.OuterSteps} temperature steps, {flash.Report.ModelEvaluations} model evaluations\n");
        AppendNotes(text, input, flash.Enthalpy is null, units, flash.Temperature);
        return text.ToString();
    }

    /// <summary>The temperature and pressure lines in the chosen units.</summary>
    private static void AppendConditions(StringBuilder text, double temperature, double pressure, UnitSystem units)
    {
        text.Append(CultureInfo.InvariantCulture, $"temperature: {NumberText.Table(UnitFormatter.Temperature(temperature, units))} {UnitFormatter.TemperatureLabel(units)}\n");
        text.Append(CultureInfo.InvariantCulture, $"pressure: {NumberText.Table(UnitFormatter.Pressure(pressure, units))} {UnitFormatter.PressureLabel(units)}\n");
    }

    /// <summary>The two phases side by side; in engineering units each phase's density, h and s
    /// are per kilogram of that phase, with its own molar mass.</summary>
    private static string PhaseTable(MixtureInput input, MixturePhase? liquid, MixturePhase? vapour, UnitSystem units)
    {
        var table = new TextTable(["", "liquid", "vapour"], [false, true, true]);
        string Cell(MixturePhase? phase, Func<MixturePhase, double, double?> value)
            => phase is null ? "-" : value(phase, MolarMass(input, phase)) is double v ? NumberText.Table(v) : "n/a";
        for (int i = 0; i < input.Mixture.Count; i++)
        {
            int k = i;
            table.Add($"x {input.Mixture.Components[i].Name}", Cell(liquid, (p, _) => p.MoleFractions[k]), Cell(vapour, (p, _) => p.MoleFractions[k]));
        }

        double? Density(MixturePhase p, double m) => UnitFormatter.Density(p.Density, m, units);
        double? Enthalpy(MixturePhase p, double m) => p.Enthalpy is double h ? UnitFormatter.MolarEnergy(h, m, units) : null;
        double? Entropy(MixturePhase p, double m) => p.Entropy is double s ? UnitFormatter.MolarEntropy(s, m, units) : null;
        table.Add($"density ({Label(DisplayQuantity.Density, units)})", Cell(liquid, Density), Cell(vapour, Density));
        table.Add("Z", Cell(liquid, (p, _) => p.CompressibilityFactor), Cell(vapour, (p, _) => p.CompressibilityFactor));
        table.Add($"h ({Label(DisplayQuantity.MolarEnergy, units)})", Cell(liquid, Enthalpy), Cell(vapour, Enthalpy));
        table.Add($"s ({Label(DisplayQuantity.MolarEntropy, units)})", Cell(liquid, Entropy), Cell(vapour, Entropy));
        if (units == UnitSystem.Engineering)
        {
            table.Add("molar mass (g/mol)", Cell(liquid, (_, m) => m * 1e3), Cell(vapour, (_, m) => m * 1e3));
        }

        return table.Render();
    }

    private static void AppendNotes(StringBuilder text, MixtureInput input, bool caloricMissing, UnitSystem units, double temperature)
    {
        foreach (string note in MixtureWriter.InteractionNotes(input.Interactions))
        {
            text.Append(CultureInfo.InvariantCulture, $"note: {note}\n");
        }

        foreach (string caution in SolidCaution.BelowTriplePoints(input.Mixture.Components, temperature))
        {
            text.Append(CultureInfo.InvariantCulture, $"caution: {caution}\n");
        }

        text.Append(CultureInfo.InvariantCulture, $"note: {(caloricMissing ? "h and s are n/a: a component has no ideal-gas heat capacity cp°" : units == UnitSystem.Si ? ConventionNote : EngineeringConventionNote)}\n");
        text.AppendLine(CoexistenceWriter.Caution);
    }
}
