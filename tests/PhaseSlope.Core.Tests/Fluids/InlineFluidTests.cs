using System.Globalization;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Fluids;

public class InlineFluidTests
{
    private static string R(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>The catalog fluid's Tc, Pc and ω written inline in K and Pa with round-trip digits.</summary>
    private static string InlineOf(Fluid fluid)
        => $"inline:tc={R(fluid.CriticalTemperature.Value)}K,pc={R(fluid.CriticalPressure.Value)}Pa,omega={R(fluid.AcentricFactor.Value)}";

    [Fact]
    public void Parse_CatalogText_SameDoublesAsTheCatalogFile()
    {
        // fluids/propane.fluid writes 44.09562 g/mol, 369.89 K, 4.2512 MPa and 0.152; the same text
        // goes through the same reader and unit table, so the doubles are identical.
        var catalog = FluidCatalog.Embedded.Find("propane");
        var inline = InlineFluid.Parse("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,molar_mass=44.09562g/mol,name=my-propane");

        Assert.Equal(catalog.CriticalTemperature.Value, inline.CriticalTemperature.Value);
        Assert.Equal(catalog.CriticalPressure.Value, inline.CriticalPressure.Value);
        Assert.Equal(catalog.AcentricFactor.Value, inline.AcentricFactor.Value);
        Assert.Equal(catalog.MolarMass!.Value, inline.MolarMass!.Value);
        Assert.Equal("my-propane", inline.Name);
        Assert.Equal(InlineFluid.Origin, inline.Origin);
        Assert.All(new[] { inline.CriticalTemperature, inline.CriticalPressure, inline.AcentricFactor, inline.MolarMass },
            v => Assert.Equal(InlineFluid.Source, v.Source));
        Assert.Null(inline.IdealGasHeatCapacity);
        Assert.Null(inline.CriticalDensity);
    }

    [Fact]
    public void Parse_OnlyRequiredKeys_DefaultNameAndNoMolarMass()
    {
        var fluid = InlineFluid.Parse("inline: TC = 190.564K , Pc=4.5992MPa, omega=0.0114");

        Assert.Equal(InlineFluid.DefaultName, fluid.Name);
        Assert.Null(fluid.MolarMass);
        Assert.Equal(190.564, fluid.CriticalTemperature.Value);
        Assert.Equal(4599200.0, fluid.CriticalPressure.Value);
        Assert.Null(fluid.CriticalTemperature.StandardUncertainty);
        Assert.Throws<FluidDataException>(() => fluid.RequireMolarMass("a test"));
    }

    [Theory]
    // Uncertainty in the value's unit, in another unit of the same kind, or with no unit (the
    // value's unit). 5 kPa = 0.005 MPa = 5000 Pa; 0.05 degC as a difference is 0.05 K. The
    // conversions are one multiplication and one division each, so 1e-15 relative covers them.
    [InlineData("tc=369.89K±0.05K", "tc", 0.05)]
    [InlineData("tc=369.89K±0.05", "tc", 0.05)]
    [InlineData("tc=369.89K+/-0.05degC", "tc", 0.05)]
    [InlineData("pc=4.2512MPa±5kPa", "pc", 5000.0)]
    [InlineData("pc=4.2512MPa±0.005", "pc", 5000.0)]
    [InlineData("omega=0.152±0.003", "omega", 0.003)]
    [InlineData("molar_mass=44.1g/mol±0.1g/mol", "molar_mass", 1e-4)]
    public void Parse_Uncertainty_StoredInSi(string entry, string key, double expected)
    {
        var values = new Dictionary<string, string> { ["tc"] = "tc=369.89K", ["pc"] = "pc=4.2512MPa", ["omega"] = "omega=0.152" };
        values[key] = entry;
        var fluid = InlineFluid.Parse($"inline:{string.Join(",", values.Values)}");

        SourcedValue value = key switch
        {
            "tc" => fluid.CriticalTemperature,
            "pc" => fluid.CriticalPressure,
            "omega" => fluid.AcentricFactor,
            _ => fluid.MolarMass!,
        };
        AssertClose.Relative(expected, value.StandardUncertainty!.Value, 1e-15, $"u({key})");
    }

    [Theory]
    [InlineData("inline:", null)]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa", "omega")]
    [InlineData("inline:tc=369.89,pc=4.2512MPa,omega=0.152", "tc")]                   // a file's temperatures carry K
    [InlineData("inline:tc=369.89degC,pc=4.2512MPa,omega=0.152", "tc")]               // K only, as in a file
    [InlineData("inline:tc=369.89K,pc=-4MPa,omega=0.152", "pc")]
    [InlineData("inline:tc=369.89K,pc=4.2512mpa,omega=0.152", "pc")]                  // units are case-sensitive
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=2.5", "omega")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,molar_mass=44.1", "molar_mass")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,molar_mass=44100kg/mol", "molar_mass")]
    [InlineData("inline:tcc=369.89K,pc=4.2512MPa,omega=0.152", "tcc")]
    [InlineData("inline:tc=369.89K,tc=370K,pc=4.2512MPa,omega=0.152", "tc")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,name=Propane", "name")]
    [InlineData("inline:tc=369.89K,pc=4.2512MPa,omega=0.152,name=", "name")]
    [InlineData("inline:tc=369.89K±-0.05K,pc=4.2512MPa,omega=0.152", "tc")]
    [InlineData("inline:tc=369.89K±0.05bar,pc=4.2512MPa,omega=0.152", "tc")]
    [InlineData("inline:tc=369.89K±0.05K±1K,pc=4.2512MPa,omega=0.152", "tc")]
    [InlineData("inline:tc=abcK,pc=4.2512MPa,omega=0.152", "tc")]
    [InlineData("inline:tc=369.89K,,pc=4.2512MPa,omega=0.152", null)]
    [InlineData("inline:tc=1,2K,pc=4.2512MPa,omega=0.152", "2K")]
    public void Parse_BadDefinition_ThrowsNamingTheKey(string text, string? key)
    {
        var ex = Assert.Throws<FluidDataException>(() => InlineFluid.Parse(text));

        Assert.Equal(key, ex.Field);
        Assert.False(string.IsNullOrWhiteSpace(ex.Problem));
        Assert.DoesNotContain('\n', ex.Message);
    }

    [Fact]
    public void Catalog_NoNameOrSynonymLooksInline()
    {
        // The prefix is what tells an inline definition from a name: no catalog spelling may start with it.
        foreach (var fluid in FluidCatalog.Embedded.All)
        {
            Assert.False(InlineFluid.IsInline(fluid.Name), fluid.Name);
            Assert.All(fluid.Synonyms, s => Assert.False(InlineFluid.IsInline(s), s));
        }
    }

    public static TheoryData<string> CatalogFluids => new() { "propane", "water", "carbon dioxide", "methane", "ethanol", "r-134a" };

    [Theory]
    [MemberData(nameof(CatalogFluids))]
    public void Coexistence_InlineFromCatalogConstants_BitForBitEqualToCatalog(string name)
    {
        // Exact equality, not a tolerance: the default models see only Tc, Pc and ω (no alpha
        // constants, no volume shift), the inline values are the catalog's doubles written with
        // round-trip digits in K and Pa (unit factor 1, so read back to the same doubles), and the
        // solver is deterministic. Temperatures are chosen above both fluids' lowest valid
        // temperature (the inline fluid has no triple point, so its floor is 0.3 Tc).
        var catalog = FluidCatalog.Embedded.Find(name);
        var inline = InlineFluid.Parse(InlineOf(catalog));
        Assert.Equal(catalog.CriticalTemperature.Value, inline.CriticalTemperature.Value);
        Assert.Equal(catalog.CriticalPressure.Value, inline.CriticalPressure.Value);
        Assert.Equal(catalog.AcentricFactor.Value, inline.AcentricFactor.Value);
        foreach (var kind in new[] { CubicModelKind.PengRobinson, CubicModelKind.SoaveRedlichKwong })
        {
            var a = CoexistenceSolver.For(catalog, kind);
            var b = CoexistenceSolver.For(inline, kind);
            double floor = Math.Max(a.MinimumTemperature, b.MinimumTemperature);
            foreach (double fraction in new[] { 0.0, 0.3, 0.6, 0.9, 0.999 })
            {
                double t = floor + fraction * (catalog.CriticalTemperature.Value - floor);
                var pa = a.AtTemperature(t);
                var pb = b.AtTemperature(t);
                Assert.Equal(pa.Pressure, pb.Pressure);
                Assert.Equal(pa.Liquid.Density, pb.Liquid.Density);
                Assert.Equal(pa.Vapour.Density, pb.Vapour.Density);
                Assert.Equal(pa.EnthalpyOfVaporization, pb.EnthalpyOfVaporization);
                Assert.Equal(pa.Slope, pb.Slope);
            }
        }
    }
}
