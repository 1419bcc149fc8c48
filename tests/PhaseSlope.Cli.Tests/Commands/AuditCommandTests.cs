using System.Text.Json;

namespace PhaseSlope.Cli.Tests.Commands;

public class AuditCommandTests
{
    // Water, log10(P/mmHg) = 8.07131 − 1730.63/(233.426 + t/°C), 1–100 °C, Lange's Handbook of
    // Chemistry (from memory); and log10(P/bar) = 5.40221 − 1838.675/(T/K − 31.737), 304–333 K,
    // Bridgeman & Aldrich, J. Heat Transfer 86, 279 (1964) (from memory).
    private const string LangeWater = "8.07131,1730.63,233.426";
    private const string BridgemanWater = "5.40221,1838.675,-31.737";

    [Fact]
    public void Withheld_convention_of_the_Lange_water_set_is_detected_in_json()
    {
        var json = CliHarness.RunJson("audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1 degC,100 degC", "--fluid", "water", "--format", "json");
        var detected = json.GetProperty("detected");
        Assert.Equal("10", detected.GetProperty("log_base").GetString());
        Assert.Equal("mmHg", detected.GetProperty("pressure_unit").GetString());
        Assert.Equal("degC", detected.GetProperty("temperature_unit").GetString());
        Assert.True(json.GetProperty("findings").GetArrayLength() > 3);
        Assert.Equal(JsonValueKind.Object, json.GetProperty("runner_up").ValueKind);
    }

    [Fact]
    public void Mis_declared_unit_exits_8()
    {
        var result = CliHarness.Run("audit", "--form", "antoine", "--coefficients", LangeWater, "--log-base", "10", "--correlation-pressure-unit", "kPa", "--correlation-temperature-unit", "degC", "--range", "1,100", "--fluid", "water");
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("+649", result.Stdout, StringComparison.Ordinal);
        Assert.Equal("", result.Stderr);
    }

    [Fact]
    public void Negative_B_Antoine_set_fails_the_latent_heat_check()
    {
        var result = CliHarness.Run("audit", "--form", "antoine", "--coefficients", "10,-1000,0", "--log-base", "e", "--correlation-pressure-unit", "Pa", "--correlation-temperature-unit", "K", "--range", "300,350");
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("latent-heat-positive  fail", result.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_water_sets_are_compared_and_the_band_reported()
    {
        var json = CliHarness.Run("audit", "--form", "antoine", "--coefficients", LangeWater, "--log-base", "10", "--correlation-pressure-unit", "mmHg", "--correlation-temperature-unit", "degC",
            "--range", "1,100", "--fluid", "water", "--against", "antoine", "--coefficients2", BridgemanWater, "--log-base2", "10", "--correlation-pressure-unit2", "bar", "--correlation-temperature-unit2", "K", "--format", "json");
        Assert.Equal(0, json.ExitCode);
        using var doc = StrictJson.Parse(json.Stdout);
        var against = doc.RootElement.GetProperty("findings").EnumerateArray().Single(f => f.GetProperty("check").GetString() == "against");
        // The Bridgeman–Aldrich set is fitted over 304–333 K; extrapolated to 100 °C it drifts
        // 2.5 % from the Lange set, so the band of > 1 % disagreement lies at the hot end.
        Assert.Equal("warn", against.GetProperty("severity").GetString());
        Assert.Contains("to 373.1 K", against.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Ambiguous_detection_exits_8()
    {
        var result = CliHarness.Run("audit", "--form", "antoine", "--coefficients", BridgemanWater, "--range", "304,333", "--fluid", "water");
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("ambiguous", result.Stdout, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--coefficients", "8.07131,1730.63")]
    [InlineData("--coefficients", "8.07131,abc,233.426")]
    [InlineData("--correlation-pressure-unit", "furlong")]
    [InlineData("--log-base", "2")]
    [InlineData("--range", "100,1")]
    public void Bad_input_exits_2_with_one_stderr_line(string option, string value)
    {
        var args = new List<string> { "audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1,100", "--correlation-temperature-unit", "degC" };
        int i = args.IndexOf(option);
        if (i >= 0)
        {
            args[i + 1] = value;
        }
        else
        {
            args.AddRange([option, value]);
        }

        CliHarness.AssertFailure(CliHarness.Run([.. args]), 2);
    }

    [Theory]
    [InlineData("--correlation-pressure-unit", "MMHG", "--correlation-pressure-unit: unknown pressure unit 'MMHG'; did you mean mmHg?")]
    [InlineData("--correlation-pressure-unit", "kpa", "--correlation-pressure-unit: unknown pressure unit 'kpa'; did you mean kPa?")]
    [InlineData("--correlation-pressure-unit", "GPa", "--correlation-pressure-unit: pressure unit 'GPa' is not offered for published correlations")]
    [InlineData("--correlation-temperature-unit", "C", "--correlation-temperature-unit: unknown temperature unit 'C'; did you mean")]
    [InlineData("--correlation-temperature-unit", "degf", "--correlation-temperature-unit: unknown temperature unit 'degf'; did you mean degF?")]
    public void Units_come_from_the_one_table_case_sensitively(string option, string value, string message)
    {
        var args = new List<string> { "audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1,100", "--log-base", "10", "--correlation-pressure-unit", "mmHg", "--correlation-temperature-unit", "degC" };
        args[args.IndexOf(option) + 1] = value;
        CliHarness.AssertFailure(CliHarness.Run([.. args]), 2, message);
    }

    [Fact]
    public void Torr_is_its_own_unit_and_differs_from_the_conventional_mmHg()
    {
        // One value per unit: mmHg 133.322387415 Pa (conventional), torr 101325/760 Pa; the same
        // printed constants therefore give pressures 1.43e-7 apart, relative.
        string[] common = ["audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1,100", "--log-base", "10", "--correlation-temperature-unit", "degC", "--format", "json"];
        var mmHg = CliHarness.RunJson([.. common, "--correlation-pressure-unit", "mmHg"]);
        var torr = CliHarness.RunJson([.. common, "--correlation-pressure-unit", "torr"]);
        Assert.Equal("torr", torr.GetProperty("detected").GetProperty("pressure_unit").GetString());
        Assert.Equal("mmHg", mmHg.GetProperty("detected").GetProperty("pressure_unit").GetString());
        // The SI constant A is A·ln10 + ln(Pa per unit): the two differ by ln(133.322387415 / (101325/760)).
        double difference = mmHg.GetProperty("si_coefficients")[0].GetDouble() - torr.GetProperty("si_coefficients")[0].GetDouble();
        double expected = Math.Log(133.322387415 / (101325.0 / 760.0)); // 1.4307e-7
        // A is about 23.5, so its rounding (2e-15 absolute per value) limits the difference to ~1e-14.
        Assert.True(Math.Abs(difference - expected) < 1e-13, $"expected {expected:R}, got {difference:R}");
    }

    [Fact]
    public void Audit_AgainstDataFile_ReportsTheDataDeviation()
    {
        // The Antoine constants are this dataset's own least-squares fit (phaseslope fit on the
        // invented FRC-7 data, docs/examples): the largest deviation from its 14 points is 0.51 %,
        // inside the pass band of the data check; with A raised by ln(1.1) every point is 10 %
        // off and the same check fails, so the command exits 8.
        string[] common = ["--log-base", "e", "--correlation-pressure-unit", "Pa", "--correlation-temperature-unit", "K", "--range", "300,480",
            "--data", "../../../../../docs/examples/frc-7-vapour-pressure.csv", "--fluid", "../../../../../docs/examples/frc-7.fluid", "--format", "json"];
        var good = CliHarness.RunJson(["audit", "--form", "antoine", "--coefficients", "20.987605815602315,2931.3062947977137,-57.81410056619607", .. common]);
        var data = good.GetProperty("findings").EnumerateArray().Single(f => f.GetProperty("check").GetString() == "data-deviation");
        Assert.Equal("pass", data.GetProperty("severity").GetString());

        double shifted = 20.987605815602315 + Math.Log(1.1);
        var bad = CliHarness.Run(["audit", "--form", "antoine", "--coefficients", $"{shifted.ToString("R", System.Globalization.CultureInfo.InvariantCulture)},2931.3062947977137,-57.81410056619607", .. common]);
        Assert.Equal(8, bad.ExitCode);
        using var doc = StrictJson.Parse(bad.Stdout);
        var failed = doc.RootElement.GetProperty("findings").EnumerateArray().Single(f => f.GetProperty("check").GetString() == "data-deviation");
        Assert.Equal("fail", failed.GetProperty("severity").GetString());
    }

    [Fact]
    public void Lange_water_set_agrees_with_the_IAPWS_equation_read_as_a_wagner_6_set()
    {
        // IAPWS saturation equation, Wagner & Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993),
        // coefficients, Tc = 647.096 K and Pc = 22.064 MPa from memory. The first set's log base
        // 10 is not a Wagner convention, so the second takes e (and its own stated units). The
        // Lange set is a handbook fit, within 1 % of the reference over 1-100 degC: pass.
        var json = CliHarness.RunJson("audit", "--form", "antoine", "--coefficients", LangeWater, "--log-base", "10", "--correlation-pressure-unit", "mmHg", "--correlation-temperature-unit", "degC",
            "--range", "1,100", "--fluid", "water", "--against", "wagner-6", "--coefficients2", "-7.85951783,1.84408259,-11.7866497,22.6807411,-15.9618719,1.80122502,647.096,22.064",
            "--correlation-pressure-unit2", "MPa", "--correlation-temperature-unit2", "K", "--format", "json");
        var against = json.GetProperty("findings").EnumerateArray().Single(f => f.GetProperty("check").GetString() == "against");
        Assert.Equal("pass", against.GetProperty("severity").GetString());
        Assert.Contains("(wagner-6, ln, MPa, K)", against.GetProperty("message").GetString(), StringComparison.Ordinal);
    }

    [Fact]
    public void Benzene_bar_set_is_read_as_bar_by_the_anchor_uncertainty()
    {
        // ln(P/bar) = 9.2806 − 2788.51/(T/K − 52.36), Reid, Prausnitz & Poling, The Properties of
        // Gases and Liquids, 4th ed. (1987), Appendix A (from memory): at Tb −0.04 % as bar,
        // +1.28 % as atm; the boiling point known to 0.05 K (0.15 % in ln P) tells them apart.
        var json = CliHarness.RunJson("audit", "--form", "antoine", "--coefficients", "9.2806,2788.51,-52.36", "--log-base", "e", "--correlation-temperature-unit", "K", "--fluid", "benzene", "--format", "json");
        Assert.Equal("bar", json.GetProperty("detected").GetProperty("pressure_unit").GetString());
        var evidence = json.GetProperty("evidence").EnumerateArray().ToArray();
        Assert.Equal("atm", evidence[1].GetProperty("convention").GetProperty("pressure_unit").GetString());
        // The rule: the runner-up's separation at least 5 times the best's (docs/audit.md).
        Assert.True(evidence[1].GetProperty("separation").GetDouble() >= 5 * evidence[0].GetProperty("separation").GetDouble());
    }

    [Fact]
    public void Positive_but_absurd_latent_heat_exits_8()
    {
        // ln(P/Pa) = 25 − 13000 K/T: ΔH/T = R·13000/300 = 360 J/(mol K) at 300 K with ΔZ = 1,
        // above the Trouton-type bound of 350 (common practice).
        var result = CliHarness.Run("audit", "--form", "clausius-clapeyron", "--coefficients", "25,13000", "--log-base", "e", "--correlation-pressure-unit", "Pa", "--correlation-temperature-unit", "K", "--range", "300,350");
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("latent-heat-magnitude  fail      implausible latent heat: dH/T = 360.29", result.Stdout, StringComparison.Ordinal);
    }
}
