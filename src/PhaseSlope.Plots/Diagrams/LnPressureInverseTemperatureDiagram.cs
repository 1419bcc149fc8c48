using OxyPlot;
using OxyPlot.Axes;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>lnp-invt: ln P against 1000/T (or ln(P/Pc) against Tc/T), where the
/// Clausius–Clapeyron approximation is a straight line of slope −Δh/R.</summary>
public static class LnPressureInverseTemperatureDiagram
{
    /// <summary>Builds the diagram from each fluid's traced coexistence curve.</summary>
    public static PlotModel Build(IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var model = HouseStyle.NewModel($"Vapour pressure of {Chart.Names(fluids)} against inverse temperature — {Chart.Models(fluids)}");
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Bottom, "inverse reduced temperature Tc/T", null)
            : HouseStyle.Linear(AxisPosition.Bottom, "inverse temperature 1000/T", "1/K"));
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Left, "ln(Psat/Pc)", null)
            : HouseStyle.Linear(AxisPosition.Left, $"ln(Psat/{units.PressureUnit})", null));

        DataPoint Map(double t, double p, double tc, double pc)
            => options.Reduced ? new(tc / t, Math.Log(p / pc)) : new(1000 / t, Math.Log(units.Pressure(p)));

        var criticals = new List<DataPoint>();
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            var curve = Chart.Curve(fluid, options.Points);
            double tc = fluid.Model.CriticalTemperature;
            double pc = fluid.Model.CriticalPressure;
            model.Series.Add(Chart.Line(fluid.Name, HouseStyle.Colour(i), curve.Select(c => Map(c.Temperature, c.Pressure, tc, pc))));
            criticals.Add(Map(curve[^1].Temperature, curve[^1].Pressure, tc, pc));
        }

        model.Series.Add(Chart.Critical(criticals));

        if (options.Data is { Count: > 0 } data)
        {
            double tc = fluids[0].Model.CriticalTemperature;
            double pc = fluids[0].Model.CriticalPressure;
            model.Series.Add(Chart.Measured($"measured ({options.DataLabel})", data.Select(d => Map(d.Temperature, d.Pressure, tc, pc))));
        }

        return model;
    }
}
