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
        var model = SaturationLineChart.Build(fluids, options,
            $"Clapeyron slope of {Chart.Names(fluids)} — {Chart.Models(fluids)}",
            ("slope dPsat/dT", "reduced slope d(Psat/Pc)/d(T/Tc)"), units.SlopeUnit,
            c => c.Slope, (slope, tc, pc) => slope * tc / pc, units.Pressure);
        return model;
    }
}
