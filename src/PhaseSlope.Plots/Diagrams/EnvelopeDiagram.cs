using OxyPlot;
using OxyPlot.Axes;
using OxyPlot.Series;
using PhaseSlope.Core.Mixtures;

namespace PhaseSlope.Plots.Diagrams;

/// <summary>envelope: the phase envelope of a mixture of fixed composition in pressure against
/// temperature: the bubble branch (feed a saturated liquid) and the dew branch (feed a saturated
/// vapour) as traced by <see cref="EnvelopeTracer"/>, which meet at the critical point (black
/// diamond, as on every diagram), with the cricondenbar and cricondentherm marked and labelled.</summary>
public static class EnvelopeDiagram
{
    /// <summary>Builds the diagram of a traced envelope.</summary>
    /// <param name="envelope">The traced envelope.</param>
    /// <param name="mixtureName">How the mixture is named in the title (for example its
    /// components and fractions).</param>
    /// <param name="modelTitle">The model, for the subtitle (for example "Peng-Robinson (1976)").</param>
    /// <param name="options">Units (SI: K and kPa; engineering: °C and bar) and a logarithmic
    /// pressure axis; the other options do not apply.</param>
    public static PlotModel Build(PhaseEnvelope envelope, string mixtureName, string modelTitle, DiagramOptions options)
    {
        ArgumentNullException.ThrowIfNull(envelope);
        ArgumentNullException.ThrowIfNull(mixtureName);
        ArgumentNullException.ThrowIfNull(options);
        var units = new UnitScale(options.Units);
        var model = Chart.NewModel($"Phase envelope of {mixtureName}", $"{modelTitle}; van der Waals one-fluid mixing");
        model.Axes.Add(HouseStyle.Linear(AxisPosition.Bottom, "temperature T", units.TemperatureUnit));
        model.Axes.Add(options.Logarithmic
            ? HouseStyle.Logarithmic(AxisPosition.Left, "pressure P", units.PressureUnit)
            : HouseStyle.Linear(AxisPosition.Left, "pressure P", units.PressureUnit));
        DataPoint Map(double temperature, double pressure) => new(units.Temperature(temperature), units.Pressure(pressure));

        // Each branch is drawn to the critical point, so the two lines meet there.
        var critical = envelope.CriticalPoint;
        var bubble = envelope.BubblePoints.Select(p => Map(p.Temperature, p.Pressure)).ToList();
        var dew = envelope.DewPoints.Select(p => Map(p.Temperature, p.Pressure)).ToList();
        if (critical is { } c)
        {
            bubble.Add(Map(c.Temperature, c.Pressure));
            dew.Insert(0, Map(c.Temperature, c.Pressure));
        }

        model.Series.Add(Chart.Line("bubble line", HouseStyle.Colour(0), bubble));
        if (dew.Count > 0)
        {
            model.Series.Add(Chart.Line("dew line", HouseStyle.Colour(1), dew));
        }

        AddLandmark(model, "cricondenbar", MarkerType.Triangle, envelope.Cricondenbar, Map, units, VerticalAlignment.Bottom, -8);
        AddLandmark(model, "cricondentherm", MarkerType.Square, envelope.Cricondentherm, Map, units, VerticalAlignment.Middle, 0);
        if (critical is { } point)
        {
            model.Series.Add(Chart.Critical([Map(point.Temperature, point.Pressure)]));
        }

        return model;
    }

    private static void AddLandmark(PlotModel model, string title, MarkerType marker, EnvelopeLandmark? landmark,
        Func<double, double, DataPoint> map, UnitScale units, VerticalAlignment vertical, double dy)
    {
        if (landmark is not { } l)
        {
            return;
        }

        var at = map(l.Temperature, l.Pressure);
        var series = new ScatterSeries
        {
            Title = title,
            MarkerType = marker,
            MarkerSize = 5.5,
            Tag = new HouseStyle.BaseSize(5.5),
            MarkerFill = OxyColors.White,
            MarkerStroke = HouseStyle.Ink,
            MarkerStrokeThickness = 1.5,
        };
        series.Points.Add(new ScatterPoint(at.X, at.Y));
        model.Series.Add(series);
        string text = $"{title} {Chart.Number(at.X)} {units.TemperatureUnit}, {Chart.Number(at.Y)} {units.PressureUnit}";
        Chart.Label(model, text, at, HouseStyle.Ink, HorizontalAlignment.Right, vertical, -10, dy);
    }
}
