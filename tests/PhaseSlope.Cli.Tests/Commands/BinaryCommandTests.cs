using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>phaseslope binary</c> and <c>phaseslope fit-kij</c>.</summary>
public sealed class BinaryCommandTests
{
    [Fact]
    public void Binary_BenzeneCyclohexaneAtOneAtmosphere_ReportsTheAzeotrope()
    {
        // Benzene–cyclohexane azeotrope at 101.325 kPa: 77.6 °C (350.75 K), x_benzene ≈ 0.57
        // (CRC Handbook azeotrope table; from memory). With k_ij = 0.02 (a typical Peng–Robinson
        // value for this pair, from memory) the model puts it within 0.5 K and 0.1 in x (see
        // BinaryDiagramTests in Core for why those tolerances).
        var root = RunJson("binary", "benzene=0.5,cyclohexane=0.5", "--pressure", "1 atm", "--kij", "benzene,cyclohexane=0.02", "--format", "json");
        var azeotrope = root.GetProperty("azeotrope");
        Assert.Equal("maximum_pressure", azeotrope.GetProperty("kind").GetString());
        Assert.Equal(350.75, azeotrope.GetProperty("temperature_K").GetDouble(), 0.5);
        Assert.Equal(0.57, azeotrope.GetProperty("x1").GetDouble(), 0.1);
        var points = root.GetProperty("points").EnumerateArray().ToArray();
        // 41 compositions plus the azeotrope's row, which is the one marked.
        Assert.Equal(42, points.Length);
        var marked = Assert.Single(points, p => p.GetProperty("azeotrope").GetBoolean());
        Assert.Equal(azeotrope.GetProperty("x1").GetDouble(), marked.GetProperty("x1").GetDouble());
        Assert.Equal(101325, root.GetProperty("pressure_Pa").GetDouble());
        Assert.Equal(System.Text.Json.JsonValueKind.Null, root.GetProperty("temperature_K").ValueKind);
    }

    [Fact]
    public void Binary_PropaneButane_HasNoAzeotrope_AndCsvHasOneRowPerComposition()
    {
        var root = RunJson("binary", "propane=0.5,n-butane=0.5", "--temperature", "300", "--points", "9", "--format", "json");
        Assert.Equal(System.Text.Json.JsonValueKind.Null, root.GetProperty("azeotrope").ValueKind);
        string csv = RunText("binary", "propane=0.5,n-butane=0.5", "--temperature", "300", "--points", "9", "--format", "csv");
        string[] lines = csv.TrimEnd('\n').Split('\n');
        Assert.Equal("x1,y1,temperature_K,pressure_Pa,bubble_slope_Pa_K,azeotrope", lines[0]);
        Assert.Equal(10, lines.Length);
    }

    [Fact]
    public void FitKij_WritesAMixtureFileThatTheMixtureCommandReads()
    {
        // Ethanol–water at 1 atm (Carey and Lewis 1932 via Perry's handbook; from memory), 5 points.
        using var folder = new TempFolder();
        string data = folder.File("ew.csv");
        File.WriteAllText(data, "# Carey and Lewis (1932) via Perry's, from memory\nT [degC],P [kPa],x1,y1\n89.0,101.325,0.0721,0.3891\n84.1,101.325,0.1661,0.5089\n"
            + "81.5,101.325,0.3273,0.5826\n79.8,101.325,0.5079,0.6564\n78.41,101.325,0.7472,\n");
        string output = folder.File("ew.mixture");
        var result = Run("fit-kij", data, "--components", "ethanol,water", "--out", output, "--format", "json");
        Assert.True(result.ExitCode == 0, result.ToString());
        // As tune: the note that the file was written goes to standard error, the report to standard output.
        Assert.StartsWith("phaseslope: wrote k_ij of ethanol, water to ", result.Stderr, StringComparison.Ordinal);
        using var document = StrictJson.Parse(result.Stdout);
        var report = document.RootElement;
        double kij = report.GetProperty("kij").GetDouble();
        // Peng–Robinson k_ij of ethanol–water is about −0.1 (Core's InteractionFitTests measure
        // −0.102 on 15 points); five points give the same to within a few hundredths.
        Assert.InRange(kij, -0.15, -0.05);
        Assert.True(report.GetProperty("kij_standard_error").GetDouble() > 0);
        // The last row has no y1: one residual fewer.
        Assert.Equal(9, report.GetProperty("residuals").GetInt32());

        var mixture = RunJson("mixture", output, "--format", "json");
        var pair = mixture.GetProperty("interaction_parameters").EnumerateArray().Single();
        Assert.Equal(kij, pair.GetProperty("kij").GetDouble());
        Assert.Equal("given", pair.GetProperty("origin").GetString());
        Assert.StartsWith("fitted by phaseslope to ew.csv (sha256 ", pair.GetProperty("source").GetString(), StringComparison.Ordinal);
        Assert.Contains("5 points", pair.GetProperty("source").GetString(), StringComparison.Ordinal);
    }
}
