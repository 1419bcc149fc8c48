using OxyPlot;
using OxyPlot.Annotations;
using OxyPlot.Series;
using PhaseSlope.Core.Equilibrium;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>Series in the house style, shared by the diagram builders.</summary>
internal static class Chart
{
    /// <summary>The molar mass a diagram converts with: required for mass units (engineering),
    /// unused (NaN when the fluid gives none) for molar SI units.</summary>
    /// <exception cref="Core.Errors.FluidDataException">Mass units and no molar mass.</exception>
    public static double MolarMass(PlotFluid fluid, DiagramOptions options)
        => options.Units == PlotUnits.Si
            ? fluid.Fluid.MolarMass?.Value ?? double.NaN
            : fluid.Fluid.RequireMolarMass("a diagram in engineering (per-kilogram) units");

    /// <summary>Line width of a main curve in pixels.</summary>
    public const double Thick = 2.5;

    /// <summary>Line width of a secondary curve (diameters, quality lines, tie lines).</summary>
    public const double Thin = 1.5;

    public static LineSeries Line(string? title, OxyColor colour, double thickness = Thick, LineStyle style = LineStyle.Solid)
        => new()
        {
            Title = title,
            Color = colour,
            StrokeThickness = thickness,
            Tag = new HouseStyle.BaseSize(thickness),
            LineStyle = style,
            MarkerType = MarkerType.None,
            CanTrackerInterpolatePoints = false,
        };

    public static LineSeries Line(string? title, OxyColor colour, IEnumerable<DataPoint> points, double thickness = Thick, LineStyle style = LineStyle.Solid)
    {
        var series = Line(title, colour, thickness, style);
        series.Points.AddRange(points);
        return series;
    }

    /// <summary>Critical points: black diamonds (one look for every fluid, since in reduced
    /// coordinates they coincide); one legend entry, after the curves.</summary>
    public static ScatterSeries Critical(IEnumerable<DataPoint> points)
    {
        var series = new ScatterSeries
        {
            Title = "critical point",
            MarkerType = MarkerType.Diamond,
            MarkerSize = 7,
            Tag = new HouseStyle.BaseSize(7),
            MarkerFill = HouseStyle.Ink,
            MarkerStroke = OxyColors.White,
            MarkerStrokeThickness = 1,
        };
        series.Points.AddRange(points.Select(p => new ScatterPoint(p.X, p.Y)));
        return series;
    }

    /// <summary>Measured points: open black circles, drawn over the curves.</summary>
    public static ScatterSeries Measured(string title, IEnumerable<DataPoint> points)
    {
        var series = new ScatterSeries
        {
            Title = title,
            MarkerType = MarkerType.Circle,
            MarkerSize = 4.5,
            Tag = new HouseStyle.BaseSize(4.5),
            MarkerFill = OxyColors.White,
            MarkerStroke = HouseStyle.Ink,
            MarkerStrokeThickness = 1.5,
        };
        series.Points.AddRange(points.Select(p => new ScatterPoint(p.X, p.Y)));
        return series;
    }

    /// <summary>A small text label on a line of the chart (its value), in the line's colour.</summary>
    public static void Label(PlotModel model, string text, DataPoint at, OxyColor colour,
        HorizontalAlignment horizontal = HorizontalAlignment.Center, VerticalAlignment vertical = VerticalAlignment.Bottom, double dx = 0, double dy = 0)
        => model.Annotations.Add(new TextAnnotation
        {
            Text = text,
            TextPosition = at,
            TextHorizontalAlignment = horizontal,
            TextVerticalAlignment = vertical,
            Offset = new ScreenVector(dx, dy),
            Stroke = OxyColors.Undefined,
            Background = OxyColor.FromAColor(190, OxyColors.White),
            Padding = new OxyThickness(1),
            FontSize = HouseStyle.BaseLabelFontSize,
            TextColor = colour,
        });

    /// <summary>The title's second line for the property charts: the model and the zero of h and s.</summary>
    public static string ModelAndReference(PlotFluid fluid, Core.Properties.ReferenceState reference)
        => $"{ModelTitle(fluid)}; reference: {reference.Description}";

    /// <summary>A new chart with its title and, on a second line, what it was computed with (so
    /// the title holds no brackets inside brackets).</summary>
    public static PlotModel NewModel(string title, string subtitle)
    {
        var model = HouseStyle.NewModel(title);
        model.Subtitle = subtitle;
        return model;
    }

    /// <summary>The whole saturation curve of a fluid, ending at its critical point.</summary>
    public static IReadOnlyList<CoexistencePoint> Curve(PlotFluid fluid, int points)
        => CoexistenceCurve.Trace(fluid.Solver(), points);

    /// <summary>Numbers in legends: four significant figures, invariant culture.</summary>
    public static string Number(double value) => value.ToString("g4", System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>A short title suffix naming the model.</summary>
    public static string ModelTitle(PlotFluid fluid) => Core.Models.ModelRegistry.Title(fluid.Model.Kind);

    /// <summary>"propane" or "propane, n-butane and water".</summary>
    public static string Names(IReadOnlyList<PlotFluid> fluids)
        => fluids.Count == 1 ? fluids[0].Name
            : string.Join(", ", fluids.Take(fluids.Count - 1).Select(f => f.Name)) + " and " + fluids[^1].Name;

    /// <summary>"Peng-Robinson (1976)" when every fluid uses one model, else "several models".</summary>
    public static string Models(IReadOnlyList<PlotFluid> fluids)
        => fluids.Select(f => f.Model.Kind).Distinct().Count() == 1 ? ModelTitle(fluids[0]) : "several models";

    /// <summary>The zero line of a deviation plot and, when every point states one, the data's
    /// ±u(P)/P band around it (a curve that describes the data leaves about two thirds of the
    /// points inside).</summary>
    public static void AddDeviationBaseline(PlotModel model, IReadOnlyList<Core.Correlations.VapourPressurePoint> sorted, UnitScale units)
    {
        if (sorted.All(d => d.StandardUncertainty is not null))
        {
            var band = new AreaSeries { Title = "data uncertainty (1 u)", Color = OxyColors.Transparent, Color2 = OxyColors.Transparent, Fill = OxyColor.FromRgb(0xE3, 0xE3, 0xE3), StrokeThickness = 0 };
            foreach (var d in sorted)
            {
                double u = 100 * d.StandardUncertainty!.Value / d.Pressure;
                band.Points.Add(new DataPoint(units.Temperature(d.Temperature), u));
                band.Points2.Add(new DataPoint(units.Temperature(d.Temperature), -u));
            }

            model.Series.Add(band);
        }

        model.Series.Add(Line(null, HouseStyle.Ink, [new DataPoint(units.Temperature(sorted[0].Temperature), 0), new DataPoint(units.Temperature(sorted[^1].Temperature), 0)], 1));
    }
}
