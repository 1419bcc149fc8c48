namespace PhaseSlope.Cli.Tests;

/// <summary>Every class of error ends as one "phaseslope: " line on standard error, nothing on
/// standard output, and the documented exit code (see <see cref="ExitCodes"/>).</summary>
public class CliIoTests
{
    /// <summary>An invented test fluid (Data/vanishing-attraction.fluid) on which coexistence cannot converge.</summary>
    public static readonly string VanishingAttraction = Path.GetFullPath("../../../Data/vanishing-attraction.fluid");

    public static TheoryData<string[], int, string> ErrorCases => new()
    {
        // Fluid (3)
        { ["coexist", "propanne", "--temperature", "300"], ExitCodes.Fluid, "did you mean 'propane'" },
        { ["coexist", "watr", "--temperature", "300"], ExitCodes.Fluid, "'water'" },
        { ["fluids", "show", "no-such-fluid-at-all"], ExitCodes.Fluid, "unknown fluid 'no-such-fluid-at-all'" },
        { ["coexist", "/no/such/folder/propane.fluid", "--temperature", "300"], ExitCodes.Fluid, "/no/such/folder/propane.fluid: fluid file not found" },
        { ["coexist", "missing-file.fluid", "--temperature", "300"], ExitCodes.Fluid, "missing-file.fluid" },

        // Out of range (4)
        { ["coexist", "propane", "--temperature", "400"], ExitCodes.OutOfRange, "critical temperature" },
        { ["coexist", "propane", "--temperature", "369.89"], ExitCodes.OutOfRange, "at or above the critical temperature" },
        { ["coexist", "propane", "--pressure", "5 MPa"], ExitCodes.OutOfRange, "critical pressure" },
        { ["coexist", "propane", "--pressure", "4.2512 MPa"], ExitCodes.OutOfRange, "at or above the critical pressure" },
        { ["coexist", "propane", "--temperature", "50"], ExitCodes.OutOfRange, "below the triple point 85.525 K of propane" },
        { ["coexist", "water", "--temperature", "-10 degC"], ExitCodes.OutOfRange, "below the triple point 273.16 K of water" },
        { ["coexist", "propane", "--pressure", "3e-4"], ExitCodes.OutOfRange, "falls below the triple point 85.525 K of propane" },
        { ["curve", "propane", "--from", "50"], ExitCodes.OutOfRange, "--from: 50 K is below the triple point 85.525 K of propane" },
        { ["curve", "propane", "--to", "500"], ExitCodes.OutOfRange, "--to: 500 K is above the critical temperature" },
        { ["curve", "propane", "--from", "400"], ExitCodes.OutOfRange, "--from: 400 K is at or above the critical temperature" },
        { ["curve", "propane", "--from", "369.89"], ExitCodes.OutOfRange, "--from: 369.89 K is at or above the critical temperature" },
        { ["curve", "propane", "--to", "50"], ExitCodes.OutOfRange, "--to: 50 K is below the triple point 85.525 K of propane" },

        // Not converged (5): an invented model whose attraction vanishes at low temperature has
        // no liquid-vapour loop there (a picokelvin below Tc, once the example here, now solves
        // through the critical series).
        { ["coexist", VanishingAttraction, "--alpha", "twu", "--temperature", "200"], ExitCodes.NotConverged, "did not converge" },

        // Usage (2): malformed numbers
        { ["coexist", "propane", "--temperature", "3..0"], ExitCodes.Usage, "--temperature: malformed number" },
        { ["coexist", "propane", "--temperature", "abc"], ExitCodes.Usage, "--temperature: expected a temperature starting with a number" },
        { ["coexist", "propane", "--temperature", "300,5"], ExitCodes.Usage, "--temperature: comma in number" },
        { ["coexist", "propane", "--pressure", "1.0.0 bar"], ExitCodes.Usage, "--pressure: malformed number" },
        { ["coexist", "propane", "--temperature", "NaN"], ExitCodes.Usage, "NaN and infinity are not accepted" },
        { ["coexist", "propane", "--temperature", ""], ExitCodes.Usage, "--temperature: no temperature given" },
        { ["curve", "propane", "--points", "ten"], ExitCodes.Usage, "ten" },
        { ["curve", "propane", "--from", "1x0"], ExitCodes.Usage, "--from" },

        // Usage (2): unknown units
        { ["coexist", "propane", "--temperature", "300 furlong"], ExitCodes.Usage, "unknown temperature unit 'furlong'" },
        { ["coexist", "propane", "--pressure", "1 atmos"], ExitCodes.Usage, "unknown pressure unit 'atmos'" },
        { ["coexist", "propane", "--pressure", "10 psig"], ExitCodes.Usage, "gauge pressures are not accepted" },
        { ["curve", "propane", "--to", "300 Pa"], ExitCodes.Usage, "--to: unknown temperature unit 'Pa'" },

        // Usage (2): zero and negative absolute values
        { ["coexist", "propane", "--temperature", "0"], ExitCodes.Usage, "not above absolute zero" },
        { ["coexist", "propane", "--temperature", "-5"], ExitCodes.Usage, "not above absolute zero" },
        { ["coexist", "propane", "--temperature", "-300 degC"], ExitCodes.Usage, "not above absolute zero" },
        { ["coexist", "propane", "--temperature", "-500 degF"], ExitCodes.Usage, "not above absolute zero" },
        { ["coexist", "propane", "--pressure", "0"], ExitCodes.Usage, "pressure is not above zero" },
        { ["coexist", "propane", "--pressure", "-1 bar"], ExitCodes.Usage, "pressure is not above zero" },

        // Usage (2): unknown options, commands and choices
        { ["coexist", "propane", "--temperature", "300", "--bogus"], ExitCodes.Usage, "--bogus" },
        { ["coexist", "propane", "--temperature", "300", "surplus"], ExitCodes.Usage, "surplus" },
        { ["frobnicate"], ExitCodes.Usage, "frobnicate" },
        { [], ExitCodes.Usage, "no command given" },
        { ["fluids"], ExitCodes.Usage, "" },
        { ["curve"], ExitCodes.Usage, "" },
        { ["coexist", "propane", "--temperature", "300", "--eos", "xx"], ExitCodes.Usage, "--eos: unknown model 'xx'" },
        { ["curve", "propane", "--eos", "bwr"], ExitCodes.Usage, "--eos: unknown model 'bwr'" },
        { ["coexist", "propane", "--temperature", "300", "--format", "xml"], ExitCodes.Usage, "--format: unknown format 'xml'" },
        { ["fluids", "list", "--format", "yaml"], ExitCodes.Usage, "--format: unknown format 'yaml'" },
        { ["coexist", "propane", "--temperature", "300", "--units", "imperial"], ExitCodes.Usage, "--units: unknown unit system 'imperial'" },
        { ["fluids", "show", "water", "--units", "cgs"], ExitCodes.Usage, "--units: unknown unit system 'cgs'" },

        // Usage (2): --points out of its range, and curve bounds in the wrong order
        { ["curve", "propane", "--points", "1"], ExitCodes.Usage, "--points: must be between 2 and 100000, got 1" },
        { ["curve", "propane", "--points", "0"], ExitCodes.Usage, "--points" },
        { ["curve", "propane", "--points", "-3"], ExitCodes.Usage, "" },
        { ["curve", "propane", "--points", "100001"], ExitCodes.Usage, "--points" },
        { ["curve", "propane", "--from", "300", "--to", "250"], ExitCodes.Usage, "must be below --to" },

        // Usage (2): both or neither of --temperature and --pressure
        { ["coexist", "propane", "--temperature", "300", "--pressure", "1 bar"], ExitCodes.Usage, "exactly one of --temperature and --pressure" },
        { ["coexist", "propane"], ExitCodes.Usage, "exactly one of --temperature and --pressure" },
        { ["coexist", "propane", "-T", "300", "-P", "1 bar"], ExitCodes.Usage, "exactly one of --temperature and --pressure" },

        // Output file (6)
        { ["curve", "propane", "--points", "3", "--out", "/no/such/folder/curve.csv"], ExitCodes.OutputFile, "cannot write output file '/no/such/folder/curve.csv'" },
        { ["curve", "propane", "--points", "3", "--out", "/"], ExitCodes.OutputFile, "it is a directory" },
    };

    [Theory]
    [MemberData(nameof(ErrorCases))]
    public void Guard_ErrorCase_OneStderrLineNoStdoutAndDocumentedExitCode(string[] args, int expectedCode, string messagePart)
    {
        CliHarness.AssertFailure(CliHarness.Run(args), expectedCode, messagePart);
    }

    [Fact]
    public void Guard_InvalidFluidFileContent_ExitFluidAndMessageNamesFileAndLine()
    {
        using var folder = new TempFolder();
        string[] lines = CliHarness.CatalogFileText("propane.fluid").Split('\n');
        int index = Array.FindIndex(lines, l => l.StartsWith("acentric_factor", StringComparison.Ordinal));
        Assert.True(index >= 0);
        lines[index] = "acentric_factor           0,152                | typed with a decimal comma";
        string path = folder.File("broken.fluid");
        File.WriteAllText(path, string.Join('\n', lines));

        var result = CliHarness.Run("coexist", path, "--temperature", "300");

        CliHarness.AssertFailure(result, ExitCodes.Fluid, $"{path}:{index + 1}:");
        Assert.Contains("acentric_factor", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Guard_FluidFileWithoutFormatLine_ExitFluidAndMessageNamesFile()
    {
        using var folder = new TempFolder();
        string path = folder.File("not-a-fluid.fluid");
        File.WriteAllText(path, "name  propane\nthis is not a fluid file\n");

        var result = CliHarness.Run("fluids", "show", path);

        CliHarness.AssertFailure(result, ExitCodes.Fluid, path);
        Assert.Matches($@"{System.Text.RegularExpressions.Regex.Escape(path)}:\d+", result.Stderr);
    }

    [Fact]
    public void Guard_FluidPathIsAFolder_ExitFluid()
    {
        using var folder = new TempFolder();
        string path = folder.File("folder.fluid");
        Directory.CreateDirectory(path);

        CliHarness.AssertFailure(CliHarness.Run("coexist", path, "--temperature", "300"), ExitCodes.Fluid, path);
    }

    [Fact]
    public void Guard_OutPathIsAnExistingFolder_ExitOutputFileAndFolderUntouched()
    {
        using var folder = new TempFolder();
        string target = folder.File("out.csv");
        Directory.CreateDirectory(target);
        File.WriteAllText(Path.Combine(target, "inside.txt"), "keep");

        var result = CliHarness.Run("curve", "propane", "--points", "3", "--out", target);

        CliHarness.AssertFailure(result, ExitCodes.OutputFile, "out.csv");
        Assert.True(Directory.Exists(target));
        Assert.Equal("keep", File.ReadAllText(Path.Combine(target, "inside.txt")));
        Assert.Equal(["out.csv"], folder.Entries());
    }
}
