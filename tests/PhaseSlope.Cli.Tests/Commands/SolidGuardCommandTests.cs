using System.Globalization;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>The commands reach down to the triple point and no further: coexistence from the triple
/// point, states the fluid's own data place in the solid refused (also inside a batch), and mixture
/// results below a component's triple point cautioned. The refusals themselves (one stderr line,
/// exit 4, nothing on stdout) are rows of <see cref="BadInputCatalogueTests"/>.</summary>
public class SolidGuardCommandTests
{
    [Fact]
    public void Coexist_Propane_AtItsTriplePoint_IsSolved()
    {
        // Lemmon, McLinden & Wagner (2009): triple point 85.525 K (from memory); before, refused below
        // 0.3 Tc = 110.967 K. The pressure is checked against the reference in the core tests.
        var json = RunJson("coexist", "propane", "--temperature", "85.525 K", "--format", "json");
        Assert.Equal(85.525, json.GetProperty("temperature_K").GetDouble());
        Assert.True(json.GetProperty("pressure_Pa").GetDouble() > 0);

        var show = RunJson("fluids", "show", "propane", "--format", "json");
        Assert.Equal(85.525, show.GetProperty("lowest_valid_temperature_K").GetDouble());
    }

    [Fact]
    public void Curve_Propane_StartsAtTheTriplePoint()
    {
        var rows = RunJson("curve", "propane", "--points", "5", "--format", "json").EnumerateArray().ToArray();
        Assert.Equal(85.525, rows[0].GetProperty("temperature_K").GetDouble());
    }

    [Fact]
    public void StateBatch_RowInTheSolid_IsRefusedByLineTheOthersComputed()
    {
        // Water: 300 K, 1 atm is liquid; 260 K, 1 atm is ice Ih (IAPWS 2011 lines in the catalog);
        // 250 K, 50 Pa is vapour below the sublimation line (about 76 Pa, from memory).
        string dir = Directory.CreateTempSubdirectory("phaseslope-solid").FullName;
        string file = Path.Combine(dir, "states.csv");
        File.WriteAllText(file, "T [K],P [Pa]\n300,101325\n260,101325\n250,50\n");
        var result = Run("state", "water", "--batch", file, "--format", "json");

        Assert.Equal(ExitCodes.BatchRowsFailed, result.ExitCode);
        var rows = StrictJson.Parse(result.Stdout).RootElement.EnumerateArray().ToArray();
        Assert.Equal(3, rows.Length);
        Assert.Contains(":3: water at 260 K and 101325 Pa is solid by its own data", rows[1].GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Equal("superheated-vapour", rows[2].GetProperty("state").GetProperty("phase").GetString());
        Assert.Single(result.StderrLines);
    }

    [Fact]
    public void MixtureFlashAndBubble_BelowAComponentsTriplePoint_CarryACaution()
    {
        // n-decane's triple point 243.5 K (Lemmon & Span 2006, from memory): at 200 K a solid may
        // form; the mixture models have no solid, so the result is given with the caution.
        const string Caution = "200 K is below the triple point of n-decane (243.5 K): a solid may form; this tool does not model solid phases";
        var flash = RunJson("flash", "methane=0.5,n-decane=0.5", "-T", "200 K", "-P", "5 MPa", "--format", "json");
        Assert.Contains(flash.GetProperty("notes").EnumerateArray(), n => n.GetString() == Caution);
        Assert.Contains("caution: " + Caution, RunText("flash", "methane=0.5,n-decane=0.5", "-T", "200 K", "-P", "5 MPa"), StringComparison.Ordinal);

        var warm = RunJson("flash", "methane=0.5,n-decane=0.5", "-T", "300 K", "-P", "5 MPa", "--format", "json");
        Assert.DoesNotContain(warm.GetProperty("notes").EnumerateArray(), n => n.GetString()!.Contains("triple point", StringComparison.Ordinal));

        var bubble = RunJson("bubble", "methane=0.3,n-decane=0.7", "-T", "220 K", "--format", "json");
        Assert.Contains(bubble.GetProperty("notes").EnumerateArray(), n => n.GetString()!.StartsWith("220 K is below the triple point of n-decane", StringComparison.Ordinal));
    }

    [Fact]
    public void Envelope_ReachingBelowAComponentsTriplePoint_CarriesACaution()
    {
        var json = RunJson("envelope", "methane=0.9,n-decane=0.1", "--format", "json");
        var points = json.GetProperty("points");
        double coldest = points.GetProperty("bubble").EnumerateArray().Concat(points.GetProperty("dew").EnumerateArray()).Min(p => p.GetProperty("temperature_K").GetDouble());
        Assert.True(coldest < 243.5, coldest.ToString(CultureInfo.InvariantCulture));
        Assert.Contains(json.GetProperty("notes").EnumerateArray(), n => n.GetString()!.StartsWith("the envelope's coldest point: ", StringComparison.Ordinal)
            && n.GetString()!.Contains("below the triple point of n-decane (243.5 K)", StringComparison.Ordinal));
    }
}
