using System.Globalization;
using System.Text.Json;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Solids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>curve --line sublimation|melting</c>: the solid lines of <see cref="SolidPhaseLines"/>
/// as JSON, CSV and a table; water's and carbon dioxide's from their catalog files (IAPWS (2011)
/// ice Ih and Span &amp; Wagner (1996) equations, from memory).</summary>
public class CurveLineCommandTests
{
    private static SolidPhaseLines CoreLines(string name)
    {
        var fluid = FluidCatalog.Embedded.Find(name);
        return new SolidPhaseLines(fluid, CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson));
    }

    private static double Number(JsonElement element, string key) => element.GetProperty(key).GetDouble();

    [Theory]
    [InlineData("water", "sublimation")]
    [InlineData("water", "melting")]
    [InlineData("carbon dioxide", "sublimation")]
    [InlineData("carbon dioxide", "melting")]
    public void Json_Line_PointsAreTheCoreLineOverItsDefaultRange(string name, string line)
    {
        var kind = line == "sublimation" ? PhaseLineKind.Sublimation : PhaseLineKind.Melting;
        var lines = CoreLines(name);
        var fluid = FluidCatalog.Embedded.Find(name);
        var json = RunJson("curve", name, "--line", line, "--points", "6", "--format", "json");

        Assert.Equal(fluid.Name, json.GetProperty("fluid").GetString());
        Assert.Equal(line, json.GetProperty("line").GetString());
        Assert.Equal(kind == PhaseLineKind.Sublimation ? lines.SublimationMethod : lines.MeltingMethod, json.GetProperty("method").GetString());
        var triple = json.GetProperty("triple_point");
        AssertSameDouble(fluid.TriplePointTemperature!.Value, Number(triple, "temperature_K"), "triple-point temperature");
        AssertSameDouble(fluid.TriplePointPressure!.Value, Number(triple, "pressure_Pa"), "triple-point pressure");
        Assert.Equal(fluid.TriplePointTemperature.Source, triple.GetProperty("temperature_source").GetString());
        Assert.Equal(fluid.TriplePointPressure.Source, triple.GetProperty("pressure_source").GetString());
        var check = json.GetProperty("triple_point_check");
        AssertSameDouble(lines.Check.ModelPressure, Number(check, "model_pressure_Pa"), "model pressure at T_t");
        AssertSameDouble(lines.Check.RelativeDeviation, Number(check, "relative_deviation"), "relative deviation");
        Assert.Equal(JsonValueKind.Null, json.GetProperty("triple_point_check_unavailable_reason").ValueKind);
        Assert.Equal(Core.Fluids.FluidCatalog.Embedded.Find(name).Name, json.GetProperty("fluid").GetString());
        Assert.False(string.IsNullOrEmpty(json.GetProperty("caution").GetString()));

        var (low, high) = lines.DefaultRange(kind);
        var points = json.GetProperty("points");
        Assert.Equal(6, points.GetArrayLength());
        AssertSameDouble(low, Number(points[0], "temperature_K"), "first temperature");
        AssertSameDouble(high, Number(points[5], "temperature_K"), "last temperature");
        foreach (var item in points.EnumerateArray())
        {
            double t = Number(item, "temperature_K");
            var point = kind == PhaseLineKind.Sublimation ? lines.Sublimation(t) : lines.Melting(t);
            AssertSameDouble(point.Pressure, Number(item, "pressure_Pa"), $"pressure at {t} K");
            AssertSameDouble(point.Slope, Number(item, "slope_Pa_K"), $"slope at {t} K");
            // Δh and Δv are null where the core gives none (a published melting line beyond
            // SolidPhaseLines.MeltingVolumeBand of the triple point).
            if (point.EnthalpyChange is double dh)
            {
                AssertSameDouble(dh, Number(item, "enthalpy_change_J_mol"), $"dh at {t} K");
                AssertSameDouble(point.VolumeChange!.Value, Number(item, "volume_change_m3_mol"), $"dv at {t} K");
            }
            else
            {
                Assert.Equal(JsonValueKind.Null, item.GetProperty("enthalpy_change_J_mol").ValueKind);
                Assert.Equal(JsonValueKind.Null, item.GetProperty("volume_change_m3_mol").ValueKind);
            }
        }
    }

    [Fact]
    public void Json_WaterMelting_FallsWithTemperatureAndSaysHowRoughDhIs()
    {
        var json = RunJson("curve", "water", "--line", "melting", "--points", "5", "--format", "json");
        var points = json.GetProperty("points").EnumerateArray().ToArray();

        // Ice Ih melts at lower temperature under pressure (IAPWS 2011): P falls as T rises.
        for (int i = 1; i < points.Length; i++)
        {
            Assert.True(Number(points[i], "pressure_Pa") < Number(points[i - 1], "pressure_Pa"), "melting pressure falls with T");
            Assert.True(Number(points[i], "slope_Pa_K") < 0, "negative slope");
        }

        // At the triple point dh = T dv dP/dT gives back the CRC enthalpy of fusion, 6.01 kJ/mol
        // (from memory), to the 0.1 % that the sources' dh_fus and densities allow.
        Assert.Equal(6.01e3, Number(points[^1], "enthalpy_change_J_mol"), 6.01e3 * 1e-3);
        string notes = string.Join(" | ", json.GetProperty("notes").EnumerateArray().Select(n => n.GetString()));
        Assert.Contains("dv is held at its triple-point value", notes, StringComparison.Ordinal);
        Assert.Contains("rough far from the triple point, so both are given only within 10 MPa", notes, StringComparison.Ordinal);
        // The points at 1e8 Pa and more have no Δv, and the reason says why.
        Assert.Contains("given only within 10 MPa of the triple-point pressure", json.GetProperty("volume_change_unavailable_reason").GetString(), StringComparison.Ordinal);
        Assert.Equal(JsonValueKind.Null, points[0].GetProperty("volume_change_m3_mol").ValueKind);
    }

    [Fact]
    public void Csv_SolidLine_IsTheJsonPointsFlattened()
    {
        string[] args = ["curve", "carbon dioxide", "--line", "sublimation", "--points", "4"];
        var json = RunJson([.. args, "--format", "json"]);
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv"]));

        Assert.Equal(["line", "temperature_K", "pressure_Pa", "slope_Pa_K", "enthalpy_change_J_mol", "volume_change_m3_mol"], rows[0]);
        Assert.Equal(5, rows.Count);
        for (int i = 0; i < 4; i++)
        {
            var values = CurveCommandTests.FlatValues(json.GetProperty("points")[i]);
            Assert.Equal("sublimation", rows[i + 1][0]);
            for (int j = 1; j < rows[0].Length; j++)
            {
                Assert.Equal(values[rows[0][j]], rows[i + 1][j]);
            }
        }
    }

    [Fact]
    public void Csv_EngineeringUnits_ConvertsEveryColumn()
    {
        string[] args = ["curve", "water", "--line", "melting", "--points", "3"];
        var json = RunJson([.. args, "--format", "json"]);
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv", "--units", "engineering"]));
        double m = FluidCatalog.Embedded.Find("water").MolarMass!.Value;

        Assert.Equal(["line", "temperature_degC", "pressure_bar", "slope_bar_K", "enthalpy_change_kJ_kg", "volume_change_m3_kg"], rows[0]);
        for (int i = 0; i < 3; i++)
        {
            var point = json.GetProperty("points")[i];
            double Cell(int j) => double.Parse(rows[i + 1][j], CultureInfo.InvariantCulture);
            // Each conversion is one or two floating operations on the JSON's value: 1e-12 relative
            // (absolute for degC, which subtracts 273.15 K).
            Assert.Equal(Number(point, "temperature_K") - 273.15, Cell(1), 1e-9);
            Assert.Equal(Number(point, "pressure_Pa") / 1e5, Cell(2), Math.Abs(Cell(2)) * 1e-12);
            Assert.Equal(Number(point, "slope_Pa_K") / 1e5, Cell(3), Math.Abs(Cell(3)) * 1e-12);
            if (point.GetProperty("enthalpy_change_J_mol").ValueKind == JsonValueKind.Null)
            {
                // Beyond 10 MPa of the triple point the melting line gives no Δh, Δv: empty cells.
                Assert.Equal("", rows[i + 1][4]);
                Assert.Equal("", rows[i + 1][5]);
                continue;
            }

            Assert.Equal(Number(point, "enthalpy_change_J_mol") / m / 1e3, Cell(4), Math.Abs(Cell(4)) * 1e-12);
            Assert.Equal(Number(point, "volume_change_m3_mol") / m, Cell(5), Math.Abs(Cell(5)) * 1e-12);
        }
    }

    [Fact]
    public void Table_EngineeringUnits_HeadersAndTriplePoint()
    {
        string text = RunText("curve", "water", "--line", "melting", "--points", "3", "--units", "engineering");

        Assert.StartsWith("Melting line of water; 3 points", text, StringComparison.Ordinal);
        foreach (string header in new[] { "T [degC]", "P [bar]", "dP/dT [bar/K]", "dh_fus [kJ/kg]", "dv_fus [m3/kg]" })
        {
            Assert.Contains(header, text, StringComparison.Ordinal);
        }

        Assert.Contains("triple point: 0.01 degC", text, StringComparison.Ordinal);
        Assert.Contains("note: ", text, StringComparison.Ordinal);
        Assert.Contains("licensed engineering practice", text, StringComparison.Ordinal);
    }

    [Fact]
    public void TemperaturesAndStep_SolidLine_RowsAtThoseTemperatures()
    {
        var listed = RunJson("curve", "water", "--line", "sublimation", "--temperatures", "-50,-20,0 degC", "--format", "json").GetProperty("points");
        Assert.Equal([223.15, 253.15, 273.15], listed.EnumerateArray().Select(p => Math.Round(Number(p, "temperature_K"), 9)).ToArray());

        var stepped = RunJson("curve", "water", "--line", "sublimation", "--from", "200", "--to", "230", "--step", "10", "--format", "json").GetProperty("points");
        Assert.Equal([200.0, 210.0, 220.0, 230.0], stepped.EnumerateArray().Select(p => Number(p, "temperature_K")).ToArray());

        // Below the default start (0.7 T_t) but inside the published equation's range (from 50 K).
        var low = RunJson("curve", "water", "--line", "sublimation", "--to", "150", "--points", "2", "--format", "json").GetProperty("points");
        Assert.Equal([50.0, 150.0], low.EnumerateArray().Select(p => Number(p, "temperature_K")).ToArray());
    }

    [Fact]
    public void Out_SolidLine_WritesTheFileInTheFormatOfItsExtension()
    {
        using var folder = new TempFolder();
        string path = folder.File("melting.json");

        var result = Run("curve", "water", "--line", "melting", "--points", "3", "--out", path);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        Assert.Equal($"phaseslope: wrote 3 melting points to {path}\n", result.Stderr);
        using var written = StrictJson.Parse(File.ReadAllText(path));
        Assert.Equal(3, written.RootElement.GetProperty("points").GetArrayLength());
    }

    [Fact]
    public void Vaporization_DefaultLine_OutputUnchanged()
    {
        Assert.Equal(RunText("curve", "propane", "--points", "5"), RunText("curve", "propane", "--points", "5", "--line", "vaporization"));
    }

    [Fact]
    public void Json_WithoutVolumeChange_NullWithReason()
    {
        using var folder = new TempFolder();
        // Water's file without its densities: the published melting line stands, dh and dv cannot be formed.
        string text = string.Join('\n', CatalogFileText("water.fluid").Split('\n')
            .Where(l => !l.StartsWith("solid_density ", StringComparison.Ordinal) && !l.StartsWith("triple_point_liquid_density ", StringComparison.Ordinal)));
        File.WriteAllText(folder.File("water-nodv.fluid"), text);

        var json = RunJson("curve", folder.File("water-nodv.fluid"), "--line", "melting", "--points", "2", "--format", "json");

        foreach (var point in json.GetProperty("points").EnumerateArray())
        {
            Assert.Equal(JsonValueKind.Null, point.GetProperty("enthalpy_change_J_mol").ValueKind);
            Assert.Equal(JsonValueKind.Null, point.GetProperty("volume_change_m3_mol").ValueKind);
        }

        Assert.Contains("fusion_volume_change", json.GetProperty("volume_change_unavailable_reason").GetString(), StringComparison.Ordinal);
        Assert.Contains("fusion_volume_change", json.GetProperty("enthalpy_change_unavailable_reason").GetString(), StringComparison.Ordinal);
    }
}
