using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Output;

/// <summary>Renders a binary diagram for <c>binary</c>: table, JSON (the points and an
/// <c>azeotrope</c> object or null) or CSV (the JSON's points, flattened: one row per composition,
/// the azeotrope's row marked). Table and CSV follow --units (temperatures, pressures and slopes
/// only: nothing in them is per kilogram).</summary>
internal static class BinaryDiagramWriter
{
    /// <summary>The note that the diagram ignores MIXTURE's fractions.</summary>
    public const string FractionsNote = "the diagram spans every liquid composition: the fractions written in MIXTURE are not used";

    /// <summary>Renders in the request's format.</summary>
    public static string Render(BinaryRequest request, BinaryDiagram diagram) => request.Output.Format switch
    {
        OutputFormat.Json => JsonText.WriteLine(json => Json(json, request, diagram)),
        OutputFormat.Csv => FlatCsv.Write(diagram.Points.Select(p => new JsonFlattener().Flatten(json => Row(json, p, diagram.Azeotrope))), request.Output.Units, molarMass: null),
        _ => Table(request, diagram),
    };

    private static string First(BinaryRequest request) => request.Input.Mixture.Components[0].Name;

    private static string Second(BinaryRequest request) => request.Input.Mixture.Components[1].Name;

    private static string Table(BinaryRequest request, BinaryDiagram diagram)
    {
        var text = new StringBuilder();
        var units = request.Output.Units;
        string tUnit = UnitFormatter.TemperatureLabel(units), pUnit = UnitFormatter.PressureLabel(units), slopeUnit = UnitFormatter.SlopeLabel(units);
        string T(double kelvin) => NumberText.Table(UnitFormatter.Temperature(kelvin, units));
        string P(double pascal) => NumberText.Table(UnitFormatter.Pressure(pascal, units));
        string Slope(double paPerK) => NumberText.Table(UnitFormatter.Slope(paPerK, units));
        var pair = request.Input.Interactions.Pairs[0];
        text.Append(CultureInfo.InvariantCulture, $"binary: {First(request)} (1) + {Second(request)} (2), {request.Input.Model.Kind.Title()}, van der Waals one-fluid mixing\n");
        text.Append(CultureInfo.InvariantCulture, $"k_ij = {NumberText.Table(pair.Value)} ({MixtureWriter.OriginName(pair.Origin).Replace('_', ' ')}: {pair.Source})\n");
        bool isothermal = diagram.Kind == BinaryDiagramKind.Isothermal;
        text.Append(isothermal
            ? string.Create(CultureInfo.InvariantCulture, $"P-x-y at T = {T(diagram.Temperature!.Value)} {tUnit}\n\n")
            : string.Create(CultureInfo.InvariantCulture, $"T-x-y at P = {P(diagram.Pressure!.Value)} {pUnit}\n\n"));
        var table = new TextTable(["x1", "y1", isothermal ? $"P ({pUnit})" : $"T ({tUnit})", $"dP/dT at x ({slopeUnit})", ""], [true, true, true, true, false]);
        foreach (var point in diagram.Points)
        {
            table.Add(
                NumberText.Table(point.LiquidFraction),
                NumberText.Table(point.VapourFraction),
                isothermal ? P(point.Pressure) : T(point.Temperature),
                Slope(BinaryDiagramWriter.Slope(point)),
                ReferenceEquals(point.Point, diagram.Azeotrope?.Point) ? "azeotrope" : "");
        }

        text.Append(table.Render());
        text.Append('\n');
        if (diagram.Azeotrope is { } a)
        {
            text.Append(CultureInfo.InvariantCulture,
                $"azeotrope ({KindText(a.Kind)}): x1 = y1 = {NumberText.Table(a.MoleFraction)}, T = {T(a.Temperature)} {tUnit}, P = {P(a.Pressure)} {pUnit}, "
                + $"dP/dT of its line = {Slope(a.Clapeyron.Slope)} {slopeUnit}\n");
        }
        else
        {
            text.Append("azeotrope: none (y1 - x1 keeps its sign over 0 < x1 < 1)\n");
        }

        foreach (string note in Notes(request))
        {
            text.Append(CultureInfo.InvariantCulture, $"note: {note}\n");
        }

        return text.ToString();
    }

    private static void Json(Utf8JsonWriter json, BinaryRequest request, BinaryDiagram diagram)
    {
        var pair = request.Input.Interactions.Pairs[0];
        json.WriteStartObject();
        json.WriteStartArray("components");
        json.WriteStringValue(First(request));
        json.WriteStringValue(Second(request));
        json.WriteEndArray();
        json.WriteString("eos", request.Input.Model.Kind.Id());
        json.WriteString("model", $"{request.Input.Model.Kind.Title()}, van der Waals one-fluid mixing");
        json.WriteFinite("kij", pair.Value);
        json.WriteString("kij_origin", MixtureWriter.OriginName(pair.Origin));
        json.WriteString("kij_source", pair.Source);
        json.WriteString("diagram", diagram.Kind == BinaryDiagramKind.Isothermal ? "p-xy" : "t-xy");
        json.WriteNumberOrNull("temperature_K", diagram.Temperature);
        json.WriteNumberOrNull("pressure_Pa", diagram.Pressure);
        json.WriteStartArray("points");
        foreach (var point in diagram.Points)
        {
            json.WriteStartObject();
            Fields(json, point, diagram.Azeotrope);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        if (diagram.Azeotrope is { } a)
        {
            json.WriteStartObject("azeotrope");
            json.WriteString("kind", a.Kind == AzeotropeKind.MaximumPressure ? "maximum_pressure" : "minimum_pressure");
            json.WriteFinite("x1", a.MoleFraction);
            json.WriteFinite("temperature_K", a.Temperature);
            json.WriteFinite("pressure_Pa", a.Pressure);
            json.WriteFinite("slope_Pa_K", a.Clapeyron.Slope);
            json.WriteFinite("enthalpy_of_vaporization_J_mol", a.Clapeyron.EnthalpyDifference);
            json.WriteFinite("volume_change_m3_mol", a.Clapeyron.VolumeDifference);
            json.WriteNumber("root_iterations", a.RootIterations);
            json.WriteEndObject();
        }
        else
        {
            json.WriteNull("azeotrope");
        }

        json.WriteNumber("model_evaluations", diagram.ModelEvaluations);
        json.WriteStartArray("notes");
        foreach (string note in Notes(request))
        {
            json.WriteStringValue(note);
        }

        json.WriteEndArray();
        json.WriteEndObject();
    }

    private static void Row(Utf8JsonWriter json, BinaryDiagramPoint point, Azeotrope? azeotrope)
    {
        json.WriteStartObject();
        Fields(json, point, azeotrope);
        json.WriteEndObject();
    }

    private static void Fields(Utf8JsonWriter json, BinaryDiagramPoint point, Azeotrope? azeotrope)
    {
        json.WriteFinite("x1", point.LiquidFraction);
        json.WriteFinite("y1", point.VapourFraction);
        json.WriteFinite("temperature_K", point.Temperature);
        json.WriteFinite("pressure_Pa", point.Pressure);
        json.WriteFinite("bubble_slope_Pa_K", Slope(point));
        json.WriteBoolean("azeotrope", ReferenceEquals(point.Point, azeotrope?.Point));
    }

    /// <summary>dP/dT of the bubble line at the point's liquid composition (generalized Clapeyron).</summary>
    private static double Slope(BinaryDiagramPoint point) => point.BubbleSlope;

    private static string KindText(AzeotropeKind kind) => kind == AzeotropeKind.MaximumPressure
        ? "maximum pressure, minimum-boiling"
        : "minimum pressure, maximum-boiling";

    private static IEnumerable<string> Notes(BinaryRequest request)
    {
        yield return FractionsNote;
        if (request.Input.Interactions.AnyAssumedZero)
        {
            yield return MixtureWriter.AssumedZeroNote;
        }

        yield return "a cubic with van der Waals mixing and one k_ij represents non-polar pairs well; for polar or hydrogen-bonding pairs (alcohol-water) "
            + "it can miss or misplace an azeotrope: fit k_ij to data (fit-kij) and check against measurements";
    }
}
