using OxyPlot;
using OxyPlot.Series;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Plots.Diagrams;
using SkiaSharp;

namespace PhaseSlope.Plots.Tests;

/// <summary>The envelope diagram draws the tracer's own numbers and renders.</summary>
public class EnvelopeDiagramTests
{
    // An invented lean natural gas (mole fractions; not a sourced analysis).
    private static readonly string[] Names = ["methane", "ethane", "propane", "n-butane", "nitrogen", "carbon-dioxide"];
    private static readonly double[] Composition = [0.85, 0.06, 0.03, 0.02, 0.02, 0.02];

    private static PhaseEnvelope Gas()
    {
        var model = new CubicMixtureModel(Names.Select(n => CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find(n))).ToList());
        return new EnvelopeTracer(model).Trace(Composition);
    }

    private static LineSeries Titled(PlotModel model, string title)
        => model.Series.OfType<LineSeries>().Single(s => s.Title == title);

    [Fact]
    public void Branches_are_the_traced_points_and_meet_at_the_critical_point()
    {
        var envelope = Gas();
        var model = EnvelopeDiagram.Build(envelope, "a lean gas", "Peng-Robinson (1976)", new DiagramOptions());
        var bubble = Titled(model, "bubble line");
        var dew = Titled(model, "dew line");
        var critical = envelope.CriticalPoint!.Value;
        // SI axes: K and kPa; the plotted numbers are the tracer's (exactly, no resampling).
        var firstBubble = envelope.BubblePoints.First();
        Assert.Equal(firstBubble.Temperature, bubble.Points[0].X);
        Assert.Equal(firstBubble.Pressure / 1e3, bubble.Points[0].Y, 9);
        Assert.Equal(envelope.BubblePoints.Count() + 1, bubble.Points.Count);
        Assert.Equal(envelope.DewPoints.Count() + 1, dew.Points.Count);
        Assert.Equal(bubble.Points[^1], dew.Points[0]);
        Assert.Equal(critical.Temperature, bubble.Points[^1].X);
        var markers = model.Series.OfType<ScatterSeries>().ToDictionary(s => s.Title);
        Assert.Equal(envelope.Cricondenbar!.Value.Pressure / 1e3, markers["cricondenbar"].Points.Single().Y, 9);
        Assert.Equal(envelope.Cricondentherm!.Value.Temperature, markers["cricondentherm"].Points.Single().X);
        Assert.Equal(critical.Pressure / 1e3, markers["critical point"].Points.Single().Y, 9);
        // The cricondenbar is the top of both lines, the cricondentherm their right end.
        Assert.True(bubble.Points.Concat(dew.Points).All(p => p.Y <= markers["cricondenbar"].Points.Single().Y * (1 + 1e-9)));
        Assert.True(bubble.Points.Concat(dew.Points).All(p => p.X <= markers["cricondentherm"].Points.Single().X * (1 + 1e-9)));
    }

    [Fact]
    public void Engineering_units_convert_the_axes()
    {
        var envelope = Gas();
        var model = EnvelopeDiagram.Build(envelope, "a lean gas", "Peng-Robinson (1976)", new DiagramOptions { Units = PlotUnits.Engineering });
        var critical = envelope.CriticalPoint!.Value;
        var marker = model.Series.OfType<ScatterSeries>().Single(s => s.Title == "critical point").Points.Single();
        Assert.Equal(critical.Temperature - 273.15, marker.X, 9);
        Assert.Equal(critical.Pressure / 1e5, marker.Y, 9);
    }

    [Fact]
    public void Renders_a_png_with_drawn_pixels()
    {
        var model = EnvelopeDiagram.Build(Gas(), "a lean gas", "Peng-Robinson (1976)", new DiagramOptions());
        using var stream = new MemoryStream();
        FigureExporter.Export(model, stream, FigureFormat.Png, 640, 480);
        using var bitmap = SKBitmap.Decode(stream.ToArray());
        Assert.Equal(640, bitmap.Width);
        int drawn = 0;
        for (int y = 0; y < bitmap.Height; y++)
        {
            for (int x = 0; x < bitmap.Width; x++)
            {
                var c = bitmap.GetPixel(x, y);
                drawn += c.Red < 245 || c.Green < 245 || c.Blue < 245 ? 1 : 0;
            }
        }

        // As for every diagram (RenderingTests): frame, grid, labels and curves cover a few percent.
        Assert.True(drawn > 0.03 * 640 * 480, $"only {drawn} drawn pixels");
    }
}
