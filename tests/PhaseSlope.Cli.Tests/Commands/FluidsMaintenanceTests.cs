using System.Text.Json;
using PhaseSlope.Core.Estimation;
using PhaseSlope.Core.Fluids;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>fluids check</c>, <c>fluids estimate</c> and the filters of <c>fluids list</c>.</summary>
public class FluidsMaintenanceTests
{
    [Fact]
    public void Check_CatalogFile_ValidAndConsistent()
    {
        var json = RunJson("fluids", "check", "../../../../../fluids/propane.fluid", "--format", "json");

        Assert.True(json.GetProperty("valid").GetBoolean());
        Assert.True(json.GetProperty("boiling_point_consistent").GetBoolean());
        Assert.True(json.GetProperty("solves_to_critical_point").GetBoolean());
        // Peng–Robinson gives propane's Tb to 0.04 % (docs/validation.md).
        Assert.True(Math.Abs(json.GetProperty("boiling_point_deviation").GetDouble()) < 1e-3);
    }

    [Fact]
    public void Check_InconsistentData_ValidButWarnedAndExit8()
    {
        using var folder = new TempFolder();
        string path = folder.File("wrong-omega.fluid");
        string text = File.ReadAllText("../../../../../fluids/propane.fluid").Replace("acentric_factor           0.152", "acentric_factor           0.352", StringComparison.Ordinal);
        File.WriteAllText(path, text);

        var result = Run("fluids", "check", path);

        // The report is printed; the inconsistency fails the run (README: exit 8) on one stderr line.
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("WARNING: more than 1 % apart", result.Stdout, StringComparison.Ordinal);
        Assert.Single(result.StderrLines);
        Assert.Contains($"{path}: check failed", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_BrokenFile_ExitThreeNamingFileLineAndField()
    {
        using var folder = new TempFolder();
        string path = folder.File("broken.fluid");
        File.WriteAllText(path, File.ReadAllText("../../../../../fluids/propane.fluid").Replace("4.2512 MPa", "-4.2512 MPa", StringComparison.Ordinal));

        var result = Run("fluids", "check", path);

        AssertFailure(result, 3, "critical_pressure");
        Assert.Contains($"{path}:", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Estimate_FromGroups_WritesAValidatedFileWithLabelledEstimates()
    {
        using var folder = new TempFolder();
        string path = folder.File("my-solvent.fluid");

        var result = Run("fluids", "estimate", "--name", "my solvent", "--formula", "C7H8",
            "--groups", "ring=CH:5,ring=C:1,CH3:1", "--tb", "383.8 K", "--out", path);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        using var stream = File.OpenRead(path);
        var fluid = FluidFile.Read(stream, path);
        var joback = Joback.Estimate([(Joback.Groups.Single(g => g.Id == "ring=CH"), 5), (Joback.Groups.Single(g => g.Id == "ring=C"), 1), (Joback.Groups.Single(g => g.Id == "CH3"), 1)], 383.8);
        Assert.Equal(joback.CriticalTemperature!.Value, fluid.CriticalTemperature.Value);
        Assert.Equal(joback.CriticalPressure!.Value, fluid.CriticalPressure.Value);
        Assert.Contains("estimated by the Joback", fluid.CriticalTemperature.Source, StringComparison.Ordinal);
        Assert.Contains("estimated by the Ambrose-Walton", fluid.AcentricFactor.Source, StringComparison.Ordinal);
        Assert.Equal("given by the user", fluid.NormalBoilingPoint!.Source);
        Assert.NotNull(fluid.IdealGasHeatCapacity);
        // The written file is usable at once: coexistence by path.
        var point = RunJson("coexist", path, "--pressure", "1 atm", "--format", "json");
        // ω was estimated from this very boiling point, so the model returns it closely (0.1 K).
        Assert.True(Math.Abs(point.GetProperty("temperature_K").GetDouble() - 383.8) < 0.1, point.ToString());
    }

    [Fact]
    public void Estimate_OmegaFromAVapourPressure_UsesTheNamedMethod()
    {
        string text = RunText("fluids", "estimate", "--name", "x", "--molar-mass", "58.12 g/mol", "--tc", "425.125 K", "--pc", "3.796 MPa",
            "--vapour-pressure", "272.66 K, 101.325 kPa", "--omega-method", "lee-kesler");

        using var reader = new StringReader(text);
        var fluid = FluidFile.Parse(reader, "stdout");
        double expected = CorrespondingStates.AcentricFactor(AcentricFactorMethod.LeeKesler, 425.125, 3.796e6, 272.66, 101325);
        Assert.Equal(expected, fluid.AcentricFactor.Value);
        Assert.Contains("Lee-Kesler", fluid.AcentricFactor.Source, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--groups", "CH5:1")]
    [InlineData("--groups", "CH3:0")]
    [InlineData("--omega-method", "guess")]
    public void Estimate_BadInput_UsageError(string option, string value)
    {
        var result = Run("fluids", "estimate", "--name", "x", "--formula", "C3H8", "--groups", "CH3:2,CH2:1", option, value);
        AssertFailure(result, 2, option);
    }

    [Fact]
    public void Estimate_FormulaOfAnotherMolecule_RefusedNamingTheElementCounts()
    {
        // Propane's formula with butane's groups (2 -CH3, 2 -CH2-): before, the file said C3H8 with
        // butane's Tc. One stderr line names each element whose count differs.
        var result = Run("fluids", "estimate", "--name", "x", "--formula", "C3H8", "--groups", "CH3:2,CH2:2");
        AssertFailure(result, 2, "--formula: C3H8 is not the molecule of --groups (C4H10): C 3 vs 4, H 8 vs 10 (formula vs groups)");
    }

    [Fact]
    public void Estimate_FormulaWrittenByStructure_AcceptedWhenTheAtomsAgree()
    {
        // CH3CH2OH has the atoms of ethanol's groups (C2H6O); the formula is written as given.
        using var reader = new StringReader(RunTextAllowingFindings("fluids", "estimate", "--name", "x", "--formula", "CH3CH2OH", "--groups", "CH3:1,CH2:1,OH:1", "--tb", "351.4 K"));
        var fluid = FluidFile.Parse(reader, "stdout");
        Assert.Equal("CH3CH2OH", fluid.Formula);
    }

    [Fact]
    public void Estimate_GroupsOnly_FormulaAndMolarMassFromTheirAtoms()
    {
        using var reader = new StringReader(RunTextAllowingFindings("fluids", "estimate", "--name", "x", "--groups", "CH3:1,CH2:1,OH:1", "--tb", "351.4 K"));
        var fluid = FluidFile.Parse(reader, "stdout");
        Assert.Equal("C2H6O", fluid.Formula);
        // IUPAC 2005 weights (from memory): 2·12.0107 + 6·1.00794 + 15.9994 = 46.06844 g/mol.
        Assert.Equal(ChemicalFormula.MolarMass("C2H6O"), fluid.MolarMass!.Value);
        AssertRelative(0.04606844, fluid.MolarMass.Value, 1e-12, "molar mass of ethanol");
        Assert.Contains("atoms of the Joback groups (C2H6O)", fluid.MolarMass.Source, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("--groups", "CH3:2,CH4:1", "--groups: unknown group 'CH4'")]
    [InlineData("--groups", "CH3:1,CH3:1", "--groups: group 'CH3' is listed twice")]
    [InlineData("--groups", "CH3:1001", "--groups: 'CH3:1001' is not ID:COUNT with a count from 1 to 1000")]
    [InlineData("--groups", "OH:20", "--groups: the Joback critical temperature of the groups 20 -OH (alcohol) is")]
    [InlineData("--molar-mass", "60 g/mol", "--molar-mass: 60 g/mol is not the molar mass of C3H8, 44.09562 g/mol (more than 0.5 % apart)")]
    [InlineData("--format", "csv", "--format: unknown format 'csv' (use fluid, table or json)")]
    public void Estimate_BadInput_OneLineNamingTheOption(string option, string value, string message)
    {
        string[] args = option == "--groups"
            ? ["fluids", "estimate", "--name", "x", option, value]
            : ["fluids", "estimate", "--name", "x", "--formula", "C3H8", "--groups", "CH3:2,CH2:1", option, value];
        AssertFailure(Run(args), 2, message);
    }

    [Fact]
    public void Estimate_GroupWithoutATcContribution_NeedsTc()
    {
        // The published table has no tc, pc, vc for =NH (from memory): the method gives no Tc.
        var result = Run("fluids", "estimate", "--name", "x", "--groups", "CH3:2,=C:1,=NH:1");
        AssertFailure(result, 2, "--tc: not given, and the Joback table has no Tc contribution for group =NH: give --tc");
    }

    [Fact]
    public void Estimate_JsonReport_CrossCheckBesideTheJobackValues()
    {
        // Methanol by groups: Joback's Pc is a known outlier (67 bar; measured 80.97 bar, Poling et
        // al. Appendix A, from memory), Lydersen's 82.6 bar; the report flags it, and one warning
        // line per finding goes to standard error (exit 0: the file is still the estimate asked for).
        var result = Run("fluids", "estimate", "--name", "methanol-estimate", "--groups", "CH3:1,OH:1", "--tb", "337.69 K", "--format", "json");
        Assert.True(result.ExitCode == 0, result.ToString());
        using var document = StrictJson.Parse(result.Stdout);
        var json = document.RootElement;
        Assert.Equal("CH4O", json.GetProperty("formula").GetString());
        Assert.Equal("derived from the groups", json.GetProperty("formula_source").GetString());

        var groups = new[] { (Joback.Groups.Single(g => g.Id == "CH3"), 1), (Joback.Groups.Single(g => g.Id == "OH"), 1) };
        var joback = Joback.Estimate(groups, 337.69);
        var lydersen = Lydersen.Estimate(groups, 337.69, joback.MolarMass);
        var pc = json.GetProperty("cross_check").GetProperty("critical_pressure_Pa");
        Assert.Equal(joback.CriticalPressure!.Value, pc.GetProperty("joback").GetDouble());
        Assert.Equal(lydersen.CriticalPressure!.Value, pc.GetProperty("lydersen").GetDouble());
        AssertRelative((lydersen.CriticalPressure.Value - joback.CriticalPressure.Value) / joback.CriticalPressure.Value,
            pc.GetProperty("relative_difference").GetDouble(), 1e-14, "relative difference");
        Assert.True(pc.GetProperty("exceeds_threshold").GetBoolean());
        Assert.True(pc.GetProperty("joback_value_used").GetBoolean());
        var tc = json.GetProperty("cross_check").GetProperty("critical_temperature_K");
        Assert.False(tc.GetProperty("exceeds_threshold").GetBoolean());
        Assert.Equal(joback.CriticalTemperature!.Value, json.GetProperty("values").GetProperty("critical_temperature_K").GetProperty("value").GetDouble());

        var findings = json.GetProperty("findings").EnumerateArray().Select(f => f.GetString()!).ToArray();
        Assert.Contains(findings, f => f.Contains("critical pressure", StringComparison.Ordinal));
        Assert.Equal(findings.Length, result.StderrLines.Length);
        Assert.All(result.StderrLines, line => Assert.StartsWith("phaseslope: warning: Joback and the Lydersen cross-check differ", line, StringComparison.Ordinal));
    }

    [Fact]
    public void Estimate_GivenPc_IsNoFinding()
    {
        // With the measured Pc given, Joback's Pc is not used: its disagreement is shown, not a finding.
        var result = Run("fluids", "estimate", "--name", "x", "--groups", "CH3:1,OH:1", "--tb", "337.69 K", "--pc", "80.97 bar", "--omega", "0.565", "--format", "json");
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stderr);
        using var document = StrictJson.Parse(result.Stdout);
        var pc = document.RootElement.GetProperty("cross_check").GetProperty("critical_pressure_Pa");
        Assert.True(pc.GetProperty("exceeds_threshold").GetBoolean());
        Assert.False(pc.GetProperty("joback_value_used").GetBoolean());
        Assert.Equal(0, document.RootElement.GetProperty("findings").GetArrayLength());
        Assert.Equal("given by the user (--omega)", document.RootElement.GetProperty("cross_check").GetProperty("acentric_factor").GetProperty("unavailable").GetString());
    }

    [Fact]
    public void Estimate_TableReportAndFileHeader_ShowTheCrossCheck()
    {
        string table = RunText("fluids", "estimate", "--name", "x", "--groups", "CH3:2,CH2:4", "--tb", "341.88 K", "--format", "table");
        Assert.Contains("cross-check: Lydersen (1955) on the same groups", table, StringComparison.Ordinal);
        Assert.Matches(@"critical temperature\s+[0-9.]+\s+[0-9.]+\s+K\s+[-+][0-9.]+ %\s+5 %\s+agree", table);
        Assert.Contains("formula: C6H14 (derived from the atoms of the groups)", table, StringComparison.Ordinal);

        string file = RunText("fluids", "estimate", "--name", "x", "--groups", "CH3:2,CH2:4", "--tb", "341.88 K");
        Assert.Contains("# Cross-check of the critical pressure (Lydersen 1955 on the same groups): ", file, StringComparison.Ordinal);
    }

    [Fact]
    public void Estimate_GroupWithoutLydersenIncrement_NotComparedWithTheReason()
    {
        // Pyridine: the ring -N= has no Lydersen increment here, so nothing is compared (and
        // nothing flagged); the report says why.
        var json = RunJson("fluids", "estimate", "--name", "x", "--groups", "ring=CH:5,ring=N:1", "--tb", "388.41 K", "--format", "json");
        var tc = json.GetProperty("cross_check").GetProperty("critical_temperature_K");
        Assert.Equal(JsonValueKind.Null, tc.GetProperty("lydersen").ValueKind);
        Assert.Equal(JsonValueKind.Null, tc.GetProperty("relative_difference").ValueKind);
        Assert.Equal("no Lydersen increment for ring=N", tc.GetProperty("unavailable").GetString());
    }

    private static string RunTextAllowingFindings(params string[] args)
    {
        var result = Run(args);
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.All(result.StderrLines, line => Assert.StartsWith("phaseslope: warning: ", line, StringComparison.Ordinal));
        return result.Stdout;
    }

    [Fact]
    public void Estimate_MissingConstantAndNoGroups_UsageError()
    {
        var result = Run("fluids", "estimate", "--name", "x", "--formula", "C3H8");
        AssertFailure(result, 2, "--tc");
    }

    [Fact]
    public void List_FilterByFamilyAndName()
    {
        var alcohols = RunJson("fluids", "list", "--family", "alcohol", "--format", "json");
        Assert.All(alcohols.EnumerateArray(), f => Assert.Equal("alcohol", f.GetProperty("family").GetString()));
        Assert.Contains(alcohols.EnumerateArray(), f => f.GetProperty("name").GetString() == "ethanol");

        var xylenes = RunJson("fluids", "list", "--name", "xylene", "--format", "json");
        Assert.Equal(["m-xylene", "o-xylene", "p-xylene"], xylenes.EnumerateArray().Select(f => f.GetProperty("name").GetString()!).Order(StringComparer.Ordinal));

        AssertFailure(Run("fluids", "list", "--family", "no such family"), 2, "families:");
    }
}
