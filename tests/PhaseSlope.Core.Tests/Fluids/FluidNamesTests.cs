using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Tests.Fluids;

public class FluidNamesTests
{
    [Theory]
    [InlineData("R-134a", "r134a")]
    [InlineData("Carbon Dioxide", "carbondioxide")]
    [InlineData(" n_butane, ", "nbutane")]
    [InlineData("1,1,1,2-tetrafluoroethane", "1112tetrafluoroethane")]
    [InlineData("- _ ,", "")]
    public void Normalise_Name_DropsIgnoredCharactersAndLowersCase(string name, string expected)
    {
        Assert.Equal(expected, FluidNames.Normalise(name));
    }

    [Theory]
    // Levenshtein distance as defined by Levenshtein, Sov. Phys. Dokl. 10, 707 (1966); from memory.
    // "kitten" -> "sitting": substitute k->s, substitute e->i, insert g, so 3 edits.
    [InlineData("kitten", "sitting", 3)]
    [InlineData("", "abc", 3)]
    [InlineData("abc", "", 3)]
    [InlineData("propan", "propane", 1)]
    [InlineData("same", "same", 0)]
    [InlineData("ab", "ba", 2)]
    public void EditDistance_Pairs_GiveLevenshteinDistance(string a, string b, int expected)
    {
        Assert.Equal(expected, FluidNames.EditDistance(a, b));
        Assert.Equal(expected, FluidNames.EditDistance(b, a));
    }
}
