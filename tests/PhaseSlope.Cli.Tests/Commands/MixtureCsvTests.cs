using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>The CSV of bubble, dew and flash is their JSON flattened: the same keys, the same numbers.</summary>
public class MixtureCsvTests
{
    [Theory]
    [InlineData("bubble", "-P", "1atm")]
    [InlineData("dew", "-T", "250")]
    [InlineData("flash", "-T", "250", "-P", "1MPa")]
    public void Csv_IsTheFlattenedJson(string command, params string[] state)
    {
        string[] args = [command, "methane=0.2,propane=0.8", .. state];
        var json = RunJson([.. args, "--format", "json"]);
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv"]));
        Assert.Equal(2, rows.Count);
        string Cell(string key) => rows[1][Array.IndexOf(rows[0], key)];

        // Top-level numbers and a nested object's numbers, as JSON wrote them (round-trip text).
        foreach (string key in new[] { "temperature_K", "pressure_Pa" })
        {
            Assert.Equal(json.GetProperty(key).GetRawText(), Cell(key));
        }

        Assert.Equal(json.GetProperty("liquid_mole_fractions").GetProperty("propane").GetRawText(), Cell("liquid_mole_fractions_propane"));
        Assert.Equal(json.GetProperty("vapour_mole_fractions").GetProperty("methane").GetRawText(), Cell("vapour_mole_fractions_methane"));
        if (json.TryGetProperty("vapour_fraction", out JsonElement beta))
        {
            Assert.Equal(beta.GetRawText(), Cell("vapour_fraction"));
        }
    }
}

/// <summary>The envelope's CSV: one row per traced point, both branches, as in the JSON.</summary>
public class EnvelopeCsvTests
{
    [Fact]
    public void Csv_OneRowPerPoint_BothBranches_SameNumbers()
    {
        string[] args = ["envelope", "methane=0.8,ethane=0.2"];
        var json = RunJson([.. args, "--format", "json"]);
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv"]));
        var bubble = json.GetProperty("points").GetProperty("bubble").EnumerateArray().ToArray();
        var dew = json.GetProperty("points").GetProperty("dew").EnumerateArray().ToArray();
        Assert.Equal(1 + bubble.Length + dew.Length, rows.Count);
        int t = Array.IndexOf(rows[0], "temperature_K");
        Assert.Equal("bubble", rows[1][0]);
        Assert.Equal(bubble[0].GetProperty("temperature_K").GetRawText(), rows[1][t]);
        Assert.Equal("dew", rows[^1][0]);
        Assert.Equal(dew[^1].GetProperty("temperature_K").GetRawText(), rows[^1][t]);
    }
}
