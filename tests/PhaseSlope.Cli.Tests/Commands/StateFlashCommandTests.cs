using System.Globalization;
using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>state</c> from any two properties and <c>state --batch</c>, checked against the
/// tool's own <c>coexist</c> and (T, P) states (consistency of one model with itself: the flash's
/// 1e-10 promise is the tolerance, not a model's accuracy).</summary>
public class StateFlashCommandTests
{
    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    [Fact]
    public void PressureAndEnthalpyInsideTheDome_AreTheLeverRuleOnCoexist()
    {
        var sat = RunJson("coexist", "r-134a", "-P", "2bar", "--reference", "refrigeration", "--format", "json");
        double hL = sat.GetProperty("liquid").GetProperty("enthalpy_J_mol").GetDouble();
        double hV = sat.GetProperty("vapour").GetProperty("enthalpy_J_mol").GetDouble();
        double h = hL + 0.4 * (hV - hL);
        var json = RunJson("state", "r-134a", "-P", "2bar", "--enthalpy", Number(h), "--reference", "refrigeration", "--format", "json");

        Assert.Equal("two-phase", json.GetProperty("phase").GetString());
        Assert.Equal(JsonValueKind.Null, json.GetProperty("branch").ValueKind);
        Assert.Equal(0.4, json.GetProperty("quality").GetDouble(), 1e-12);
        AssertRelative(sat.GetProperty("temperature_K").GetDouble(), json.GetProperty("temperature_K").GetDouble(), 1e-12, "saturation temperature");
        AssertRelative(hL, json.GetProperty("liquid").GetProperty("enthalpy_J_mol").GetDouble(), 1e-12, "liquid h");
        // The mixture's s is the same lever rule.
        double sL = sat.GetProperty("liquid").GetProperty("entropy_J_molK").GetDouble();
        double sV = sat.GetProperty("vapour").GetProperty("entropy_J_molK").GetDouble();
        AssertRelative(sL + 0.4 * (sV - sL), json.GetProperty("entropy_J_molK").GetDouble(), 1e-12, "mixture s");
        Assert.Equal(JsonValueKind.Null, json.GetProperty("isobaric_heat_capacity_J_molK").ValueKind);
    }

    [Theory]
    [InlineData("--enthalpy", "enthalpy_J_mol", "320 K", "1MPa")]
    [InlineData("--entropy", "entropy_J_molK", "320 K", "1MPa")]
    [InlineData("--internal-energy", "internal_energy_J_mol", "250 K", "3MPa")]
    public void SinglePhase_PressureAndCaloricProperty_GiveBackTheTemperature(string option, string key, string t, string p)
    {
        var direct = RunJson("state", "r-134a", "-T", t, "-P", p, "--format", "json");
        var back = RunJson("state", "r-134a", "-P", p, option, Number(direct.GetProperty(key).GetDouble()), "--format", "json");
        AssertRelative(direct.GetProperty("temperature_K").GetDouble(), back.GetProperty("temperature_K").GetDouble(), 1e-10, $"T from {option}");
        Assert.Equal(direct.GetProperty("phase").GetString(), back.GetProperty("phase").GetString());
        Assert.Equal(JsonValueKind.Null, back.GetProperty("quality").ValueKind);
    }

    [Fact]
    public void MassUnits_AreConvertedWithTheMolarMass()
    {
        // 0.05 m3/kg is 0.05 × M m3/mol; 250 kJ/kg is 250e3 × M J/mol.
        var json = RunJson("state", "r-134a", "-T", "0degC", "--volume", "0.05 m3/kg", "--format", "json");
        double m = json.GetProperty("molar_mass_kg_mol").GetDouble();
        AssertRelative(0.05 * m, json.GetProperty("molar_volume_m3_mol").GetDouble(), 1e-13, "molar volume");
        var h = RunJson("state", "r-134a", "-P", "3bar", "--enthalpy", "250 kJ/kg", "--reference", "refrigeration", "--format", "json");
        AssertRelative(250e3 * m, h.GetProperty("enthalpy_J_mol").GetDouble(), 1e-10, "enthalpy");
    }

    [Fact]
    public void SuperheatAndSubcooling_AgainstTheSaturationTemperatureAtThePressure()
    {
        double tsat = RunJson("coexist", "propane", "-P", "1MPa", "--format", "json").GetProperty("temperature_K").GetDouble();
        var vapour = RunJson("state", "propane", "-T", "330", "-P", "1MPa", "--format", "json");
        var liquid = RunJson("state", "propane", "-T", "280", "-P", "1MPa", "--format", "json");
        Assert.Equal("superheated-vapour", vapour.GetProperty("phase").GetString());
        AssertRelative(330 - tsat, vapour.GetProperty("superheat_K").GetDouble(), 1e-12, "superheat");
        Assert.Equal("compressed-liquid", liquid.GetProperty("phase").GetString());
        AssertRelative(tsat - 280, liquid.GetProperty("subcooling_K").GetDouble(), 1e-12, "subcooling");
        Assert.True(vapour.GetProperty("heat_capacity_ratio").GetDouble() > 1);
        Assert.True(vapour.GetProperty("isentropic_exponent").GetDouble() > 0);
    }

    [Fact]
    public void Csv_EngineeringUnits_ConvertsAbsoluteTemperatures_KeepsDifferencesInKelvin()
    {
        var json = RunJson("state", "propane", "-T", "330", "-P", "1MPa", "--format", "json");
        var rows = CurveCommandTests.ParseCsv(RunText("state", "propane", "-T", "330", "-P", "1MPa", "--format", "csv", "--units", "engineering"));
        string Cell(string key) => rows[1][Array.IndexOf(rows[0], key)];
        // 330 K is 56.85 degC exactly (the offset 273.15 in decimal); the superheat is a difference.
        Assert.Equal(330 - 273.15, double.Parse(Cell("temperature_degC"), CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal(json.GetProperty("superheat_K").GetDouble(), double.Parse(Cell("superheat_K"), CultureInfo.InvariantCulture));
        AssertRelative(json.GetProperty("enthalpy_J_mol").GetDouble() / json.GetProperty("molar_mass_kg_mol").GetDouble() / 1000,
            double.Parse(Cell("enthalpy_kJ_kg"), CultureInfo.InvariantCulture), 1e-14, "enthalpy in kJ/kg");
    }

    [Fact]
    public void Batch_EveryRowComputed_BadRowsNamedByLineAndColumn_ExitSays()
    {
        string dir = Directory.CreateTempSubdirectory("phaseslope-batch").FullName;
        string file = Path.Combine(dir, "states.csv");
        File.WriteAllText(file, "# invented states\nP [bar],h [kJ/kg]\n2,250\n10,abc\n10,420\n1,1e9\n");
        var result = Run("state", "r-134a", "--batch", file, "--reference", "refrigeration", "--format", "json");

        Assert.Equal(ExitCodes.BatchRowsFailed, result.ExitCode);
        var rows = StrictJson.Parse(result.Stdout).RootElement.EnumerateArray().ToArray();
        Assert.Equal([3, 4, 5, 6], rows.Select(r => r.GetProperty("line").GetInt32()));
        Assert.Contains("column 'h [kJ/kg]'", rows[1].GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Contains(":6: no state at 100000 Pa", rows[3].GetProperty("error").GetString(), StringComparison.Ordinal);
        Assert.Equal(2, result.Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);

        // A good row equals the single state.
        var single = RunJson("state", "r-134a", "-P", "10bar", "--enthalpy", "420 kJ/kg", "--reference", "refrigeration", "--format", "json");
        AssertSameDouble(single.GetProperty("temperature_K").GetDouble(), rows[2].GetProperty("state").GetProperty("temperature_K").GetDouble(), "batch row = single state");

        // CSV: one row per input row, line and error first.
        var csv = CurveCommandTests.ParseCsv(Run("state", "r-134a", "--batch", file, "--reference", "refrigeration", "--format", "csv").Stdout);
        Assert.Equal(["line", "error"], csv[0][..2]);
        Assert.Equal(5, csv.Count);

        File.WriteAllText(file, "P [bar],h [kJ/kg]\n2,250\n10,420\n");
        Assert.Equal(ExitCodes.Success, Run("state", "r-134a", "--batch", file, "--reference", "refrigeration").ExitCode);
    }

    [Theory]
    [InlineData("T [K],P [bar],h [kJ/kg]\n300,1,2\n", "exactly two different properties")]
    [InlineData("P [bar],h [kJ/lb]\n1,2\n", "column 'h [kJ/lb]'")]
    [InlineData("P [bar],x [%]\n1,2\n", "a quality is a bare fraction")]
    [InlineData("# nothing\n", "no header row")]
    public void Batch_BadHeader_RefusesTheFile(string content, string message)
    {
        string dir = Directory.CreateTempSubdirectory("phaseslope-batch").FullName;
        string file = Path.Combine(dir, "states.csv");
        File.WriteAllText(file, content);
        AssertFailure(Run("state", "r-134a", "--batch", file), ExitCodes.DataFile, message);
    }
}
