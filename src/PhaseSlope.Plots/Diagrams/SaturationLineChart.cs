using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>A quantity of the saturation line against temperature for several fluids, ending at
/// each critical point, in SI/engineering units or reduced by the model's Tc and Pc; the shared
/// body of the p-t and slope diagrams.</summary>
internal static class SaturationLineChart
{
    /// <summary>Builds the chart.</summary>
    /// <param name="fluids">The fluids, one line each.</param>
    /// <param name="options">Units, reduced coordinates, log axis, points per curve.</param>
    /// <param name="title">Figure title.</param>
    /// <param name="valueTitle">Title of the value axis (absolute, reduced).</param>
    /// <param name="valueUnit">Unit label of the value axis in absolute coordinates.</param>
    /// <param name="value">The SI value of a coexistence point (Pa for Psat, Pa/K for the slope).</param>
    /// <param name="reduce">SI value → reduced value, given Tc and Pc.</param>
    /// <param name="display">SI value → display value in the chosen units.</param>
    public static PlotModel Build(
        IReadOnlyList<PlotFluid> fluids, DiagramOptions options, string title,
        (string Absolute, string Reduced) valueTitle, string valueUnit,
        Func<CoexistencePoint, double> value, Func<double, double, double, double> reduce, Func<double, double> display)
    {
        var units = new UnitScale(options.Units);
        var model = HouseStyle.NewModel(title);
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Bottom, "reduced temperature T/Tc", null)
            : HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        string axisTitle = options.Reduced ? valueTitle.Reduced : valueTitle.Absolute;
        string? unit = options.Reduced ? null : valueUnit;
        model.Axes.Add(options.Logarithmic
            ? HouseStyle.Logarithmic(AxisPosition.Left, axisTitle, unit)
            : HouseStyle.Linear(AxisPosition.Left, axisTitle, unit));

        var criticals = new List<DataPoint>();
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            var curve = Chart.Curve(fluid, options.Points);
            double tc = fluid.Model.CriticalTemperature;
            double pc = fluid.Model.CriticalPressure;
            DataPoint Map(CoexistencePoint c)
                => options.Reduced ? new(c.Temperature / tc, reduce(value(c), tc, pc)) : new(units.Temperature(c.Temperature), display(value(c)));
            model.Series.Add(Chart.Line(fluid.Name, HouseStyle.Colour(i), curve.Select(Map)));
            criticals.Add(Map(curve[^1]));
        }

        model.Series.Add(Chart.Critical(criticals));
        return model;
    }
}
