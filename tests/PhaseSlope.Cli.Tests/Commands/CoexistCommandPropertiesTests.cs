using System.Globalization;
using System.Text.Json;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>The per-phase properties and along-line slopes of <c>coexist --format json</c>, and the
/// vapour-line class of <c>fluids show</c>.</summary>
public class CoexistCommandPropertiesTests
{
    private static readonly (string Key, Func<SaturatedPhase, double?> Value)[] SlopeKeys =
    [
        ("density_slope_mol_m3K", p => p.DensitySlope),
        ("enthalpy_slope_J_molK", p => p.EnthalpySlope),
        ("entropy_slope_J_molK2", p => p.EntropySlope),
        ("internal_energy_slope_J_molK", p => p.InternalEnergySlope),
        ("saturation_heat_capacity_J_molK", p => p.SaturationHeatCapacity),
    ];

    [Theory]
    [InlineData("propane", "pr", CubicModelKind.PengRobinson, 300.0)]
    [InlineData("water", "srk", CubicModelKind.SoaveRedlichKwong, 450.0)]
    [InlineData("toluene", "pr78", CubicModelKind.PengRobinson1978, 500.0)]
    public void Json_PerPhasePropertiesAndSlopes_EqualPropertyModel(string fluid, string eos, CubicModelKind kind, double t)
    {
        var json = RunJson("coexist", fluid, "--eos", eos, "--temperature", t.ToString("R", CultureInfo.InvariantCulture), "--format", "json");
        var engine = StateCommandTests.Engine(fluid, kind);
        var c = engine.Coexistence(engine.Solver.AtTemperature(t));

        foreach (var (name, phase) in new[] { ("liquid", c.Liquid), ("vapour", c.Vapour) })
        {
            var obj = json.GetProperty(name);
            foreach (var (key, value) in SlopeKeys)
            {
                Assert.True(obj.TryGetProperty(key, out var element), $"{name} lacks {key}");
                AssertSameDouble(value(phase)!.Value, element.GetDouble(), $"{name}.{key}");
            }

            // The state keys other than T and P (which the coexistence object carries once).
            foreach (var (key, value) in StateCommandTests.Keys.Where(k => k.Key is not ("temperature_K" or "pressure_Pa")))
            {
                Assert.True(obj.TryGetProperty(key, out var element), $"{name} lacks {key}");
                AssertSameDouble(value(phase.State)!.Value, element.GetDouble(), $"{name}.{key}");
            }
        }
    }

    [Fact]
    public void Json_Reference_ChangesAbsoluteEnthalpyButNotLatentHeat()
    {
        JsonElement Run(string reference) => RunJson("coexist", "propane", "--temperature", "300", "--reference", reference, "--format", "json");
        var ideal = Run("ideal-gas");
        var refrigeration = Run("refrigeration");
        var minus40 = Run("minus40");

        double hIdeal = ideal.GetProperty("liquid").GetProperty("enthalpy_J_mol").GetDouble();
        double hRefrigeration = refrigeration.GetProperty("liquid").GetProperty("enthalpy_J_mol").GetDouble();
        double hMinus40 = minus40.GetProperty("liquid").GetProperty("enthalpy_J_mol").GetDouble();
        // The offsets differ by kJ/mol: the refrigeration zero is 200 kJ/kg·M ≈ 8.8 kJ/mol above
        // the liquid at 0 °C, the ideal-gas zero ~ the latent heat above the liquid.
        Assert.True(Math.Abs(hIdeal - hRefrigeration) > 1000, $"{hIdeal} vs {hRefrigeration}");
        Assert.True(Math.Abs(hMinus40 - hRefrigeration) > 1000, $"{hMinus40} vs {hRefrigeration}");
        Assert.Equal("refrigeration", refrigeration.GetProperty("reference").GetString());

        double latent = ideal.GetProperty("enthalpy_of_vaporization_J_mol").GetDouble();
        AssertSameDouble(latent, refrigeration.GetProperty("enthalpy_of_vaporization_J_mol").GetDouble(), "enthalpy_of_vaporization_J_mol");
        AssertSameDouble(latent, minus40.GetProperty("enthalpy_of_vaporization_J_mol").GetDouble(), "enthalpy_of_vaporization_J_mol");
        AssertSameDouble(ideal.GetProperty("slope_Pa_K").GetDouble(), minus40.GetProperty("slope_Pa_K").GetDouble(), "slope_Pa_K");
        // h_V − h_L of each reference equals the latent heat to the rounding of the offset
        // (a few ulps of ~1e4 J/mol).
        foreach (var json in new[] { ideal, refrigeration, minus40 })
        {
            double difference = json.GetProperty("vapour").GetProperty("enthalpy_J_mol").GetDouble() - json.GetProperty("liquid").GetProperty("enthalpy_J_mol").GetDouble();
            AssertRelative(latent, difference, 1e-12, $"h_V - h_L on {json.GetProperty("reference").GetString()}");
        }
    }

    [Theory]
    [InlineData("toluene", "dry")]
    [InlineData("n-pentane", "dry")]
    [InlineData("water", "wet")]
    [InlineData("ammonia", "wet")]
    public void ShowJson_VapourLine_ClassOfTheFluid(string fluid, string expected)
    {
        var json = RunJson("fluids", "show", fluid, "--format", "json");
        var line = VapourLine.Classify(StateCommandTests.Engine(fluid, CubicModelKind.PengRobinson));

        Assert.Equal(expected, json.GetProperty("vapour_line").GetString());
        AssertSameDouble(line.ReducedSlope, json.GetProperty("vapour_line_reduced_slope").GetDouble(), "vapour_line_reduced_slope");
        var tMax = json.GetProperty("maximum_vapour_entropy_temperature_K");
        if (expected == "dry")
        {
            AssertSameDouble(line.MaximumEntropyTemperature!.Value, tMax.GetDouble(), "maximum_vapour_entropy_temperature_K");
            Assert.True(tMax.GetDouble() < json.GetProperty("critical_temperature_K").GetDouble());
        }
        else
        {
            Assert.Equal(JsonValueKind.Null, tMax.ValueKind);
        }
    }
}
