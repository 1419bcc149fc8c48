using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Solids;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders fluid records for <c>fluids list</c> and <c>fluids show</c>.</summary>
internal static class FluidWriter
{
    /// <summary>A sourced constant of a fluid: SI key, title, display quantity, and accessor.</summary>
    private sealed record Field(string Key, string Title, DisplayQuantity? Quantity, Func<Fluid, SourcedValue?> Get);

    private static readonly Field[] Fields =
    [
        new("molar_mass_kg_mol", "molar mass", null, f => f.MolarMass),
        new("critical_temperature_K", "critical temperature", DisplayQuantity.Temperature, f => f.CriticalTemperature),
        new("critical_pressure_Pa", "critical pressure", DisplayQuantity.Pressure, f => f.CriticalPressure),
        new("acentric_factor", "acentric factor", null, f => f.AcentricFactor),
        new("critical_density_mol_m3", "critical density", DisplayQuantity.Density, f => f.CriticalDensity),
        new("normal_boiling_point_K", "normal boiling point", DisplayQuantity.Temperature, f => f.NormalBoilingPoint),
        new("triple_point_temperature_K", "triple point temperature", DisplayQuantity.Temperature, f => f.TriplePointTemperature),
        new("triple_point_pressure_Pa", "triple point pressure", DisplayQuantity.Pressure, f => f.TriplePointPressure),
        new("enthalpy_of_fusion_J_mol", "enthalpy of fusion", DisplayQuantity.MolarEnergy, f => f.EnthalpyOfFusion),
        new("solid_density_mol_m3", "solid density", DisplayQuantity.Density, f => f.SolidDensity),
        new("triple_point_liquid_density_mol_m3", "liquid density at the triple point", DisplayQuantity.Density, f => f.TriplePointLiquidDensity),
        new("fusion_volume_change_m3_mol", "volume change on melting", DisplayQuantity.MolarVolume, f => f.FusionVolumeChange),
        new("solid_heat_capacity_J_molK", "solid heat capacity", DisplayQuantity.MolarEntropy, f => f.SolidHeatCapacity),
    ];

    /// <summary>Renders one fluid (<paramref name="single"/>) or a list.</summary>
    public static string Render(IReadOnlyList<Fluid> fluids, bool single, OutputFormat format, UnitSystem units)
        => format switch
        {
            OutputFormat.Json => Json(fluids, single),
            OutputFormat.Csv => Csv(fluids),
            _ => single ? ShowTable(fluids[0], units) : ListTable(fluids, units),
        };

    private static string Json(IReadOnlyList<Fluid> fluids, bool single)
    {
        return JsonText.Write(json =>
        {
            if (!single)
            {
                json.WriteStartArray();
            }

            foreach (var fluid in fluids)
            {
                WriteObject(json, fluid);
            }

            if (!single)
            {
                json.WriteEndArray();
            }
        });
    }

    private static void WriteObject(Utf8JsonWriter json, Fluid fluid)
    {
        json.WriteStartObject();
        json.WriteString("name", fluid.Name);
        json.WriteStartArray("synonyms");
        foreach (var synonym in fluid.Synonyms)
        {
            json.WriteStringValue(synonym);
        }

        json.WriteEndArray();
        WriteOptional(json, "formula", fluid.Formula);
        WriteOptional(json, "cas", fluid.CasNumber);
        WriteOptional(json, "family", fluid.Family);
        WriteHazard(json, fluid.Hazard);
        foreach (var field in Fields)
        {
            if (field.Get(fluid) is SourcedValue value)
            {
                json.WriteFinite(field.Key, value.Value);
            }
            else
            {
                json.WriteNull(field.Key);
            }
        }

        json.WriteFinite("lowest_valid_temperature_K", CoexistenceSolver.LowestValidTemperature(fluid));
        var line = VapourLineOf(fluid);
        WriteOptional(json, "vapour_line", line?.Class.ToString().ToLowerInvariant());
        if (line is null)
        {
            json.WriteNull("vapour_line_reduced_slope");
            json.WriteNull("maximum_vapour_entropy_temperature_K");
        }
        else
        {
            json.WriteFinite("vapour_line_reduced_slope", line.ReducedSlope);
            if (line.MaximumEntropyTemperature is double tMax)
            {
                json.WriteFinite("maximum_vapour_entropy_temperature_K", tMax);
            }
            else
            {
                json.WriteNull("maximum_vapour_entropy_temperature_K");
            }
        }
        json.WriteStartObject("standard_uncertainties");
        foreach (var field in Fields)
        {
            if (field.Get(fluid)?.StandardUncertainty is double u)
            {
                json.WriteFinite(field.Key, u);
            }
        }

        json.WriteEndObject();
        json.WriteStartObject("sources");
        foreach (var field in Fields)
        {
            if (field.Get(fluid) is SourcedValue value)
            {
                json.WriteString(field.Key, value.Source);
            }
        }

        json.WriteEndObject();
        WriteSolidLineEquation(json, "melting_pressure_equation", fluid.MeltingPressureEquation);
        WriteSolidLineEquation(json, "sublimation_pressure_equation", fluid.SublimationPressureEquation);
        var (check, reason, model) = TriplePointCheckOf(fluid);
        WriteTriplePointCheck(json, check, reason, model);
        WriteModelData(json, fluid);
        WriteOptional(json, "provenance", fluid.Provenance);
        WriteOptional(json, "remarks", fluid.Remarks);
        json.WriteString("origin", fluid.Origin);
        json.WriteEndObject();
    }

    /// <summary>The vapour-line class for the default model, or null when the fluid has no
    /// ideal-gas heat capacity (the class depends on it).</summary>
    private static VapourLine? VapourLineOf(Fluid fluid)
        => fluid.IdealGasHeatCapacity is null ? null : VapourLine.Classify(PropertyModel.For(fluid, CubicModelKind.PengRobinson));

    /// <summary>"hazard_class": {"code", "description", "source"}, or null when the file gives none.</summary>
    private static void WriteHazard(Utf8JsonWriter json, HazardClass? hazard)
    {
        if (hazard is null)
        {
            json.WriteNull("hazard_class");
            return;
        }

        json.WriteStartObject("hazard_class");
        json.WriteString("code", hazard.Code);
        json.WriteString("description", hazard.Description);
        json.WriteString("source", hazard.Source);
        json.WriteEndObject();
    }

    /// <summary>Beside a real fluid's identity when its file gives no <c>hazard_class</c>: the
    /// tool knows no hazard class of its own for it.</summary>
    internal const string GenericHazardCaution = "The fluid file carries no flammability or toxicity class: take it from the supplier's safety data sheet, "
        + "and follow local codes and licensed engineering practice for equipment, charge limits and relief.";

    /// <summary>The hazard caution for a fluid: its sourced class in words where the file gives
    /// one, else <see cref="GenericHazardCaution"/>.</summary>
    internal static string HazardCaution(Fluid fluid)
    {
        if (fluid.Hazard is not { } hazard)
        {
            return GenericHazardCaution;
        }

        string subject = char.ToUpperInvariant(fluid.Name[0]) + fluid.Name[1..];
        string statement = hazard.SafetyGroup is null
            ? $"{subject} is {hazard.Description} (source: {hazard.Source})"
            : $"{subject} is classified {hazard.Description} in the ASHRAE Standard 34 safety groups (source: {hazard.Source})";
        return $"{statement}. Equipment, charge limits, ventilation and relief for it follow local codes and licensed engineering practice; the supplier's safety data sheet governs.";
    }

    /// <summary>One line per fluid for a mixture: each component's class, or that its file gives none.</summary>
    internal static IReadOnlyList<string> HazardLines(IEnumerable<Fluid> fluids)
        => fluids.Select(f => f.Hazard is { } h ? $"{f.Name}: {h.Description} (source: {h.Source})" : $"{f.Name}: no hazard class in its fluid file; see the supplier's safety data sheet").ToList();

    private static void WriteOptional(Utf8JsonWriter json, string key, string? value)
    {
        if (value is null)
        {
            json.WriteNull(key);
        }
        else
        {
            json.WriteString(key, value);
        }
    }

    private static string Csv(IReadOnlyList<Fluid> fluids)
        => CsvText.Write(
            ["name", "formula", "cas", "family", .. Fields.Select(f => f.Key)],
            fluids.Select(fluid => (IReadOnlyList<string>)[
                fluid.Name, fluid.Formula ?? "", fluid.CasNumber ?? "", fluid.Family ?? "",
                .. Fields.Select(f => f.Get(fluid) is SourcedValue v ? NumberText.RoundTrip(v.Value) : "")]));

    private static string Display(Field field, double si, UnitSystem units, double molarMass)
        => field.Quantity is DisplayQuantity q ? NumberText.Given(UnitFormatter.Convert(q, si, units, molarMass)) : NumberText.Given(field.Key == "molar_mass_kg_mol" ? Core.Units.UnitTable.Get("g/mol").FromSi(si) : si);

    private static string Unit(Field field, UnitSystem units)
        => field.Quantity is DisplayQuantity q ? UnitFormatter.Label(q, units) : field.Key == "molar_mass_kg_mol" ? "g/mol" : "-";

    private static string ListTable(IReadOnlyList<Fluid> fluids, UnitSystem units)
    {
        var shown = Fields.Take(4).ToArray();
        var headers = new List<string> { "name", "formula", "family" };
        headers.AddRange(shown.Select(f => $"{Abbreviation(f)} [{Unit(f, units)}]"));
        var table = new TextTable(headers, [false, false, false, .. shown.Select(_ => true)]);
        foreach (var fluid in fluids)
        {
            table.Add([fluid.Name, fluid.Formula ?? "", fluid.Family ?? "", .. shown.Select(f => f.Get(fluid) is SourcedValue v ? Display(f, v.Value, units, fluid.MolarMass?.Value ?? double.NaN) : "")]);
        }

        return $"{fluids.Count} {(fluids.Count == 1 ? "fluid" : "fluids")}{Environment.NewLine}{Environment.NewLine}{table.Render()}";
    }

    private static string Abbreviation(Field field) => field.Key switch
    {
        "molar_mass_kg_mol" => "M",
        "critical_temperature_K" => "Tc",
        "critical_pressure_Pa" => "Pc",
        _ => "omega",
    };

    private static string ShowTable(Fluid fluid, UnitSystem units)
    {
        var text = new StringBuilder();
        foreach (string line in IdentityLines(fluid))
        {
            text.AppendLine(line);
        }

        text.AppendLine();
        text.Append(ConstantsTable(fluid, units).Render());
        text.AppendLine();
        foreach (string line in ModelDataLines(fluid, units))
        {
            text.AppendLine(line);
        }

        text.AppendLine();
        text.AppendLine($"caution: {HazardCaution(fluid)}");
        return text.ToString();
    }

    /// <summary>The fluid's name, synonyms, CAS number, family and origin, one line each (as
    /// <c>fluids show</c> prints them above its table).</summary>
    internal static IReadOnlyList<string> IdentityLines(Fluid fluid)
    {
        var lines = new List<string> { $"{fluid.Name}{(fluid.Formula is null ? "" : $" ({fluid.Formula})")}" };
        if (fluid.Synonyms.Count > 0)
        {
            lines.Add($"also known as: {string.Join(", ", fluid.Synonyms)}");
        }

        if (fluid.CasNumber is not null)
        {
            lines.Add($"CAS number: {fluid.CasNumber}");
        }

        if (fluid.Family is not null)
        {
            lines.Add($"family: {fluid.Family}");
        }

        if (fluid.Hazard is { } hazard)
        {
            lines.Add($"hazard class: {hazard.Description}; {hazard.Source}");
        }

        lines.Add($"origin: {fluid.Origin}");
        return lines;
    }

    /// <summary>The sourced constants: value, standard uncertainty, unit and source of each.</summary>
    internal static TextTable ConstantsTable(Fluid fluid, UnitSystem units) => ConstantsTable(fluid, units, Fields);

    /// <summary>The keys of the solid-phase constants (the triple point and the fusion data).</summary>
    private static readonly HashSet<string> SolidKeys =
    [
        "triple_point_temperature_K", "triple_point_pressure_Pa", "enthalpy_of_fusion_J_mol", "solid_density_mol_m3",
        "triple_point_liquid_density_mol_m3", "fusion_volume_change_m3_mol", "solid_heat_capacity_J_molK",
    ];

    /// <summary>The rows of <see cref="ConstantsTable(Fluid, UnitSystem)"/> for the triple point and
    /// the fusion data only (the report's solid-phase section).</summary>
    internal static TextTable SolidConstantsTable(Fluid fluid, UnitSystem units) => ConstantsTable(fluid, units, Fields.Where(f => SolidKeys.Contains(f.Key)));

    private static TextTable ConstantsTable(Fluid fluid, UnitSystem units, IEnumerable<Field> fields)
    {
        var table = new TextTable(["constant", "value", "std. uncertainty", "unit", "source"], [false, true, true, false, false]);
        foreach (var field in fields)
        {
            if (field.Get(fluid) is SourcedValue value)
            {
                double m = fluid.MolarMass?.Value ?? double.NaN; // engineering units were refused without it
                string u = value.StandardUncertainty is double s ? DisplayUncertainty(field, s, units, m) : "";
                table.Add(field.Title, Display(field, value.Value, units, m), u, Unit(field, units), value.Source);
            }
            else
            {
                table.Add(field.Title, "not given", "", "", "");
            }
        }

        return table;
    }

    /// <summary>The lines <c>fluids show</c> prints under its table: the valid range, the
    /// vapour-line class, cp°, the published vapour-pressure equation, alpha parameters, volume
    /// translations, provenance and remarks, each with its source.</summary>
    internal static IReadOnlyList<string> ModelDataLines(Fluid fluid, UnitSystem units)
    {
        var lines = new List<string>();
        double tMin = CoexistenceSolver.LowestValidTemperature(fluid);
        lines.Add($"lowest valid temperature: {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Temperature, tMin, units))} {UnitFormatter.Label(DisplayQuantity.Temperature, units)} (the triple point where the fluid gives one, not below 0.1 Tc; 0.3 Tc where it gives none)");
        if (VapourLineOf(fluid) is { } line)
        {
            lines.Add(VapourLineText(line, units, CubicModelKind.PengRobinson.Title()));
        }

        if (fluid.IdealGasHeatCapacity is { } cp)
        {
            lines.Add($"ideal-gas heat capacity: {NumberText.Table(cp.MinimumTemperature)}-{NumberText.Table(cp.MaximumTemperature)} K; {cp.Source}");
        }

        lines.AddRange(SolidEquationLines(fluid));

        if (fluid.TriplePointTemperature is not null && fluid.TriplePointPressure is not null)
        {
            var (check, reason, model) = TriplePointCheckOf(fluid);
            lines.Add(check is null
                ? $"triple-point check: not available ({reason})"
                : $"triple-point check ({model}): vapour pressure at the triple point {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Pressure, check.ModelPressure, units))} "
                    + $"{UnitFormatter.Label(DisplayQuantity.Pressure, units)}, {NumberText.Table(100 * check.RelativeDeviation)} % from the sourced triple-point pressure");
        }

        if (fluid.VapourPressureEquation is { } vp)
        {
            lines.Add($"vapour-pressure equation: ln(P/Pc) = (Tc/T) sum N_i tau^t_i, Tc = {NumberText.Table(vp.Form.CriticalTemperature)} K, Pc = {NumberText.Table(vp.Form.CriticalPressure / 1e3)} kPa, "
                + $"N^t = {string.Join(" ", vp.Coefficients.Select((n, i) => $"{NumberText.RoundTrip(n)}^{NumberText.RoundTrip(vp.Form.Exponents[i])}"))}; {vp.Source}");
        }

        foreach (var set in fluid.AlphaParameters)
        {
            var names = CubicModel.AlphaParameterNames(set.Form);
            lines.Add($"{CubicModel.AlphaName(set.Form)} alpha ({set.Model.Title()}): {string.Join(", ", set.Values.Select((v, i) => $"{names[i]} = {NumberText.RoundTrip(v)}"))}"
                + $"{(set.Covariance is null ? "" : ", with covariance")}; {set.Source}");
        }

        if (fluid.PreferredAlpha != AlphaForm.Default)
        {
            lines.Add($"alpha used by default: {CubicModel.AlphaName(fluid.PreferredAlpha)}");
        }

        foreach (var shift in fluid.VolumeShifts)
        {
            lines.Add($"volume translation ({shift.Model.Title()}): c = {NumberText.Table(shift.Shift.Value * 1e6)} cm3/mol; {shift.Shift.Source}");
        }

        if (fluid.Provenance is not null)
        {
            lines.Add($"provenance: {fluid.Provenance}");
        }

        if (fluid.Remarks is not null)
        {
            lines.Add($"remarks: {fluid.Remarks}");
        }

        return lines;
    }

    /// <summary>The published melting and sublimation equations of <c>fluids show</c>, one line each
    /// with its coefficients, range and source (none where the file gives none).</summary>
    internal static IEnumerable<string> SolidEquationLines(Fluid fluid)
    {
        foreach (var (name, equation) in new[] { ("melting-pressure equation", fluid.MeltingPressureEquation), ("sublimation-pressure equation", fluid.SublimationPressureEquation) })
        {
            if (equation is not null)
            {
                yield return $"{name}: {EquationText(equation)}, Tr = {NumberText.RoundTrip(equation.ReducingTemperature)} K, Pr = {NumberText.RoundTrip(equation.ReducingPressure)} Pa, "
                    + $"a^b = {string.Join(" ", equation.Coefficients.Select((a, i) => $"{NumberText.RoundTrip(a)}^{NumberText.RoundTrip(equation.Exponents[i])}"))}, "
                    + $"{NumberText.RoundTrip(equation.LowestTemperature)}-{NumberText.RoundTrip(equation.HighestTemperature)} K; {equation.Source}";
            }
        }
    }

    /// <summary>The vapour-line class line of <c>fluids show</c> (which uses Peng–Robinson) for the
    /// model titled <paramref name="modelTitle"/>.</summary>
    internal static string VapourLineText(VapourLine line, UnitSystem units, string modelTitle)
    {
        string turn = line.MaximumEntropyTemperature is double tMax
            ? $"; vapour entropy is highest at {NumberText.Table(UnitFormatter.Convert(DisplayQuantity.Temperature, tMax, units))} {UnitFormatter.Label(DisplayQuantity.Temperature, units)}"
            : "";
        return $"saturated-vapour line ({modelTitle}): {line.Class.ToString().ToLowerInvariant()}, (Tc/R) ds/dT = {NumberText.Table(line.ReducedSlope)} at T/Tc = {NumberText.Table(VapourLine.ReadingReducedTemperature)}{turn}";
    }

    /// <summary>The algebraic form of a published solid line, as the fluid-file syntax names it.</summary>
    private static string FormName(SolidLineEquation equation) => equation.Form == SolidLineForm.Powers ? "powers" : "excess";

    /// <summary>The formula of a published solid line with its form's name, e.g.
    /// "powers: P/Pr = 1 + sum a_i((T/Tr)^b_i - 1)".</summary>
    private static string EquationText(SolidLineEquation equation)
    {
        // Description is "FORMULA, T1-T2 K"; the formula is everything before the range.
        string description = equation.Description;
        return $"{FormName(equation)}: {description[..description.LastIndexOf(", ", StringComparison.Ordinal)]}";
    }

    /// <summary>A published melting or sublimation equation as an object (form, formula, reducing
    /// point, coefficients, exponents, range, source), or null.</summary>
    private static void WriteSolidLineEquation(Utf8JsonWriter json, string key, SolidLineEquation? equation)
    {
        if (equation is null)
        {
            json.WriteNull(key);
            return;
        }

        json.WriteStartObject(key);
        json.WriteString("form", FormName(equation));
        json.WriteString("equation", EquationText(equation)[(FormName(equation).Length + 2)..]);
        json.WriteFinite("reducing_temperature_K", equation.ReducingTemperature);
        json.WriteFinite("reducing_pressure_Pa", equation.ReducingPressure);
        json.WriteStartArray("coefficients");
        foreach (double a in equation.Coefficients)
        {
            json.WriteFiniteValue(a, "coefficients");
        }

        json.WriteEndArray();
        json.WriteStartArray("exponents");
        foreach (double b in equation.Exponents)
        {
            json.WriteFiniteValue(b, "exponents");
        }

        json.WriteEndArray();
        json.WriteFinite("lowest_temperature_K", equation.LowestTemperature);
        json.WriteFinite("highest_temperature_K", equation.HighestTemperature);
        json.WriteString("source", equation.Source);
        json.WriteEndObject();
    }

    /// <summary>The default model's (Peng–Robinson's) vapour pressure at the sourced triple-point
    /// temperature against the sourced triple-point pressure; null with the reason when the fluid
    /// lacks either or the model gives no coexistence there.</summary>
    internal static (TriplePointCheck? Check, string? Reason, string Model) TriplePointCheckOf(Fluid fluid)
    {
        var model = CubicModel.For(CubicModelKind.PengRobinson, fluid);
        if (fluid.TriplePointTemperature is null || fluid.TriplePointPressure is null)
        {
            return (null, $"fluid '{fluid.Name}' gives no {(fluid.TriplePointTemperature is null ? "triple_point_temperature" : "triple_point_pressure")}", ModelText.Describe(model));
        }

        var (check, reason) = TriplePointCheckOf(fluid, new SolidPhaseLines(fluid, new CoexistenceSolver(model, fluid)));
        return (check, reason, ModelText.Describe(model));
    }

    /// <summary>The check of <paramref name="lines"/>, or null with the solver's reason.</summary>
    internal static (TriplePointCheck? Check, string? Reason) TriplePointCheckOf(Fluid fluid, SolidPhaseLines lines)
    {
        try
        {
            return (lines.Check, null);
        }
        catch (Core.Errors.InvalidInputException ex)
        {
            return (null, $"the model gives no vapour pressure at the triple point of {fluid.Name}: {ex.Message}");
        }
        catch (Core.Errors.ConvergenceException ex)
        {
            return (null, $"the model's coexistence at the triple point of {fluid.Name} did not converge: {ex.Message}");
        }
    }

    /// <summary>Writes <c>triple_point_check</c> (the model's vapour pressure at the sourced
    /// triple-point temperature, the sourced pressure and their relative deviation) or null, and
    /// <c>triple_point_check_unavailable_reason</c>.</summary>
    internal static void WriteTriplePointCheck(Utf8JsonWriter json, TriplePointCheck? check, string? reason, string model)
    {
        if (check is null)
        {
            json.WriteNull("triple_point_check");
        }
        else
        {
            json.WriteStartObject("triple_point_check");
            json.WriteString("model", model);
            json.WriteFinite("temperature_K", check.Temperature);
            json.WriteFinite("sourced_pressure_Pa", check.SourcedPressure);
            json.WriteFinite("model_pressure_Pa", check.ModelPressure);
            json.WriteFinite("relative_deviation", check.RelativeDeviation);
            json.WriteEndObject();
        }

        json.WriteStringOrNull("triple_point_check_unavailable_reason", check is null ? reason : null);
    }

    /// <summary>The published vapour-pressure equation, fluid-specific alpha parameters and
    /// volume translations, each with its source.</summary>
    private static void WriteModelData(Utf8JsonWriter json, Fluid fluid)
    {
        if (fluid.VapourPressureEquation is { } vp)
        {
            json.WriteStartObject("vapour_pressure_equation");
            json.WriteFinite("critical_temperature_K", vp.Form.CriticalTemperature);
            json.WriteFinite("critical_pressure_Pa", vp.Form.CriticalPressure);
            json.WriteStartArray("coefficients");
            foreach (double n in vp.Coefficients)
            {
                json.WriteFiniteValue(n, "coefficients");
            }

            json.WriteEndArray();
            json.WriteStartArray("exponents");
            foreach (double t in vp.Form.Exponents)
            {
                json.WriteFiniteValue(t, "exponents");
            }

            json.WriteEndArray();
            json.WriteString("source", vp.Source);
            json.WriteEndObject();
        }
        else
        {
            json.WriteNull("vapour_pressure_equation");
        }

        json.WriteStartArray("alpha_parameters");
        foreach (var set in fluid.AlphaParameters)
        {
            json.WriteStartObject();
            json.WriteString("alpha", CubicModel.AlphaKeyStem(set.Form));
            json.WriteString("eos", set.Model.Id());
            json.WriteStartObject("values");
            var names = CubicModel.AlphaParameterNames(set.Form);
            for (int i = 0; i < set.Values.Count; i++)
            {
                json.WriteFinite(names[i], set.Values[i]);
            }

            json.WriteEndObject();
            if (set.Covariance is { } covariance)
            {
                json.WriteFiniteMatrix("covariance", covariance);
            }
            else
            {
                json.WriteNull("covariance");
            }

            json.WriteString("source", set.Source);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        if (fluid.PreferredAlpha != AlphaForm.Default)
        {
            json.WriteString("alpha_default", CubicModel.AlphaKeyStem(fluid.PreferredAlpha));
        }
        else
        {
            json.WriteNull("alpha_default");
        }

        json.WriteStartArray("volume_shifts");
        foreach (var shift in fluid.VolumeShifts)
        {
            json.WriteStartObject();
            json.WriteString("eos", shift.Model.Id());
            json.WriteFinite("value_m3_mol", shift.Shift.Value);
            json.WriteNumberOrNull("standard_uncertainty_m3_mol", shift.Shift.StandardUncertainty);
            json.WriteString("source", shift.Shift.Source);
            json.WriteEndObject();
        }

        json.WriteEndArray();
    }

    private static string DisplayUncertainty(Field field, double si, UnitSystem units, double molarMass)
    {
        // An uncertainty is a difference: temperature offsets (degC) must not shift it.
        if (field.Quantity == DisplayQuantity.Temperature)
        {
            return NumberText.Given(si);
        }

        return Display(field, si, units, molarMass);
    }
}
