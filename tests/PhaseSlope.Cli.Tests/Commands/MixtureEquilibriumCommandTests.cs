using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>bubble</c>, <c>dew</c> and <c>flash</c>: a blend given as on its datasheet, its
/// bubble and dew points with the glide, and the flash with its phase compositions keyed by
/// component name.</summary>
public sealed class MixtureEquilibriumCommandTests
{
    private static double[] Fractions(JsonElement root, string key, params string[] names)
        => names.Select(n => root.GetProperty(key).GetProperty(n).GetDouble()).ToArray();

    [Fact]
    public void Bubble_R407C_AtOneAtmosphere_GivesTheGlide()
    {
        // R-407C = R-32/R-125/R-134a 23/25/52 % by mass: glide about 7 K at 101.325 kPa (ASHRAE
        // Standard 34 refrigerant data; from memory); bubble −43.8 °C (same source, from memory).
        // Peng–Robinson, k_ij = 0: within 1 K (the model's accuracy for HFC blends without fitted
        // k_ij; the core test R407C_AtOneAtmosphere_HasItsPublishedGlide gives the reasoning).
        var root = RunJson("bubble", "R-32=0.23,R-125=0.25,R-134a=0.52", "--mass-fractions", "--pressure", "1 atm", "--format", "json");
        Assert.Equal("bubble", root.GetProperty("point").GetString());
        Assert.Equal(101325, root.GetProperty("pressure_Pa").GetDouble());
        Assert.Equal(-43.8 + 273.15, root.GetProperty("temperature_K").GetDouble(), 1.0);
        Assert.Equal(7.1, root.GetProperty("glide_K").GetDouble(), 1.0);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("glide_unavailable_reason").ValueKind);
        // The liquid is the feed; the incipient vapour is richer in the volatile R-32.
        var feed = Fractions(root, "feed_mole_fractions", "r-32", "r-125", "r-134a");
        Assert.Equal(feed, Fractions(root, "liquid_mole_fractions", "r-32", "r-125", "r-134a"));
        Assert.True(Fractions(root, "vapour_mole_fractions", "r-32")[0] > feed[0]);
        Assert.Equal(1, Fractions(root, "vapour_mole_fractions", "r-32", "r-125", "r-134a").Sum(), 1e-12);
        Assert.True(root.GetProperty("liquid").GetProperty("density_mol_m3").GetDouble() > root.GetProperty("vapour").GetProperty("density_mol_m3").GetDouble());
        Assert.True(root.GetProperty("solver").GetProperty("model_evaluations").GetInt32() > 0);
    }

    [Fact]
    public void BubbleAndDew_AtTemperature_HaveNoGlideAndMatchTheFlash()
    {
        // At a given temperature the glide (a temperature difference at one pressure) is null with
        // its reason. The dew pressure is below the bubble pressure, and a flash between them splits.
        string[] mix = ["methane=0.2,propane=0.8", "-T", "250", "--format", "json"];
        var bubble = RunJson(["bubble", .. mix]);
        var dew = RunJson(["dew", .. mix]);
        Assert.Equal(JsonValueKind.Null, bubble.GetProperty("glide_K").ValueKind);
        Assert.Contains("--pressure", bubble.GetProperty("glide_unavailable_reason").GetString(), StringComparison.Ordinal);
        double pb = bubble.GetProperty("pressure_Pa").GetDouble(), pd = dew.GetProperty("pressure_Pa").GetDouble();
        Assert.True(pd < pb);
        var flash = RunJson("flash", "methane=0.2,propane=0.8", "-T", "250", "-P", $"{0.5 * (pb + pd)} Pa", "--format", "json");
        Assert.Equal("two-phase", flash.GetProperty("phase").GetString());
        double beta = flash.GetProperty("vapour_fraction").GetDouble();
        Assert.InRange(beta, 0, 1);
        // Material balance through the JSON (round-trip numbers): 1e-12.
        var x = Fractions(flash, "liquid_mole_fractions", "methane", "propane");
        var y = Fractions(flash, "vapour_mole_fractions", "methane", "propane");
        Assert.Equal(0.2, (1 - beta) * x[0] + beta * y[0], 1e-12);
        Assert.False(flash.GetProperty("stability").GetProperty("feed_stable").GetBoolean());
        Assert.True(flash.GetProperty("stability").GetProperty("gibbs_energy_change_per_RT").GetDouble() < 0);
    }

    [Fact]
    public void Flash_SinglePhase_HasNullForTheAbsentPhase()
    {
        var root = RunJson("flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "10 MPa", "--format", "json");
        Assert.Equal("liquid", root.GetProperty("phase").GetString());
        Assert.Equal(0, root.GetProperty("vapour_fraction").GetDouble());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("vapour_mole_fractions").ValueKind);
        Assert.Equal(JsonValueKind.Null, root.GetProperty("vapour").ValueKind);
        Assert.True(root.GetProperty("stability").GetProperty("feed_stable").GetBoolean());
    }

    [Fact]
    public void FlashAtEnthalpy_InvertsTheTemperatureFlash()
    {
        // h of a P-T flash (round-trip JSON), then the P-h flash of it: the temperature to 1e-6 K
        // (the outer search stops at 1e-9 K).
        var pt = RunJson("flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "1 MPa", "--format", "json");
        double h = pt.GetProperty("enthalpy_J_mol").GetDouble();
        var ph = RunJson("flash", "methane=0.2,propane=0.8", "-P", "1 MPa", "--enthalpy", $"{h:R} J/mol", "--format", "json");
        Assert.Equal(250, ph.GetProperty("temperature_K").GetDouble(), 1e-6);
        Assert.True(ph.GetProperty("solver").GetProperty("temperature_steps").GetInt32() > 0);
    }

    [Theory]
    [InlineData("bubble")]
    [InlineData("dew")]
    public void NoPointOutsideTheEnvelope_IsRefusedAsNotConverged(string point)
    {
        // 90 % methane with propane at 300 K lies outside its phase envelope (above its
        // cricondentherm): no bubble or dew point, exit 5 with one line saying so.
        var result = Run(point, "methane=0.9,propane=0.1", "-T", "300");
        AssertFailure(result, ExitCodes.NotConverged, point);
    }

    [Fact]
    public void Table_ShowsBothPhasesAndTheCaution()
    {
        string table = RunText("flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "1 MPa");
        Assert.Contains("x methane", table, StringComparison.Ordinal);
        Assert.Contains("two-phase", table, StringComparison.Ordinal);
        Assert.Contains("licensed engineering practice", table, StringComparison.Ordinal);
    }
}
