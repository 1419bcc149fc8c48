using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The mixture file: what it reads, and every malformed file refused at its line.</summary>
public sealed class MixtureFileTests
{
    private static (Mixture Mixture, string? Name, string? Remarks) Parse(string text)
        => MixtureFile.Parse(new StringReader(text), "test.mixture", FluidCatalog.Embedded.Find);

    private const string Head = "format phaseslope-mixture 1\n";

    [Fact]
    public void Parse_ReadsComponentsBasisAndInteractions()
    {
        var (mixture, name, remarks) = Parse(
            "# an invented blend for the test\n" + Head
            + "name       test blend (invented)\n"
            + "basis      mass\n"
            + "component  r-32 = 0.23\n"
            + "component  R-125=0.25\n"
            + "component  HFC-134a = 0.52\n"
            + "kij        r-32, r-134a = 0.01 | invented for this test\n"
            + "remarks    anything\n");
        Assert.Equal(("test blend (invented)", "anything"), (name, remarks));
        Assert.Equal(["r-32", "r-125", "r-134a"], mixture.Components.Select(c => c.Name));
        // Mass basis: the same mole fractions as the hand computation in MixtureTests (5e-8).
        Assert.Equal(0.3811104, mixture.MoleFractions[0], 5e-8);
        var kij = mixture.Interactions(CubicModelKind.PengRobinson);
        Assert.Equal((0.01, "invented for this test", InteractionOrigin.Given), (kij[2, 0], kij.Pair(0, 2).Source, kij.Pair(0, 2).Origin));
        Assert.Equal(InteractionOrigin.AssumedZero, kij.Pair(0, 1).Origin);
    }

    [Theory]
    [InlineData("component methane = 1\n", 1, "format", "the first entry must be 'format phaseslope-mixture 1'")]
    [InlineData("format phaseslope-mixture 2\n", 1, "format", "the first entry must be")]
    [InlineData(Head, 1, "component", "no component lines")]
    [InlineData(Head + "component methane 0.5\ncomponent ethane=0.5\n", 2, "component", "is not NAME=FRACTION")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=half\n", 3, "component", "the fraction of 'ethane' is 'half'")]
    [InlineData(Head + "component methane=0.5\ncomponent metane=0.5\n", 3, "component", "unknown fluid 'metane'; did you mean 'methane'")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=0.4\n", 3, "component", "sum to 0.9, not 1")]
    [InlineData(Head + "component methane=1.2\ncomponent ethane=-0.2\n", 3, "component", "the mole fraction of 'ethane' is -0.2")]
    [InlineData(Head + "component methane=0.5\ncomponent CH4=0.5\n", 3, "component", "component 'methane' is given twice")]
    [InlineData(Head + "component methane=0.5 | my lab\ncomponent ethane=0.5\n", 2, "component", "takes no source")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=0.5\nkij methane, ethane = 0.01\n", 4, "kij", "needs '| source'")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=0.5\nkij methane ethane = 0.01 | x\n", 4, "kij", "is not A,B=VALUE")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=0.5\nkij methane, propane = 0.01 | x\n", 4, "kij", "'propane' is not a component of this mixture")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=0.5\nkij methane, ethane = 0.01 | x\nkij ethane, methane = 0.02 | y\n", 5, "kij", "is given twice")]
    [InlineData(Head + "component methane=0.5\ncomponent ethane=0.5\nkij methane, ethane = 1.5 | x\n", 4, "kij", "must be between -1 and 1")]
    [InlineData(Head + "basis volume\ncomponent methane=1\n", 2, "basis", "'volume' is not a basis")]
    [InlineData(Head + "name a\nname b\ncomponent methane=1\n", 3, "name", "given twice")]
    [InlineData(Head + "colour blue\ncomponent methane=1\n", 2, "colour", "unknown key")]
    public void Parse_BadFile_IsRefusedAtItsLine(string text, int line, string field, string message)
    {
        var ex = Assert.Throws<FluidDataException>(() => Parse(text));
        Assert.Equal((line, field), (ex.Line, ex.Field));
        Assert.Contains(message, ex.Message, StringComparison.Ordinal);
        Assert.StartsWith($"test.mixture:{line}: field '{field}': ", ex.Message, StringComparison.Ordinal);
    }
}
