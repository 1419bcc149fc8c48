using System.Globalization;
using System.Text;
using PhaseSlope.Cli.Commands;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Output;

/// <summary>The report of <c>fit-kij</c>: k_ij, its standard error, the deviations, and each point
/// against the model (table or JSON).</summary>
internal static class FitKijWriter
{
    /// <summary>The note on the weights.</summary>
    public static readonly string WeightsNote =
        FormattableString.Invariant($"weighted least squares: bubble-pressure residuals relative to P with sigma {InteractionFit.DefaultPressureUncertainty * 100:0.#} %, y1 residuals with sigma {InteractionFit.DefaultVapourUncertainty} (common practice); ")
        + "the standard error is linearised from the Jacobian in k_ij";

    /// <summary>Renders the report.</summary>
    public static string Render(FitKijRequest request, InteractionFitResult result, string source)
        => request.Format == OutputFormat.Json ? Json(request, result, source) : Table(request, result, source);

    private static string Table(FitKijRequest request, InteractionFitResult result, string source)
    {
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"k_ij of {request.Components[0].Name} (1) + {request.Components[1].Name} (2), {request.Model.Kind.Title()}, van der Waals one-fluid mixing\n");
        text.Append(CultureInfo.InvariantCulture, $"k_ij = {NumberText.Table(result.Kij)} +/- {NumberText.Uncertainty(result.StandardError)} (standard error)\n");
        text.Append(CultureInfo.InvariantCulture, $"AAD(P) = {NumberText.Table(result.PressureDeviation * 100)} %");
        text.Append(result.VapourDeviation is double y ? string.Create(CultureInfo.InvariantCulture, $", AAD(y1) = {NumberText.Table(y)}\n") : ", y1 not measured\n");
        text.Append(CultureInfo.InvariantCulture, $"source written: {source}\n\n");
        var table = new TextTable(["T (K)", "P data (kPa)", "P model (kPa)", "dev (%)", "x1", "y1 data", "y1 model"], [true, true, true, true, true, true, true]);
        foreach (var point in result.Points)
        {
            table.Add(
                NumberText.Table(point.Data.Temperature),
                NumberText.Table(point.Data.Pressure / 1e3),
                NumberText.Table(point.Pressure / 1e3),
                NumberText.Table(point.RelativePressureDeviation * 100),
                NumberText.Table(point.Data.LiquidFraction),
                point.Data.VapourFraction is double yd ? NumberText.Table(yd) : "-",
                NumberText.Table(point.VapourFraction));
        }

        text.Append(table.Render());
        text.Append(CultureInfo.InvariantCulture, $"\nnote: {WeightsNote}\n");
        return text.ToString();
    }

    private static string Json(FitKijRequest request, InteractionFitResult result, string source) => JsonText.WriteLine(json =>
    {
        json.WriteStartObject();
        json.WriteStartArray("components");
        json.WriteStringValue(request.Components[0].Name);
        json.WriteStringValue(request.Components[1].Name);
        json.WriteEndArray();
        json.WriteString("eos", request.Model.Kind.Id());
        json.WriteFinite("kij", result.Kij);
        json.WriteFinite("kij_standard_error", result.StandardError);
        json.WriteFinite("pressure_aad_relative", result.PressureDeviation);
        json.WriteNumberOrNull("y1_aad", result.VapourDeviation);
        json.WriteFinite("weighted_sum_of_squares", result.WeightedSumOfSquares);
        json.WriteNumber("residuals", result.Residuals);
        json.WriteNumber("objective_evaluations", result.ObjectiveEvaluations);
        json.WriteString("data_file", request.DataPath);
        json.WriteString("data_sha256", request.Checksum);
        json.WriteString("source", source);
        json.WriteString("mixture_file", request.OutPath);
        json.WriteStartArray("points");
        foreach (var point in result.Points)
        {
            json.WriteStartObject();
            json.WriteFinite("temperature_K", point.Data.Temperature);
            json.WriteFinite("pressure_Pa", point.Data.Pressure);
            json.WriteFinite("model_pressure_Pa", point.Pressure);
            json.WriteFinite("x1", point.Data.LiquidFraction);
            json.WriteNumberOrNull("y1", point.Data.VapourFraction);
            json.WriteFinite("model_y1", point.VapourFraction);
            json.WriteEndObject();
        }

        json.WriteEndArray();
        json.WriteStartArray("notes");
        json.WriteStringValue(WeightsNote);
        json.WriteEndArray();
        json.WriteEndObject();
    });
}
