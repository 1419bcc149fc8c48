using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The <c>hazard_class</c> key: an ASHRAE Standard 34 safety group or plain hazard
/// words, with a source; a bad value is refused naming the key and its line; the writer keeps
/// it; the catalog carries the refrigerants' groups.</summary>
public class FluidFileHazardClassTests
{
    private static Fluid ParseText(string text) => FluidFile.Parse(new StringReader(text), FluidFileTestData.Origin);

    [Theory]
    [InlineData("A1", "A1 (lower toxicity, no flame propagation)")]
    [InlineData("A2L", "A2L (lower toxicity, lower flammability, burning velocity at most 10 cm/s)")]
    [InlineData("A2", "A2 (lower toxicity, flammable)")]
    [InlineData("A3", "A3 (lower toxicity, higher flammability)")]
    [InlineData("B1", "B1 (higher toxicity, no flame propagation)")]
    [InlineData("B2L", "B2L (higher toxicity, lower flammability, burning velocity at most 10 cm/s)")]
    [InlineData("B2", "B2 (higher toxicity, flammable)")]
    [InlineData("B3", "B3 (higher toxicity, higher flammability)")]
    public void Parse_SafetyGroup_ReadWithItsMeaning(string group, string description)
    {
        // The meaning of the letters and digits: ASHRAE Standard 34 (from memory).
        var fluid = ParseText(FluidFileTestData.WithExtraLine($"hazard_class {group} | ASHRAE Standard 34; from memory"));

        Assert.Equal(group, fluid.Hazard!.SafetyGroup);
        Assert.Equal(HazardTrait.None, fluid.Hazard.Traits);
        Assert.Equal(group, fluid.Hazard.Code);
        Assert.Equal(description, fluid.Hazard.Description);
        Assert.Equal("ASHRAE Standard 34; from memory", fluid.Hazard.Source);
    }

    [Theory]
    [InlineData("flammable", HazardTrait.Flammable, "flammable")]
    [InlineData("toxic   flammable", HazardTrait.Flammable | HazardTrait.Toxic, "flammable and toxic")]
    [InlineData("oxidizer toxic", HazardTrait.Toxic | HazardTrait.Oxidizer, "toxic and an oxidizer")]
    [InlineData("asphyxiant", HazardTrait.Asphyxiant, "an asphyxiant")]
    public void Parse_Traits_ReadInTheirOrder(string value, HazardTrait traits, string description)
    {
        var fluid = ParseText(FluidFileTestData.WithExtraLine($"hazard_class {value} | s"));

        Assert.Null(fluid.Hazard!.SafetyGroup);
        Assert.Equal(traits, fluid.Hazard.Traits);
        Assert.Equal(description, fluid.Hazard.Description);
    }

    [Fact]
    public void Parse_NoHazardClass_LeavesItNull()
        => Assert.Null(ParseText(FluidFileTestData.Join(FluidFileTestData.ValidLines())).Hazard);

    [Theory]
    [InlineData("hazard_class a3 | s", "not a hazard class")]
    [InlineData("hazard_class A4 | s", "not a hazard class")]
    [InlineData("hazard_class A3 flammable | s", "not a hazard class")]
    [InlineData("hazard_class flammable flammable | s", "not a hazard class")]
    [InlineData("hazard_class explosive | s", "not a hazard class")]
    [InlineData("hazard_class | s", "not a hazard class")]
    [InlineData("hazard_class A3", "missing source")]
    [InlineData("hazard_class A3 |  ", "missing source")]
    public void Parse_BadHazardClass_NamesKeyAndLine(string line, string problem)
    {
        var ex = Assert.Throws<FluidDataException>(() => ParseText(FluidFileTestData.WithExtraLine(line)));

        Assert.Equal("hazard_class", ex.Field);
        Assert.Equal(17, ex.Line);
        Assert.Contains(problem, ex.Problem, StringComparison.Ordinal);
        Assert.StartsWith($"{FluidFileTestData.Origin}:17: field 'hazard_class':", ex.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("hazard_class B2L | ASHRAE Standard 34; from memory")]
    [InlineData("hazard_class toxic oxidizer | GHS classification; from memory")]
    public void Writer_RoundTrip_KeepsTheClassAndSource(string line)
    {
        var fluid = ParseText(FluidFileTestData.WithExtraLine(line));

        var again = FluidFile.Parse(new StringReader(FluidFileWriter.Format(fluid)), "round-trip.fluid");

        Assert.Equal(fluid.Hazard, again.Hazard);
    }

    /// <summary>ASHRAE Standard 34 safety groups of the catalog's refrigerants (from memory, as
    /// the fluid files say).</summary>
    [Theory]
    [InlineData("R-32", "A2L")]
    [InlineData("R-125", "A1")]
    [InlineData("R-134a", "A1")]
    [InlineData("R-143a", "A2L")]
    [InlineData("R-152a", "A2")]
    [InlineData("R-22", "A1")]
    [InlineData("R-23", "A1")]
    [InlineData("R-227ea", "A1")]
    [InlineData("R-245fa", "B1")]
    [InlineData("R-1234yf", "A2L")]
    [InlineData("R-1234ze(E)", "A2L")]
    [InlineData("R-1233zd(E)", "A1")]
    [InlineData("ammonia", "B2L")]
    [InlineData("propane", "A3")]
    [InlineData("isobutane", "A3")]
    [InlineData("carbon dioxide", "A1")]
    [InlineData("water", "A1")]
    [InlineData("propylene", "A3")]
    public void Catalog_Refrigerant_CarriesItsAshrae34Group(string name, string group)
    {
        var hazard = FluidCatalog.Embedded.Find(name).Hazard;

        Assert.NotNull(hazard);
        Assert.Equal(group, hazard.SafetyGroup);
        Assert.Contains("ASHRAE Standard 34", hazard.Source, StringComparison.Ordinal);
        Assert.Contains("from memory", hazard.Source, StringComparison.Ordinal);
    }

    /// <summary>Plain classes as suppliers' safety data sheets give them (GHS; from memory).</summary>
    [Theory]
    [InlineData("hydrogen", HazardTrait.Flammable)]
    [InlineData("methane", HazardTrait.Flammable)]
    [InlineData("hydrogen sulfide", HazardTrait.Flammable | HazardTrait.Toxic)]
    [InlineData("carbon monoxide", HazardTrait.Flammable | HazardTrait.Toxic)]
    [InlineData("chlorine", HazardTrait.Toxic | HazardTrait.Oxidizer)]
    [InlineData("sulfur dioxide", HazardTrait.Toxic)]
    [InlineData("oxygen", HazardTrait.Oxidizer)]
    [InlineData("nitrogen", HazardTrait.Asphyxiant)]
    [InlineData("helium", HazardTrait.Asphyxiant)]
    public void Catalog_OtherFluid_CarriesItsSourcedTraits(string name, HazardTrait traits)
    {
        var hazard = FluidCatalog.Embedded.Find(name).Hazard;

        Assert.NotNull(hazard);
        Assert.Equal(traits, hazard.Traits);
        Assert.Contains("safety data sheets", hazard.Source, StringComparison.Ordinal);
    }
}
