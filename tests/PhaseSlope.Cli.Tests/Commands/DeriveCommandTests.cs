using System.Globalization;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

public class DeriveCommandTests
{
    [Theory]
    [InlineData("H", "T", "P", 300.0, 2e6)]
    [InlineData("S", "V", "T", 300.0, 1e5)]
    [InlineData("T", "P", "H", 300.0, 1e5)]
    [InlineData("U", "V", "T", 450.0, 6e6)]
    [InlineData("G", "T", "P", 300.0, 2e6)]
    [InlineData("V", "P", "S", 450.0, 6e6)]
    [InlineData("H", "U", "S", 300.0, 1e5)]
    public void Json_Derivative_ValueAndUnitEqualCore(string of, string by, string hold, double t, double p)
    {
        var json = RunJson("derive", "propane", "--of", of, "--by", by, "--hold", hold,
            "-T", t.ToString("R", CultureInfo.InvariantCulture), "-P", p.ToString("R", CultureInfo.InvariantCulture), "--format", "json");
        var state = StateCommandTests.Engine("propane", CubicModelKind.PengRobinson).AtPressure(t, p);
        var x = Enum.Parse<StateVariable>(of);
        var y = Enum.Parse<StateVariable>(by);
        var z = Enum.Parse<StateVariable>(hold);

        AssertSameDouble(PartialDerivatives.Of(state, x, y, z), json.GetProperty("value").GetDouble(), "value");
        Assert.Equal(PartialDerivatives.Unit(x, y), json.GetProperty("unit").GetString());
        Assert.Equal(of, json.GetProperty("of").GetString());
        Assert.Equal(by, json.GetProperty("by").GetString());
        Assert.Equal(hold, json.GetProperty("hold").GetString());
        AssertSameDouble(state.Density, json.GetProperty("density_mol_m3").GetDouble(), "density_mol_m3");
    }

    [Fact]
    public void Json_LowerCaseVariables_Accepted()
    {
        var lower = RunJson("derive", "propane", "--of", "h", "--by", "t", "--hold", "p", "-T", "300", "-P", "2e6", "--format", "json");
        var state = StateCommandTests.Engine("propane", CubicModelKind.PengRobinson).AtPressure(300, 2e6);

        Assert.Equal("H", lower.GetProperty("of").GetString());
        AssertSameDouble(PartialDerivatives.Of(state, StateVariable.H, StateVariable.T, StateVariable.P), lower.GetProperty("value").GetDouble(), "cp");
        Assert.Equal("J/(mol K)", lower.GetProperty("unit").GetString());
    }

    [Fact]
    public void Json_DensityPath_EqualsCoreAtDensity()
    {
        var json = RunJson("derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "--density", "11600", "--format", "json");
        var state = StateCommandTests.Engine("propane", CubicModelKind.PengRobinson).AtDensity(300, 11600);

        AssertSameDouble(state.InternalPressure, json.GetProperty("value").GetDouble(), "(dU/dV)_T");
        Assert.Equal("Pa", json.GetProperty("unit").GetString());
    }

    [Fact]
    public void Run_AtModelCriticalState_UndefinedDerivativeExits4()
    {
        // (∂V/∂P)_T diverges at the critical point of the model, where (∂P/∂V)_T = 0.
        var model = StateCommandTests.Engine("propane", CubicModelKind.PengRobinson).Solver;
        var result = Run("derive", "propane", "--of", "V", "--by", "P", "--hold", "T",
            "-T", model.CriticalTemperature.ToString("R", CultureInfo.InvariantCulture),
            "--density", model.CriticalDensity.ToString("R", CultureInfo.InvariantCulture), "--format", "json");

        AssertFailure(result, ExitCodes.OutOfRange, "undefined at this state");
    }

    public static TheoryData<string[], int, string> Errors => new()
    {
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "T", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "--hold" },
        { ["derive", "propane", "--of", "X", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "unknown variable 'X'" },
        { ["derive", "propane", "--of", "2", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "unknown variable '2'" },
        { ["derive", "propane", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "--of" },
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "--density", "11600", "--phase", "vapour"], ExitCodes.OutOfRange, "is a stable liquid, not a vapour" },
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5", "--reference", "zero"], ExitCodes.Usage, "--reference" },
        { ["derive", "methane", "--of", "H", "--by", "T", "--hold", "P", "-T", "150", "-P", "1e5", "--reference", "refrigeration"], ExitCodes.OutOfRange, "does not exist for methane" },
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5", "--alpha", "soave"], ExitCodes.Usage, "--alpha" },
        { ["derive", "n-butane", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5", "--alpha", "mathias-copeman"], ExitCodes.OutOfRange, "Mathias-Copeman" },
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e5", "--volume-shift", "3 furlongs"], ExitCodes.Usage, "--volume-shift" },
    };

    [Theory]
    [MemberData(nameof(Errors))]
    public void Run_BadInput_ExitCodeAndOneStderrLine(string[] args, int code, string message)
    {
        AssertFailure(Run([.. args, "--format", "json"]), code, message);
    }
}
