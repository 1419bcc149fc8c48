using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>deviations: 100·(Psat_model − P_data)/P_data at each measured temperature for each
/// fluid's model, with the data's stated relative uncertainties as a band around zero: the
/// figure that shows how well a model (say, one fluid before and after tuning) describes the
/// user's measurements.</summary>
public static class DeviationsDiagram
{
    /// <summary>Builds the diagram.</summary>
    public static PlotModel Build(IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        var data = options.Data ?? throw new ArgumentException("the deviations diagram needs data", nameof(options));
        var units = new UnitScale(options.Units);
        var sorted = data.OrderBy(d => d.Temperature).ToArray();
        var model = HouseStyle.NewModel($"Vapour pressure of the model{(fluids.Count > 1 ? "s" : "")} against {options.DataLabel}");
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Left, "deviation 100 (P_model - P_data)/P_data", "%"));
        Chart.AddDeviationBaseline(model, sorted, units);
        MarkerType[] markers = [MarkerType.Circle, MarkerType.Square, MarkerType.Triangle, MarkerType.Diamond];
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            // Each point solved from its neighbour (a traced sweep over the data temperatures).
            var points = CoexistenceCurve.Through(fluid.Solver(), [.. sorted.Select(d => d.Temperature)]);
            double[] deviations = [.. sorted.Select((d, k) => 100 * (points[k].Pressure / d.Pressure - 1))];
            double aad = deviations.Average(Math.Abs);
            var line = Chart.Line($"{fluid.Name} (AAD {Chart.Number(aad)} %)", HouseStyle.Colour(i),
                [.. sorted.Select((d, k) => new DataPoint(units.Temperature(d.Temperature), deviations[k]))], 1.5);
            line.MarkerType = markers[i % markers.Length];
            line.MarkerSize = 4;
            line.MarkerFill = HouseStyle.Colour(i);
            model.Series.Add(line);
        }

        return model;
    }
}
