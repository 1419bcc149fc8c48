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
        if (sorted.All(d => d.StandardUncertainty is not null))
        {
            // ±u(P)/P of the data: a model that describes them leaves about two thirds of the points inside.
            var band = new AreaSeries { Title = "data uncertainty (1 u)", Color = OxyColors.Transparent, Color2 = OxyColors.Transparent, Fill = OxyColor.FromRgb(0xE3, 0xE3, 0xE3), StrokeThickness = 0 };
            foreach (var d in sorted)
            {
                double u = 100 * d.StandardUncertainty!.Value / d.Pressure;
                band.Points.Add(new DataPoint(units.Temperature(d.Temperature), u));
                band.Points2.Add(new DataPoint(units.Temperature(d.Temperature), -u));
            }

            model.Series.Add(band);
        }

        model.Series.Add(Chart.Line(null, HouseStyle.Ink, [new DataPoint(units.Temperature(sorted[0].Temperature), 0), new DataPoint(units.Temperature(sorted[^1].Temperature), 0)], 1));
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
