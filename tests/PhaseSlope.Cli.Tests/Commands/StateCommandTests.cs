using System.Globalization;
using System.Text.Json;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

public class StateCommandTests
{
    /// <summary>Every property key of the state JSON with the core value it must carry (written
    /// out here, not taken from the writer's own column list).</summary>
    internal static readonly (string Key, Func<ThermodynamicState, double?> Value)[] Keys =
    [
        ("temperature_K", s => s.Temperature),
        ("pressure_Pa", s => s.Pressure),
        ("density_mol_m3", s => s.Density),
        ("molar_volume_m3_mol", s => s.MolarVolume),
        ("compressibility_factor", s => s.CompressibilityFactor),
        ("internal_energy_J_mol", s => s.InternalEnergy),
        ("enthalpy_J_mol", s => s.Enthalpy),
        ("entropy_J_molK", s => s.Entropy),
        ("helmholtz_energy_J_mol", s => s.HelmholtzEnergy),
        ("gibbs_energy_J_mol", s => s.GibbsEnergy),
        ("isobaric_heat_capacity_J_molK", s => s.IsobaricHeatCapacity),
        ("isochoric_heat_capacity_J_molK", s => s.IsochoricHeatCapacity),
        ("speed_of_sound_m_s", s => s.SpeedOfSound),
        ("isobaric_expansivity_1_K", s => s.IsobaricExpansivity),
        ("isothermal_compressibility_1_Pa", s => s.IsothermalCompressibility),
        ("isentropic_compressibility_1_Pa", s => s.IsentropicCompressibility),
        ("joule_thomson_coefficient_K_Pa", s => s.JouleThomsonCoefficient),
        ("internal_pressure_Pa", s => s.InternalPressure),
        ("ln_fugacity_coefficient", s => s.LnFugacityCoefficient),
    ];

    internal static PropertyModel Engine(string fluid, CubicModelKind kind, ReferenceState? reference = null)
    {
        Fluid f = FluidCatalog.Embedded.Find(fluid);
        return new PropertyModel(f, CubicModel.For(kind, f), reference);
    }

    private static void AssertMatchesState(JsonElement json, ThermodynamicState state, bool skipPressure = false)
    {
        foreach (var (key, value) in Keys)
        {
            Assert.True(json.TryGetProperty(key, out var element), $"missing key {key}");
            if (skipPressure && key == "pressure_Pa")
            {
                continue;
            }

            AssertSameDouble(value(state)!.Value, element.GetDouble(), key);
        }

        Assert.Equal(state.Phase.ToString().ToLowerInvariant(), json.GetProperty("branch").GetString());
        Assert.Equal(state.Metastable, json.GetProperty("metastable").GetBoolean());
    }

    [Theory]
    [InlineData("propane", "pr", CubicModelKind.PengRobinson, 300.0, 2e6, "compressed-liquid")]
    [InlineData("propane", "pr", CubicModelKind.PengRobinson, 300.0, 1e5, "superheated-vapour")]
    [InlineData("propane", "pr", CubicModelKind.PengRobinson, 450.0, 6e6, "supercritical-fluid")]
    [InlineData("water", "srk", CubicModelKind.SoaveRedlichKwong, 400.0, 1e6, "compressed-liquid")]
    [InlineData("ethanol", "pr78", CubicModelKind.PengRobinson1978, 400.0, 1e5, "superheated-vapour")]
    public void Json_TemperatureAndPressure_EveryKeyBitForBitEqualToCore(string fluid, string eos, CubicModelKind kind, double t, double p, string phase)
    {
        var json = RunJson("state", fluid, "--eos", eos, "-T", t.ToString("R", CultureInfo.InvariantCulture),
            "-P", p.ToString("R", CultureInfo.InvariantCulture), "--format", "json");
        var state = Engine(fluid, kind).AtPressure(t, p);

        Assert.Equal(fluid, json.GetProperty("fluid").GetString());
        Assert.Equal(eos, json.GetProperty("eos").GetString());
        Assert.Equal("ideal-gas", json.GetProperty("reference").GetString());
        Assert.Equal(phase, json.GetProperty("phase").GetString());
        AssertMatchesState(json, state);
    }

    [Fact]
    public void Json_Density_EqualsCoreAtDensity()
    {
        var json = RunJson("state", "propane", "-T", "300", "--density", "11600", "--format", "json");
        var state = Engine("propane", CubicModelKind.PengRobinson).AtDensity(300, 11600);

        Assert.Equal("compressed-liquid", json.GetProperty("phase").GetString());
        AssertMatchesState(json, state);
    }

    [Fact]
    public void Json_MassDensity_ConvertedWithMolarMass()
    {
        // 515 kg/m³ of propane (M = 0.04409562 kg/mol) is 515/M mol/m³; one division, exact to an ulp.
        var json = RunJson("state", "propane", "-T", "300", "--density", "515 kg/m3", "--format", "json");

        AssertRelative(515 / 0.04409562, json.GetProperty("density_mol_m3").GetDouble(), 1e-15, "density_mol_m3");
        AssertRelative(515, json.GetProperty("density_kg_m3").GetDouble(), 1e-15, "density_kg_m3");
    }

    [Theory]
    [InlineData("liquid", 0.9e6, "metastable-liquid")]
    [InlineData("vapour", 1.05e6, "metastable-vapour")]
    public void Json_PhaseChosenAgainstStability_MetastableFlag(string choice, double p, string phase)
    {
        // Propane PR: Psat(300 K) ≈ 0.998 MPa, so at 0.9 MPa the liquid and at 1.05 MPa the vapour
        // is the metastable root (both inside the spinodal window at 0.81 Tc).
        string pressure = p.ToString("R", CultureInfo.InvariantCulture);
        var json = RunJson("state", "propane", "-T", "300", "-P", pressure, "--phase", choice, "--format", "json");
        var stable = RunJson("state", "propane", "-T", "300", "-P", pressure, "--format", "json");
        var engine = Engine("propane", CubicModelKind.PengRobinson);
        var expected = engine.AtPressure(300, p, choice == "liquid" ? PhaseChoice.Liquid : PhaseChoice.Vapour);

        Assert.Equal(phase, json.GetProperty("phase").GetString());
        Assert.True(json.GetProperty("metastable").GetBoolean());
        Assert.False(stable.GetProperty("metastable").GetBoolean());
        Assert.NotEqual(phase, stable.GetProperty("phase").GetString());
        Assert.True(json.GetProperty("gibbs_energy_J_mol").GetDouble() > stable.GetProperty("gibbs_energy_J_mol").GetDouble());
        AssertMatchesState(json, expected);
    }

    [Fact]
    public void Json_Reference_ChangesAbsoluteEnthalpyOnly()
    {
        var ideal = RunJson("state", "propane", "-T", "300", "-P", "1e5", "--format", "json");
        var nbp = RunJson("state", "propane", "-T", "300", "-P", "1e5", "--reference", "nbp", "--format", "json");
        var state = Engine("propane", CubicModelKind.PengRobinson, ReferenceState.NormalBoilingPoint).AtPressure(300, 1e5);

        Assert.Equal("nbp", nbp.GetProperty("reference").GetString());
        AssertMatchesState(nbp, state);
        Assert.True(Math.Abs(ideal.GetProperty("enthalpy_J_mol").GetDouble() - nbp.GetProperty("enthalpy_J_mol").GetDouble()) > 1000);
        AssertSameDouble(ideal.GetProperty("isobaric_heat_capacity_J_molK").GetDouble(), nbp.GetProperty("isobaric_heat_capacity_J_molK").GetDouble(), "cp");
        AssertSameDouble(ideal.GetProperty("speed_of_sound_m_s").GetDouble(), nbp.GetProperty("speed_of_sound_m_s").GetDouble(), "w");
    }

    public static TheoryData<string[], int, string> Errors => new()
    {
        { ["state", "propane", "-T", "300", "--density", "11600", "--phase", "vapour"], ExitCodes.OutOfRange, "is a stable liquid, not a vapour" },
        { ["state", "propane", "-T", "300", "-P", "1e5", "--reference", "bogus"], ExitCodes.Usage, "--reference" },
        { ["state", "methane", "-T", "150", "-P", "1e5", "--reference", "refrigeration"], ExitCodes.OutOfRange, "reference state 'refrigeration'" },
        { ["state", "carbon-dioxide", "-T", "300", "-P", "1e5", "--reference", "nbp"], ExitCodes.OutOfRange, "reference state 'nbp'" },
        { ["state", "propane", "-T", "300", "-P", "1e5", "--alpha", "cubic"], ExitCodes.Usage, "--alpha" },
        { ["state", "n-butane", "-T", "300", "-P", "1e5", "--alpha", "mathias-copeman"], ExitCodes.OutOfRange, "Mathias-Copeman" },
        { ["state", "propane", "-T", "300", "-P", "1e5", "--volume-shift", "abc"], ExitCodes.Usage, "--volume-shift" },
        { ["state", "propane", "-T", "300"], ExitCodes.Usage, "--pressure" },
        { ["state", "propane", "-T", "300", "-P", "1e5", "--density", "10"], ExitCodes.Usage, "exactly two" },
        { ["state", "propane", "-T", "300", "-P", "8e6", "--phase", "vapour"], ExitCodes.OutOfRange, "spinodal" },
        { ["state", "propane", "-T", "450", "-P", "6e6", "--phase", "liquid"], ExitCodes.OutOfRange, "one fluid phase" },
    };

    [Theory]
    [MemberData(nameof(Errors))]
    public void Run_BadInput_ExitCodeAndOneStderrLine(string[] args, int code, string message)
    {
        AssertFailure(Run([.. args, "--format", "json"]), code, message);
    }
}
