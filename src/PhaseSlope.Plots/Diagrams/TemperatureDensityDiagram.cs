using OxyPlot;
using OxyPlot.Axes;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>t-rho: the coexistence dome in temperature–density (vapour branch rising to the
/// critical point, liquid branch falling from it) with the rectilinear diameter (ρL + ρV)/2.</summary>
public static class TemperatureDensityDiagram
{
    /// <summary>Builds the diagram from each fluid's traced coexistence curve.</summary>
    public static PlotModel Build(IReadOnlyList<PlotFluid> fluids, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(fluids);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var model = HouseStyle.NewModel($"Coexistence dome of {Chart.Names(fluids)} — {Chart.Models(fluids)}");
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Bottom, "reduced density ρ/ρc", null)
            : HouseStyle.Linear(AxisPosition.Bottom, "density ρ", units.DensityUnit));
        model.Axes.Add(options.Reduced
            ? HouseStyle.Linear(AxisPosition.Left, "reduced temperature T/Tc", null)
            : HouseStyle.Linear(AxisPosition.Left, "temperature T", units.TemperatureUnit));

        var criticals = new List<DataPoint>();
        for (int i = 0; i < fluids.Count; i++)
        {
            var fluid = fluids[i];
            var curve = Chart.Curve(fluid, options.Points);
            double tc = fluid.Model.CriticalTemperature;
            double rhoc = fluid.Model.CriticalDensity;
            double m = Chart.MolarMass(fluid, options);
            DataPoint Map(double rho, double t)
                => options.Reduced ? new(rho / rhoc, t / tc) : new(units.Density(rho, m), units.Temperature(t));

            // Vapour branch up to the critical point, then the liquid branch back down: one
            // unbroken dome.
            var dome = curve.Select(c => Map(c.Vapour.Density, c.Temperature))
                .Concat(curve.Reverse().Skip(1).Select(c => Map(c.Liquid.Density, c.Temperature)));
            var colour = HouseStyle.Colour(i);
            model.Series.Add(Chart.Line(fluid.Name, colour, dome));
            model.Series.Add(Chart.Line($"{fluid.Name}: diameter (ρL + ρV)/2", colour,
                curve.Select(c => Map((c.Liquid.Density + c.Vapour.Density) / 2, c.Temperature)), Chart.Thin, LineStyle.Dash));
            var critical = curve[^1];
            criticals.Add(Map(critical.Liquid.Density, critical.Temperature));
        }

        model.Series.Add(Chart.Critical(criticals));

        return model;
    }
}
