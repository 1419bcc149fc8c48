using OxyPlot;
using OxyPlot.Axes;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>p-t: the saturation pressure against temperature of each fluid up to its critical
/// point, optionally on a logarithmic pressure axis, in reduced coordinates, or with measured
/// vapour pressures overlaid.</summary>
public static class PressureTemperatureDiagram
{
    /// <summary>Builds the diagram from each fluid's traced coexistence curve.</summary>
    public static PlotModel Build(IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var model = HouseStyle.NewModel($"Saturation pressure of {Chart.Names(fluids)} ({Chart.Models(fluids)})");
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Bottom, "reduced temperature T/Tc", null)
            : HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        string pTitle = options.Reduced ? "reduced pressure P/Pc" : "saturation pressure Psat";
        string? pUnit = options.Reduced ? null : units.PressureUnit;
        model.Axes.Add(options.Logarithmic
            ? HouseStyle.Logarithmic(AxisPosition.Left, pTitle, pUnit)
            : HouseStyle.Linear(AxisPosition.Left, pTitle, pUnit));

        var criticals = new List<DataPoint>();
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            var curve = Chart.Curve(fluid, options.Points);
            double tc = fluid.Model.CriticalTemperature;
            double pc = fluid.Model.CriticalPressure;
            DataPoint Map(double t, double p) => options.Reduced ? new(t / tc, p / pc) : new(units.Temperature(t), units.Pressure(p));
            model.Series.Add(Chart.Line(fluid.Name, HouseStyle.Colour(i), curve.Select(c => Map(c.Temperature, c.Pressure))));
            var critical = curve[^1];
            criticals.Add(Map(critical.Temperature, critical.Pressure));
        }

        model.Series.Add(Chart.Critical(criticals));

        if (options.Data is { Count: > 0 } data)
        {
            double tc = fluids[0].Model.CriticalTemperature;
            double pc = fluids[0].Model.CriticalPressure;
            model.Series.Add(Chart.Measured($"measured ({options.DataLabel})", data.Select(d => options.Reduced
                ? new DataPoint(d.Temperature / tc, d.Pressure / pc)
                : new DataPoint(units.Temperature(d.Temperature), units.Pressure(d.Pressure)))));
        }

        return model;
    }
}
