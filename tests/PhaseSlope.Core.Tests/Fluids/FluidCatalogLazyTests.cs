using System.Reflection;
using System.Text;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The catalog indexes files by their name lines and parses a file only when its fluid is
/// asked for. Each test builds its own catalog, so the counts are not disturbed by other tests
/// using <see cref="FluidCatalog.Embedded"/>.</summary>
public class FluidCatalogLazyTests
{
    private static readonly Assembly CoreAssembly = typeof(FluidCatalog).Assembly;

    private static int ShippedFileCount() =>
        CoreAssembly.GetManifestResourceNames().Count(n => n.StartsWith(FluidCatalog.ResourcePrefix, StringComparison.Ordinal));

    /// <summary>An in-memory file that counts how often it was opened.</summary>
    private sealed class TextFile(string origin, string text)
    {
        public int Opened { get; private set; }

        public FluidFileSource Source => new(origin, () =>
        {
            Opened++;
            return new MemoryStream(Encoding.UTF8.GetBytes(text));
        });
    }

    private static string Named(string name, string synonyms) =>
        FluidFileTestData.Join(FluidFileTestData.ValidLines()
            .Select(l => l.StartsWith("name ", StringComparison.Ordinal) ? "name " + name : l)
            .Select(l => l.StartsWith("synonyms ", StringComparison.Ordinal) ? "synonyms " + synonyms : l));

    [Fact]
    public void ReadEmbedded_Built_ParsesNoFile()
    {
        var catalog = FluidCatalog.ReadEmbedded();

        Assert.Equal(0, catalog.FilesParsed);
    }

    [Fact]
    public void Find_OneFluidBySynonym_ParsesExactlyOneFile()
    {
        var catalog = FluidCatalog.ReadEmbedded();

        Fluid propane = catalog.Find("R-290");

        Assert.Equal("propane", propane.Name);
        Assert.Equal(1, catalog.FilesParsed);
    }

    [Fact]
    public void Find_SameFluidAgainUnderOtherNames_ParsesNoMoreAndReturnsTheSameRecord()
    {
        var catalog = FluidCatalog.ReadEmbedded();
        Fluid first = catalog.Find("propane");

        Fluid second = catalog.Find("C3H8");
        bool found = catalog.TryFind("N-Propane", out Fluid? third);

        Assert.True(found);
        Assert.Same(first, second);
        Assert.Same(first, third);
        Assert.Equal(1, catalog.FilesParsed);
    }

    [Fact]
    public void Find_TwoFluids_ParsesTwoFiles()
    {
        var catalog = FluidCatalog.ReadEmbedded();

        catalog.Find("water");
        catalog.Find("CO2");

        Assert.Equal(2, catalog.FilesParsed);
    }

    [Fact]
    public void Find_UnknownName_SuggestsWithoutParsingAnyFile()
    {
        var catalog = FluidCatalog.ReadEmbedded();

        var ex = Assert.Throws<UnknownFluidException>(() => catalog.Find("R-134b"));

        Assert.Contains("r-134a", ex.NearMatches);
        Assert.False(catalog.TryFind("unobtainium", out _));
        Assert.Equal(0, catalog.FilesParsed);
    }

    [Fact]
    public void All_ParsesEveryFileOnceAndLaterLookUpsParseNoMore()
    {
        var catalog = FluidCatalog.ReadEmbedded();
        catalog.Find("propane");

        int count = catalog.All.Count;
        _ = catalog.All;
        Fluid water = catalog.Find("water");

        Assert.Equal(ShippedFileCount(), count);
        Assert.Equal(ShippedFileCount(), catalog.FilesParsed);
        Assert.Contains(catalog.All, f => ReferenceEquals(f, water));
    }

    [Fact]
    public void ReadEmbedded_EveryNameAndSynonym_FindsTheFluidItsFileDescribes()
    {
        // The index is built from the name lines alone; it must agree with the full parse.
        var catalog = FluidCatalog.ReadEmbedded();
        foreach (Fluid fluid in catalog.All)
        {
            foreach (string label in fluid.Synonyms.Prepend(fluid.Name))
            {
                Assert.True(catalog.TryFind(label, out Fluid? found), $"'{label}' of {fluid.Name} not indexed");
                Assert.Same(fluid, found);
            }
        }
    }

    [Fact]
    public void ScanNames_EveryShippedFile_GivesTheNameAndSynonymsOfTheFullRead()
    {
        foreach (string resource in CoreAssembly.GetManifestResourceNames()
                     .Where(n => n.StartsWith(FluidCatalog.ResourcePrefix, StringComparison.Ordinal)))
        {
            using Stream scanStream = CoreAssembly.GetManifestResourceStream(resource)!;
            using Stream readStream = CoreAssembly.GetManifestResourceStream(resource)!;

            (string name, IReadOnlyList<string> synonyms) = FluidFile.ScanNames(scanStream, resource);
            Fluid fluid = FluidFile.Read(readStream, resource);

            Assert.Equal(fluid.Name, name);
            Assert.Equal(fluid.Synonyms, synonyms);
        }
    }

    [Fact]
    public void ScanNames_NameAfterTheOtherEntriesAndNoSynonyms_ReadsItAndGivesNoSynonyms()
    {
        string text = FluidFileTestData.Join(
            FluidFileTestData.ValidLines().Where(l => !l.StartsWith("name ", StringComparison.Ordinal)
                && !l.StartsWith("synonyms ", StringComparison.Ordinal)).Append("name  late name"));
        using var stream = new MemoryStream(Encoding.UTF8.GetBytes(text));

        (string name, IReadOnlyList<string> synonyms) = FluidFile.ScanNames(stream, "test/late.fluid");

        Assert.Equal("late name", name);
        Assert.Empty(synonyms);
    }

    [Fact]
    public void Constructor_Files_OpensEachOnceToIndexAndAgainOnlyWhenAskedFor()
    {
        var a = new TextFile("test/a.fluid", Named("alpha", "A-1; first"));
        var b = new TextFile("test/b.fluid", Named("beta", "B-2"));
        var catalog = new FluidCatalog([a.Source, b.Source]);

        Fluid beta = catalog.Find("b2");

        Assert.Equal("beta", beta.Name);
        Assert.Equal("test/b.fluid", beta.Origin);
        Assert.Equal((1, 2), (a.Opened, b.Opened));
        Assert.Equal(1, catalog.FilesParsed);
        Assert.Equal(new[] { "alpha", "beta" }, catalog.All.Select(f => f.Name));
        Assert.Equal((2, 2), (a.Opened, b.Opened));
    }

    [Fact]
    public void Constructor_FilesSharingASynonym_ThrowsNamingBothFilesWithoutParsing()
    {
        var first = new TextFile("test/first.fluid", Named("first", "R-1"));
        var second = new TextFile("test/second.fluid", Named("second", "r1"));

        var ex = Assert.Throws<FluidDataException>(() => new FluidCatalog([first.Source, second.Source]));

        // The same message as a catalog built from fluids already read gives.
        Assert.Equal("synonyms", ex.Field);
        Assert.Equal("test/second.fluid: field 'synonyms': 'r1' of fluid 'second' is already a name of fluid 'first' (test/first.fluid)", ex.Message);
        Assert.Equal((1, 1), (first.Opened, second.Opened));
    }

    [Fact]
    public void Constructor_FileWithoutName_ThrowsForTheNameField()
    {
        var file = new TextFile("test/nameless.fluid", FluidFileTestData.Without("name"));

        var ex = Assert.Throws<FluidDataException>(() => new FluidCatalog([file.Source]));

        Assert.Equal("test/nameless.fluid", ex.Origin);
        Assert.Equal("name", ex.Field);
    }

    [Fact]
    public void Constructor_SynonymSameAsName_ThrowsTheFullReadsMessage()
    {
        string text = Named("propane", "R-290; Pro-pane");
        var file = new TextFile("test/self.fluid", text);
        var full = Assert.Throws<FluidDataException>(() => FluidFile.Parse(new StringReader(text), "test/self.fluid"));

        var ex = Assert.Throws<FluidDataException>(() => new FluidCatalog([file.Source]));

        Assert.Equal(full.Message, ex.Message);
    }

    [Fact]
    public void Find_FileInvalidBeyondItsNames_ThrowsTheParsersErrorOnlyForThatFluid()
    {
        // Line 10 is the critical temperature; a Celsius value is refused by the full read only.
        string broken = FluidFileTestData.WithLine(10, "critical_temperature  96.74 degC | test");
        var bad = new TextFile("test/bad.fluid", broken.Replace("name                      propane", "name bad", StringComparison.Ordinal)
            .Replace("R-290; n-propane", "worse", StringComparison.Ordinal));
        var good = new TextFile("test/good.fluid", Named("good", "fine"));
        var catalog = new FluidCatalog([bad.Source, good.Source]);

        var ex = Assert.Throws<FluidDataException>(() => catalog.Find("worse"));

        Assert.Equal(("test/bad.fluid", 10, "critical_temperature"), (ex.Origin, ex.Line, ex.Field));
        Assert.Equal("good", catalog.Find("fine").Name);
        Assert.Throws<FluidDataException>(() => catalog.All);
    }
}
