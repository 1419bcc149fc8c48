using System.Globalization;
using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>Tables people read: <c>curve --step</c>, <c>--temperatures</c> and <c>--pressures</c>,
/// and the CSV of <c>curve</c> and <c>coexist</c> as their JSON flattened, in SI or engineering
/// units.</summary>
public class CurveTableTests
{
    // A traced row and a cold-started coexist at the same T or P are two converged solutions of the
    // same equations: the solver reports densities converged to a few 1e-15 relative, up to 5e-14
    // near Tc (its density_uncertainty); P, the densities and the latent heat then agree to far
    // better than 1e-12, which still catches a row at the wrong temperature or pressure (a change
    // of 1e-9 K moves Psat by ~1e-11 relative).
    private const double SameState = 1e-12;

    private static double Number(JsonElement element, string key) => element.GetProperty(key).GetDouble();

    private static double Nearest(decimal value) => double.Parse(value.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static string R(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    [Fact]
    public void Step_MinusFortyToEightyDegC_EveryFiveDegreesExactly()
    {
        string[] args = ["curve", "r-134a", "--from", "-40 degC", "--to", "80 degC", "--step", "5"];

        var table = Assert.Single(TableLayout.Find(RunText([.. args, "--units", "engineering"])));
        var json = RunJson([.. args, "--format", "json"]);

        Assert.Equal([.. Enumerable.Range(0, 25).Select(i => (-40 + 5 * i).ToString(CultureInfo.InvariantCulture))],
            table.Rows.Select(r => table.Cells(r)[0]).ToArray());
        Assert.Equal(25, json.GetArrayLength());
        for (int i = 0; i < 25; i++)
        {
            // -40 degC is 233.15 K exactly in decimal; each row is the double nearest 233.15 + 5i.
            AssertSameDouble(Nearest(233.15m + 5 * i), Number(json[i], "temperature_K"), $"row {i}");
        }
    }

    [Fact]
    public void Step_Rows_EqualCoexistAtThoseTemperatures()
    {
        var json = RunJson("curve", "propane", "--from", "250", "--to", "360", "--step", "10", "--format", "json");

        Assert.Equal(12, json.GetArrayLength());
        foreach (var row in json.EnumerateArray())
        {
            var single = RunJson("coexist", "propane", "-T", R(Number(row, "temperature_K")), "--format", "json");
            AssertRelative(Number(single, "pressure_Pa"), Number(row, "pressure_Pa"), SameState, "pressure_Pa");
            AssertRelative(Number(single, "enthalpy_of_vaporization_J_mol"), Number(row, "enthalpy_of_vaporization_J_mol"), SameState, "latent heat");
            AssertRelative(Number(single.GetProperty("liquid"), "density_mol_m3"), Number(row.GetProperty("liquid"), "density_mol_m3"), SameState, "liquid density");
            AssertRelative(Number(single.GetProperty("vapour"), "density_mol_m3"), Number(row.GetProperty("vapour"), "density_mol_m3"), SameState, "vapour density");
        }
    }

    [Fact]
    public void Step_NotLandingOnTo_ToIsTheLastRow()
    {
        var json = RunJson("curve", "propane", "--from", "250", "--to", "300", "--step", "15", "--format", "json");

        Assert.Equal([250.0, 265, 280, 295, 300], json.EnumerateArray().Select(r => Number(r, "temperature_K")).ToArray());
    }

    [Theory]
    [InlineData("1e6")]
    [InlineData("1e30 degF")] // beyond decimal's range: the step is compared with the range first
    public void Step_AtLeastTheRange_GivesItsTwoEnds(string step)
    {
        var json = RunJson("curve", "propane", "--from", "300", "--to", "310", "--step", step, "--format", "json");

        Assert.Equal([300.0, 310], json.EnumerateArray().Select(r => Number(r, "temperature_K")).ToArray());
    }

    [Fact]
    public void Step_NoTo_EndsAtTheCriticalPoint()
    {
        var json = RunJson("curve", "propane", "--from", "300", "--step", "20", "--format", "json");

        Assert.Equal([300.0, 320, 340, 360, 369.89], json.EnumerateArray().Select(r => Number(r, "temperature_K")).ToArray());
        Assert.True(json[4].GetProperty("critical").GetBoolean());
    }

    [Fact]
    public void Step_Fahrenheit_IsADifferenceWithoutTheOffset()
    {
        var json = RunJson("curve", "propane", "--from", "0 degF", "--to", "100 degF", "--step", "10 degF", "--format", "json");

        Assert.Equal(11, json.GetArrayLength());
        for (int i = 0; i < 11; i++)
        {
            // T/K = (t/degF + 459.67)/1.8 (NIST SP 811 B.9). The step 10/1.8 K is not a finite
            // decimal: its shortest double text, summed ten times, is off by at most ~1e-14 K.
            Assert.Equal((10 * i + 459.67) / 1.8, Number(json[i], "temperature_K"), 1e-12);
        }

        // With an offset the step would be (10 + 459.67)/1.8 = 261 K and give two rows.
        AssertSameDouble(Nearest((100m + 459.67m) / 1.8m), Number(json[10], "temperature_K"), "last row is --to");
    }

    [Fact]
    public void Temperatures_List_RowsAtThoseTemperaturesAndTcIsTheCriticalPoint()
    {
        var json = RunJson("curve", "propane", "--temperatures", "-40,-30,-20,96.74 degC", "--format", "json");

        Assert.Equal(4, json.GetArrayLength());
        AssertSameDouble(Nearest(233.15m), Number(json[0], "temperature_K"), "-40 degC");
        AssertSameDouble(Nearest(243.15m), Number(json[1], "temperature_K"), "-30 degC");
        AssertSameDouble(Nearest(253.15m), Number(json[2], "temperature_K"), "-20 degC");
        // 96.74 degC is propane's catalog Tc, 369.89 K: that row is the critical point.
        Assert.True(json[3].GetProperty("critical").GetBoolean());
        Assert.False(json[2].GetProperty("critical").GetBoolean());
    }

    // Normal boiling point of water 373.124 K (IAPWS-95, Wagner & Pruss 2002; from memory, as in
    // the catalog file). At 373 K, d ln P/dT = dH/(RT^2) = 40.66 kJ/mol / (8.314 J/(mol K) x
    // (373.1 K)^2) = 0.0351 /K, so a deviation of x in Psat moves Tsat by x/0.0351 K.
    // Mathias-Copeman: water's constants were tuned to its vapour-pressure equation with a largest
    // deviation of 0.53 % (fluids/water.fluid): 0.15 K. The model gives 373.105 K.
    // Default alpha: Peng-Robinson's generalised alpha misses polar water's vapour pressure by
    // 4.3 % on average over the range (water.fluid, the same tuning record), and more at the
    // ends; 7 % is 2 K. The model gives 374.498 K, 1.37 K high.
    [Theory]
    [InlineData("mathias-copeman", 0.15)]
    [InlineData("default", 2.0)]
    public void Pressures_WaterAtOneAtmosphere_TheNormalBoilingPoint(string alpha, double tolerance)
    {
        var json = RunJson("curve", "water", "--pressures", "1 atm", "--alpha", alpha, "--format", "json");

        Assert.Equal(101325, Number(json[0], "pressure_Pa"));
        Assert.Equal(373.124, Number(json[0], "temperature_K"), tolerance);
    }

    [Fact]
    public void Coexist_CsvInEngineeringUnits_TheUnitInEachHeader()
    {
        var rows = CurveCommandTests.ParseCsv(RunText("coexist", "propane", "-T", "26.85 degC", "--format", "csv", "--units", "engineering"));
        var json = RunJson("coexist", "propane", "-T", "26.85 degC", "--format", "json");

        Assert.Equal(2, rows.Count);
        // 26.85 degC is 300 K in decimal, and back: the cell is the text the user gave.
        Assert.Equal("26.85", rows[1][Array.IndexOf(rows[0], "temperature_degC")]);
        // bar from Pa: one exact decimal conversion, then one rounding to a double.
        AssertRelative(Number(json, "pressure_Pa") / 1e5, double.Parse(rows[1][Array.IndexOf(rows[0], "pressure_bar")], CultureInfo.InvariantCulture), 1e-15, "bar");
        Assert.Contains("vapour_enthalpy_kJ_kg", rows[0]);
        Assert.DoesNotContain("pressure_Pa", rows[0]);
    }

    [Fact]
    public void Pressures_Rows_EqualCoexistAtThosePressures()
    {
        var json = RunJson("curve", "propane", "--pressures", "1,2,5,10 bar", "--format", "json");

        Assert.Equal(4, json.GetArrayLength());
        string[] given = ["1 bar", "2 bar", "5 bar", "10 bar"];
        for (int i = 0; i < 4; i++)
        {
            var single = RunJson("coexist", "propane", "-P", given[i], "--format", "json");
            Assert.Equal(Number(single, "pressure_Pa"), Number(json[i], "pressure_Pa"));
            AssertRelative(Number(single, "temperature_K"), Number(json[i], "temperature_K"), SameState, "temperature_K");
            AssertRelative(Number(single.GetProperty("liquid"), "density_mol_m3"), Number(json[i].GetProperty("liquid"), "density_mol_m3"), SameState, "liquid density");
        }
    }

    [Fact]
    public void Pressures_TableWithUncertainty_TitleSaysByPressureAndShowsUOfT()
    {
        string text = RunText("curve", "propane", "--pressures", "1,2 bar", "--uncertainty", "linear");

        Assert.StartsWith("Saturation table by pressure of propane,", text, StringComparison.Ordinal);
        var table = Assert.Single(TableLayout.Find(text));
        Assert.Contains("u(T) [K]", table.HeaderCells);
        Assert.DoesNotContain("u(P) [kPa]", table.HeaderCells);
        Assert.Equal(["100", "200"], table.Rows.Select(r => table.Cells(r)[1]).ToArray());
    }

    public static TheoryData<string[]> CsvCommands => new()
    {
        { ["curve", "propane", "--points", "4"] },
        { ["curve", "propane", "--points", "4", "--uncertainty", "linear"] },
        { ["curve", "propane", "--pressures", "1,2 bar", "--reference", "nbp"] },
        { ["curve", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "--points", "3"] },
        { ["coexist", "propane", "-T", "300"] },
        { ["coexist", "propane", "-P", "1 bar", "--uncertainty", "linear"] },
    };

    [Theory]
    [MemberData(nameof(CsvCommands))]
    public void Csv_HeadersAndCells_AreTheJsonFlattened(string[] args)
    {
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv"]));
        var json = RunJson([.. args, "--format", "json"]);
        var objects = json.ValueKind == JsonValueKind.Array ? json.EnumerateArray().ToArray() : [json];

        Assert.Equal(objects.Length + 1, rows.Count);
        Assert.Equal(CurveCommandTests.FlatKeys(objects[0]), rows[0]);
        for (int i = 0; i < objects.Length; i++)
        {
            var flat = CurveCommandTests.FlatValues(objects[i]);
            Assert.Equal(flat.Keys.ToHashSet(), rows[0].ToHashSet());
            Assert.Equal(rows[0].Select(k => flat[k]).ToArray(), rows[i + 1]);
        }
    }

    [Fact]
    public void Csv_Engineering_UnitInEachHeaderAndConvertedValues()
    {
        string[] args = ["curve", "propane", "--temperatures", "0,20 degC", "--uncertainty", "linear"];
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv", "--units", "engineering"]));
        var json = RunJson([.. args, "--format", "json"]);
        double m = Number(json[0], "molar_mass_kg_mol");
        string Cell(int row, string key)
        {
            int column = Array.IndexOf(rows[0], key);
            Assert.True(column >= 0, $"no column {key}");
            return rows[row][column];
        }

        double Value(int row, string key) => double.Parse(Cell(row, key), CultureInfo.InvariantCulture);

        string[] header = rows[0];
        Assert.Equal(header.Length, header.Distinct().Count());
        foreach (string key in new[]
        {
            "temperature_degC", "pressure_bar", "enthalpy_of_vaporization_kJ_kg", "entropy_of_vaporization_kJ_kgK", "slope_bar_K", "inverse_slope_K_bar",
            "volume_change_m3_kg", "liquid_density_kg_m3", "liquid_enthalpy_kJ_kg", "vapour_entropy_kJ_kgK", "liquid_speed_of_sound_m_s",
            "liquid_isothermal_compressibility_1_bar", "liquid_density_slope_kg_m3K", "liquid_entropy_slope_kJ_kgK2", "liquid_internal_pressure_bar",
            "molar_mass_kg_mol", "standard_uncertainty_temperature_K", "standard_uncertainty_pressure_bar", "model_volume_shift_m3_kg",
        })
        {
            Assert.Contains(key, header);
        }

        // Nothing left in molar SI units; mass-based keys and the uncertainty's K (a difference) stay.
        Assert.DoesNotContain(header, h => h.EndsWith("_Pa", StringComparison.Ordinal) || h.EndsWith("_J_mol", StringComparison.Ordinal)
            || h.EndsWith("_mol_m3", StringComparison.Ordinal) || h.EndsWith("_J_molK", StringComparison.Ordinal) || h == "temperature_K");
        for (int i = 0; i < 2; i++)
        {
            var point = json[i];
            // The unit table converts in decimal from the shortest text of the double: 273.15 K is 0 degC exactly.
            Assert.Equal(i == 0 ? "0" : "20", Cell(i + 1, "temperature_degC"));
            // One conversion (P/1e5, h/M/1e3): within 2 roundings, i.e. a few 1e-16 relative.
            AssertRelative(Number(point, "pressure_Pa") / 1e5, Value(i + 1, "pressure_bar"), 1e-15, "bar");
            AssertRelative(Number(point.GetProperty("liquid"), "enthalpy_J_mol") / m / 1e3, Value(i + 1, "liquid_enthalpy_kJ_kg"), 1e-15, "kJ/kg");
            AssertRelative(Number(point.GetProperty("vapour"), "density_mol_m3") * m, Value(i + 1, "vapour_density_kg_m3"), 1e-15, "kg/m3");
            AssertRelative(Number(point.GetProperty("liquid"), "entropy_slope_J_molK2") / m / 1e3, Value(i + 1, "liquid_entropy_slope_kJ_kgK2"), 1e-15, "kJ/(kg K2)");
            // u(T) is a difference: the same number in K, never shifted by 273.15.
            Assert.Equal(point.GetProperty("standard_uncertainty").GetProperty("temperature_K").GetRawText(), Cell(i + 1, "standard_uncertainty_temperature_K"));
        }
    }

    [Fact]
    public void Table_EnthalpyAtItsReferenceState_PrintedAsZero()
    {
        string[] args = ["curve", "water", "--pressures", "1 atm", "--reference", "nbp"];
        var json = RunJson([.. args, "--format", "json"]);
        var table = Assert.Single(TableLayout.Find(RunText(args)));

        double hLiquid = Number(json[0].GetProperty("liquid"), "enthalpy_J_mol");
        double hVapour = Number(json[0].GetProperty("vapour"), "enthalpy_J_mol");
        // The nbp reference sets h = s = 0 for the saturated liquid at 1 atm; JSON keeps what the
        // arithmetic gave (round-off, far below 1e-9 of the latent heat beside it) ...
        Assert.True(Math.Abs(hLiquid) < 1e-9 * Math.Abs(hVapour), $"h_L = {R(hLiquid)} J/mol");
        // ... and the table, read by people, prints 0.
        var cells = table.Cells(table.Rows[0]);
        Assert.Equal("0", cells[Array.IndexOf(table.HeaderCells, "h_L [J/mol]")]);
        Assert.Equal("0", cells[Array.IndexOf(table.HeaderCells, "s_L [J/(mol·K)]")]);
    }
}
