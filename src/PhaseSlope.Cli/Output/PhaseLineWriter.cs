using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Solids;

namespace PhaseSlope.Cli.Output;

/// <summary>A solid line (sublimation or melting) as <c>curve --line</c> computed it: its points,
/// how they were obtained, the sourced triple point and the model's check against it.</summary>
/// <param name="Fluid">The fluid.</param>
/// <param name="Model">The model that gave the vapour volumes and the triple-point check.</param>
/// <param name="Line">Sublimation or melting.</param>
/// <param name="Lines">The fluid's solid lines (method texts, triple point).</param>
/// <param name="Check">The model's vapour pressure at the triple point against the sourced one, or
/// null when the model cannot give it (<paramref name="CheckUnavailableReason"/>).</param>
/// <param name="CheckUnavailableReason">Why <paramref name="Check"/> is null, else null.</param>
/// <param name="Points">The line's points, by increasing temperature.</param>
internal sealed record PhaseLineTable(Fluid Fluid, IResidualModel Model, PhaseLineKind Line, SolidPhaseLines Lines, TriplePointCheck? Check, string? CheckUnavailableReason,
    IReadOnlyList<PhaseLinePoint> Points)
{
    /// <summary>"sublimation" or "melting", as <c>--line</c> takes it.</summary>
    public string LineName => Line == PhaseLineKind.Sublimation ? "sublimation" : "melting";

    /// <summary>How the line is computed (the core's own text).</summary>
    public string Method => Line == PhaseLineKind.Sublimation ? Lines.SublimationMethod : Lines.MeltingMethod;
}

/// <summary>Renders a solid line for <c>curve --line sublimation|melting</c> as a table, JSON or
/// CSV (one row per point: the line's name and the point's JSON members, flattened).</summary>
internal static class PhaseLineWriter
{
    /// <summary>Renders the line in a format; tables and CSV in the unit system, JSON in SI.</summary>
    public static string Render(PhaseLineTable table, OutputFormat format, UnitSystem units) => format switch
    {
        OutputFormat.Json => Json(table),
        OutputFormat.Csv => Csv(table, units),
        _ => Table(table, units),
    };

    /// <summary>Why the transition's enthalpy change is missing from the rows, or null when it is given.</summary>
    internal static string? EnthalpyUnavailableReason(PhaseLineTable table)
        => table.Points.Any(p => p.EnthalpyChange is null)
            ? table.Fluid.FusionVolumeChange is null
                ? $"fluid '{table.Fluid.Name}' gives no fusion_volume_change (or solid_density with triple_point_liquid_density), from which dh = T dv dP/dT along the published melting equation is formed"
                : BandReason
            : null;

    /// <summary>Why the transition's volume change is missing from the rows, or null when it is given.</summary>
    internal static string? VolumeUnavailableReason(PhaseLineTable table)
        => table.Points.Any(p => p.VolumeChange is null)
            ? table.Fluid.FusionVolumeChange is null
                ? $"fluid '{table.Fluid.Name}' gives no fusion_volume_change (or solid_density with triple_point_liquid_density)"
                : BandReason
            : null;

    /// <summary>Why a published melting line gives no Δh and Δv far above the triple point.</summary>
    private static string BandReason => string.Create(CultureInfo.InvariantCulture,
        $"dh and dv are given only within {SolidPhaseLines.MeltingVolumeBand / 1e6:G3} MPa of the triple-point pressure, where the triple-point dv_fus still holds (it changes by about 10 % per 10 MPa)");

    /// <summary>What a reader must know to use the numbers: how far the approximations behind the
    /// enthalpy and volume columns hold.</summary>
    internal static IReadOnlyList<string> Notes(PhaseLineTable table)
    {
        var fluid = table.Fluid;
        var notes = new List<string>();
        if (table.Line == PhaseLineKind.Melting)
        {
            if (fluid.MeltingPressureEquation is not null)
            {
                notes.Add(fluid.FusionVolumeChange is not null
                    ? "pressure and slope from the published melting equation; dv is held at its triple-point value and dh = T dv dP/dT is formed from it, "
                        + "a triple-point approximation that is rough far from the triple point, so both are given only within "
                        + string.Create(CultureInfo.InvariantCulture, $"{SolidPhaseLines.MeltingVolumeBand / 1e6:G3} MPa of it")
                    : "pressure and slope from the published melting equation; dh and dv are not given (no volume change on melting in the fluid file)");
            }
            else
            {
                notes.Add("dh_fus and dv_fus are held at their triple-point values, so P = Pt + (dh_fus/dv_fus) ln(T/Tt): a triple-point extrapolation, "
                    + "rough far from the triple point (beyond tens of MPa)");
            }
        }
        else if (fluid.SublimationPressureEquation is not null)
        {
            notes.Add(table.Lines.SolidVolume is null
                ? "pressure and slope from the published sublimation equation; dv is the model's vapour volume (the solid's neglected: no solid_density) and dh = T dv dP/dT"
                : "pressure and slope from the published sublimation equation; dv is the model's vapour volume less the solid's (solid_density) and dh = T dv dP/dT");
        }
        else
        {
            notes.Add("the vapour volume is the model's vapour root (not the ideal gas); the line is the Clapeyron equation integrated from the sourced triple point, "
                + "so it is only as good as dh_sub and the model's vapour volume");
            if (table.Lines.VaporizationEnthalpy.Method.StartsWith("the model's", StringComparison.Ordinal))
            {
                notes.Add("dh_vap at the triple point comes from the model's own coexistence (the fluid file gives no vapour_pressure_equation usable there); "
                    + "an error in it enters dh_sub in full, and the line's pressure far below the triple point by exp(error in dh_sub/R (1/T - 1/Tt))");
            }
        }

        if (table.Check is { } check)
        {
            notes.Add(string.Create(CultureInfo.InvariantCulture,
                $"the model's vapour pressure at the triple point differs from the sourced triple-point pressure by {NumberText.Table(100 * check.RelativeDeviation)} %"));
        }

        return notes;
    }

    private static string Json(PhaseLineTable table) => JsonText.Write(json =>
    {
        var fluid = table.Fluid;
        json.WriteStartObject();
        json.WriteString("fluid", fluid.Name);
        ModelText.WriteJson(json, table.Model.Identity);
        json.WriteNumberOrNull("molar_mass_kg_mol", fluid.MolarMass?.Value);
        json.WriteString("line", table.LineName);
        json.WriteString("method", table.Method);
        WriteTriplePoint(json, table);
        json.WriteStringOrNull("enthalpy_change_unavailable_reason", EnthalpyUnavailableReason(table));
        json.WriteStringOrNull("volume_change_unavailable_reason", VolumeUnavailableReason(table));
        json.WriteStartArray("points");
        foreach (var point in table.Points)
        {
            WritePoint(json, point);
        }

        json.WriteEndArray();
        json.WriteStartArray("notes");
        foreach (string note in Notes(table))
        {
            json.WriteStringValue(note);
        }

        json.WriteEndArray();
        json.WriteString("caution", CoexistenceWriter.Caution);
        json.WriteEndObject();
    });

    /// <summary>The sourced triple point with its sources, and the model's check against it.</summary>
    private static void WriteTriplePoint(Utf8JsonWriter json, PhaseLineTable table)
    {
        var fluid = table.Fluid;
        json.WriteStartObject("triple_point");
        json.WriteFinite("temperature_K", table.Lines.TriplePointTemperature);
        json.WriteFinite("pressure_Pa", table.Lines.TriplePointPressure);
        json.WriteString("temperature_source", fluid.TriplePointTemperature!.Source);
        json.WriteString("pressure_source", fluid.TriplePointPressure!.Source);
        json.WriteEndObject();
        FluidWriter.WriteTriplePointCheck(json, table.Check, table.CheckUnavailableReason, ModelText.Describe(table.Model));
    }

    /// <summary>One point of the line: the keys the CSV flattens into a row.</summary>
    private static void WritePoint(Utf8JsonWriter json, PhaseLinePoint point)
    {
        json.WriteStartObject();
        json.WriteFinite("temperature_K", point.Temperature);
        json.WriteFinite("pressure_Pa", point.Pressure);
        json.WriteFinite("slope_Pa_K", point.Slope);
        json.WriteNumberOrNull("enthalpy_change_J_mol", point.EnthalpyChange);
        json.WriteNumberOrNull("volume_change_m3_mol", point.VolumeChange);
        json.WriteEndObject();
    }

    private static string Csv(PhaseLineTable table, UnitSystem units)
    {
        var flattener = new JsonFlattener();
        var line = new FlatField("line", [], JsonValueKind.String, table.LineName);
        var rows = table.Points.Select(point => (IReadOnlyList<FlatField>)[line, .. flattener.Flatten(json => WritePoint(json, point))]).ToArray();
        return FlatCsv.Write(rows, units, table.Fluid.MolarMass?.Value);
    }

    private static string Table(PhaseLineTable table, UnitSystem units)
    {
        var text = new StringBuilder();
        foreach (string line in HeaderLines(table, units))
        {
            text.AppendLine(line);
        }

        text.AppendLine();
        text.Append(Rows(table, units).Render());
        text.AppendLine();
        foreach (string line in FooterLines(table))
        {
            text.AppendLine(line);
        }

        text.AppendLine(CoexistenceWriter.Caution);
        return text.ToString();
    }

    /// <summary>The lines above the table: the line's name and size, its method, the sourced triple
    /// point and the model's check against it.</summary>
    internal static IReadOnlyList<string> HeaderLines(PhaseLineTable table, UnitSystem units)
    {
        var fluid = table.Fluid;
        string name = table.Line == PhaseLineKind.Sublimation ? "Sublimation line" : "Melting line";
        return
        [
            $"{name} of {fluid.Name}; {table.Points.Count} point{(table.Points.Count == 1 ? "" : "s")}",
            $"method: {table.Method}",
            $"triple point: {Show(DisplayQuantity.Temperature, table.Lines.TriplePointTemperature, table, units)} {UnitFormatter.Label(DisplayQuantity.Temperature, units)} ({fluid.TriplePointTemperature!.Source}), "
                + $"{Show(DisplayQuantity.Pressure, table.Lines.TriplePointPressure, table, units)} {UnitFormatter.Label(DisplayQuantity.Pressure, units)} ({fluid.TriplePointPressure!.Source})",
            table.Check is { } check
                ? $"model check ({ModelText.Describe(table.Model)}): vapour pressure at the triple point {Show(DisplayQuantity.Pressure, check.ModelPressure, table, units)} {UnitFormatter.Label(DisplayQuantity.Pressure, units)}, "
                    + $"{NumberText.Table(100 * check.RelativeDeviation)} % from the sourced value"
                : $"model check ({ModelText.Describe(table.Model)}): not available ({table.CheckUnavailableReason})",
        ];
    }

    /// <summary>The table of the line's points in the unit system (a missing Δh or Δv "not given").</summary>
    internal static TextTable Rows(PhaseLineTable table, UnitSystem units)
    {
        string Label(DisplayQuantity q) => UnitFormatter.Label(q, units);
        string ShowOrNot(DisplayQuantity q, double? si) => si is double v ? Show(q, v, table, units) : "not given";
        string change = table.Line == PhaseLineKind.Sublimation ? "sub" : "fus";
        string[] headers =
        [
            $"T [{Label(DisplayQuantity.Temperature)}]", $"P [{Label(DisplayQuantity.Pressure)}]", $"dP/dT [{Label(DisplayQuantity.Slope)}]",
            $"dh_{change} [{Label(DisplayQuantity.MolarEnergy)}]", $"dv_{change} [{Label(DisplayQuantity.MolarVolume)}]",
        ];
        var rows = new TextTable(headers, [true, true, true, true, true]);
        foreach (var point in table.Points)
        {
            rows.Add(Show(DisplayQuantity.Temperature, point.Temperature, table, units), Show(DisplayQuantity.Pressure, point.Pressure, table, units), Show(DisplayQuantity.Slope, point.Slope, table, units),
                ShowOrNot(DisplayQuantity.MolarEnergy, point.EnthalpyChange), ShowOrNot(DisplayQuantity.MolarVolume, point.VolumeChange));
        }

        return rows;
    }

    /// <summary>The lines under the table: why Δh and Δv are missing where they are, then the notes.</summary>
    internal static IReadOnlyList<string> FooterLines(PhaseLineTable table)
    {
        var lines = new List<string>();
        if (VolumeUnavailableReason(table) is { } reason)
        {
            // Without dv neither column can be formed (dh = T dv dP/dT along a published equation).
            lines.Add($"dh and dv not given: {reason}");
        }

        lines.AddRange(Notes(table).Select(note => $"note: {note}"));
        return lines;
    }

    /// <summary>A value in the unit system (SI tables do not use the molar mass; engineering units
    /// were refused without it).</summary>
    private static string Show(DisplayQuantity quantity, double si, PhaseLineTable table, UnitSystem units)
        => NumberText.Table(UnitFormatter.Convert(quantity, si, units, table.Fluid.MolarMass?.Value ?? double.NaN));
}
