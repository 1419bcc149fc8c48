using System.Text;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Output;

/// <summary>The report of <c>fluids estimate --format table|json</c>: every value of the fluid
/// with its source, and the Lydersen cross-check of the Joback values.</summary>
internal static class EstimateReport
{
    /// <summary>The caution of every report: estimated constants carry the methods' errors.</summary>
    public const string Caution = "Estimated constants carry the errors of their methods (a few percent in Tc and Pc, more for small polar molecules): "
        + "do not size pressure equipment or relief devices, or judge flammability or toxicity hazards, on them without measured data; local codes and licensed practice govern.";

    /// <summary>The report as text: identity lines, the values, the cross-check and its findings.</summary>
    public static string Table(Fluid fluid, FluidsEstimateRequest request, IReadOnlyList<EstimateCheck>? checks)
    {
        var text = new StringBuilder();
        text.AppendLine($"fluid: {fluid.Name}");
        text.AppendLine($"caution: {Caution}");
        text.AppendLine($"formula: {fluid.Formula ?? "not given"}{FormulaNote(request)}");
        if (request.Joback is { } joback)
        {
            text.AppendLine($"groups: {joback.GroupList}");
        }

        text.AppendLine();
        var values = new TextTable(["quantity", "value", "unit", "source"], [false, true, false, false]);
        foreach (var (label, _, unit, value) in Values(fluid))
        {
            values.Add(label, label == "acentric factor" ? EstimateCheck.Number(value.Value, "acentric_factor") : NumberText.Table(value.Value), unit, value.Source);
        }

        text.Append(values.Render());
        if (checks is null)
        {
            text.AppendLine();
            text.AppendLine("cross-check: none (no --groups, so no Joback estimate to check)");
            return text.ToString();
        }

        text.AppendLine();
        text.AppendLine("cross-check: Lydersen (1955) on the same groups; thresholds from the methods' published average errors (docs/estimation.md)");
        var table = new TextTable(["quantity", "Joback", "Lydersen", "unit", "difference", "threshold", "finding"], [false, true, true, false, true, true, false]);
        foreach (var check in checks)
        {
            var item = check.Item;
            table.Add(check.Label,
                item.Joback is double j ? EstimateCheck.Number(j, item.Quantity) : "-",
                item.CrossCheck is double c ? EstimateCheck.Number(c, item.Quantity) : "-",
                check.Unit,
                check.DifferenceText,
                check.ThresholdText,
                FindingCell(check));
        }

        text.Append(table.Render());
        return text.ToString();
    }

    /// <summary>The report as JSON (SI units in the keys).</summary>
    public static string Json(Fluid fluid, FluidsEstimateRequest request, IReadOnlyList<EstimateCheck>? checks)
    {
        return JsonText.Write(json =>
        {
            json.WriteStartObject();
            json.WriteString("name", fluid.Name);
            json.WriteString("caution", Caution);
            if (fluid.Formula is null)
            {
                json.WriteNull("formula");
            }
            else
            {
                json.WriteString("formula", fluid.Formula);
            }

            json.WriteString("formula_source", request.Formula is null ? "not given"
                : !request.FormulaGiven ? "derived from the groups"
                : request.Joback is null ? "given" : "given, matches the groups");
            if (request.Joback is { } joback)
            {
                json.WriteString("groups", joback.GroupList);
            }
            else
            {
                json.WriteNull("groups");
            }

            json.WriteStartObject("values");
            foreach (var (_, key, _, value) in Values(fluid))
            {
                json.WriteStartObject(key);
                json.WriteFinite("value", value.Value);
                json.WriteString("source", value.Source);
                json.WriteEndObject();
            }

            json.WriteEndObject();
            if (checks is null)
            {
                json.WriteNull("cross_check");
                json.WriteString("cross_check_unavailable", "no --groups, so no Joback estimate to check");
            }
            else
            {
                json.WriteStartObject("cross_check");
                json.WriteString("method", "Lydersen (1955) on the same groups");
                foreach (var check in checks)
                {
                    var item = check.Item;
                    json.WriteStartObject(check.Key);
                    json.WriteNumberOrNull("joback", item.Joback);
                    json.WriteNumberOrNull("lydersen", item.CrossCheck);
                    json.WriteNumberOrNull(item.Relative ? "relative_difference" : "difference", item.Difference);
                    json.WriteFinite(item.Relative ? "relative_threshold" : "threshold", item.Threshold);
                    json.WriteBoolean("joback_value_used", check.Used);
                    json.WriteBoolean("exceeds_threshold", item.Exceeds);
                    if (item.Unavailable is null)
                    {
                        json.WriteNull("unavailable");
                    }
                    else
                    {
                        json.WriteString("unavailable", item.Unavailable);
                    }

                    json.WriteEndObject();
                }

                json.WriteEndObject();
            }

            json.WriteStartArray("findings");
            foreach (var check in checks ?? [])
            {
                if (check.Finding is string finding)
                {
                    json.WriteStringValue(finding);
                }
            }

            json.WriteEndArray();
            json.WriteEndObject();
        });
    }

    private static string FormulaNote(FluidsEstimateRequest request)
        => request.Joback is null || request.Formula is null ? ""
            : request.FormulaGiven ? " (given; matches the atoms of the groups)" : " (derived from the atoms of the groups)";

    private static string FindingCell(EstimateCheck check)
    {
        var item = check.Item;
        if (item.Difference is null)
        {
            return $"not compared: {item.Unavailable}";
        }

        if (!item.Exceeds)
        {
            return "agree";
        }

        return check.Used ? "FINDING: differ beyond the threshold" : "differ beyond the threshold (value given by the user is used)";
    }

    private static IEnumerable<(string Label, string Key, string Unit, SourcedValue Value)> Values(Fluid fluid)
    {
        if (fluid.MolarMass is { } mass)
        {
            yield return ("molar mass", "molar_mass_kg_per_mol", "kg/mol", mass);
        }

        if (fluid.NormalBoilingPoint is { } tb)
        {
            yield return ("normal boiling point", "normal_boiling_point_K", "K", tb);
        }

        yield return ("critical temperature", "critical_temperature_K", "K", fluid.CriticalTemperature);
        yield return ("critical pressure", "critical_pressure_Pa", "Pa", fluid.CriticalPressure);
        if (fluid.CriticalDensity is { } rho)
        {
            yield return ("critical density", "critical_density_mol_per_m3", "mol/m3", rho);
        }

        yield return ("acentric factor", "acentric_factor", "", fluid.AcentricFactor);
        if (fluid.IdealGasHeatCapacity is { } cp && cp.MinimumTemperature <= 298.15 && cp.MaximumTemperature >= 298.15)
        {
            yield return ("ideal-gas cp at 298.15 K", "ideal_gas_cp_298K_J_per_mol_K", "J/(mol K)", new SourcedValue(cp.HeatCapacity(298.15), cp.Source));
        }
    }
}
