using System.Globalization;
using System.Text;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tuning;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders the before/after report of <c>tune</c>.</summary>
internal static class TuneWriter
{
    /// <summary>The caution printed under every tuning report.</summary>
    public const string Caution = "Caution: a model tuned to vapour pressures is checked only where the data are; outside their range, and for densities, "
        + "it is as uncertain as before. For pressure equipment and relief systems rely on measured data and your local codes.";

    /// <summary>The report text (table or JSON).</summary>
    public static string Report(TuningResult result, OutputFormat format, string fluidPath)
    {
        foreach (var c in result.Comparisons)
        {
            FiniteNumbers.Check(c.After, $"the tuned pressure at {NumberText.Table(c.Temperature)} K");
            FiniteNumbers.Check(c.LatentHeatAfter, $"the tuned latent heat at {NumberText.Table(c.Temperature)} K");
        }

        return format == OutputFormat.Json ? Json(result, fluidPath) : Table(result, fluidPath);
    }

    private static string What(TuningResult result)
        => result.Form == AlphaForm.Default ? "acentric factor" : $"{CubicModel.AlphaName(result.Form)} alpha function";

    private static string Table(TuningResult result, string fluidPath)
    {
        var text = new StringBuilder();
        text.AppendLine($"tuned fluid: {result.Tuned.Name} (written to {fluidPath})");
        text.AppendLine($"model: {result.Kind.Title()}, {What(result)}");
        text.AppendLine($"method: {result.Method}");
        text.AppendLine(string.Create(CultureInfo.InvariantCulture, $"vapour pressure: AAD {result.AadBeforePercent:0.####} % before, {result.AadAfterPercent:0.####} % after; maximum {result.MaximumBeforePercent:0.####} % before, {result.MaximumAfterPercent:0.####} % after"));
        text.AppendLine(string.Create(CultureInfo.InvariantCulture, $"enthalpy of vaporization over the data: changed by up to {result.MaximumLatentHeatChangePercent:0.###} %"));
        if (result.Form != AlphaForm.Default)
        {
            text.AppendLine(result.Convex ? "alpha: positive, decreasing and convex up to Tc" : "alpha: positive and decreasing up to Tc, but not convex everywhere (finding: non-convex alpha; second derivatives such as cv may be distorted)");
        }

        if (result.VolumeShift is { } shift)
        {
            text.AppendLine(string.Create(CultureInfo.InvariantCulture,
                $"volume translation: c = {NumberText.Table(shift.Shift * 1e6)} cm3/mol{(shift.StandardError is double e ? $" (standard error {NumberText.Uncertainty(e * 1e6)} cm3/mol)" : "")}, fitted to {shift.Comparisons.Count} liquid densities: AAD {shift.AadBeforePercent:0.###} % before, {shift.AadAfterPercent:0.###} % after (Psat and latent heats unchanged)"));
        }

        text.AppendLine();
        var parameters = new TextTable(["parameter", "value", "standard error"], [false, true, true]);
        foreach (var (name, value, error) in result.Parameters)
        {
            parameters.Add(name, NumberText.RoundTrip(value), error is double e ? NumberText.Uncertainty(e) : "-");
        }

        text.Append(parameters.Render());
        text.AppendLine();
        var points = new TextTable(["T [K]", "P measured [kPa]", "before [%]", "after [%]", "dH_vap change [%]"], [true, true, true, true, true]);
        foreach (var c in result.Comparisons)
        {
            points.Add(NumberText.Table(c.Temperature), NumberText.Table(c.Measured / 1e3), Fixed(c.DeviationBeforePercent), Fixed(c.DeviationAfterPercent), Fixed(c.LatentHeatChangePercent));
        }

        text.Append(points.Render());
        if (result.VolumeShift is { } fit)
        {
            text.AppendLine();
            var densities = new TextTable(["T [K]", "rho_L measured [mol/m3]", "before [%]", "after [%]"], [true, true, true, true]);
            foreach (var c in fit.Comparisons)
            {
                densities.Add(NumberText.Table(c.Temperature), NumberText.Table(c.Measured), Fixed(c.DeviationBeforePercent), Fixed(c.DeviationAfterPercent));
            }

            text.Append(densities.Render());
        }

        text.AppendLine(Caution);
        return text.ToString();
    }

    private static string Fixed(double percent) => percent.ToString("0.0000", CultureInfo.InvariantCulture);

    private static string Json(TuningResult result, string fluidPath) => JsonText.Write(json =>
    {
        json.WriteStartObject();
        json.WriteString("tuned_fluid", result.Tuned.Name);
        json.WriteString("fluid_file", fluidPath);
        json.WriteString("eos", result.Kind.Id());
        json.WriteString("tuned", result.Form == AlphaForm.Default ? "acentric_factor" : CubicModel.AlphaKeyStem(result.Form));
        json.WriteString("method", result.Method);
        json.WriteStartArray("parameters");
        foreach (var (name, value, error) in result.Parameters)
        {
            json.WriteStartObject();
            json.WriteString("name", name);
            json.WriteFinite("value", value);
            if (error is double e && double.IsFinite(e))
            {
                json.WriteFinite("standard_error", e);
            }
            else
            {
                json.WriteNull("standard_error");
            }

            json.WriteEndObject();
        }

        json.WriteEndArray();
        if (result.Fit is { CovarianceDefined: true } fit)
        {
            json.WriteFiniteMatrix("covariance", fit.Covariance);
        }
        else
        {
            json.WriteNull("covariance");
        }

        json.WriteBoolean("alpha_convex", result.Convex);
        json.WriteFinite("aad_before_percent", result.AadBeforePercent);
        json.WriteFinite("aad_after_percent", result.AadAfterPercent);
        json.WriteFinite("max_deviation_before_percent", result.MaximumBeforePercent);
        json.WriteFinite("max_deviation_after_percent", result.MaximumAfterPercent);
        json.WriteFinite("max_enthalpy_of_vaporization_change_percent", result.MaximumLatentHeatChangePercent);
        json.WriteStartArray("points");
        foreach (var c in result.Comparisons)
        {
            json.WriteStartObject();
            json.WriteFinite("temperature_K", c.Temperature);
            json.WriteFinite("pressure_Pa", c.Measured);
            json.WriteFinite("pressure_before_Pa", c.Before);
            json.WriteFinite("pressure_after_Pa", c.After);
            json.WriteFinite("deviation_before_percent", c.DeviationBeforePercent);
            json.WriteFinite("deviation_after_percent", c.DeviationAfterPercent);
            json.WriteFinite("enthalpy_of_vaporization_before_J_mol", c.LatentHeatBefore);
            json.WriteFinite("enthalpy_of_vaporization_after_J_mol", c.LatentHeatAfter);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        if (result.VolumeShift is { } shift)
        {
            json.WriteStartObject("volume_shift");
            json.WriteFinite("value_m3_mol", shift.Shift);
            if (shift.StandardError is double e)
            {
                json.WriteFinite("standard_error_m3_mol", e);
            }
            else
            {
                json.WriteNull("standard_error_m3_mol");
            }

            json.WriteFinite("liquid_density_aad_before_percent", shift.AadBeforePercent);
            json.WriteFinite("liquid_density_aad_after_percent", shift.AadAfterPercent);
            json.WriteStartArray("points");
            foreach (var c in shift.Comparisons)
            {
                json.WriteStartObject();
                json.WriteFinite("temperature_K", c.Temperature);
                json.WriteFinite("liquid_density_mol_m3", c.Measured);
                json.WriteFinite("liquid_density_before_mol_m3", c.Before);
                json.WriteFinite("liquid_density_after_mol_m3", c.After);
                json.WriteEndObject();
            }

            json.WriteEndArray();
            json.WriteEndObject();
        }
        else
        {
            json.WriteNull("volume_shift");
        }

        json.WriteString("caution", Caution);
        json.WriteEndObject();
    });
}
