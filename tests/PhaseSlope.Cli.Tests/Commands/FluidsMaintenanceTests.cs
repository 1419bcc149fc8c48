using System.Text.Json;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>fluids check</c>, <c>fluids estimate</c> and the filters of <c>fluids list</c>.</summary>
public class FluidsMaintenanceTests
{
    [Fact]
    public void Check_CatalogFile_ValidAndConsistent()
    {
        var json = RunJson("fluids", "check", "../../../../../fluids/propane.fluid", "--format", "json");

        Assert.True(json.GetProperty("valid").GetBoolean());
        Assert.True(json.GetProperty("boiling_point_consistent").GetBoolean());
        Assert.True(json.GetProperty("solves_to_critical_point").GetBoolean());
        // Peng–Robinson gives propane's Tb to 0.04 % (docs/validation.md).
        Assert.True(Math.Abs(json.GetProperty("boiling_point_deviation").GetDouble()) < 1e-3);
    }

    [Fact]
    public void Check_InconsistentData_ValidButWarnedAndExit8()
    {
        using var folder = new TempFolder();
        string path = folder.File("wrong-omega.fluid");
        string text = File.ReadAllText("../../../../../fluids/propane.fluid").Replace("acentric_factor           0.152", "acentric_factor           0.352", StringComparison.Ordinal);
        File.WriteAllText(path, text);

        var result = Run("fluids", "check", path);

        // The report is printed; the inconsistency fails the run (README: exit 8) on one stderr line.
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("WARNING: more than 1 % apart", result.Stdout, StringComparison.Ordinal);
        Assert.Single(result.StderrLines);
        Assert.Contains($"{path}: check failed", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_BrokenFile_ExitThreeNamingFileLineAndField()
    {
        using var folder = new TempFolder();
        string path = folder.File("broken.fluid");
        File.WriteAllText(path, File.ReadAllText("../../../../../fluids/propane.fluid").Replace("4.2512 MPa", "-4.2512 MPa", StringComparison.Ordinal));

        var result = Run("fluids", "check", path);

        AssertFailure(result, 3, "critical_pressure");
        Assert.Contains($"{path}:", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Estimate_FromGroups_WritesAValidatedFileWithLabelledEstimates()
    {
        using var folder = new TempFolder();
        string path = folder.File("my-solvent.fluid");

        var result = Run("fluids", "estimate", "--name", "my solvent", "--formula", "C7H8",
            "--groups", "ring=CH:5,ring=C:1,CH3:1", "--tb", "383.8 K", "--out", path);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        using var stream = File.OpenRead(path);
        var fluid = FluidFile.Read(stream, path);
        var joback = Joback.Estimate([(Joback.Groups.Single(g => g.Id == "ring=CH"), 5), (Joback.Groups.Single(g => g.Id == "ring=C"), 1), (Joback.Groups.Single(g => g.Id == "CH3"), 1)], 383.8);
        Assert.Equal(joback.CriticalTemperature, fluid.CriticalTemperature.Value);
        Assert.Equal(joback.CriticalPressure, fluid.CriticalPressure.Value);
        Assert.Contains("estimated by the Joback", fluid.CriticalTemperature.Source, StringComparison.Ordinal);
        Assert.Contains("estimated by the Ambrose-Walton", fluid.AcentricFactor.Source, StringComparison.Ordinal);
        Assert.Equal("given by the user", fluid.NormalBoilingPoint!.Source);
        Assert.NotNull(fluid.IdealGasHeatCapacity);
        // The written file is usable at once: coexistence by path.
        var point = RunJson("coexist", path, "--pressure", "1 atm", "--format", "json");
        // ω was estimated from this very boiling point, so the model returns it closely (0.1 K).
        Assert.True(Math.Abs(point.GetProperty("temperature_K").GetDouble() - 383.8) < 0.1, point.ToString());
    }

    [Fact]
    public void Estimate_OmegaFromAVapourPressure_UsesTheNamedMethod()
    {
        string text = RunText("fluids", "estimate", "--name", "x", "--molar-mass", "58.12 g/mol", "--tc", "425.125 K", "--pc", "3.796 MPa",
            "--vapour-pressure", "272.66 K, 101.325 kPa", "--omega-method", "lee-kesler");

        using var reader = new StringReader(text);
        var fluid = FluidFile.Parse(reader, "stdout");
        double expected = CorrespondingStates.AcentricFactor(AcentricFactorMethod.LeeKesler, 425.125, 3.796e6, 272.66, 101325);
        Assert.Equal(expected, fluid.AcentricFactor.Value);
        Assert.Contains("Lee-Kesler", fluid.AcentricFactor.Source, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--groups", "CH5:1")]
    [InlineData("--groups", "CH3:0")]
    [InlineData("--omega-method", "guess")]
    public void Estimate_BadInput_UsageError(string option, string value)
    {
        var result = Run("fluids", "estimate", "--name", "x", "--formula", "C3H8", "--groups", "CH3:2,CH2:1", option, value);
        AssertFailure(result, 2, option);
    }

    [Fact]
    public void Estimate_MissingConstantAndNoGroups_UsageError()
    {
        var result = Run("fluids", "estimate", "--name", "x", "--formula", "C3H8");
        AssertFailure(result, 2, "--tc");
    }

    [Fact]
    public void List_FilterByFamilyAndName()
    {
        var alcohols = RunJson("fluids", "list", "--family", "alcohol", "--format", "json");
        Assert.All(alcohols.EnumerateArray(), f => Assert.Equal("alcohol", f.GetProperty("family").GetString()));
        Assert.Contains(alcohols.EnumerateArray(), f => f.GetProperty("name").GetString() == "ethanol");

        var xylenes = RunJson("fluids", "list", "--name", "xylene", "--format", "json");
        Assert.Equal(["m-xylene", "o-xylene", "p-xylene"], xylenes.EnumerateArray().Select(f => f.GetProperty("name").GetString()!).Order(StringComparer.Ordinal));

        AssertFailure(Run("fluids", "list", "--family", "no such family"), 2, "families:");
    }
}
