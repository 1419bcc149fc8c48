using System.Buffers.Binary;
using System.Xml.Linq;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>phaseslope plot</c>: figures written atomically, clean errors otherwise.</summary>
public class PlotCommandTests
{
    private static (int Width, int Height) PngSize(string path)
    {
        byte[] png = File.ReadAllBytes(path);
        Assert.Equal([0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A], png[..8]);
        return (BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)), BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));
    }

    [Fact]
    public void Writes_a_png_of_the_requested_size_and_prints_nothing()
    {
        using var folder = new TempFolder();
        string path = folder.File("dome.png");
        var result = CliHarness.Run("plot", "propane,n-butane", "--diagram", "t-rho", "--out", path, "--width", "640", "--height", "400");
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        Assert.Equal("", result.Stderr);
        Assert.Equal((640, 400), PngSize(path));
        Assert.Equal(["dome.png"], folder.Entries());
    }

    [Theory]
    [InlineData("water", "triple point: 273.16 K, 0.61166 kPa")]
    [InlineData("carbon-dioxide", "triple point: 216.59 K, 517.95 kPa")]
    public void Phase_diagram_is_written_as_png_and_svg_with_its_regions_and_triple_point(string fluid, string triple)
    {
        // Triple points: IAPWS-95 (Wagner and Pruß 2002) for water, Span and Wagner (1996) for
        // carbon dioxide, both as the catalog gives them (from memory), shown to five figures.
        using var folder = new TempFolder();
        string png = folder.File("phase.png"), svg = folder.File("phase.svg");
        var result = CliHarness.Run("plot", fluid, "--diagram", "phase", "--out", png);
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout + result.Stderr);
        Assert.Equal((1200, 800), PngSize(png));
        CliHarness.RunText("plot", fluid, "--diagram", "phase", "--out", svg);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = XDocument.Load(svg).Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        Assert.Contains("temperature T (K)", texts);
        Assert.Contains("pressure P (kPa)", texts);
        Assert.Contains(triple, texts);
        foreach (string region in new[] { "solid", "liquid", "vapour", "supercritical", "fluid" })
        {
            Assert.Contains(region, texts);
        }

        Assert.Equal(["phase.png", "phase.svg"], folder.Entries());
    }

    [Fact]
    public void Default_png_is_1200_by_800()
    {
        using var folder = new TempFolder();
        string path = folder.File("pt.PNG");
        CliHarness.RunText("plot", "water", "-d", "p-t", "-o", path, "--log", "--units", "engineering");
        Assert.Equal((1200, 800), PngSize(path));
    }

    [Fact]
    public void Writes_svg_with_the_axis_titles_and_overlaid_data()
    {
        using var folder = new TempFolder();
        string data = folder.File("vp.csv");
        File.WriteAllText(data, "T [K],P [kPa]\n250,218\n270,415\n290,767\n310,1288\n330,2050\n");
        string path = folder.File("pt.svg");
        CliHarness.RunText("plot", "propane", "--diagram", "p-t", "--out", path, "--data", data);
        var svg = XDocument.Load(path);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = svg.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        Assert.Contains("temperature T (K)", texts);
        Assert.Contains("saturation pressure Psat (kPa)", texts);
        Assert.Contains("measured (vp.csv)", texts);
    }

    [Fact]
    public void P_h_chart_with_reference_lines_and_cycle_names_the_fluid_and_the_COP()
    {
        using var folder = new TempFolder();
        string path = folder.File("ph.svg");
        CliHarness.RunText("plot", "r-134a", "--diagram", "p-h", "--units", "engineering", "--reference", "refrigeration",
            "--isotherms", "-20,0,20,40 degC", "--isochores", "auto", "--t-range", "-40,100 degC", "--h-range", "150,480 kJ/kg",
            "--cycle", "evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=75 %", "--out", path);
        var svg = XDocument.Load(path);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = svg.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        Assert.Contains("P–h diagram of R-134a", texts);
        Assert.DoesNotContain(texts, t => t.Contains("r-134a", StringComparison.Ordinal));
        Assert.Contains(texts, t => t.StartsWith("Peng-Robinson (1976); reference: saturated liquid at 0 degC", StringComparison.Ordinal));
        Assert.Contains(texts, t => t.StartsWith("cycle: COP ", StringComparison.Ordinal));
        // The isotherms asked for, labelled in °C, and the quality lines' labels.
        foreach (string label in new[] { "-20", "0", "20", "40", "x = 0.1", "0.9", "2s" })
        {
            Assert.Contains(label, texts);
        }
    }

    [Theory]
    [InlineData("--diagram", "p-x", "unknown diagram")]
    [InlineData("--width", "100", "--width")]
    [InlineData("--height", "9000", "--height")]
    [InlineData("--units", "imperial", "--units")]
    [InlineData("--eos", "xyz", "--eos")]
    public void Bad_options_exit_2_and_leave_no_file(string option, string value, string message)
    {
        using var folder = new TempFolder();
        var args = new List<string> { "plot", "propane", "--out", folder.File("a.png") };
        if (option != "--diagram")
        {
            args.AddRange(["--diagram", "p-t"]);
        }

        args.AddRange([option, value]);
        CliHarness.AssertFailure(CliHarness.Run([.. args]), ExitCodes.Usage, message);
        Assert.Empty(folder.Entries());
    }

    [Theory]
    [InlineData("a.jpg")]
    [InlineData("a")]
    public void Unknown_extension_exits_2(string name)
    {
        using var folder = new TempFolder();
        CliHarness.AssertFailure(CliHarness.Run("plot", "propane", "-d", "p-t", "-o", folder.File(name)), ExitCodes.Usage, ".png or .svg");
        Assert.Empty(folder.Entries());
    }

    [Theory]
    [InlineData("p-v", "propane,n-butane", null, "one fluid")]
    [InlineData("t-s", "propane", "--reduced", "no reduced form")]
    [InlineData("t-rho", "propane", "--log", "no log option")]
    public void Options_a_diagram_does_not_have_exit_2(string kind, string fluids, string? flag, string message)
    {
        using var folder = new TempFolder();
        string existing = folder.File("keep.png");
        File.WriteAllText(existing, "old");
        var args = new List<string> { "plot", fluids, "-d", kind, "-o", existing };
        if (flag is not null)
        {
            args.Add(flag);
        }

        CliHarness.AssertFailure(CliHarness.Run([.. args]), ExitCodes.Usage, message);
        Assert.Equal("old", File.ReadAllText(existing));
        Assert.Equal(["keep.png"], folder.Entries());
    }

    [Fact]
    public void Unwritable_path_exits_6_and_leaves_nothing()
    {
        using var folder = new TempFolder();
        CliHarness.AssertFailure(CliHarness.Run("plot", "propane", "-d", "p-t", "-o", folder.File("missing/a.png")), ExitCodes.OutputFile, "folder does not exist");
        Directory.CreateDirectory(folder.File("dir.svg"));
        CliHarness.AssertFailure(CliHarness.Run("plot", "propane", "-d", "p-t", "-o", folder.File("dir.svg")), ExitCodes.OutputFile, "directory");
        Assert.Equal(["dir.svg"], folder.Entries());
        Assert.Empty(Directory.EnumerateFileSystemEntries(folder.File("dir.svg")));
    }

    [Fact]
    public void Unknown_fluid_and_missing_data_file_use_their_codes()
    {
        using var folder = new TempFolder();
        CliHarness.AssertFailure(CliHarness.Run("plot", "propane,unobtainium", "-d", "p-t", "-o", folder.File("a.png")), ExitCodes.Fluid);
        CliHarness.AssertFailure(CliHarness.Run("plot", "propane", "-d", "latent", "-o", folder.File("a.png"), "--data", folder.File("none.csv")), ExitCodes.DataFile);
        CliHarness.AssertFailure(CliHarness.Run("plot", "propane,", "-d", "p-t", "-o", folder.File("a.png")), ExitCodes.Usage, "empty name");
        Assert.Empty(folder.Entries());
    }
}
