using System.Text.Json;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>fluids show</c>: the solid-phase keys of the fluid file, each with its source, the
/// published solid-line equations and the model's check at the triple point.</summary>
public class FluidsShowSolidTests
{
    private static readonly (string Key, Func<Fluid, SourcedValue?> Get)[] Keys =
    [
        ("triple_point_pressure_Pa", f => f.TriplePointPressure),
        ("enthalpy_of_fusion_J_mol", f => f.EnthalpyOfFusion),
        ("solid_density_mol_m3", f => f.SolidDensity),
        ("triple_point_liquid_density_mol_m3", f => f.TriplePointLiquidDensity),
        ("fusion_volume_change_m3_mol", f => f.FusionVolumeChange),
        ("solid_heat_capacity_J_molK", f => f.SolidHeatCapacity),
    ];

    [Theory]
    [InlineData("water")]
    [InlineData("carbon dioxide")]
    [InlineData("propane")]
    public void Json_SolidKeys_ValuesAndSourcesAsTheFileGivesThem(string name)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        var json = RunJson("fluids", "show", name, "--format", "json");
        var sources = json.GetProperty("sources");

        foreach (var (key, get) in Keys)
        {
            if (get(fluid) is { } value)
            {
                AssertSameDouble(value.Value, json.GetProperty(key).GetDouble(), key);
                Assert.Equal(value.Source, sources.GetProperty(key).GetString());
            }
            else
            {
                Assert.Equal(JsonValueKind.Null, json.GetProperty(key).ValueKind);
                Assert.False(sources.TryGetProperty(key, out _), $"{key} has no source when it has no value");
            }
        }

        foreach (var (key, equation) in new[] { ("melting_pressure_equation", fluid.MeltingPressureEquation), ("sublimation_pressure_equation", fluid.SublimationPressureEquation) })
        {
            var element = json.GetProperty(key);
            if (equation is null)
            {
                Assert.Equal(JsonValueKind.Null, element.ValueKind);
                continue;
            }

            Assert.Equal(equation.Form == SolidLineForm.Powers ? "powers" : "excess", element.GetProperty("form").GetString());
            AssertSameDouble(equation.ReducingTemperature, element.GetProperty("reducing_temperature_K").GetDouble(), $"{key} Tr");
            AssertSameDouble(equation.ReducingPressure, element.GetProperty("reducing_pressure_Pa").GetDouble(), $"{key} Pr");
            Assert.Equal(equation.Coefficients, element.GetProperty("coefficients").EnumerateArray().Select(e => e.GetDouble()).ToArray());
            Assert.Equal(equation.Exponents, element.GetProperty("exponents").EnumerateArray().Select(e => e.GetDouble()).ToArray());
            AssertSameDouble(equation.LowestTemperature, element.GetProperty("lowest_temperature_K").GetDouble(), $"{key} low");
            AssertSameDouble(equation.HighestTemperature, element.GetProperty("highest_temperature_K").GetDouble(), $"{key} high");
            Assert.Equal(equation.Source, element.GetProperty("source").GetString());
            Assert.Contains("P/Pr", element.GetProperty("equation").GetString(), StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("water")]
    [InlineData("carbon dioxide")]
    public void Json_TriplePointCheck_ModelVapourPressureAgainstSourced(string name)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        var json = RunJson("fluids", "show", name, "--format", "json");
        var check = json.GetProperty("triple_point_check");
        double model = CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson).AtTemperature(fluid.TriplePointTemperature!.Value).Pressure;

        AssertSameDouble(fluid.TriplePointTemperature.Value, check.GetProperty("temperature_K").GetDouble(), "T_t");
        AssertSameDouble(fluid.TriplePointPressure!.Value, check.GetProperty("sourced_pressure_Pa").GetDouble(), "sourced P_t");
        AssertSameDouble(model, check.GetProperty("model_pressure_Pa").GetDouble(), "model P at T_t");
        AssertSameDouble(model / fluid.TriplePointPressure.Value - 1, check.GetProperty("relative_deviation").GetDouble(), "relative deviation");
        Assert.StartsWith("Peng-Robinson", check.GetProperty("model").GetString(), StringComparison.Ordinal);
        Assert.Equal(JsonValueKind.Null, json.GetProperty("triple_point_check_unavailable_reason").ValueKind);
    }

    [Fact]
    public void Json_NoTriplePointPressure_CheckNullWithReason()
    {
        using var folder = new TempFolder();
        string text = string.Join('\n', CatalogFileText("water.fluid").Split('\n').Where(l => !l.StartsWith("triple_point_pressure ", StringComparison.Ordinal)));
        File.WriteAllText(folder.File("water-nopt.fluid"), text);

        var json = RunJson("fluids", "show", folder.File("water-nopt.fluid"), "--format", "json");

        Assert.Equal(JsonValueKind.Null, json.GetProperty("triple_point_pressure_Pa").ValueKind);
        Assert.Equal(JsonValueKind.Null, json.GetProperty("triple_point_check").ValueKind);
        Assert.Contains("triple_point_pressure", json.GetProperty("triple_point_check_unavailable_reason").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Table_Water_ShowsSolidKeysEquationsAndCheck()
    {
        string text = RunText("fluids", "show", "water");

        foreach (string part in new[]
        {
            "triple point pressure", "enthalpy of fusion", "solid density", "liquid density at the triple point", "volume change on melting",
            "melting-pressure equation: powers", "sublimation-pressure equation: powers", "triple-point check (Peng-Robinson",
        })
        {
            Assert.Contains(part, text, StringComparison.Ordinal);
        }
    }
}
