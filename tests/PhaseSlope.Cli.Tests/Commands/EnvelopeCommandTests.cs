using System.Text.Json;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>phaseslope envelope</c>: the core's envelope in the JSON keys, the table,
/// and the cross-check with the Heidemann–Khalil critical point.</summary>
public sealed class EnvelopeCommandTests
{
    private static (double T, double P) Pair(JsonElement e) => (e.GetProperty("temperature_K").GetDouble(), e.GetProperty("pressure_Pa").GetDouble());

    [Fact]
    public void Json_MethaneEthane_BranchesLandmarksAndTheCoreNumbers()
    {
        // The command prints the core's numbers (round-trip JSON): compare with the tracer run
        // directly on the same model (methane-ethane has no published k_ij in the table, so 0).
        var root = RunJson("envelope", "methane=0.5,ethane=0.5", "--format", "json");
        var model = new CubicMixtureModel([CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find("methane")), CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find("ethane"))]);
        var envelope = new EnvelopeTracer(model).Trace([0.5, 0.5]);
        var bubble = root.GetProperty("points").GetProperty("bubble").EnumerateArray().ToArray();
        var dew = root.GetProperty("points").GetProperty("dew").EnumerateArray().ToArray();
        Assert.Equal(envelope.BubblePoints.Count(), bubble.Length);
        Assert.Equal(envelope.DewPoints.Count(), dew.Length);
        Assert.Equal(envelope.Points[0].Temperature, bubble[0].GetProperty("temperature_K").GetDouble());
        // The first bubble point is at the default minimum pressure, 100 kPa, within the Newton tolerance.
        AssertRelative(1e5, bubble[0].GetProperty("pressure_Pa").GetDouble(), 1e-9, "first bubble pressure");
        // Bubble points: the liquid is the feed; dew points: the vapour is the feed.
        Assert.Equal(0.5, bubble[3].GetProperty("liquid_mole_fractions").GetProperty("methane").GetDouble());
        Assert.Equal(0.5, dew[3].GetProperty("vapour_mole_fractions").GetProperty("ethane").GetDouble());
        Assert.True(bubble[3].GetProperty("vapour_mole_fractions").GetProperty("methane").GetDouble() > 0.5, "the incipient vapour is richer in methane");
        var critical = Pair(root.GetProperty("critical_point"));
        Assert.Equal(envelope.CriticalPoint!.Value.Temperature, critical.T);
        var criteria = Pair(root.GetProperty("critical_point_criteria"));
        // The two routes agree as in the core tests (EnvelopeTracerTests: 1e-5 relative, justified there).
        AssertRelative(criteria.T, critical.T, 1e-5, "critical temperature, envelope against Heidemann-Khalil");
        AssertRelative(criteria.P, critical.P, 1e-5, "critical pressure, envelope against Heidemann-Khalil");
        var bar = Pair(root.GetProperty("cricondenbar"));
        var therm = Pair(root.GetProperty("cricondentherm"));
        Assert.True(bubble.Concat(dew).All(p => p.GetProperty("pressure_Pa").GetDouble() <= bar.P * (1 + 1e-9)), "cricondenbar is the highest pressure");
        Assert.True(bubble.Concat(dew).All(p => p.GetProperty("temperature_K").GetDouble() <= therm.T * (1 + 1e-9)), "cricondentherm is the highest temperature");
        Assert.Equal("end_pressure", root.GetProperty("stop_reason").GetString());
        Assert.Contains("licensed", root.GetProperty("caution").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Table_NamesTheLandmarksAndCautions()
    {
        string text = RunText("envelope", "methane=0.8,carbon dioxide=0.2");
        Assert.Contains("critical point: T = ", text, StringComparison.Ordinal);
        Assert.Contains("critical point (Heidemann-Khalil criteria): T = ", text, StringComparison.Ordinal);
        Assert.Contains("cricondenbar: T = ", text, StringComparison.Ordinal);
        Assert.Contains("cricondentherm: T = ", text, StringComparison.Ordinal);
        Assert.Contains("bubble", text, StringComparison.Ordinal);
        Assert.Contains("dew", text, StringComparison.Ordinal);
        Assert.Contains("caution: ", text, StringComparison.Ordinal);
    }

    [Fact]
    public void MinPressure_MovesTheEndsOfBothBranches()
    {
        // --min-pressure 50 kPa: the bubble line starts there and the dew line ends just below it.
        var root = RunJson("envelope", "methane=0.8,carbon dioxide=0.2", "--min-pressure", "50 kPa", "--format", "json");
        var bubble = root.GetProperty("points").GetProperty("bubble").EnumerateArray().ToArray();
        var dew = root.GetProperty("points").GetProperty("dew").EnumerateArray().ToArray();
        AssertRelative(5e4, bubble[0].GetProperty("pressure_Pa").GetDouble(), 1e-9, "first bubble pressure");
        Assert.True(dew[^1].GetProperty("pressure_Pa").GetDouble() < 5e4, "the dew line comes back below 50 kPa");
        Assert.True(dew[^2].GetProperty("pressure_Pa").GetDouble() >= 5e4, "and stops at the first point below");
    }
}
