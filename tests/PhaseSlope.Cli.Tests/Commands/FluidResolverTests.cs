using PhaseSlope.Cli.Commands;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

public class FluidResolverTests
{
    [Theory]
    [InlineData("R134a", "r-134a")]
    [InlineData("r-134a", "r-134a")]
    [InlineData("HFC-134a", "r-134a")]
    [InlineData("CO2", "carbon dioxide")]
    [InlineData("carbon dioxide", "carbon dioxide")]
    [InlineData("Carbon-Dioxide", "carbon dioxide")]
    [InlineData("butane", "n-butane")]
    [InlineData("R-290", "propane")]
    [InlineData("H2O", "water")]
    public void Coexist_Synonym_SameResultAsCanonicalName(string typed, string canonical)
    {
        string viaSynonym = RunText("coexist", typed, "--temperature", Tr08(canonical), "--format", "json");
        string viaName = RunText("coexist", canonical, "--temperature", Tr08(canonical), "--format", "json");

        Assert.Equal(viaName, viaSynonym);
        Assert.Contains($"\"fluid\": \"{canonical}\"", viaSynonym, StringComparison.Ordinal);
    }

    private static string Tr08(string name)
        => (0.8 * FluidCatalog.Embedded.Find(name).CriticalTemperature.Value).ToString("R", System.Globalization.CultureInfo.InvariantCulture);

    [Fact]
    public void Coexist_CopyOfCatalogFileByPath_SameOutputAsCatalogFluid()
    {
        using var folder = new TempFolder();
        string path = folder.File("my-propane.fluid");
        File.WriteAllText(path, CatalogFileText("propane.fluid"));

        foreach (string[] query in new[] { new[] { "--temperature", "250" }, ["--pressure", "3 bar"] })
        {
            foreach (string format in new[] { "json", "csv", "table" })
            {
                string fromFile = RunText(["coexist", path, .. query, "--format", format]);
                string fromCatalog = RunText(["coexist", "propane", .. query, "--format", format]);
                Assert.Equal(fromCatalog, fromFile);
            }
        }
    }

    [Fact]
    public void Curve_FileWithoutFluidExtensionButWithFolder_ReadAsFile()
    {
        using var folder = new TempFolder();
        string path = folder.File("ethane.txt");
        File.WriteAllText(path, CatalogFileText("ethane.fluid"));

        Assert.Equal(
            RunText("curve", "ethane", "--points", "4", "--format", "csv"),
            RunText("curve", path, "--points", "4", "--format", "csv"));
    }

    [Fact]
    public void FluidsShow_FileByPath_OriginIsThePath()
    {
        using var folder = new TempFolder();
        string path = folder.File("w.fluid");
        File.WriteAllText(path, CatalogFileText("water.fluid"));

        var json = RunJson("fluids", "show", path, "--format", "json");

        Assert.Equal("water", json.GetProperty("name").GetString());
        Assert.Equal(path, json.GetProperty("origin").GetString());
    }

    [Fact]
    public void Resolve_EditedFileByPath_UsesTheFileNotTheCatalog()
    {
        using var folder = new TempFolder();
        string path = folder.File("heavy-propane.fluid");
        File.WriteAllText(path, CatalogFileText("propane.fluid").Replace("acentric_factor           0.152", "acentric_factor           0.200", StringComparison.Ordinal));

        var fromFile = RunJson("coexist", path, "--temperature", "250", "--format", "json");
        var fromCatalog = RunJson("coexist", "propane", "--temperature", "250", "--format", "json");

        Assert.Equal("propane", fromFile.GetProperty("fluid").GetString());
        Assert.NotEqual(fromCatalog.GetProperty("pressure_Pa").GetDouble(), fromFile.GetProperty("pressure_Pa").GetDouble());
        Assert.Equal(0.2, FluidResolver.Resolve(path).AcentricFactor.Value);
    }

    [Fact]
    public void Resolve_UnknownName_ListsNearMatches()
    {
        var ex = Assert.Throws<UnknownFluidException>(() => FluidResolver.Resolve("methan"));
        Assert.Contains("methane", ex.NearMatches);
        Assert.Contains("'methane'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Resolve_Blank_UsageError()
    {
        Assert.Throws<UsageException>(() => FluidResolver.Resolve("  "));
        AssertFailure(Run("coexist", "", "--temperature", "300"), ExitCodes.Usage, "FLUID");
    }
}
