using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Guards;

/// <summary>Physics guards of <c>state</c> and <c>derive</c>: a density inside the dome, the
/// metastable branches by density, a liquid under tension, and the critical point given as (T, P).</summary>
public class StateGuardTests
{
    [Fact]
    public void State_DensityInsideTheDome_IsTheTwoPhaseMixture()
    {
        // R-134a at 0 degC, 100 kg/m3: between the saturated vapour (about 14 kg/m3) and liquid
        // (about 1300 kg/m3) densities; it once printed "vapour, 1175.6 kPa" with exit 0, then was
        // refused; now it is the two-phase state with its quality by the lever rule on volume.
        var json = RunJson("state", "r134a", "-T", "0degC", "--density", "100 kg/m3", "--format", "json");
        Assert.Equal("two-phase", json.GetProperty("phase").GetString());
        double vL = json.GetProperty("liquid").GetProperty("molar_volume_m3_mol").GetDouble();
        double vV = json.GetProperty("vapour").GetProperty("molar_volume_m3_mol").GetDouble();
        double v = json.GetProperty("molar_volume_m3_mol").GetDouble();
        // Same arithmetic on the same saturated volumes: equal to rounding.
        Assert.Equal((v - vL) / (vV - vL), json.GetProperty("quality").GetDouble(), 1e-13);
    }

    [Fact]
    public void State_DensityOnTheVapourBranchWithPhase_FlaggedMetastable()
    {
        var json = RunJson("state", "r134a", "-T", "0degC", "--density", "100 kg/m3", "--phase", "vapour", "--format", "json");
        Assert.Equal("metastable-vapour", json.GetProperty("phase").GetString());
        Assert.Equal("vapour", json.GetProperty("branch").GetString());
        Assert.True(json.GetProperty("metastable").GetBoolean());
        Assert.False(json.GetProperty("critical").GetBoolean());
    }

    [Fact]
    public void State_DensityOnTheOtherBranch_Refused()
    {
        var result = Run("state", "r134a", "-T", "0degC", "--density", "100 kg/m3", "--phase", "liquid");
        AssertFailure(result, 4, "is on the metastable vapour branch, not the liquid branch");
    }

    [Fact]
    public void State_LiquidUnderTension_DefinedPropertiesGivenUndefinedNullWithReason()
    {
        // Propane PR at 300 K and 11000 mol/m3: P is about -2.5 MPa on the rising liquid branch.
        var json = RunJson("state", "propane", "-T", "300", "--density", "11000", "--phase", "liquid", "--format", "json");
        Assert.True(json.GetProperty("pressure_Pa").GetDouble() < 0);
        Assert.True(json.GetProperty("metastable").GetBoolean());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, json.GetProperty("ln_fugacity_coefficient").ValueKind);
        Assert.Equal(System.Text.Json.JsonValueKind.Null, json.GetProperty("residual_entropy_J_molK").ValueKind);
        Assert.Contains("ln Z is undefined", json.GetProperty("undefined_reason").GetString(), StringComparison.Ordinal);
        Assert.Equal(System.Text.Json.JsonValueKind.Number, json.GetProperty("isobaric_heat_capacity_J_molK").ValueKind);
        Assert.Equal(System.Text.Json.JsonValueKind.Number, json.GetProperty("enthalpy_J_mol").ValueKind);
    }

    [Fact]
    public void State_CriticalPointByTemperatureAndPressure_DivergentPropertiesNull()
    {
        // propane.fluid gives Tc = 369.89 K and Pc = 4.2512 MPa; the model's critical point is
        // the input to rounding. cp used to print 5.2e12 here.
        var json = RunJson("state", "propane", "-T", "369.89", "-P", "4.2512MPa", "--format", "json");
        Assert.True(json.GetProperty("critical").GetBoolean());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, json.GetProperty("isobaric_heat_capacity_J_molK").ValueKind);
        Assert.Equal(System.Text.Json.JsonValueKind.Null, json.GetProperty("isothermal_compressibility_1_Pa").ValueKind);
    }

    [Fact]
    public void Derive_CriticalPointByTemperatureAndPressure_UndefinedExit4()
    {
        // (dV/dP)_T diverges at the critical point; it used to print -2.63.
        var result = Run("derive", "propane", "--of", "V", "--by", "P", "--hold", "T", "-T", "369.89", "-P", "4.2512MPa");
        AssertFailure(result, 4, "undefined at this state");
    }
}
