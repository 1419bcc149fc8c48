using PhaseSlope.Cli.Output;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Output;

public class CoexistenceWriterTests
{
    [Fact]
    public void Json_CriticalPoint_FlagsAndZeroJumps()
    {
        var json = RunJson("curve", "nitrogen", "--points", "2", "--format", "json");

        var critical = json[1];
        Assert.True(critical.GetProperty("critical").GetBoolean());
        Assert.Equal(0.0, critical.GetProperty("volume_change_m3_mol").GetDouble());
        Assert.Equal(0.0, critical.GetProperty("entropy_of_vaporization_J_molK").GetDouble());
        Assert.True(critical.GetProperty("slope_Pa_K").GetDouble() > 0);
        Assert.Equal("critical-state", critical.GetProperty("solver").GetProperty("method").GetString());
    }

    [Theory]
    [InlineData("PressureIteration", "pressure-iteration")]
    [InlineData("CriticalPoint", "critical-point")]
    [InlineData("Converged", "converged")]
    public void Kebab_PascalCase_LowerCaseWithHyphens(string pascal, string kebab)
    {
        Assert.Equal(kebab, CoexistenceWriter.Kebab(pascal));
    }
}
