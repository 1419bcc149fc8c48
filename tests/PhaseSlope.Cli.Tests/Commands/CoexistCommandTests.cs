using System.Globalization;
using System.Text.Json;
using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

public class CoexistCommandTests
{
    private static readonly string[] PhaseKeys = ["density_mol_m3", "molar_volume_m3_mol", "compressibility_factor"];

    private static readonly string[] TopKeys =
    [
        "fluid", "eos", "temperature_K", "pressure_Pa", "liquid", "vapour",
        "enthalpy_of_vaporization_J_mol", "entropy_of_vaporization_J_molK",
        "internal_energy_change_J_mol", "volume_change_m3_mol", "slope_Pa_K",
    ];

    /// <summary>Checks the JSON contract of one coexistence object against the core's point, number by number, bit for bit.</summary>
    internal static void AssertMatchesPoint(JsonElement json, CoexistencePoint point, string fluid, string eos)
    {
        Assert.Equal(JsonValueKind.Object, json.ValueKind);
        foreach (string key in TopKeys)
        {
            Assert.True(json.TryGetProperty(key, out _), $"missing key {key}");
        }

        Assert.Equal(fluid, json.GetProperty("fluid").GetString());
        Assert.Equal(eos, json.GetProperty("eos").GetString());
        AssertSameDouble(point.Temperature, json.GetProperty("temperature_K").GetDouble(), "temperature_K");
        AssertSameDouble(point.Pressure, json.GetProperty("pressure_Pa").GetDouble(), "pressure_Pa");
        AssertSameDouble(point.EnthalpyOfVaporization, json.GetProperty("enthalpy_of_vaporization_J_mol").GetDouble(), "enthalpy_of_vaporization_J_mol");
        AssertSameDouble(point.EntropyOfVaporization, json.GetProperty("entropy_of_vaporization_J_molK").GetDouble(), "entropy_of_vaporization_J_molK");
        AssertSameDouble(point.InternalEnergyChange, json.GetProperty("internal_energy_change_J_mol").GetDouble(), "internal_energy_change_J_mol");
        AssertSameDouble(point.VolumeChange, json.GetProperty("volume_change_m3_mol").GetDouble(), "volume_change_m3_mol");
        AssertSameDouble(point.Slope, json.GetProperty("slope_Pa_K").GetDouble(), "slope_Pa_K");
        foreach ((string name, var phase) in new[] { ("liquid", point.Liquid), ("vapour", point.Vapour) })
        {
            var obj = json.GetProperty(name);
            Assert.Equal(JsonValueKind.Object, obj.ValueKind);
            foreach (string key in PhaseKeys)
            {
                Assert.Equal(JsonValueKind.Number, obj.GetProperty(key).ValueKind);
            }

            AssertSameDouble(phase.Density, obj.GetProperty("density_mol_m3").GetDouble(), $"{name}.density_mol_m3");
            AssertSameDouble(phase.MolarVolume, obj.GetProperty("molar_volume_m3_mol").GetDouble(), $"{name}.molar_volume_m3_mol");
            AssertSameDouble(phase.CompressibilityFactor, obj.GetProperty("compressibility_factor").GetDouble(), $"{name}.compressibility_factor");
        }
    }

    [Theory]
    [InlineData("propane", "pr", CubicModelKind.PengRobinson, 300.0)]
    [InlineData("water", "srk", CubicModelKind.SoaveRedlichKwong, 450.0)]
    [InlineData("methanol", "pr78", CubicModelKind.PengRobinson1978, 400.0)]
    [InlineData("argon", "vdw", CubicModelKind.VanDerWaals, 100.0)]
    [InlineData("nitrogen", "rk", CubicModelKind.RedlichKwong, 0.999 * 126.192)]
    public void Json_AtTemperature_HasContractKeysAndCoreValuesBitForBit(string fluid, string eos, CubicModelKind kind, double temperature)
    {
        var json = RunJson("coexist", fluid, "--temperature", temperature.ToString("R", CultureInfo.InvariantCulture), "--eos", eos, "--format", "json");

        var point = CoexistenceSolver.For(FluidCatalog.Embedded.Find(fluid), kind).AtTemperature(temperature);
        AssertMatchesPoint(json, point, fluid, eos);
    }

    [Fact]
    public void Json_AtPressure_IsTheCoreAtPressurePoint()
    {
        var json = RunJson("coexist", "ammonia", "--pressure", "500 kPa", "--format", "json");

        var point = CoexistenceSolver.For(FluidCatalog.Embedded.Find("ammonia"), CubicModelKind.PengRobinson).AtPressure(5.0e5);
        AssertMatchesPoint(json, point, "ammonia", "pr");
        AssertRelative(5.0e5, json.GetProperty("pressure_Pa").GetDouble(), 1e-9, "pressure_Pa");
    }

    [Fact]
    public void Json_Default_EosIsPengRobinson()
    {
        var json = RunJson("coexist", "propane", "-T", "300", "--format", "json");
        Assert.Equal("pr", json.GetProperty("eos").GetString());
        Assert.False(json.GetProperty("critical").GetBoolean());
        Assert.True(json.GetProperty("liquid").GetProperty("density_mol_m3").GetDouble() > json.GetProperty("vapour").GetProperty("density_mol_m3").GetDouble());
    }

    [Theory]
    [InlineData("--temperature", "26.85 degC", "300")]
    [InlineData("--temperature", "26.85degC", "300")]
    [InlineData("--temperature", "300K", "300")]
    [InlineData("--temperature", "300 K", "300")]
    [InlineData("--temperature", "540 degR", "300")]
    [InlineData("--pressure", "1 atm", "101325")]
    [InlineData("--pressure", "101.325 kPa", "101325")]
    [InlineData("--pressure", "1.2 bar", "120000")]
    [InlineData("--pressure", "2 MPa", "2000000")]
    [InlineData("--pressure", "760 torr", "101325")]
    [InlineData("--temperature", "40.70 degC", "313.85")] // exact decimal conversion, as in a data file
    [InlineData("--pressure", "101325000 mPa", "101325")] // case-sensitive: the millipascal
    public void Units_QuantityWithUnit_SameOutputAsBareSiNumber(string option, string withUnit, string bareSi)
    {
        foreach (string format in new[] { "json", "table" })
        {
            string a = RunText("coexist", "propane", option, withUnit, "--format", format);
            string b = RunText("coexist", "propane", option, bareSi, "--format", format);
            Assert.Equal(b, a);
        }
    }

    [Theory]
    [InlineData("1 mpa", "did you mean MPa or mPa?")]
    [InlineData("1 Mpa", "did you mean MPa or mPa?")]
    [InlineData("100 KPA", "did you mean kPa?")]
    public void Units_WrongCase_IsRefusedWithTheNearMatches(string text, string hint)
    {
        var result = CliHarness.Run("coexist", "propane", "--pressure", text);
        CliHarness.AssertFailure(result, ExitCodes.Usage, $"--pressure: unknown pressure unit '{text.Split(' ')[1]}' in '{text}'; {hint}");
    }

    [Fact]
    public void Units_Fahrenheit_TemperatureFromTheScaleDefinition()
    {
        // T/K = (t/degF + 459.67)/1.8 exactly (NIST SP 811, 2008, B.9): 80 degF = 299.816666... K
        var json = RunJson("coexist", "propane", "--temperature", "80 degF", "--format", "json");
        AssertRelative(299.81666666666666667, json.GetProperty("temperature_K").GetDouble(), 1e-14, "temperature_K");
    }

    [Fact]
    public void Units_Psi_PressureFromThePoundForceDefinition()
    {
        // 1 psi = 0.45359237 kg × 9.80665 m/s² / (0.0254 m)² = 6894.757293168... Pa (exact
        // definitions, NIST SP 811, 2008, B.8), so 14.7 psi = 101352.9322... Pa.
        var json = RunJson("coexist", "propane", "--pressure", "14.7 psi", "--format", "json");
        AssertRelative(101352.93220957, json.GetProperty("pressure_Pa").GetDouble(), 1e-9, "pressure_Pa");
        var bare = RunJson("coexist", "propane", "--pressure", "101352.93220957", "--format", "json");
        AssertRelative(bare.GetProperty("temperature_K").GetDouble(), json.GetProperty("temperature_K").GetDouble(), 1e-12, "temperature_K");
    }

    [Fact]
    public void Units_ShortAndLongOptionNames_SameOutput()
    {
        Assert.Equal(
            RunText("coexist", "propane", "--temperature", "300", "--format", "json"),
            RunText("coexist", "propane", "-T", "300", "--format", "json"));
        Assert.Equal(
            RunText("coexist", "propane", "--pressure", "1 bar", "--format", "json"),
            RunText("coexist", "propane", "-P", "1 bar", "--format", "json"));
    }

    [Theory]
    [InlineData("propane", "1 MPa", 1.0e6)]
    [InlineData("water", "1 atm", 101325.0)]
    [InlineData("carbon dioxide", "7 MPa", 7.0e6)]
    [InlineData("toluene", "500 Pa", 500.0)]
    public void RoundTrip_PressureThenTemperature_ReturnsThePressure(string fluid, string pressure, double pascal)
    {
        var atP = RunJson("coexist", fluid, "--pressure", pressure, "--format", "json");
        double tsat = atP.GetProperty("temperature_K").GetDouble();

        var atT = RunJson("coexist", fluid, "--temperature", tsat.ToString("R", CultureInfo.InvariantCulture), "--format", "json");

        AssertSameDouble(tsat, atT.GetProperty("temperature_K").GetDouble(), "temperature_K");
        AssertRelative(pascal, atT.GetProperty("pressure_Pa").GetDouble(), 1e-9, "pressure_Pa at Tsat");
        AssertRelative(atP.GetProperty("liquid").GetProperty("density_mol_m3").GetDouble(),
            atT.GetProperty("liquid").GetProperty("density_mol_m3").GetDouble(), 1e-9, "liquid density");
        AssertRelative(atP.GetProperty("vapour").GetProperty("density_mol_m3").GetDouble(),
            atT.GetProperty("vapour").GetProperty("density_mol_m3").GetDouble(), 1e-9, "vapour density");
    }

    [Fact]
    public void Table_Si_AlignedWithSiUnitsAndCaution()
    {
        string text = RunText("coexist", "propane", "--temperature", "300");

        var tables = TableLayout.Find(text);
        Assert.Equal(2, tables.Count);
        foreach (var table in tables)
        {
            TableLayout.AssertAligned(table);
        }

        Assert.Equal(["phase property", "liquid", "vapour", "unit"], tables[0].HeaderCells);
        var units = tables[0].Rows.Select(r => tables[0].Cells(r)[3]).ToArray();
        Assert.Contains("mol/m3", units);
        Assert.Contains("m3/mol", units);
        Assert.Contains("J/mol", units);
        var jumpUnits = tables[1].Rows.Select(r => tables[1].Cells(r)[2]).ToArray();
        Assert.Contains("J/(mol·K)", jumpUnits);
        Assert.Contains("kPa/K", jumpUnits);
        Assert.Contains("saturation temperature  300 K\n", text, StringComparison.Ordinal);
        Assert.Contains("kPa\n", text, StringComparison.Ordinal);
        Assert.Contains(CoexistenceWriter.Caution, text, StringComparison.Ordinal);
        Assert.StartsWith("Model estimates.", CoexistenceWriter.Caution, StringComparison.Ordinal);
    }

    [Fact]
    public void Table_Engineering_ShowsMassUnitsAndConvertedValues()
    {
        string text = RunText("coexist", "propane", "--temperature", "300", "--units", "engineering");
        var fluid = FluidCatalog.Embedded.Find("propane");
        var point = CoexistenceSolver.For(fluid, CubicModelKind.PengRobinson).AtTemperature(300);
        double m = fluid.MolarMass!.Value;

        Assert.Contains("saturation temperature  26.85 degC\n", text, StringComparison.Ordinal);
        Assert.Matches(@"saturation pressure +[0-9.]+ bar\n", text);
        var tables = TableLayout.Find(text);
        Assert.Equal(2, tables.Count);
        foreach (var table in tables)
        {
            TableLayout.AssertAligned(table);
        }

        var density = tables[0].Rows.Select(tables[0].Cells).Single(c => c[0] == "density");
        Assert.Equal("kg/m3", density[3]);
        AssertRelative(point.Liquid.Density * m, double.Parse(density[1], CultureInfo.InvariantCulture), TableDigits, "liquid kg/m3");
        AssertRelative(point.Vapour.Density * m, double.Parse(density[2], CultureInfo.InvariantCulture), TableDigits, "vapour kg/m3");
        var dh = tables[1].Rows.Select(tables[1].Cells).Single(c => c[0] == "enthalpy of vaporization");
        Assert.Equal("kJ/kg", dh[2]);
        AssertRelative(point.EnthalpyOfVaporization / m / 1000, double.Parse(dh[1], CultureInfo.InvariantCulture), TableDigits, "dH kJ/kg");
        var slope = tables[1].Rows.Select(tables[1].Cells).Single(c => c[0].StartsWith("slope", StringComparison.Ordinal));
        Assert.Equal("bar/K", slope[2]);
        AssertRelative(point.Slope / 1e5, double.Parse(slope[1], CultureInfo.InvariantCulture), TableDigits, "slope bar/K");
        Assert.DoesNotContain("mol/m3", text, StringComparison.Ordinal);
        Assert.Contains(CoexistenceWriter.Caution, text, StringComparison.Ordinal);
    }

    [Fact]
    public void Csv_SinglePoint_HeaderAndOneRowWithCoreValues()
    {
        string text = RunText("coexist", "propane", "--temperature", "300", "--format", "csv");
        var point = CoexistenceSolver.For(FluidCatalog.Embedded.Find("propane"), CubicModelKind.PengRobinson).AtTemperature(300);

        var rows = CurveCommandTests.ParseCsv(text);
        Assert.Equal(2, rows.Count);
        Assert.Equal(CurveCommandTests.FlatKeys(RunJson("coexist", "propane", "--temperature", "300", "--format", "json")), rows[0]);
        var record = rows[0].Zip(rows[1]).Where(p => p.First is "pressure_Pa" or "liquid_density_mol_m3" or "slope_Pa_K")
            .ToDictionary(p => p.First, p => double.Parse(p.Second, CultureInfo.InvariantCulture));
        AssertSameDouble(point.Pressure, record["pressure_Pa"], "pressure_Pa");
        AssertSameDouble(point.Liquid.Density, record["liquid_density_mol_m3"], "liquid_density_mol_m3");
        AssertSameDouble(point.Slope, record["slope_Pa_K"], "slope_Pa_K");
    }

    [Fact]
    public void Temperature_TriplePointInCelsius_AcceptedDespiteRounding()
    {
        // 0.01 degC converts to 273.15999999999997 K, one ulp under water's 273.16 K triple point
        // (IAPWS-95, Wagner & Pruss 2002; from memory): the limit is physical, not an edge to trip on.
        var json = RunJson("coexist", "water", "--temperature", "0.01 degC", "--format", "json");
        var atLimit = RunJson("coexist", "water", "--temperature", "273.16", "--format", "json");

        double p = json.GetProperty("pressure_Pa").GetDouble();
        double pLimit = atLimit.GetProperty("pressure_Pa").GetDouble();
        // Psat changes by d ln P/dT · ΔT ≈ 0.08/K × 6e-14 K: far below 1e-12.
        Assert.True(Math.Abs(p / pLimit - 1) < 1e-12, $"{p} vs {pLimit}");

        // The printed saturation pressure at the limit (Peng-Robinson's 486 Pa) is below the sourced
        // triple-point pressure 611.657 Pa (IAPWS-95, from memory): at given pressure it is refused,
        // since no liquid exists below the triple-point pressure whatever the model says.
        var back = CliHarness.Run("coexist", "water", "--pressure", pLimit.ToString("R", System.Globalization.CultureInfo.InvariantCulture), "--format", "json");
        CliHarness.AssertFailure(back, ExitCodes.OutOfRange, "no liquid exists below the triple-point pressure 611.657 Pa of water");
    }
}
