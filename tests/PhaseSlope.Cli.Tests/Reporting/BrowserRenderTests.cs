using PhaseSlope.Cli.Tests.Commands;
using SkiaSharp;

namespace PhaseSlope.Cli.Tests.Reporting;

/// <summary>The reports rendered in a real browser (Chromium, headless, offline): the page comes
/// through whole, logs nothing, and the screenshot is a page with content, in the light and the
/// dark colour scheme.</summary>
public sealed class BrowserRenderTests : IClassFixture<BrowserRenderTests.Reports>
{
    private readonly Reports _reports;
    private readonly Xunit.Abstractions.ITestOutputHelper _output;

    public BrowserRenderTests(Reports reports, Xunit.Abstractions.ITestOutputHelper output)
    {
        _reports = reports;
        _output = output;
    }

    /// <summary>The three reports (a catalog fluid, the invented FRC-7 with its invented data, the
    /// invented natural gas A of docs/mixture-files.md), made once for the class.</summary>
    public sealed class Reports : IDisposable
    {
        public Reports()
        {
            Make("propane", ["propane"]);
            Make("frc-7", [FitData.ExampleFluid, "--data", FitData.ExampleCsv, "--units", "engineering"]);
            File.WriteAllText(Folder.File("natural-gas-a.mixture"), ReportCommandTests.NaturalGasA);
            Make("blend", [Folder.File("natural-gas-a.mixture")]);
        }

        internal TempFolder Folder { get; } = new();

        public string Path(string name) => Folder.File($"{name}.html");

        private void Make(string name, string[] args)
        {
            var result = CliHarness.Run(["report", .. args, "--out", Path(name)]);
            Assert.True(result.ExitCode == 0, result.ToString());
        }

        public void Dispose() => Folder.Dispose();
    }

    public static TheoryData<string, bool> Cases => new()
    {
        { "propane", false }, { "propane", true },
        { "frc-7", false }, { "frc-7", true },
        { "blend", false }, { "blend", true },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Screenshot_IsAPageWithContent_AndTheBrowserLogsNoError(string report, bool dark)
    {
        string html = _reports.Path(report);
        string png = _reports.Folder.File($"{report}-{(dark ? "dark" : "light")}.png");
        var (code, log) = HeadlessChromium.Screenshot(html, png, dark);
        Assert.True(code == 0, $"chromium exit {code}: {log}");
        Assert.Empty(HeadlessChromium.PageErrors(log));

        using var bitmap = SKBitmap.Decode(png);
        Assert.NotNull(bitmap);
        Assert.Equal(1280, bitmap.Width);
        // The page background is the top-left pixel (the body's margin). Its brightness shows
        // which colour scheme the browser applied: the style sheet's light background is #ffffff,
        // its dark one #15171a.
        var background = bitmap.GetPixel(2, 2);
        double brightness = (background.Red + background.Green + background.Blue) / (3 * 255.0);
        Assert.True(dark ? brightness < 0.2 : brightness > 0.9, $"background {background} in the {(dark ? "dark" : "light")} scheme");

        // Not blank: a blank page is one colour. Text is anti-aliased and the figures are drawn in
        // several colours: measured on these six renders, 1590-2072 distinct colours and 15.0-53.6 %
        // of the pixels off the background (the light pages, whose figures are white like the page,
        // are the lowest). A page holding only a heading, rendered the same way, measured 166
        // colours (anti-aliasing alone) and 0.08 % (Screenshot_OfAHeadingOnly_IsBelowTheThresholds).
        // The thresholds, 500 colours and 2 %, sit between the two, with a factor of 3 or more to each.
        var (colours, share) = Measure(bitmap, background);
        _output.WriteLine($"{report} {(dark ? "dark" : "light")}: {colours} colours, {share:P1} of the pixels off the background");
        Assert.True(colours >= MinimumColours, $"{colours} distinct colours: the page looks blank");
        Assert.True(share >= MinimumShare, $"only {share:P2} of the pixels differ from the background");
    }

    private const int MinimumColours = 500;
    private const double MinimumShare = 0.02;

    /// <summary>Distinct colours and the share of pixels unlike <paramref name="background"/>,
    /// over every second pixel in each direction.</summary>
    private static (int Colours, double Share) Measure(SKBitmap bitmap, SKColor background)
    {
        var colours = new HashSet<uint>();
        long differing = 0, sampled = 0;
        for (int y = 0; y < bitmap.Height; y += 2)
        {
            for (int x = 0; x < bitmap.Width; x += 2)
            {
                var pixel = bitmap.GetPixel(x, y);
                colours.Add((uint)pixel);
                sampled++;
                if (pixel != background)
                {
                    differing++;
                }
            }
        }

        return (colours.Count, differing / (double)sampled);
    }

    [Fact]
    public void Screenshot_OfAHeadingOnly_IsBelowTheThresholds()
    {
        // The not-blank check must be able to fail: a near-empty page is refused by it.
        string page = _reports.Folder.File("heading.html");
        File.WriteAllText(page, "<!DOCTYPE html><html><body><h1>coexistence report</h1></body></html>");
        string png = _reports.Folder.File("heading.png");
        var (code, log) = HeadlessChromium.Screenshot(page, png, dark: false);
        Assert.True(code == 0, $"chromium exit {code}: {log}");
        using var bitmap = SKBitmap.Decode(png);
        var (colours, share) = Measure(bitmap, bitmap.GetPixel(2, 2));
        _output.WriteLine($"heading only: {colours} colours, {share:P2} of the pixels off the background");
        Assert.True(colours < MinimumColours && share < MinimumShare, $"{colours} colours, {share:P2}");
    }

    [Theory]
    [InlineData("propane", "figures")]
    [InlineData("frc-7", "audit")]
    [InlineData("blend", "envelope")]
    public void Dom_ComesThroughWhole(string report, string lastSection)
    {
        var (code, dom, log) = HeadlessChromium.DumpDom(_reports.Path(report));
        Assert.True(code == 0, $"chromium exit {code}: {log}");
        Assert.Empty(HeadlessChromium.PageErrors(log));
        // The last section and the end of the document were parsed: nothing cut the page short.
        Assert.Contains($"<section id=\"{lastSection}\">", dom, StringComparison.Ordinal);
        Assert.Contains("</main>", dom, StringComparison.Ordinal);
        Assert.Contains("<svg", dom, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("propane", false)]
    [InlineData("propane", true)]
    public void Print_GivesAPdfOfSeveralPages(string report, bool dark)
    {
        string pdf = _reports.Folder.File($"{report}-{(dark ? "dark" : "light")}.pdf");
        var (code, log) = HeadlessChromium.PrintToPdf(_reports.Path(report), pdf, dark);
        Assert.True(code == 0, $"chromium exit {code}: {log}");
        Assert.Empty(HeadlessChromium.PageErrors(log));
        string text = System.Text.Encoding.Latin1.GetString(File.ReadAllBytes(pdf));
        Assert.StartsWith("%PDF-", text, StringComparison.Ordinal);
        // Page objects: the propane page (constants, model, a 20-row table, five figures of
        // 900 x 600 scaled to the text width) fills several A4/Letter pages; a print style sheet
        // that hid the content would leave one. Measured: 7 pages, light and dark.
        int pages = System.Text.RegularExpressions.Regex.Matches(text, @"/Type\s*/Page\b").Count;
        _output.WriteLine($"{report} {(dark ? "dark" : "light")} print: {pages} pages");
        Assert.True(pages >= 4, $"{pages} pages");
    }

    [Fact]
    public void PageErrors_FindsAConsoleMessage()
    {
        // The check must be able to fail: a page that writes to the console, rendered in the same
        // browser, is caught (the report pages have no script; this one is made for the test).
        string page = _reports.Folder.File("console.html");
        File.WriteAllText(page, "<!DOCTYPE html><html><body><p>x</p><script>console.error('boom')</script></body></html>");
        var (_, _, log) = HeadlessChromium.DumpDom(page);
        Assert.NotEmpty(HeadlessChromium.PageErrors(log));
    }
}
