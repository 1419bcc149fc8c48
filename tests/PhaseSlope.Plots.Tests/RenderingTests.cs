using System.Buffers.Binary;
using System.Xml.Linq;
using OxyPlot;
using OxyPlot.Axes;
using PhaseSlope.Plots.Diagrams;
using SkiaSharp;

namespace PhaseSlope.Plots.Tests;

/// <summary>Every diagram kind renders to a real PNG and a well-formed SVG.</summary>
public class RenderingTests
{
    private static readonly byte[] PngSignature = [0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A];

    public static TheoryData<string> Kinds => [.. DiagramKinds.Ids];

    private static PlotModel Build(string id)
    {
        Assert.True(DiagramKinds.TryParse(id, out var kind));
        if (kind.IsBinary())
        {
            return BinaryDiagramChartTests.Chart(kind);
        }

        // Few points keep the suite fast; the shapes are the same. The residuals and deviations kinds need data:
        // the model's own saturation pressures with a 0.3 % scatter pattern and stated uncertainty.
        // Deviations draw Peng–Robinson against Soave–Redlich–Kwong's pressures (a model against its
        // own pressures would sit inside the ±u band and fill the plot with it).
        var data = kind switch
        {
            DiagramKind.Residuals => TestFluids.ModelVapourPressures(TestFluids.Propane, 12),
            DiagramKind.Deviations => TestFluids.ModelVapourPressures(TestFluids.Get("propane", Core.Models.CubicModelKind.SoaveRedlichKwong), 12),
            _ => null,
        };
        // The phase diagram needs a fluid with a triple-point pressure and solid data: water.
        var fluid = kind == DiagramKind.Phase ? TestFluids.Get("water") : TestFluids.Propane;
        return Diagram.Build(kind, [fluid], new DiagramOptions { Points = 30, Data = data });
    }

    private static byte[] Render(PlotModel model, FigureFormat format, int width, int height)
    {
        using var stream = new MemoryStream();
        FigureExporter.Export(model, stream, format, width, height);
        return stream.ToArray();
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Png_has_the_signature_the_requested_size_and_drawn_pixels(string id)
    {
        const int width = 640;
        const int height = 480;
        byte[] png = Render(Build(id), FigureFormat.Png, width, height);

        Assert.Equal(PngSignature, png[..8]);
        // The first chunk is IHDR: length (4 bytes), type "IHDR", then width and height, big-endian.
        Assert.Equal("IHDR", System.Text.Encoding.ASCII.GetString(png, 12, 4));
        Assert.Equal(width, BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)));
        Assert.Equal(height, BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));

        using var bitmap = SKBitmap.Decode(png);
        Assert.NotNull(bitmap);
        Assert.Equal(width, bitmap.Width);
        Assert.Equal(height, bitmap.Height);
        int drawn = 0;
        for (int y = 0; y < height; y++)
        {
            for (int x = 0; x < width; x++)
            {
                var c = bitmap.GetPixel(x, y);
                if (c.Red < 245 || c.Green < 245 || c.Blue < 245)
                {
                    drawn++;
                }
            }
        }

        // A frame, a light grid, labels and several curves cover a few percent of the image at
        // least; an empty or failed render covers none (the white background alone is 0 %).
        double share = (double)drawn / (width * height);
        Assert.True(share > 0.03, $"{id}: only {share:P2} of the pixels are not background");
        // And the background stays white: no gradient or filled plot area.
        Assert.True(share < 0.5, $"{id}: {share:P2} of the pixels are drawn, the background is not white");
    }

    public static TheoryData<string, int, int> KindsAndSizes()
    {
        var data = new TheoryData<string, int, int>();
        foreach (string id in DiagramKinds.Ids)
        {
            data.Add(id, HouseStyle.MinimumSize + 100, HouseStyle.MinimumSize);
            data.Add(id, HouseStyle.DefaultWidth, HouseStyle.DefaultHeight);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(KindsAndSizes))]
    public void Data_keep_most_of_the_figure_and_the_legend_stays_off_them(string id, int width, int height)
    {
        var model = Build(id);
        Render(model, FigureFormat.Png, width, height);
        var plot = model.PlotArea;
        Assert.True(plot.Width >= 0.45 * width, $"{id} at {width}x{height}: plot area only {plot.Width:F0} px wide");
        Assert.True(plot.Height >= 0.35 * height, $"{id} at {width}x{height}: plot area only {plot.Height:F0} px high");
        foreach (var legend in model.Legends)
        {
            var area = legend.LegendArea;
            double overlapX = Math.Min(area.Right, plot.Right) - Math.Max(area.Left, plot.Left);
            double overlapY = Math.Min(area.Bottom, plot.Bottom) - Math.Max(area.Top, plot.Top);
            Assert.False(overlapX > 0 && overlapY > 0, $"{id} at {width}x{height}: legend {area} overlaps the plot area {plot}");
            Assert.True(area.Left >= 0 && area.Top >= 0 && area.Right <= width + 0.5 && area.Bottom <= height + 0.5,
                $"{id} at {width}x{height}: legend {area} is cut off");
        }
    }

    [Fact]
    public void Default_size_is_1200_by_800()
    {
        byte[] png = Render(Build("p-t"), FigureFormat.Png, HouseStyle.DefaultWidth, HouseStyle.DefaultHeight);
        Assert.Equal(1200, BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)));
        Assert.Equal(800, BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void Svg_is_well_formed_with_paths_and_the_axis_titles(string id)
    {
        var model = Build(id);
        byte[] svg = Render(model, FigureFormat.Svg, 800, 600);
        var document = XDocument.Parse(System.Text.Encoding.UTF8.GetString(svg));
        XNamespace ns = "http://www.w3.org/2000/svg";
        Assert.Equal(ns + "svg", document.Root!.Name);
        Assert.Equal("800", document.Root.Attribute("width")?.Value);
        Assert.Equal("600", document.Root.Attribute("height")?.Value);
        int lines = document.Descendants(ns + "path").Count() + document.Descendants(ns + "polyline").Count();
        Assert.True(lines >= 5, $"{id}: {lines} path/polyline elements");

        // Every coordinate list is a valid SVG list of numbers (no trailing separator).
        foreach (var attribute in document.Descendants(ns + "text").Attributes().Where(a => a.Name.LocalName is "x" or "y"))
        {
            Assert.All(attribute.Value.Split(',', StringSplitOptions.TrimEntries),
                n => Assert.True(double.TryParse(n, System.Globalization.CultureInfo.InvariantCulture, out _), $"{id}: {attribute.Name}=\"{attribute.Value}\""));
        }

        var texts = document.Descendants(ns + "text").Select(t => t.Value.Trim()).ToHashSet(StringComparer.Ordinal);
        foreach (var axis in model.Axes)
        {
            string title = axis.Unit is null ? axis.Title : $"{axis.Title} ({axis.Unit})";
            Assert.Contains(title, texts);
        }
    }

    [Fact]
    public void Axes_carry_units_and_legend_sits_outside_the_plot_area()
    {
        var model = Build("t-rho");
        Assert.All(model.Axes, a => Assert.False(string.IsNullOrEmpty(a.Unit)));
        Assert.All(model.Legends, l => Assert.Equal(OxyPlot.Legends.LegendPlacement.Outside, l.LegendPlacement));
        Assert.All(model.Axes, a => Assert.Equal(LineStyle.None, a.MinorGridlineStyle));
    }
}
