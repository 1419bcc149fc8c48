using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>p-xy, t-xy and x-y: the binary diagrams of a two-component mixture, drawn from the
/// bubble points of <see cref="BinaryDiagram"/> (the bubble line at the liquid's x_1, the dew
/// line at the incipient vapour's y_1), with the azeotrope marked where there is one.</summary>
public static class BinaryDiagramChart
{
    /// <summary>Builds the chart.</summary>
    /// <param name="kind"><see cref="DiagramKind.PressureComposition"/>, <see cref="DiagramKind.TemperatureComposition"/>
    /// or <see cref="DiagramKind.Composition"/>.</param>
    /// <param name="diagram">The computed diagram (isothermal for p-xy, isobaric for t-xy, either for x-y).</param>
    /// <param name="firstFluid">The first component (x_1, y_1 are its mole fractions).</param>
    /// <param name="secondFluid">The second component.</param>
    /// <param name="model">The model's title, shown under the title.</param>
    /// <param name="units">Axis units.</param>
    /// <exception cref="ArgumentException">The kind is not a binary diagram, or p-xy of an isobaric
    /// diagram, or t-xy of an isothermal one.</exception>
    public static PlotModel Build(DiagramKind kind, BinaryDiagram diagram, Core.Fluids.Fluid firstFluid, Core.Fluids.Fluid secondFluid, string model, PlotUnits units)
    {
        ArgumentNullException.ThrowIfNull(diagram);
        string first = PlotFluid.DisplayName(firstFluid), second = PlotFluid.DisplayName(secondFluid);
        var scale = new UnitScale(units);
        bool isothermal = diagram.Kind == BinaryDiagramKind.Isothermal;
        if (kind == DiagramKind.PressureComposition && !isothermal || kind == DiagramKind.TemperatureComposition && isothermal
            || !kind.IsBinary())
        {
            throw new ArgumentException($"{kind.Id()} cannot be drawn from an {(isothermal ? "isothermal" : "isobaric")} diagram", nameof(kind));
        }

        string condition = isothermal
            ? $"T = {Chart.Number(scale.Temperature(diagram.Temperature!.Value))} {scale.TemperatureUnit}"
            : $"P = {Chart.Number(scale.Pressure(diagram.Pressure!.Value))} {scale.PressureUnit}";
        string what = kind switch
        {
            DiagramKind.PressureComposition => "P-x-y",
            DiagramKind.TemperatureComposition => "T-x-y",
            _ => "x-y",
        };
        var plot = Chart.NewModel($"{what} of {first} + {second} at {condition}", $"{model}, van der Waals one-fluid mixing");
        string fraction = $"mole fraction of {first}";
        var points = diagram.Points;
        if (kind == DiagramKind.Composition)
        {
            plot.Axes.Add(Axis(HouseStyle.Linear(AxisPosition.Bottom, $"{fraction} in the liquid, x1", null)));
            plot.Axes.Add(Axis(HouseStyle.Linear(AxisPosition.Left, $"{fraction} in the vapour, y1", null)));
            plot.Series.Add(Chart.Line("x = y", HouseStyle.Grid.ChangeIntensity(0.7), [new DataPoint(0, 0), new DataPoint(1, 1)], Chart.Thin, LineStyle.Dash));
            plot.Series.Add(Chart.Line("equilibrium", HouseStyle.Colour(0), points.Select(p => new DataPoint(p.LiquidFraction, p.VapourFraction))));
            if (diagram.Azeotrope is { } a)
            {
                plot.Series.Add(Marker(a.MoleFraction, a.MoleFraction));
            }

            return plot;
        }

        Func<BinaryDiagramPoint, double> value = isothermal ? p => scale.Pressure(p.Pressure) : p => scale.Temperature(p.Temperature);
        plot.Axes.Add(Axis(HouseStyle.Linear(AxisPosition.Bottom, fraction, null)));
        plot.Axes.Add(HouseStyle.Linear(AxisPosition.Left, isothermal ? "pressure" : "temperature", isothermal ? scale.PressureUnit : scale.TemperatureUnit));
        plot.Series.Add(Chart.Line("bubble line (liquid, x1)", HouseStyle.Colour(0), points.Select(p => new DataPoint(p.LiquidFraction, value(p)))));
        plot.Series.Add(Chart.Line("dew line (vapour, y1)", HouseStyle.Colour(1), points.Select(p => new DataPoint(p.VapourFraction, value(p)))));
        if (diagram.Azeotrope is { } azeotrope)
        {
            plot.Series.Add(Marker(azeotrope.MoleFraction, isothermal ? scale.Pressure(azeotrope.Pressure) : scale.Temperature(azeotrope.Temperature)));
        }

        return plot;
    }

    private static LinearAxis Axis(LinearAxis axis)
    {
        axis.Minimum = 0;
        axis.Maximum = 1;
        return axis;
    }

    private static OxyPlot.Series.ScatterSeries Marker(double x, double y)
    {
        var series = Chart.Critical([new DataPoint(x, y)]);
        series.Title = "azeotrope";
        return series;
    }
}
