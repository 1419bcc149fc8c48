using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Guards;

/// <summary>Physics guards of <c>fit</c> and <c>latent</c>: data that cannot be a vapour pressure
/// under the stated critical constants, or a vapour pressure that falls with T, are refused (exit
/// 4, one line naming the point), never turned into a number.</summary>
public sealed class CorrelationGuardTests : IDisposable
{
    private readonly string _directory = Directory.CreateTempSubdirectory("phaseslope-guards-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    /// <summary>Invented rising vapour pressures, 10 to 215 kPa over 300 to 400 K (the shape of a
    /// C6-C7 hydrocarbon; no measured source).</summary>
    private const string Rising = "T [K],P [kPa]\n300,10\n320,22\n340,44\n360,80\n380,135\n400,215\n";

    private string Write(string name, string text)
    {
        string path = Path.Combine(_directory, name);
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void Latent_PcBelowTheData_RefusedNamingThePoint()
    {
        // "--pc 31" without a unit is 31 Pa, below every point: the Haggenmacher relation used
        // to clamp 1 - Pr/Tr^3 to zero and print dH = 0 +- 0.
        var result = Run("latent", Write("rising.csv", Rising), "--tc", "540", "--pc", "31");
        AssertFailure(result, 4, "critical pressure 31 Pa is not above the data point at 300 K");
    }

    [Fact]
    public void Fit_PcBelowTheData_RefusedNamingThePoint()
    {
        var result = Run("fit", Write("rising.csv", Rising), "--tc", "540", "--pc", "31");
        AssertFailure(result, 4, "the critical pressure 31 Pa is not above the data point at 300 K, 10000 Pa");
    }

    [Fact]
    public void Fit_TcBelowTheData_Refused()
    {
        var result = Run("fit", Write("rising.csv", Rising), "--form", "wagner-3-6", "--tc", "390", "--pc", "3MPa");
        AssertFailure(result, 4, "the critical temperature 390 K is not above the data point at 400 K");
    }

    [Theory]
    [InlineData("latent")]
    [InlineData("fit")]
    public void FallingVapourPressure_Refused(string command)
    {
        // The same pressures in reverse order: the columns of a file written backwards. Fitted,
        // they gave dH = -27 963 J/mol with exit 0.
        const string falling = "T [K],P [kPa]\n300,215\n320,135\n340,80\n360,44\n380,22\n400,10\n";
        var result = Run(command, Write("falling.csv", falling));
        AssertFailure(result, 4, "the vapour pressure falls with temperature, from 215000 Pa at 300 K to 10000 Pa at 400 K");
    }

    [Fact]
    public void Latent_ConsistentConstants_StillAnswers()
    {
        // The guard must not refuse a sound case: the same data with Pc = 3.1 MPa in its unit.
        var json = RunJson("latent", Write("rising.csv", Rising), "--tc", "540", "--pc", "3.1 MPa", "--format", "json");
        foreach (var point in json.GetProperty("points").EnumerateArray())
        {
            Assert.True(point.GetProperty("enthalpy_of_vaporization_J_mol").GetDouble() > 0);
            Assert.False(point.TryGetProperty("finding", out _));
        }
    }

    [Fact]
    public void Latent_ImplausibleLatentHeat_FindingInEveryFormat()
    {
        // Invented data on ln P = A − 30 000 K/T: the Clausius–Clapeyron ΔH = R·30 000 K ≈ 249 kJ/mol,
        // ΔH/T ≈ 800 J/(mol K), above the 350 J/(mol K) bound (common practice): each row carries
        // the finding, in JSON and as the CSV's last column.
        string data = Write("steep.csv", "T [K],P [Pa]\n300,1000\n305,5151.79\n310,25173.9\n315,116969\n320,518013\n325,2.19143e+06\n");
        var json = RunJson("latent", data, "--form", "clausius-clapeyron", "--format", "json");
        Assert.All(json.GetProperty("points").EnumerateArray(),
            point => Assert.Contains("implausible latent heat", point.GetProperty("finding").GetString(), StringComparison.Ordinal));

        string[] csv = RunText("latent", data, "--form", "clausius-clapeyron", "--format", "csv").TrimEnd('\n').Split('\n');
        Assert.EndsWith(",finding", csv[0], StringComparison.Ordinal);
        Assert.All(csv.Skip(1), row => Assert.Contains("implausible latent heat", row, StringComparison.Ordinal));
    }
}
