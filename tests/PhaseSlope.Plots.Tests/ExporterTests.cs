using PhaseSlope.Core.Errors;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Plots.Tests;

/// <summary>File output: format by extension, atomic replacement, clean failures.</summary>
public class ExporterTests
{
    private static readonly OxyPlot.PlotModel Model
        = Diagram.Build(DiagramKind.PressureTemperature, [TestFluids.Propane], new DiagramOptions { Points = 10 });

    [Theory]
    [InlineData("figure.png", FigureFormat.Png)]
    [InlineData("FIGURE.PNG", FigureFormat.Png)]
    [InlineData("a.b/figure.svg", FigureFormat.Svg)]
    public void Extension_chooses_the_format(string path, FigureFormat expected)
    {
        Assert.True(FigureFormats.TryFromPath(path, out var format));
        Assert.Equal(expected, format);
    }

    [Theory]
    [InlineData("figure.jpg")]
    [InlineData("figure")]
    [InlineData("figure.png.txt")]
    public void Other_extensions_are_refused_and_write_nothing(string name)
    {
        using var folder = new TempFolder();
        Assert.False(FigureFormats.TryFromPath(name, out _));
        Assert.Throws<InvalidInputException>(() => FigureExporter.Export(Model, folder.File(name)));
        Assert.Empty(folder.Entries());
    }

    [Fact]
    public void Png_and_svg_files_are_written_by_extension()
    {
        using var folder = new TempFolder();
        FigureExporter.Export(Model, folder.File("a.png"), 400, 300);
        FigureExporter.Export(Model, folder.File("a.svg"), 400, 300);
        Assert.Equal(["a.png", "a.svg"], folder.Entries());
        Assert.Equal(0x89, File.ReadAllBytes(folder.File("a.png"))[0]);
        Assert.StartsWith("<?xml", File.ReadAllText(folder.File("a.svg")), StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_folder_fails_cleanly()
    {
        using var folder = new TempFolder();
        var ex = Assert.Throws<FigureFileException>(() => FigureExporter.Export(Model, folder.File("no/such/dir/a.png")));
        Assert.Contains("folder does not exist", ex.Message, StringComparison.Ordinal);
        Assert.Empty(folder.Entries());
    }

    [Fact]
    public void A_failed_write_leaves_the_existing_file_untouched()
    {
        using var folder = new TempFolder();
        string target = folder.File("taken.png");
        Directory.CreateDirectory(target);
        Assert.Throws<FigureFileException>(() => FigureExporter.Export(Model, target));
        Assert.True(Directory.Exists(target));
        Assert.Equal(["taken.png"], folder.Entries());

        string existing = folder.File("old.png");
        File.WriteAllText(existing, "old");
        Assert.Throws<InvalidInputException>(() => FigureExporter.Export(Model, existing, 10, 300));
        Assert.Equal("old", File.ReadAllText(existing));
    }

    [Theory]
    [InlineData(299, 800)]
    [InlineData(1200, 8001)]
    [InlineData(0, 0)]
    public void Sizes_outside_the_range_are_refused(int width, int height)
    {
        using var stream = new MemoryStream();
        Assert.Throws<InvalidInputException>(() => FigureExporter.Export(Model, stream, FigureFormat.Png, width, height));
        Assert.Equal(0, stream.Length);
    }
}
