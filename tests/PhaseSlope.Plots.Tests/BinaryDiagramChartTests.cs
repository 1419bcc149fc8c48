using OxyPlot;
using OxyPlot.Series;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Plots.Tests;

/// <summary>p-xy, t-xy and x-y draw the core's bubble points and its azeotrope.</summary>
public class BinaryDiagramChartTests
{
    private static readonly Fluid Benzene = FluidCatalog.Embedded.Find("benzene");
    private static readonly Fluid Cyclohexane = FluidCatalog.Embedded.Find("cyclohexane");

    /// <summary>Benzene + cyclohexane with k_ij = 0.02 (it has an azeotrope, so the marker is
    /// drawn): p-xy at 340 K, t-xy and x-y at 101.325 kPa, 21 compositions.</summary>
    internal static BinaryDiagram Diagram(DiagramKind kind)
    {
        var engine = MixtureEquilibrium.For([Benzene, Cyclohexane], CubicModelKind.PengRobinson, [0, 0.02, 0.02, 0]);
        return kind == DiagramKind.PressureComposition ? BinaryDiagram.AtTemperature(engine, 340, 21) : BinaryDiagram.AtPressure(engine, 101325, 21);
    }

    internal static PlotModel Chart(DiagramKind kind, PlotUnits units = PlotUnits.Si)
        => BinaryDiagramChart.Build(kind, Diagram(kind), Benzene, Cyclohexane, "Peng-Robinson (1976)", units);

    [Fact]
    public void P_xy_draws_the_bubble_and_dew_points_in_kPa()
    {
        var diagram = Diagram(DiagramKind.PressureComposition);
        var model = BinaryDiagramChart.Build(DiagramKind.PressureComposition, diagram, Benzene, Cyclohexane, "PR", PlotUnits.Si);
        var lines = model.Series.OfType<LineSeries>().ToArray();
        Assert.Equal(2, lines.Length);
        for (int i = 0; i < diagram.Points.Count; i++)
        {
            // The plotted numbers are the core's, divided by 1000 for kPa (exact to rounding).
            Assert.Equal(diagram.Points[i].LiquidFraction, lines[0].Points[i].X);
            Assert.Equal(diagram.Points[i].Pressure / 1e3, lines[0].Points[i].Y, 9);
            Assert.Equal(diagram.Points[i].VapourFraction, lines[1].Points[i].X);
        }

        var marker = model.Series.OfType<ScatterSeries>().Single();
        Assert.Equal(diagram.Azeotrope!.MoleFraction, marker.Points.Single().X);
    }

    [Fact]
    public void T_xy_in_engineering_units_is_in_degrees_Celsius()
    {
        var diagram = Diagram(DiagramKind.TemperatureComposition);
        var model = BinaryDiagramChart.Build(DiagramKind.TemperatureComposition, diagram, Benzene, Cyclohexane, "PR", PlotUnits.Engineering);
        var bubble = model.Series.OfType<LineSeries>().First();
        Assert.Equal(diagram.Points[0].Temperature - 273.15, bubble.Points[0].Y, 9);
    }

    [Fact]
    public void P_xy_of_an_isobaric_diagram_is_refused()
        => Assert.Throws<ArgumentException>(() => BinaryDiagramChart.Build(DiagramKind.PressureComposition, Diagram(DiagramKind.TemperatureComposition), Benzene, Cyclohexane, "PR", PlotUnits.Si));
}
