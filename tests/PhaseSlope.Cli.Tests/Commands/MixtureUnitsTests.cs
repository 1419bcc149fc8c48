using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>--units engineering</c> on bubble, dew, flash, envelope and binary: every value of
/// the table and the CSV equals the SI JSON value of the same command line converted here by hand,
/// each per-kilogram value with the molar mass of its own phase, Σ x_i M_i of that phase's mole
/// fractions (from the JSON) and the catalog molar masses (each fluid file's molar_mass, with its
/// source beside it in the file).</summary>
/// <remarks>
/// <para>Conversions (exact by definition, SI Brochure, BIPM 2019): degC = K − 273.15,
/// bar = Pa / 1e5, kg/m3 = mol/m3 · M, kJ/kg = J/mol / M / 1000, kJ/(kg K) = J/(mol K) / M / 1000,
/// bar/K = Pa/K / 1e5.</para>
/// <para>Tolerances. CSV cells are round-trip numbers of the writer's converted doubles; the test
/// converts the same doubles (the JSON's round-trip text) in perhaps another order, a few
/// roundings of 1.1e-16 each apart: 1e-12 relative (<see cref="CsvDigits"/>). Table cells print
/// six significant digits, within half a unit in the sixth, 5e-6 relative
/// (<see cref="TableDigits"/>). A per-kilogram value converted with the wrong phase's molar mass
/// is off by the ratio of the molar masses; the mixtures are chosen so that ratio is far outside
/// both tolerances (asserted in each test).</para>
/// </remarks>
public sealed class MixtureUnitsTests
{
    /// <summary>Relative tolerance of a CSV value against the hand conversion (see the remarks).</summary>
    private const double CsvDigits = 1e-12;

    /// <summary>Methane + n-butane at 300 K, 3 MPa: two phases whose molar masses differ by more
    /// than a factor of two (liquid rich in n-butane, vapour in methane); the bubble and dew points
    /// of the same feed at 3 MPa have incipient phases far from the feed too.</summary>
    private static readonly string[] Flash = ["flash", "methane=0.3,n-butane=0.7", "-T", "300", "-P", "3MPa"];

    private static readonly string[] Bubble = ["bubble", "methane=0.3,n-butane=0.7", "-P", "3MPa"];

    private static readonly string[] Dew = ["dew", "methane=0.3,n-butane=0.7", "-P", "3MPa"];

    /// <summary>Σ x_i M_i in kg/mol of a mole-fraction object of the JSON, from the catalog molar masses.</summary>
    private static double MolarMass(JsonElement fractions)
        => fractions.EnumerateObject().Sum(p => p.Value.GetDouble() * FluidCatalog.Embedded.Find(p.Name).MolarMass!.Value);

    private static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    /// <summary>The single CSV row of a command as key → cell.</summary>
    private static Dictionary<string, string> CsvRow(string[] args)
    {
        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv", "--units", "engineering"]));
        Assert.Equal(2, rows.Count);
        return rows[0].Zip(rows[1]).ToDictionary(p => p.First, p => p.Second);
    }

    /// <summary>Checks the CSV headers of an engineering CSV carry no SI molar unit.</summary>
    private static void AssertNoMolarKeys(IEnumerable<string> keys)
    {
        foreach (string key in keys)
        {
            Assert.False(key.EndsWith("_mol_m3", StringComparison.Ordinal) || key.EndsWith("_J_mol", StringComparison.Ordinal)
                || key.EndsWith("_J_molK", StringComparison.Ordinal) || key.EndsWith("_Pa", StringComparison.Ordinal), key);
        }
    }

    /// <summary>The per-phase hand conversions of one phase object of the JSON.</summary>
    private static (double Density, double? Enthalpy, double? Entropy) PerKilogram(JsonElement phase, double m)
    {
        static double? Maybe(JsonElement e) => e.ValueKind == JsonValueKind.Null ? null : e.GetDouble();
        return (phase.GetProperty("density_mol_m3").GetDouble() * m,
            Maybe(phase.GetProperty("enthalpy_J_mol")) / m / 1000,
            Maybe(phase.GetProperty("entropy_J_molK")) / m / 1000);
    }

    [Theory]
    [InlineData("flash")]
    [InlineData("bubble")]
    [InlineData("dew")]
    public void Csv_Engineering_IsTheSiJsonConvertedWithEachPhasesMolarMass(string command)
    {
        string[] args = command switch { "flash" => Flash, "bubble" => Bubble, _ => Dew };
        var json = RunJson([.. args, "--format", "json"]);
        var row = CsvRow(args);
        AssertNoMolarKeys(row.Keys);

        double t = json.GetProperty("temperature_K").GetDouble();
        Assert.True(Math.Abs(Number(row["temperature_degC"]) - (t - 273.15)) <= CsvDigits * t, "temperature_degC");
        AssertRelative(json.GetProperty("pressure_Pa").GetDouble() / 1e5, Number(row["pressure_bar"]), CsvDigits, "pressure_bar");
        if (command != "flash")
        {
            // The glide is a temperature difference: the same number of kelvin (1 K = 1 degC), key unchanged.
            Assert.Equal(json.GetProperty("glide_K").GetRawText(), row["glide_K"]);
        }

        double feed = MolarMass(json.GetProperty("feed_mole_fractions"));
        double liquid = MolarMass(json.GetProperty("liquid_mole_fractions"));
        double vapour = MolarMass(json.GetProperty("vapour_mole_fractions"));
        // The two phases' molar masses differ by 10 % or more (a factor 2.4 in the flash, 1.2 at
        // the dew point, 2.8 at the bubble point): 2e4 times the table's tolerance, 1e11 times the
        // CSV's, so one molar mass for both phases cannot pass.
        Assert.True(liquid / vapour > 1.1, $"liquid {liquid}, vapour {vapour}");
        foreach (var (name, m) in new[] { ("liquid", liquid), ("vapour", vapour) })
        {
            var (density, enthalpy, entropy) = PerKilogram(json.GetProperty(name), m);
            AssertRelative(density, Number(row[$"{name}_density_kg_m3"]), CsvDigits, $"{name} density");
            AssertRelative(enthalpy!.Value, Number(row[$"{name}_enthalpy_kJ_kg"]), CsvDigits, $"{name} enthalpy");
            AssertRelative(entropy!.Value, Number(row[$"{name}_entropy_kJ_kgK"]), CsvDigits, $"{name} entropy");
            // Mole fractions and Z are unchanged.
            Assert.Equal(json.GetProperty(name).GetProperty("compressibility_factor").GetRawText(), row[$"{name}_compressibility_factor"]);
        }

        foreach (var fraction in json.GetProperty("vapour_mole_fractions").EnumerateObject())
        {
            Assert.Equal(fraction.Value.GetRawText(), row[$"vapour_mole_fractions_{fraction.Name}"]);
        }

        if (command == "flash")
        {
            // The whole feed's values are per kilogram of feed; the feed's molar mass differs from
            // both phases' by more than 1 % (≫ 1e-12), so the wrong one cannot pass either.
            Assert.True(Math.Abs(liquid / feed - 1) > 0.01 && Math.Abs(vapour / feed - 1) > 0.01, $"feed {feed}");
            AssertRelative(json.GetProperty("density_mol_m3").GetDouble() * feed, Number(row["density_kg_m3"]), CsvDigits, "feed density");
            AssertRelative(json.GetProperty("enthalpy_J_mol").GetDouble() / feed / 1000, Number(row["enthalpy_kJ_kg"]), CsvDigits, "feed enthalpy");
            AssertRelative(json.GetProperty("entropy_J_molK").GetDouble() / feed / 1000, Number(row["entropy_kJ_kgK"]), CsvDigits, "feed entropy");
            Assert.Equal(json.GetProperty("vapour_fraction").GetRawText(), row["vapour_fraction"]);
        }
    }

    [Theory]
    [InlineData("flash")]
    [InlineData("bubble")]
    [InlineData("dew")]
    public void Table_Engineering_IsTheSiJsonConvertedWithEachPhasesMolarMass(string command)
    {
        string[] args = command switch { "flash" => Flash, "bubble" => Bubble, _ => Dew };
        var json = RunJson([.. args, "--format", "json"]);
        string text = RunText([.. args, "--units", "engineering"]);

        double Line(string pattern) => Number(Regex.Match(text, pattern, RegexOptions.Multiline).Groups[1].Value);
        AssertRelative(json.GetProperty("temperature_K").GetDouble() - 273.15, Line(@"^temperature: (\S+) degC$"), TableDigits, "temperature degC");
        AssertRelative(json.GetProperty("pressure_Pa").GetDouble() / 1e5, Line(@"^pressure: (\S+) bar$"), TableDigits, "pressure bar");
        if (command != "flash")
        {
            AssertRelative(json.GetProperty("glide_K").GetDouble(), Line(@"^glide at this pressure: (\S+) K \(dew minus bubble temperature; a difference"), TableDigits, "glide K");
        }

        var tables = TableLayout.Find(text);
        var phases = Assert.Single(tables);
        TableLayout.AssertAligned(phases);
        string[] Cells(string first) => phases.Rows.Select(phases.Cells).Single(c => c[0] == first);
        double liquid = MolarMass(json.GetProperty("liquid_mole_fractions"));
        double vapour = MolarMass(json.GetProperty("vapour_mole_fractions"));
        Assert.True(liquid / vapour > 1.1, $"liquid {liquid}, vapour {vapour}"); // as in the CSV test
        foreach (var (name, column, m) in new[] { ("liquid", 1, liquid), ("vapour", 2, vapour) })
        {
            var (density, enthalpy, entropy) = PerKilogram(json.GetProperty(name), m);
            AssertRelative(density, Number(Cells("density (kg/m3)")[column]), TableDigits, $"{name} density");
            AssertRelative(enthalpy!.Value, Number(Cells("h (kJ/kg)")[column]), TableDigits, $"{name} enthalpy");
            AssertRelative(entropy!.Value, Number(Cells("s (kJ/(kg K))")[column]), TableDigits, $"{name} entropy");
            AssertRelative(m * 1e3, Number(Cells("molar mass (g/mol)")[column]), TableDigits, $"{name} molar mass");
        }

        if (command == "flash")
        {
            double feed = MolarMass(json.GetProperty("feed_mole_fractions"));
            var whole = Regex.Match(text, @"^h: (\S+) kJ/kg, s: (\S+) kJ/\(kg K\) \(whole feed\)$", RegexOptions.Multiline);
            Assert.True(whole.Success, text);
            AssertRelative(json.GetProperty("enthalpy_J_mol").GetDouble() / feed / 1000, Number(whole.Groups[1].Value), TableDigits, "feed enthalpy");
            AssertRelative(json.GetProperty("entropy_J_molK").GetDouble() / feed / 1000, Number(whole.Groups[2].Value), TableDigits, "feed entropy");
        }

        Assert.DoesNotContain("mol/m3", text, StringComparison.Ordinal);
        Assert.DoesNotContain("J/mol", text, StringComparison.Ordinal);
        Assert.Contains("per kilogram of each phase", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Table_Si_IsUnchangedByTheDefault()
    {
        // --units si is the default: the same text as without the option.
        Assert.Equal(RunText(Flash), RunText([.. Flash, "--units", "si"]));
        Assert.Contains("density (mol/m3)", RunText(Flash), StringComparison.Ordinal);
    }

    [Fact]
    public void Envelope_Engineering_CsvAndTable_AreTheSiJsonConverted()
    {
        string[] args = ["envelope", "methane=0.8,ethane=0.2"];
        var json = RunJson([.. args, "--format", "json"]);
        var points = json.GetProperty("points");
        var expected = points.GetProperty("bubble").EnumerateArray().Select(p => ("bubble", p))
            .Concat(points.GetProperty("dew").EnumerateArray().Select(p => ("dew", p))).ToArray();

        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv", "--units", "engineering"]));
        Assert.Equal(1 + expected.Length, rows.Count);
        AssertNoMolarKeys(rows[0]);
        int t = Array.IndexOf(rows[0], "temperature_degC"), p = Array.IndexOf(rows[0], "pressure_bar");
        int y = Array.IndexOf(rows[0], "vapour_mole_fractions_methane");
        for (int i = 0; i < expected.Length; i++)
        {
            var (branch, point) = expected[i];
            double tk = point.GetProperty("temperature_K").GetDouble();
            Assert.Equal(branch, rows[i + 1][0]);
            Assert.True(Math.Abs(Number(rows[i + 1][t]) - (tk - 273.15)) <= CsvDigits * tk, $"row {i + 1} temperature_degC");
            AssertRelative(point.GetProperty("pressure_Pa").GetDouble() / 1e5, Number(rows[i + 1][p]), CsvDigits, $"row {i + 1} pressure_bar");
            Assert.Equal(point.GetProperty("vapour_mole_fractions").GetProperty("methane").GetRawText(), rows[i + 1][y]);
        }

        string text = RunText([.. args, "--units", "engineering"]);
        var table = TableLayout.Find(text)[0];
        Assert.Equal(["branch", "T (degC)", "P (bar)"], table.HeaderCells);
        Assert.Equal(expected.Length, table.Rows.Count);
        for (int i = 0; i < expected.Length; i++)
        {
            var cells = table.Cells(table.Rows[i]);
            var point = expected[i].Item2;
            AssertRelative(point.GetProperty("temperature_K").GetDouble() - 273.15, Number(cells[1]), TableDigits, $"T row {i}");
            AssertRelative(point.GetProperty("pressure_Pa").GetDouble() / 1e5, Number(cells[2]), TableDigits, $"P row {i}");
        }

        var critical = json.GetProperty("critical_point");
        var line = Regex.Match(text, @"^critical point: T = (\S+) degC, P = (\S+) bar$", RegexOptions.Multiline);
        Assert.True(line.Success, text);
        AssertRelative(critical.GetProperty("temperature_K").GetDouble() - 273.15, Number(line.Groups[1].Value), TableDigits, "critical degC");
        AssertRelative(critical.GetProperty("pressure_Pa").GetDouble() / 1e5, Number(line.Groups[2].Value), TableDigits, "critical bar");
    }

    [Fact]
    public void Envelope_Engineering_NeedsNoMolarMass()
    {
        // Nothing on an envelope is per kilogram (T, P, mole fractions), so a component without a
        // molar mass does not stop engineering units there; bubble, dew and flash refuse it
        // (BadInputCatalogueTests).
        using var folder = new TempFolder();
        string propane = CatalogFileText("propane.fluid");
        File.WriteAllText(folder.File("nomass.fluid"), string.Join('\n', propane.Split('\n').Select(l =>
            l.StartsWith("molar_mass ", StringComparison.Ordinal) || l.StartsWith("synonyms ", StringComparison.Ordinal) ? ""
            : l.StartsWith("name ", StringComparison.Ordinal) ? "name nomass" : l)));
        string text = RunText("envelope", $"methane=0.8,{folder.File("nomass.fluid")}=0.2", "--units", "engineering");
        Assert.Contains("T (degC)", text, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("-P", "1atm")]
    [InlineData("-T", "340")]
    public void Binary_Engineering_CsvAndTable_AreTheSiJsonConverted(string condition, string value)
    {
        // Benzene + cyclohexane: a minimum-boiling azeotrope with k_ij = 0 (checked in BinaryCommandTests).
        string[] args = ["binary", "benzene=0.5,cyclohexane=0.5", condition, value, "--points", "7"];
        var json = RunJson([.. args, "--format", "json"]);
        var points = json.GetProperty("points").EnumerateArray().ToArray();

        var rows = CurveCommandTests.ParseCsv(RunText([.. args, "--format", "csv", "--units", "engineering"]));
        Assert.Equal(["x1", "y1", "temperature_degC", "pressure_bar", "bubble_slope_bar_K", "azeotrope"], rows[0]);
        Assert.Equal(1 + points.Length, rows.Count);
        for (int i = 0; i < points.Length; i++)
        {
            var row = rows[i + 1];
            double tk = points[i].GetProperty("temperature_K").GetDouble();
            Assert.Equal(points[i].GetProperty("x1").GetRawText(), row[0]);
            Assert.True(Math.Abs(Number(row[2]) - (tk - 273.15)) <= CsvDigits * tk, $"row {i + 1} temperature_degC");
            AssertRelative(points[i].GetProperty("pressure_Pa").GetDouble() / 1e5, Number(row[3]), CsvDigits, $"row {i + 1} pressure_bar");
            AssertRelative(points[i].GetProperty("bubble_slope_Pa_K").GetDouble() / 1e5, Number(row[4]), CsvDigits, $"row {i + 1} slope bar/K");
        }

        string text = RunText([.. args, "--units", "engineering"]);
        var table = Assert.Single(TableLayout.Find(text));
        TableLayout.AssertAligned(table);
        bool isothermal = condition == "-T";
        Assert.Equal(["x1", "y1", isothermal ? "P (bar)" : "T (degC)", "dP/dT at x (bar/K)", ""], table.HeaderCells);
        for (int i = 0; i < points.Length; i++)
        {
            var cells = table.Cells(table.Rows[i]);
            AssertRelative(isothermal ? points[i].GetProperty("pressure_Pa").GetDouble() / 1e5 : points[i].GetProperty("temperature_K").GetDouble() - 273.15,
                Number(cells[2]), TableDigits, $"row {i} T or P");
            AssertRelative(points[i].GetProperty("bubble_slope_Pa_K").GetDouble() / 1e5, Number(cells[3]), TableDigits, $"row {i} slope");
        }

        var azeotrope = json.GetProperty("azeotrope");
        var line = Regex.Match(text, @"T = (\S+) degC, P = (\S+) bar, dP/dT of its line = (\S+) bar/K$", RegexOptions.Multiline);
        Assert.True(line.Success, text);
        AssertRelative(azeotrope.GetProperty("temperature_K").GetDouble() - 273.15, Number(line.Groups[1].Value), TableDigits, "azeotrope degC");
        AssertRelative(azeotrope.GetProperty("pressure_Pa").GetDouble() / 1e5, Number(line.Groups[2].Value), TableDigits, "azeotrope bar");
        AssertRelative(azeotrope.GetProperty("slope_Pa_K").GetDouble() / 1e5, Number(line.Groups[3].Value), TableDigits, "azeotrope slope");
    }
}
