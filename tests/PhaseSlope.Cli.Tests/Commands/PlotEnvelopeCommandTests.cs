using System.Xml.Linq;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>phaseslope plot MIXTURE --diagram envelope</c>: the envelope figure of a mixture.</summary>
public class PlotEnvelopeCommandTests
{
    [Fact]
    public void Envelope_svg_has_both_branches_and_the_landmarks_in_the_legend()
    {
        using var folder = new TempFolder();
        string path = folder.File("envelope.svg");
        var result = CliHarness.Run("plot", "methane=0.8,carbon dioxide=0.2", "--diagram", "envelope", "--out", path, "--units", "engineering");
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        var svg = XDocument.Load(path);
        XNamespace ns = "http://www.w3.org/2000/svg";
        var texts = svg.Descendants(ns + "text").Select(t => t.Value.Trim()).ToList();
        Assert.Contains("temperature T (°C)", texts);
        Assert.Contains("pressure P (bar)", texts);
        foreach (string entry in new[] { "bubble line", "dew line", "critical point", "cricondenbar", "cricondentherm" })
        {
            Assert.Contains(entry, texts);
        }
    }

    [Theory]
    [InlineData("--reduced")]
    [InlineData("--isotherms", "300 K")]
    public void Envelope_refuses_the_options_of_pure_diagrams(params string[] extra)
    {
        using var folder = new TempFolder();
        string path = folder.File("envelope.png");
        var result = CliHarness.Run(["plot", "methane=0.5,ethane=0.5", "--diagram", "envelope", "--out", path, .. extra]);
        CliHarness.AssertFailure(result, ExitCodes.Usage, $"{extra[0]}: the envelope diagram does not take it");
        Assert.Empty(folder.Entries());
    }

    [Fact]
    public void Envelope_of_one_component_is_refused()
    {
        using var folder = new TempFolder();
        var result = CliHarness.Run("plot", "methane=1", "--diagram", "envelope", "--out", folder.File("e.png"));
        CliHarness.AssertFailure(result, ExitCodes.Usage, "MIXTURE: a phase envelope needs at least two components");
        Assert.Empty(folder.Entries());
    }
}
