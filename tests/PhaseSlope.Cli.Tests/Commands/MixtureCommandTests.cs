using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>phaseslope mixture</c>: a blend given as on its datasheet, its mole and mass
/// fractions, the k_ij with their sources, mixture files and --kij.</summary>
public sealed class MixtureCommandTests
{
    private static JsonElement Pair(JsonElement root, string first, string second)
        => root.GetProperty("interaction_parameters").EnumerateArray().Single(p =>
            (p.GetProperty("first").GetString() == first && p.GetProperty("second").GetString() == second)
            || (p.GetProperty("first").GetString() == second && p.GetProperty("second").GetString() == first));

    [Fact]
    public void MassFractions_R407C_MoleFractionsAndMolarMass()
    {
        // R-407C is 23/25/52 mass % R-32/R-125/R-134a (ASHRAE Standard 34; from memory). By hand with
        // the catalog's molar masses (MixtureTests shows the arithmetic): x = 0.3811104, 0.1795572,
        // 0.4393324 and M = 86.20284 g/mol; ASHRAE 34 lists 86.2 g/mol (from memory). Tolerances:
        // half a unit of the hand values' last digit.
        var root = RunJson("mixture", "R-32=0.23,R-125=0.25,R-134a=0.52", "--mass-fractions", "--format", "json");
        var components = root.GetProperty("components").EnumerateArray().ToArray();
        Assert.Equal(["r-32", "r-125", "r-134a"], components.Select(c => c.GetProperty("name").GetString()));
        double[] x = [0.3811104, 0.1795572, 0.4393324];
        double[] w = [0.23, 0.25, 0.52];
        for (int i = 0; i < 3; i++)
        {
            Assert.Equal(x[i], components[i].GetProperty("mole_fraction").GetDouble(), 5e-8);
            // Back to mass fractions: the given ones to rounding (1e-15).
            Assert.Equal(w[i], components[i].GetProperty("mass_fraction").GetDouble(), 1e-15);
        }

        Assert.Equal(0.08620284, root.GetProperty("molar_mass_kg_mol").GetDouble(), 5e-9);
        // No refrigerant k_ij ships: every pair is an assumed zero, and the output says so.
        Assert.All(root.GetProperty("interaction_parameters").EnumerateArray(), p => Assert.Equal("assumed_zero", p.GetProperty("origin").GetString()));
        Assert.Contains(root.GetProperty("notes").EnumerateArray(), n => n.GetString()!.Contains("assumed zero", StringComparison.Ordinal));
    }

    [Fact]
    public void PublishedKij_IsShownWithItsSource_AndKijOverridesIt()
    {
        string[] gas = ["mixture", "methane=0.85,CO2=0.1,N2=0.05", "--format", "json"];
        var root = RunJson(gas);
        var co2 = Pair(root, "methane", "carbon dioxide");
        // Knapp et al., DECHEMA Chemistry Data Series Vol. VI (1982), Peng-Robinson; from memory.
        Assert.Equal(0.0919, co2.GetProperty("kij").GetDouble());
        Assert.Equal("published", co2.GetProperty("origin").GetString());
        Assert.Contains("DECHEMA", co2.GetProperty("source").GetString(), StringComparison.Ordinal);
        Assert.Equal(-0.017, Pair(root, "carbon dioxide", "nitrogen").GetProperty("kij").GetDouble());

        var given = Pair(RunJson([.. gas, "--kij", "carbon-dioxide, methane = 0.105"]), "methane", "carbon dioxide");
        Assert.Equal((0.105, "given", "given on the command line (--kij)"),
            (given.GetProperty("kij").GetDouble(), given.GetProperty("origin").GetString(), given.GetProperty("source").GetString()));
    }

    [Fact]
    public void Table_NamesKaysRuleAndAnAssumedZero()
    {
        string table = RunText("mixture", "methane=0.9,n-decane=0.1");
        Assert.Contains("pseudo-critical (Kay's rule)", table, StringComparison.Ordinal);
        Assert.Contains("assumed zero", table, StringComparison.Ordinal);
        Assert.Contains("note: a pair marked 'assumed zero' has no given or published k_ij", table, StringComparison.Ordinal);
    }

    [Fact]
    public void MixtureFile_WithAFluidFileComponent_AndKijOverride()
    {
        using var folder = new TempFolder();
        string propane = CatalogFileText("propane.fluid");
        // An invented private fluid: propane's constants under another name, in a sub-folder the
        // mixture file names relatively.
        Directory.CreateDirectory(folder.File("fluids"));
        File.WriteAllText(folder.File("fluids/my-gas.fluid"), string.Join('\n', propane.Split('\n')
            .Select(l => l.StartsWith("name ", StringComparison.Ordinal) ? "name my-gas" : l.StartsWith("synonyms ", StringComparison.Ordinal) ? "" : l)));
        File.WriteAllText(folder.File("gas.mixture"),
            "# invented test blend\nformat phaseslope-mixture 1\nname test gas (invented)\n"
            + "component methane = 0.7\ncomponent fluids/my-gas.fluid = 0.3\n"
            + "kij methane, my-gas = 0.02 | invented for this test\nremarks made up for the test\n");

        var root = RunJson("mixture", folder.File("gas.mixture"), "--format", "json");
        Assert.Equal("test gas (invented)", root.GetProperty("name").GetString());
        Assert.Equal("made up for the test", root.GetProperty("remarks").GetString());
        var pair = Pair(root, "methane", "my-gas");
        Assert.Equal((0.02, "invented for this test"), (pair.GetProperty("kij").GetDouble(), pair.GetProperty("source").GetString()));

        var overridden = Pair(RunJson("mixture", folder.File("gas.mixture"), "--kij", "my-gas,methane=0.03", "--format", "json"), "methane", "my-gas");
        Assert.Equal(0.03, overridden.GetProperty("kij").GetDouble());
    }

    [Fact]
    public void EosWithoutPublishedTable_AssumesZero()
    {
        var root = RunJson("mixture", "methane=0.9,CO2=0.1", "--eos", "srk", "--format", "json");
        var pair = Pair(root, "methane", "carbon dioxide");
        Assert.Equal(("assumed_zero", 0.0), (pair.GetProperty("origin").GetString(), pair.GetProperty("kij").GetDouble()));
        Assert.Contains("Soave-Redlich-Kwong", pair.GetProperty("source").GetString(), StringComparison.Ordinal);
    }
}
