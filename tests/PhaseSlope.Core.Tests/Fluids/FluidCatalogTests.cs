using System.Reflection;
using System.Text.RegularExpressions;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Fluids;

public class FluidCatalogTests
{
    private static readonly Assembly CoreAssembly = typeof(FluidCatalog).Assembly;

    private static string[] ShippedResources() =>
        [.. CoreAssembly.GetManifestResourceNames()
            .Where(n => n.StartsWith(FluidCatalog.ResourcePrefix, StringComparison.Ordinal))
            .Order(StringComparer.Ordinal)];

    private static Fluid Sample(string name, params string[] synonyms) => new()
    {
        Name = name,
        Synonyms = synonyms,
        MolarMass = new SourcedValue(0.01, "test"),
        CriticalTemperature = new SourcedValue(100, "test"),
        CriticalPressure = new SourcedValue(1e6, "test"),
        AcentricFactor = new SourcedValue(0, "test"),
        Origin = $"test/{name}.fluid",
    };

    [Fact]
    public void Embedded_EveryShippedFile_ParsesAndValidates()
    {
        string[] resources = ShippedResources();
        Assert.NotEmpty(resources);
        foreach (string resource in resources)
        {
            using Stream stream = CoreAssembly.GetManifestResourceStream(resource)!;
            Fluid fluid = FluidFile.Read(stream, resource);
            Assert.Equal(resource, fluid.Origin);
        }
    }

    [Fact]
    public void Embedded_Catalog_HasAtLeastFourteenFluids()
    {
        Assert.True(FluidCatalog.Embedded.All.Count >= 14, $"only {FluidCatalog.Embedded.All.Count} fluids");
        Assert.Equal(ShippedResources().Length, FluidCatalog.Embedded.All.Count);
    }

    [Theory]
    [InlineData("methane")]
    [InlineData("ethane")]
    [InlineData("propane")]
    [InlineData("n-butane")]
    [InlineData("water")]
    [InlineData("carbon dioxide")]
    [InlineData("nitrogen")]
    [InlineData("argon")]
    [InlineData("ammonia")]
    [InlineData("r-134a")]
    [InlineData("methanol")]
    [InlineData("ethanol")]
    [InlineData("benzene")]
    [InlineData("toluene")]
    [InlineData("n-pentane")]
    public void Embedded_RequiredFluid_IsPresentUnderItsCanonicalName(string name)
    {
        Assert.Equal(name, FluidCatalog.Embedded.Find(name).Name);
    }

    [Fact]
    public void Embedded_FileNames_AreCanonicalNamesWithHyphens()
    {
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            string expected = FluidCatalog.ResourcePrefix + fluid.Name.Replace(' ', '-') + FluidFile.Extension;
            Assert.Equal(expected, fluid.Origin);
        }
    }

    [Fact]
    public void Embedded_NamesAndSynonyms_AreUniqueOnceNormalised()
    {
        var owner = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            foreach (string label in fluid.Synonyms.Prepend(fluid.Name))
            {
                string normal = FluidNames.Normalise(label);
                Assert.False(owner.TryGetValue(normal, out string? other),
                    $"'{label}' of {fluid.Name} collides with {other}");
                owner[normal] = fluid.Name;
            }
        }
    }

    [Fact]
    public void Embedded_All_IsSortedByName()
    {
        string[] names = [.. FluidCatalog.Embedded.All.Select(f => f.Name)];

        Assert.Equal(names.Order(StringComparer.Ordinal), names);
    }

    [Fact]
    public void Embedded_EverySource_SaysWhereTheValueCameFrom()
    {
        // Every shipped constant was recalled, so its source text must say "from memory".
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            foreach (SourcedValue? value in new[]
                     {
                         fluid.MolarMass, fluid.CriticalTemperature, fluid.CriticalPressure, fluid.AcentricFactor,
                         fluid.CriticalDensity, fluid.NormalBoilingPoint, fluid.TriplePointTemperature,
                     })
            {
                if (value is not null)
                {
                    Assert.Contains("from memory", value.Source, StringComparison.Ordinal);
                }
            }
        }
    }

    [Fact]
    public void Embedded_MolarMasses_AgreeWithFormulaAndAtomicWeights()
    {
        // ChemicalFormula uses the IUPAC 2005 standard atomic weights (Wieser, Pure Appl. Chem. 78,
        // 2051 (2006); from memory); 1e-5 relative allows the last digit of a tabulated molar mass.
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            Assert.False(fluid.Formula is null, $"{fluid.Name} has no formula");
            double sum = ChemicalFormula.MolarMass(fluid.Formula!) * 1000.0;
            AssertClose.Relative(sum / 1000.0, fluid.MolarMass!.Value, 1e-5, $"{fluid.Name} molar mass (kg/mol) vs formula");
        }
    }

    [Fact]
    public void Embedded_CriticalCompressibility_IsInTheRangeOfRealFluids()
    {
        // Zc = pc/(ρc R Tc) lies between about 0.20 and 0.31 for real fluids (Poling, Prausnitz &
        // O'Connell, 5th ed. (2001), Appendix A: water 0.229 is among the lowest; from memory).
        // Catches a density or pressure entered in the wrong unit. R: CODATA 2018, exact.
        const double gasConstant = 8.314462618;
        foreach (Fluid fluid in FluidCatalog.Embedded.All.Where(f => f.CriticalDensity is not null))
        {
            double zc = fluid.CriticalPressure.Value
                / (fluid.CriticalDensity!.Value * gasConstant * fluid.CriticalTemperature.Value);
            Assert.True(zc is > 0.20 and < 0.31, $"{fluid.Name}: Zc = {zc}");
        }
    }

    [Fact]
    public void Embedded_Pentane_HasReferenceCriticalPoint()
    {
        // Span & Wagner, Int. J. Thermophys. 24, 41 (2003); from memory.
        Fluid pentane = FluidCatalog.Embedded.Find("pentane");

        Assert.Equal(469.70, pentane.CriticalTemperature.Value, 9);
        Assert.Equal(3367500.0, pentane.CriticalPressure.Value, 3);
        Assert.Equal(3215.5, pentane.CriticalDensity!.Value, 6);
        Assert.Equal(309.21, pentane.NormalBoilingPoint!.Value, 9);
        Assert.Equal(143.47, pentane.TriplePointTemperature!.Value, 9);
    }

    [Fact]
    public void Embedded_Propane_HasReferenceCriticalPoint()
    {
        // Lemmon, McLinden & Wagner, J. Chem. Eng. Data 54, 3141 (2009); from memory.
        Fluid propane = FluidCatalog.Embedded.Find("propane");

        Assert.Equal(369.89, propane.CriticalTemperature.Value, 9);
        Assert.Equal(4251200.0, propane.CriticalPressure.Value, 3);
        Assert.Equal(5000.0, propane.CriticalDensity!.Value, 6);
    }

    [Fact]
    public void Embedded_CarbonDioxide_HasNoNormalBoilingPointButATriplePoint()
    {
        // Triple-point pressure 0.51795 MPa > 101325 Pa: Span & Wagner, J. Phys. Chem. Ref. Data 25, 1509 (1996); from memory.
        Fluid co2 = FluidCatalog.Embedded.Find("CO2");

        Assert.Null(co2.NormalBoilingPoint);
        Assert.Equal(216.592, co2.TriplePointTemperature!.Value, 9);
        Assert.Contains("boiling point", co2.Remarks, StringComparison.Ordinal);
    }

    [Fact]
    public void Embedded_Water_HasIapwsCriticalPoint()
    {
        // Wagner & Pruß, J. Phys. Chem. Ref. Data 31, 387 (2002); from memory.
        Fluid water = FluidCatalog.Embedded.Find("H2O");

        Assert.Equal(647.096, water.CriticalTemperature.Value, 9);
        Assert.Equal(22.064e6, water.CriticalPressure.Value, 3);
        Assert.Equal(322.0 / 0.018015268, water.CriticalDensity!.Value, 6);
    }

    [Theory]
    [InlineData("R-134a", "r-134a")]
    [InlineData("R134a", "r-134a")]
    [InlineData("r134a", "r-134a")]
    [InlineData("HFC-134a", "r-134a")]
    [InlineData("n-butane", "n-butane")]
    [InlineData("butane", "n-butane")]
    [InlineData("N-Butane", "n-butane")]
    [InlineData("carbon dioxide", "carbon dioxide")]
    [InlineData("CO2", "carbon dioxide")]
    [InlineData("carbon-dioxide", "carbon dioxide")]
    [InlineData("Carbon_Dioxide", "carbon dioxide")]
    [InlineData("  carbon,dioxide ", "carbon dioxide")]
    [InlineData("R-290", "propane")]
    [InlineData("PROPANE", "propane")]
    [InlineData("methyl alcohol", "methanol")]
    [InlineData("R-744", "carbon dioxide")]
    [InlineData("pentane", "n-pentane")]
    [InlineData("R-601", "n-pentane")]
    public void Find_NameOrSynonymInAnySpelling_ReturnsCanonicalFluid(string typed, string expected)
    {
        Assert.Equal(expected, FluidCatalog.Embedded.Find(typed).Name);
    }

    [Fact]
    public void TryFind_KnownName_ReturnsTrueAndFluid()
    {
        bool found = FluidCatalog.Embedded.TryFind("r 134 a", out Fluid? fluid);

        Assert.True(found);
        Assert.Equal("r-134a", fluid!.Name);
    }

    [Fact]
    public void TryFind_UnknownName_ReturnsFalseAndNull()
    {
        bool found = FluidCatalog.Embedded.TryFind("unobtainium", out Fluid? fluid);

        Assert.False(found);
        Assert.Null(fluid);
    }

    [Fact]
    public void Find_Misspelt_SuggestsNearMatches()
    {
        var ex = Assert.Throws<UnknownFluidException>(() => FluidCatalog.Embedded.Find("propan"));

        Assert.Equal("propan", ex.Name);
        Assert.Equal("propane", ex.NearMatches[0]);
        Assert.InRange(ex.NearMatches.Count, 1, 4);
        Assert.Contains("'propane'", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Find_MisspeltSynonym_SuggestsCanonicalName()
    {
        var ex = Assert.Throws<UnknownFluidException>(() => FluidCatalog.Embedded.Find("R-134b"));

        Assert.Contains("r-134a", ex.NearMatches);
    }

    [Fact]
    public void Find_NothingClose_NoSuggestions()
    {
        var ex = Assert.Throws<UnknownFluidException>(() => FluidCatalog.Embedded.Find("zzzzzzzzzzzz"));

        Assert.Empty(ex.NearMatches);
    }

    [Fact]
    public void NearMatches_ManyCandidates_AtMostFourRankedByDistance()
    {
        var catalog = new FluidCatalog(
        [
            Sample("aaaa"), Sample("aaab"), Sample("aabb"), Sample("abbb"), Sample("aaac"), Sample("bbbb"),
        ]);

        IReadOnlyList<string> near = catalog.NearMatches("aaaa ");

        Assert.Equal(new[] { "aaaa", "aaab", "aaac", "aabb" }, near);
    }

    [Fact]
    public void Constructor_DuplicateNameAcrossFluids_ThrowsFluidDataException()
    {
        var ex = Assert.Throws<FluidDataException>(() => new FluidCatalog(
        [
            Sample("first", "R-1"),
            Sample("second", "r1"),
        ]));

        Assert.Equal("synonyms", ex.Field);
        Assert.Contains("test/second.fluid", ex.Message, StringComparison.Ordinal);
        Assert.Contains("test/first.fluid", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Constructor_SynonymEqualToOtherName_ThrowsFluidDataException()
    {
        Assert.Throws<FluidDataException>(() => new FluidCatalog([Sample("butane"), Sample("n-butane", "Butane")]));
    }

    [Fact]
    public void Constructor_Fluids_AllSortedByName()
    {
        var catalog = new FluidCatalog([Sample("zeta"), Sample("alpha"), Sample("mu")]);

        Assert.Equal(new[] { "alpha", "mu", "zeta" }, catalog.All.Select(f => f.Name));
    }
}
