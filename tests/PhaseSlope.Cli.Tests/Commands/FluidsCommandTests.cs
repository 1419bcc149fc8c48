using System.Text.Json;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

public class FluidsCommandTests
{
    private static void AssertFluidObject(JsonElement json, Fluid fluid)
    {
        Assert.Equal(JsonValueKind.Object, json.ValueKind);
        Assert.Equal(fluid.Name, json.GetProperty("name").GetString());
        AssertSameDouble(fluid.CriticalTemperature.Value, json.GetProperty("critical_temperature_K").GetDouble(), "critical_temperature_K");
        AssertSameDouble(fluid.CriticalPressure.Value, json.GetProperty("critical_pressure_Pa").GetDouble(), "critical_pressure_Pa");
        AssertSameDouble(fluid.AcentricFactor.Value, json.GetProperty("acentric_factor").GetDouble(), "acentric_factor");
        AssertSameDouble(fluid.MolarMass!.Value, json.GetProperty("molar_mass_kg_mol").GetDouble(), "molar_mass_kg_mol");
        var sources = json.GetProperty("sources");
        Assert.Equal(JsonValueKind.Object, sources.ValueKind);
        Assert.Equal(fluid.CriticalTemperature.Source, sources.GetProperty("critical_temperature_K").GetString());
        Assert.Equal(fluid.CriticalPressure.Source, sources.GetProperty("critical_pressure_Pa").GetString());
        Assert.Equal(fluid.AcentricFactor.Source, sources.GetProperty("acentric_factor").GetString());
        Assert.Equal(fluid.MolarMass.Source, sources.GetProperty("molar_mass_kg_mol").GetString());
        Assert.Equal(fluid.Synonyms, json.GetProperty("synonyms").EnumerateArray().Select(s => s.GetString()!).ToArray());
    }

    [Theory]
    [InlineData("propane")]
    [InlineData("water")]
    [InlineData("carbon dioxide")]
    [InlineData("r-134a")]
    public void ShowJson_CatalogFluid_ConstantsAndSources(string name)
    {
        var json = RunJson("fluids", "show", name, "--format", "json");
        AssertFluidObject(json, FluidCatalog.Embedded.Find(name));
    }

    [Fact]
    public void ShowJson_Propane_ValuesInSiUnits()
    {
        // Catalog file propane.fluid: 369.89 K, 4.2512 MPa, 44.09562 g/mol, omega 0.152.
        var json = RunJson("fluids", "show", "propane", "--format", "json");
        Assert.Equal(369.89, json.GetProperty("critical_temperature_K").GetDouble());
        Assert.Equal(4.2512e6, json.GetProperty("critical_pressure_Pa").GetDouble(), 6);
        Assert.Equal(0.04409562, json.GetProperty("molar_mass_kg_mol").GetDouble(), 12);
        Assert.Equal(0.152, json.GetProperty("acentric_factor").GetDouble());
        Assert.Contains("from memory", json.GetProperty("sources").GetProperty("critical_temperature_K").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void ListJson_WholeCatalog_ArrayOfFluidObjectsInCatalogOrder()
    {
        var json = RunJson("fluids", "list", "--format", "json");
        var all = FluidCatalog.Embedded.All;

        Assert.Equal(JsonValueKind.Array, json.ValueKind);
        Assert.Equal(all.Count, json.GetArrayLength());
        Assert.True(all.Count >= 14);
        for (int i = 0; i < all.Count; i++)
        {
            AssertFluidObject(json[i], all[i]);
        }
    }

    [Fact]
    public void ListTable_WholeCatalog_AlignedOneRowPerFluid()
    {
        string text = RunText("fluids", "list");

        Assert.StartsWith($"{FluidCatalog.Embedded.All.Count} fluids\n", text, StringComparison.Ordinal);
        var table = Assert.Single(TableLayout.Find(text));
        TableLayout.AssertAligned(table);
        Assert.Equal(["name", "formula", "family", "M [g/mol]", "Tc [K]", "Pc [kPa]", "omega [-]"], table.HeaderCells);
        Assert.Equal(FluidCatalog.Embedded.All.Select(f => f.Name), table.Rows.Select(r => table.Cells(r)[0]));
        var propane = table.Rows.Select(table.Cells).Single(c => c[0] == "propane");
        Assert.Equal(["propane", "C3H8", "alkane", "44.09562", "369.89", "4251.2", "0.152"], propane);
    }

    [Fact]
    public void ListTable_Engineering_DegCAndBar()
    {
        string text = RunText("fluids", "list", "--units", "engineering");

        var table = Assert.Single(TableLayout.Find(text));
        TableLayout.AssertAligned(table);
        Assert.Equal(["name", "formula", "family", "M [g/mol]", "Tc [degC]", "Pc [bar]", "omega [-]"], table.HeaderCells);
        var water = table.Rows.Select(table.Cells).Single(c => c[0] == "water");
        Assert.Equal("373.946", water[4]);
        Assert.Equal("220.64", water[5]);
    }

    [Fact]
    public void ShowTable_Water_AlignedWithUnitsAndSources()
    {
        string text = RunText("fluids", "show", "water");

        Assert.StartsWith("water (H2O)\n", text, StringComparison.Ordinal);
        var table = Assert.Single(TableLayout.Find(text));
        TableLayout.AssertAligned(table);
        Assert.Equal(["constant", "value", "std. uncertainty", "unit", "source"], table.HeaderCells);
        var tc = table.Rows.Select(table.Cells).Single(c => c[0] == "critical temperature");
        Assert.Equal("647.096", tc[1]);
        Assert.Equal("K", tc[3]);
        Assert.Contains("IAPWS-95", tc[4], StringComparison.Ordinal);
        Assert.Contains("lowest valid temperature: 273.16 K", text, StringComparison.Ordinal);
    }

    [Fact]
    public void ShowCsv_Propane_HeaderAndOneRow()
    {
        var rows = CurveCommandTests.ParseCsv(RunText("fluids", "show", "propane", "--format", "csv"));

        Assert.Equal(2, rows.Count);
        Assert.Equal("name", rows[0][0]);
        var record = rows[0].Zip(rows[1]).ToDictionary(p => p.First, p => p.Second);
        Assert.Equal("propane", record["name"]);
        Assert.Equal("369.89", record["critical_temperature_K"]);
        Assert.Equal("4251200", record["critical_pressure_Pa"]);
    }

    [Fact]
    public void ShowJson_Propane_DecimalValuesPrintAsWritten()
    {
        // The file says 44.09562 g/mol: the printed kg/mol value is that decimal, not the
        // binary artefact 0.044095619999999995 of multiplying by an inexact 1e-3.
        string text = RunText("fluids", "show", "propane", "--format", "json");

        Assert.Contains("\"molar_mass_kg_mol\": 0.04409562,", text, StringComparison.Ordinal);
        Assert.Contains("McLinden & Wagner", text, StringComparison.Ordinal);
    }
}
