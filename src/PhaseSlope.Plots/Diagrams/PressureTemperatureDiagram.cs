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
        var model = SaturationLineChart.Build(fluids, options,
            $"Saturation pressure of {Chart.Names(fluids)} — {Chart.Models(fluids)}",
            ("saturation pressure Psat", "reduced pressure P/Pc"), units.PressureUnit,
            c => c.Pressure, (p, _, pc) => p / pc, units.Pressure);

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
