using System.Net;
using System.Text.Json;
using PhaseSlope.Cli.Tests.Commands;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Reporting;

/// <summary>The hazard cautions of <c>report</c> and <c>fluids show</c>: the class the fluid
/// file gives (ASHRAE Standard 34 safety group, or sourced hazard words), in words, beside the
/// constants; the generic caution where the file gives none.</summary>
public sealed class ReportHazardTests : IDisposable
{
    private const string Tail = "Equipment, charge limits, ventilation and relief for it follow local codes and licensed engineering practice; the supplier's safety data sheet governs.";
    private const string Ashrae = "(source: ASHRAE Standard 34, refrigerant safety group; from memory)";

    private readonly TempFolder _folder = new();

    private string Report(params string[] args)
    {
        string path = _folder.File($"report-{Guid.NewGuid():N}.html");
        var result = Run(["report", .. args, "--out", path]);
        Assert.True(result.ExitCode == 0, result.ToString());
        return File.ReadAllText(path);
    }

    /// <summary>The caution box as HtmlReport writes it (escaped, 'from memory' marked).</summary>
    private static string CautionHtml(string text)
        => "<strong>Caution.</strong> " + WebUtility.HtmlEncode(text).Replace("from memory", "<mark class=\"memory\">from memory</mark>", StringComparison.Ordinal);

    // Safety groups: ASHRAE Standard 34 (from memory), as the catalog files give them.
    public static TheoryData<string, string> Cautions => new()
    {
        { "propane", $"Propane is classified A3 (lower toxicity, higher flammability) in the ASHRAE Standard 34 safety groups {Ashrae}. {Tail}" },
        { "ammonia", $"Ammonia is classified B2L (higher toxicity, lower flammability, burning velocity at most 10 cm/s) in the ASHRAE Standard 34 safety groups {Ashrae}. {Tail}" },
        { "r-134a", $"R-134a is classified A1 (lower toxicity, no flame propagation) in the ASHRAE Standard 34 safety groups {Ashrae}. {Tail}" },
    };

    [Theory]
    [MemberData(nameof(Cautions))]
    public void Report_CautionBesideTheConstants_NamesTheClassAndItsSource(string fluid, string caution)
    {
        string constants = ReportHtml.Section(Report(fluid), "constants");

        Assert.Contains(CautionHtml(caution), constants, StringComparison.Ordinal);
        Assert.DoesNotContain("carries no flammability or toxicity class", constants, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(Cautions))]
    public void FluidsShow_Table_EndsWithTheSameCaution(string fluid, string caution)
        => Assert.EndsWith($"caution: {caution}\n", RunText("fluids", "show", fluid), StringComparison.Ordinal);

    [Fact]
    public void Report_FluidWithoutAClass_KeepsTheGenericCaution()
    {
        // The catalog's propane file with its hazard_class line left out.
        string text = string.Join('\n', CatalogFileText("propane.fluid").Split('\n').Where(l => !l.StartsWith("hazard_class ", StringComparison.Ordinal)));
        string file = _folder.File("propane-unclassed.fluid");
        File.WriteAllText(file, text);

        string constants = ReportHtml.Section(Report(file), "constants");

        Assert.Contains(CautionHtml("The fluid file carries no flammability or toxicity class: take it from the supplier's safety data sheet, "
            + "and follow local codes and licensed engineering practice for equipment, charge limits and relief."), constants, StringComparison.Ordinal);
        Assert.DoesNotContain("ASHRAE", constants, StringComparison.Ordinal);
    }

    [Fact]
    public void Report_Mixture_ListsEachComponentsClass()
    {
        string components = ReportHtml.Section(Report("methane=0.8,ethane=0.15,propane=0.05"), "components");

        // GHS classifications as suppliers' safety data sheets give them, and propane's ASHRAE
        // Standard 34 group (all from memory, as the files say).
        string ghs = "(source: GHS classification as commonly given in suppliers' safety data sheets; from memory)";
        foreach (string line in new[] { $"methane: flammable {ghs}", $"ethane: flammable {ghs}", $"propane: A3 (lower toxicity, higher flammability) {Ashrae}" })
        {
            Assert.Contains(WebUtility.HtmlEncode(line).Replace("from memory", "<mark class=\"memory\">from memory</mark>", StringComparison.Ordinal), components, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("ammonia", "B2L")]
    [InlineData("chlorine", "toxic oxidizer")]
    public void FluidsShow_Json_HazardClassWithItsSource(string name, string code)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        using var document = StrictJson.Parse(RunText("fluids", "show", name, "--format", "json"));
        var hazard = document.RootElement.GetProperty("hazard_class");

        Assert.Equal(JsonValueKind.Object, hazard.ValueKind);
        Assert.Equal(code, hazard.GetProperty("code").GetString());
        Assert.Equal(fluid.Hazard!.Description, hazard.GetProperty("description").GetString());
        Assert.Equal(fluid.Hazard.Source, hazard.GetProperty("source").GetString());
    }

    public void Dispose() => _folder.Dispose();
}
