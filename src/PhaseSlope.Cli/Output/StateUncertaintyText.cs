using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Output;

/// <summary>Writes the standard uncertainties of a single-phase state (<c>state --uncertainty</c>).</summary>
/// <param name="Values">The uncertainties.</param>
/// <param name="Summary">Method and inputs.</param>
internal sealed record StateUncertaintyText(StateUncertainty Values, UncertaintySummary Summary)
{
    private sealed record Quantity(string Key, string Title, DisplayQuantity? Display, Func<StateUncertainty, double?> Value);

    private static readonly Quantity[] Quantities =
    [
        new("density_mol_m3", "u(rho)", DisplayQuantity.Density, u => u.Density),
        new("pressure_Pa", "u(P)", DisplayQuantity.Pressure, u => u.Pressure),
        new("compressibility_factor", "u(Z)", null, u => u.CompressibilityFactor),
        new("residual_enthalpy_J_mol", "u(h_r)", DisplayQuantity.MolarEnergy, u => u.ResidualEnthalpy),
        new("residual_entropy_J_molK", "u(s_r)", DisplayQuantity.MolarEntropy, u => u.ResidualEntropy),
        new("isobaric_heat_capacity_J_molK", "u(cp)", DisplayQuantity.MolarEntropy, u => u.IsobaricHeatCapacity),
        new("isochoric_heat_capacity_J_molK", "u(cv)", DisplayQuantity.MolarEntropy, u => u.IsochoricHeatCapacity),
        new("isothermal_compressibility_1_Pa", "u(kappa_T)", null, u => u.IsothermalCompressibility),
        new("isobaric_expansivity_1_K", "u(alpha)", null, u => u.IsobaricExpansivity),
        new("joule_thomson_coefficient_K_Pa", "u(mu_JT)", null, u => u.JouleThomsonCoefficient),
        new("speed_of_sound_m_s", "u(w)", DisplayQuantity.Speed, u => u.SpeedOfSound),
    ];

    public void WriteJson(Utf8JsonWriter json)
    {
        UncertaintyText.StartObject(json, Summary.Choice);

        foreach (var q in Quantities)
        {
            json.WriteNumberOrNull(q.Key, Checked(q));
        }

        if (Values.Reason is string reason)
        {
            json.WriteString("undefined_reason", reason);
        }
        else
        {
            json.WriteNull("undefined_reason");
        }

        if (Values.ResponseReason is string responseReason)
        {
            json.WriteString("response_functions_undefined_reason", responseReason);
        }
        else
        {
            json.WriteNull("response_functions_undefined_reason");
        }

        UncertaintyText.WriteInputs(json, Summary.Inputs);
        json.WriteEndObject();
    }

    public string Table(UnitSystem units, double molarMass)
    {
        var text = new StringBuilder();
        text.AppendLine();
        UncertaintyText.DescribeInputs(text, Summary);
        var table = new TextTable(["standard uncertainty", "u", "unit"], [false, true, false]);
        foreach (var q in Quantities)
        {
            string cell = Checked(q) is double v
                ? NumberText.Uncertainty(q.Display is DisplayQuantity d ? UnitFormatter.Convert(d, v, units, molarMass) : v)
                : "undefined";
            table.Add(q.Title, cell, q.Display is DisplayQuantity dq ? UnitFormatter.Label(dq, units) : "-");
        }

        text.Append(table.Render());
        if (Values.Reason is string reason)
        {
            text.AppendLine($"u undefined: {reason}");
        }

        if (Values.ResponseReason is string responseReason && Values.Reason is null)
        {
            text.AppendLine($"u(cp), u(cv), u(mu_JT), u(w) undefined: {responseReason}");
        }

        text.AppendLine("u(h_r) and u(s_r) are those of h and s whenever the reference state does not itself depend on the model (the ideal-gas reference).");
        return text.ToString();
    }

    private double? Checked(Quantity q) => q.Value(Values) is double v ? FiniteNumbers.Check(v, $"u({q.Key})") : null;
}
