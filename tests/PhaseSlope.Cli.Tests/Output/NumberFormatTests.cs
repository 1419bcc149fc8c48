using System.Text.Json;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Tests.Output;

/// <summary>How tables print numbers (NumberText) and how CSV is made from JSON (JsonFlattener,
/// FlatCsv).</summary>
public class NumberFormatTests
{
    [Theory]
    [InlineData(273.15000000000003, "273.15")] // 0 degC in K after a binary sum: the noise is beyond six digits
    [InlineData(0.30000000000000004, "0.3")]
    [InlineData(-0.0, "0")]                    // a negative zero is a zero
    [InlineData(997548.6909416832, "997549")]
    [InlineData(1234567.0, "1.23457E+06")]
    [InlineData(-35.59544, "-35.5954")]
    [InlineData(6.27926e-7, "6.27926E-07")]    // a small positive value is shown as computed
    public void Table_SixSignificantDigitsNoNoise(double value, string expected)
        => Assert.Equal(expected, NumberText.Table(value));

    [Theory]
    [InlineData(-1.9e-14, 41987.8, "0")]        // round-off beside a latent heat: a zero
    [InlineData(1.55e-10, 41987.8, "0")]        // 4e-15 of the scale
    [InlineData(-1.9e-14, 0, "-1.9E-14")]       // no scale, no rule
    [InlineData(-1.9e-14, 1e-14, "-1.9E-14")]   // the largest of its kind is never zeroed
    [InlineData(5e-5, 41987.8, "5E-05")]        // 1.2e-9 of the scale: above the rule, shown
    public void Table_BelowTheToleranceOfItsScale_PrintsZero(double value, double scale, string expected)
        => Assert.Equal(expected, NumberText.Table(value, scale));

    [Theory]
    [InlineData(0.012345, "0.012")]
    [InlineData(0.95, "0.95")]
    [InlineData(99.6, "100")]                   // rounded first: 100, not 1E+02
    [InlineData(1234.0, "1200")]
    [InlineData(21256.0, "21000")]
    [InlineData(1.5e7, "1.5E+07")]
    [InlineData(6.75e-5, "6.8E-05")]
    [InlineData(0.0, "0")]
    [InlineData(2.96, "3.0")]                   // the second digit is significant, zero or not
    [InlineData(0.0497, "0.050")]
    [InlineData(4.98e6, "5.0E+06")]             // in exponent form too
    [InlineData(2.0e-5, "2.0E-05")]
    public void Uncertainty_TwoSignificantDigits(double value, string expected)
        => Assert.Equal(expected, NumberText.Uncertainty(value));

    [Theory]
    [InlineData(44.09562, "44.09562")]          // propane's molar mass in g/mol, as its file gives it
    [InlineData(44.095620000000004, "44.09562")]
    public void Given_DigitsAsWritten(double value, string expected)
        => Assert.Equal(expected, NumberText.Given(value));

    private static IReadOnlyList<FlatField> Sample() => new JsonFlattener().Flatten(json =>
    {
        json.WriteStartObject();
        json.WriteString("fluid", "propane, \"demo\"");
        json.WriteNumber("temperature_K", 273.15);
        json.WriteNumber("pressure_Pa", 101325);
        json.WriteStartObject("liquid");
        json.WriteNumber("density_mol_m3", 1000);
        json.WriteNumber("density_kg_m3", 44.09562);
        json.WriteNumber("entropy_slope_J_molK2", 0.5);
        json.WriteNull("isobaric_heat_capacity_J_molK");
        json.WriteBoolean("ideal_gas_extrapolated", false);
        json.WriteEndObject();
        json.WriteStartObject("standard_uncertainty");
        json.WriteNumber("temperature_K", 0.25);
        json.WriteStartArray("inputs");
        json.WriteStartObject();
        json.WriteString("name", "critical_temperature_K");
        json.WriteNumber("value", 369.89);
        json.WriteEndObject();
        json.WriteEndArray();
        json.WriteEndObject();
        json.WriteEndObject();
    });

    [Fact]
    public void Flatten_NestedObjectsAndArrays_PrefixedKeysInJsonOrder()
    {
        var fields = Sample();

        Assert.Equal(["fluid", "temperature_K", "pressure_Pa", "liquid_density_mol_m3", "liquid_density_kg_m3", "liquid_entropy_slope_J_molK2",
            "liquid_isobaric_heat_capacity_J_molK", "liquid_ideal_gas_extrapolated", "standard_uncertainty_temperature_K",
            "standard_uncertainty_inputs_0_name", "standard_uncertainty_inputs_0_value"], fields.Select(f => f.Key).ToArray());
        Assert.Equal("273.15", fields[1].Text);
        Assert.Equal(JsonValueKind.Null, fields[6].Kind);
        Assert.Equal(["standard_uncertainty", "inputs"], fields[^1].Parents);
    }

    [Fact]
    public void FlatCsv_Si_JsonKeysAndDigits()
    {
        string csv = FlatCsv.Write([Sample()], UnitSystem.Si, 0.04409562);

        Assert.Equal("fluid,temperature_K,pressure_Pa,liquid_density_mol_m3,liquid_density_kg_m3,liquid_entropy_slope_J_molK2,liquid_isobaric_heat_capacity_J_molK,"
            + "liquid_ideal_gas_extrapolated,standard_uncertainty_temperature_K,standard_uncertainty_inputs_0_name,standard_uncertainty_inputs_0_value\n"
            + "\"propane, \"\"demo\"\"\",273.15,101325,1000,44.09562,0.5,,false,0.25,critical_temperature_K,369.89\n", csv);
    }

    [Fact]
    public void FlatCsv_Engineering_UnitsFromTheTableAndOneColumnPerQuantity()
    {
        string csv = FlatCsv.Write([Sample()], UnitSystem.Engineering, 0.04409562, new HashSet<string> { "standard_uncertainty" });

        // 273.15 K is 0 degC; 101325 Pa is 1.01325 bar; 1000 mol/m3 x 0.04409562 kg/mol is 44.09562
        // kg/m3, the same column as the JSON's own density_kg_m3 (written once, the first);
        // 0.5 J/(mol K2) / 0.04409562 kg/mol = 11.338... J/(kg K2) = 0.011338... kJ/(kg K2);
        // the uncertainty of T is a difference and stays 0.25 K; keys without a unit are unchanged.
        var lines = csv.Split('\n');
        Assert.Equal("fluid,temperature_degC,pressure_bar,liquid_density_kg_m3,liquid_entropy_slope_kJ_kgK2,liquid_isobaric_heat_capacity_kJ_kgK,"
            + "liquid_ideal_gas_extrapolated,standard_uncertainty_temperature_K,standard_uncertainty_inputs_0_name,standard_uncertainty_inputs_0_value", lines[0]);
        var cells = ParseLine(lines[1]);
        Assert.Equal("0", cells[1]);
        Assert.Equal("1.01325", cells[2]);
        Assert.Equal(44.09562, double.Parse(cells[3], System.Globalization.CultureInfo.InvariantCulture), 1e-12);
        Assert.Equal(0.5 / 0.04409562 / 1e3, double.Parse(cells[4], System.Globalization.CultureInfo.InvariantCulture), 1e-15);
        Assert.Equal("", cells[5]);
        Assert.Equal("0.25", cells[7]);
    }

    [Fact]
    public void FlatCsv_RowsWithDifferentKeys_HeaderIsTheUnionInOrderOfFirstAppearance()
    {
        var flattener = new JsonFlattener();
        IReadOnlyList<FlatField> Row(bool twoPhase) => flattener.Flatten(json =>
        {
            json.WriteStartObject();
            json.WriteString("phase", twoPhase ? "two-phase" : "liquid");
            if (twoPhase)
            {
                json.WriteNumber("quality", 0.25);
            }

            json.WriteNumber("temperature_K", 300);
            json.WriteEndObject();
        });

        // The second row has a key the first lacks: the one-pass attempt is discarded and the
        // header is the union; the first row's cell for it is empty.
        Assert.Equal("phase,temperature_K,quality\nliquid,300,\ntwo-phase,300,0.25\n", FlatCsv.Write([Row(false), Row(true)], UnitSystem.Si, null));
        Assert.Equal("phase,quality,temperature_K\ntwo-phase,0.25,300\nliquid,,300\n", FlatCsv.Write([Row(true), Row(false)], UnitSystem.Si, null));
    }

    [Fact]
    public void FlatCsv_Engineering_ANamedTemperatureDifferenceStaysInKelvin()
    {
        var row = new JsonFlattener().Flatten(json =>
        {
            json.WriteStartObject();
            json.WriteNumber("temperature_K", 278.15);
            json.WriteNumber("superheat_K", 5);
            json.WriteEndObject();
        });

        // 278.15 K is 5 degC; a superheat T - Tsat of 5 K is 5 K (a difference has no offset), not -268.15.
        Assert.Equal("temperature_degC,superheat_K\n5,5\n", FlatCsv.Write([row], UnitSystem.Engineering, 0.1, new HashSet<string> { "superheat_K" }));
        Assert.Equal("temperature_degC,superheat_degC\n5,-268.15\n", FlatCsv.Write([row], UnitSystem.Engineering, 0.1));
    }

    [Fact]
    public void FlatCsv_Engineering_ByPhase_EachKeyItsOwnMolarMass_MoleFractionsUntouched()
    {
        // A mixture's row: the liquid's density with the liquid's molar mass, the vapour's with the
        // vapour's; a component named as if it had a unit suffix is still a mole fraction.
        var row = new JsonFlattener().Flatten(json =>
        {
            json.WriteStartObject();
            json.WriteStartObject("liquid_mole_fractions");
            json.WriteNumber("odd_K", 0.5);
            json.WriteEndObject();
            json.WriteStartObject("liquid");
            json.WriteNumber("density_mol_m3", 1000);
            json.WriteEndObject();
            json.WriteStartObject("vapour");
            json.WriteNumber("density_mol_m3", 1000);
            json.WriteEndObject();
            json.WriteEndObject();
        });

        // 1000 mol/m3 at 0.0625 kg/mol is 62.5 kg/m3, at 0.03125 kg/mol 31.25 kg/m3 (powers of two:
        // exact in binary, so the text is exact).
        string csv = FlatCsv.WriteByPhase([row], UnitSystem.Engineering, f => f.Parents.Count > 0 && f.Parents[0] == "liquid" ? 0.0625 : 0.03125);
        Assert.Equal("liquid_mole_fractions_odd_K,liquid_density_kg_m3,vapour_density_kg_m3\n0.5,62.5,31.25\n", csv);
    }

    private static string[] ParseLine(string line) => PhaseSlope.Cli.Tests.Commands.CurveCommandTests.ParseCsv(line)[0];
}
