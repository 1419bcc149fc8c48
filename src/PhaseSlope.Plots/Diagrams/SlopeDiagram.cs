using OxyPlot;
using OxyPlot.Axes;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>slope: the Clapeyron slope dPsat/dT = Δh/(TΔv) along the saturation line, ending at
/// the slope of the critical isochore.</summary>
public static class SlopeDiagram
{
    /// <summary>Builds the diagram from each fluid's traced coexistence curve.</summary>
    public static PlotModel Build(IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var model = HouseStyle.NewModel($"Clapeyron slope of {Chart.Names(fluids)} ({Chart.Models(fluids)})");
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Bottom, "reduced temperature T/Tc", null)
            : HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        string title = options.Reduced ? "reduced slope d(Psat/Pc)/d(T/Tc)" : "slope dPsat/dT";
        string? unit = options.Reduced ? null : units.SlopeUnit;
        model.Axes.Add(options.Logarithmic
            ? HouseStyle.Logarithmic(AxisPosition.Left, title, unit)
            : HouseStyle.Linear(AxisPosition.Left, title, unit));

        var criticals = new List<DataPoint>();
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            var curve = Chart.Curve(fluid, options.Points);
            double tc = fluid.Model.CriticalTemperature;
            double pc = fluid.Model.CriticalPressure;
            DataPoint Map(double t, double slope)
                => options.Reduced ? new(t / tc, slope * tc / pc) : new(units.Temperature(t), units.Pressure(slope));
            model.Series.Add(Chart.Line(fluid.Name, HouseStyle.Colour(i), curve.Select(c => Map(c.Temperature, c.Slope))));
            criticals.Add(Map(curve[^1].Temperature, curve[^1].Slope));
        }

        model.Series.Add(Chart.Critical(criticals));

        return model;
    }
}
