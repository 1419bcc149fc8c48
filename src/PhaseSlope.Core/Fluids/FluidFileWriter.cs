using System.Globalization;
using System.Text;

namespace PhaseSlope.Core.Fluids;

/// <summary>Writes a <see cref="Fluid"/> as the text of a <c>.fluid</c> file (the inverse of
/// <see cref="FluidFile.Parse"/>; no file I/O here, the caller stores the text).</summary>
public static class FluidFileWriter
{
    /// <summary>The file text, SI units, round-trip numbers, every value with its source.</summary>
    public static string Format(Fluid fluid, string? comment = null)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        var text = new StringBuilder();
        text.Append("# PhaseSlope fluid file; the format is described in docs/fluid-files.md.\n");
        if (comment is not null)
        {
            foreach (string line in comment.Split('\n'))
            {
                text.Append("# ").Append(line.TrimEnd()).Append('\n');
            }
        }

        Line(text, "format", $"{FluidFile.FormatTag} {FluidFile.FormatVersion}");
        Line(text, "name", fluid.Name);
        if (fluid.Synonyms.Count > 0)
        {
            Line(text, "synonyms", string.Join("; ", fluid.Synonyms));
        }

        Optional(text, "formula", fluid.Formula);
        Optional(text, "cas", fluid.CasNumber);
        Optional(text, "family", fluid.Family);
        if (fluid.Hazard is { } hazard)
        {
            Line(text, "hazard_class", $"{hazard.Code} | {hazard.Source}");
        }

        text.Append('\n');
        if (fluid.MolarMass is { } molarMass)
        {
            Quantity(text, "molar_mass", molarMass, "kg/mol");
        }

        Quantity(text, "critical_temperature", fluid.CriticalTemperature, "K");
        Quantity(text, "critical_pressure", fluid.CriticalPressure, "Pa");
        Quantity(text, "acentric_factor", fluid.AcentricFactor, null);
        if (fluid.CriticalDensity is { } rho)
        {
            Quantity(text, "critical_density", rho, "mol/m3");
        }

        if (fluid.NormalBoilingPoint is { } tb)
        {
            Quantity(text, "normal_boiling_point", tb, "K");
        }

        if (fluid.TriplePointTemperature is { } tt)
        {
            Quantity(text, "triple_point_temperature", tt, "K");
        }

        WriteSolidData(text, fluid);

        if (fluid.IdealGasHeatCapacity is { } cp)
        {
            var value = new StringBuilder();
            if (cp.PowerTerms.Count > 0)
            {
                value.Append("power");
                foreach (var (c, t) in cp.PowerTerms)
                {
                    value.Append(' ').Append(Number(c)).Append('^').Append(Number(t));
                }
            }

            if (cp.EinsteinTerms.Count > 0)
            {
                value.Append(value.Length > 0 ? "  " : "").Append("einstein");
                foreach (var (v, u) in cp.EinsteinTerms)
                {
                    value.Append(' ').Append(Number(v)).Append('@').Append(Number(u / cp.ReducingTemperature));
                }
            }

            string reduce = cp.ReducingTemperature == 1 ? "" : $"reduce {Number(cp.ReducingTemperature)} K  ";
            Line(text, "ideal_gas_cp", $"{reduce}{value}  range {Number(cp.MinimumTemperature)}-{Number(cp.MaximumTemperature)} K | {cp.Source}");
        }

        if (fluid.VapourPressureEquation is { } vp)
        {
            string terms = string.Join(' ', vp.Coefficients.Select((n, i) => $"{Number(n)}^{Number(vp.Form.Exponents[i])}"));
            Line(text, "vapour_pressure_equation", $"reduce {Number(vp.Form.CriticalTemperature)} K {Number(vp.Form.CriticalPressure)} Pa terms {terms} | {vp.Source}");
        }

        foreach (var shift in fluid.VolumeShifts)
        {
            Quantity(text, shift.Model == Models.CubicModelKind.SoaveRedlichKwong ? "volume_shift_srk" : "volume_shift_pr", shift.Shift, "m3/mol");
        }

        foreach (var set in fluid.AlphaParameters)
        {
            string key = $"{Models.CubicModel.AlphaKeyStem(set.Form)}_{(set.Model == Models.CubicModelKind.SoaveRedlichKwong ? "srk" : "pr")}";
            Line(text, key, $"{string.Join(' ', set.Values.Select(Number))} | {set.Source}");
            if (set.Covariance is { } cov)
            {
                var upper = new List<string>();
                for (int i = 0; i < set.Values.Count; i++)
                {
                    for (int j = i; j < set.Values.Count; j++)
                    {
                        upper.Add(Number(cov[i, j]));
                    }
                }

                Line(text, key + "_covariance", $"{string.Join(' ', upper)} | {set.Source}");
            }

            if (set.CriticalSensitivity is { } d)
            {
                var column = Enumerable.Range(0, set.Values.Count);
                string values = string.Join(' ', column.Select(j => Number(d[j, 0])).Concat(column.Select(j => Number(d[j, 1]))));
                Line(text, key + "_critical_sensitivity", $"{values} | how the tuned parameters move with Tc (1/K) and Pc (1/Pa) at the same data; {set.Source}");
            }
        }

        if (fluid.PreferredAlpha != Models.AlphaForm.Default)
        {
            Line(text, "alpha_default", fluid.PreferredAlpha == Models.AlphaForm.MathiasCopeman ? "mathias-copeman" : fluid.PreferredAlpha.ToString().ToLowerInvariant());
        }

        Optional(text, "provenance", fluid.Provenance);
        Optional(text, "remarks", fluid.Remarks);
        return text.ToString();
    }

    private static void Quantity(StringBuilder text, string key, SourcedValue value, string? unit)
    {
        string u = unit is null ? "" : $" {unit}";
        string sigma = value.StandardUncertainty is double s ? $" ± {Number(s)}" : "";
        Line(text, key, $"{Number(value.Value)}{u}{sigma} | {value.Source}");
    }

    /// <summary>The triple-point pressure, fusion data and published solid lines, as read.</summary>
    private static void WriteSolidData(StringBuilder text, Fluid fluid)
    {
        if (fluid.TriplePointPressure is { } pt)
        {
            Quantity(text, "triple_point_pressure", pt, "Pa");
        }

        if (fluid.EnthalpyOfFusion is { } fusion)
        {
            Quantity(text, "enthalpy_of_fusion", fusion, "J/mol");
        }

        if (fluid.SolidDensity is { } solid && fluid.TriplePointLiquidDensity is { } liquid)
        {
            Quantity(text, "solid_density", solid, "mol/m3");
            Quantity(text, "triple_point_liquid_density", liquid, "mol/m3");
        }
        else if (fluid.FusionVolumeChange is { } dv)
        {
            Quantity(text, "fusion_volume_change", dv, "m3/mol");
        }

        if (fluid.SolidHeatCapacity is { } cs)
        {
            Quantity(text, "solid_heat_capacity", cs, "J/(mol·K)");
        }

        foreach (var (key, equation) in new[] { ("melting_pressure_equation", fluid.MeltingPressureEquation), ("sublimation_pressure_equation", fluid.SublimationPressureEquation) })
        {
            if (equation is null)
            {
                continue;
            }

            string terms = string.Join(' ', equation.Coefficients.Select((a, i) => $"{Number(a)}^{Number(equation.Exponents[i])}"));
            string form = equation.Form == SolidLineForm.Powers ? "powers" : "excess";
            Line(text, key, $"reduce {Number(equation.ReducingTemperature)} K {Number(equation.ReducingPressure)} Pa form {form} terms {terms} range {Number(equation.LowestTemperature)}-{Number(equation.HighestTemperature)} K | {equation.Source}");
        }
    }

    private static void Optional(StringBuilder text, string key, string? value)
    {
        if (!string.IsNullOrWhiteSpace(value))
        {
            Line(text, key, value);
        }
    }

    private static void Line(StringBuilder text, string key, string value)
        => text.Append(key.PadRight(25)).Append(' ').Append(value).Append('\n');

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
