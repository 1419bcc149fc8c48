using PhaseSlope.Cli.Tests.Commands;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Guards;

/// <summary>Model-boundary guards, estimate and audit guards, message digits, control characters
/// and the failing exit code of <c>fluids check</c>.</summary>
public sealed class InputGuardTests : IDisposable
{
    private readonly string _directory = Directory.CreateTempSubdirectory("phaseslope-guards-").FullName;

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    /// <summary>The catalog's propane file with one line replaced (or one inserted after the
    /// format line when <paramref name="key"/> is absent).</summary>
    private string Propane(string key, string line)
    {
        var lines = File.ReadAllLines(FitData.ExamplePath("../../fluids/propane.fluid")).ToList();
        int i = lines.FindIndex(l => l.StartsWith(key + " ", StringComparison.Ordinal));
        if (i >= 0)
        {
            lines[i] = line;
        }
        else
        {
            lines.Insert(lines.FindIndex(l => l.StartsWith("format ", StringComparison.Ordinal)) + 1, line);
        }

        string path = Path.Combine(_directory, $"{key}.fluid");
        File.WriteAllLines(path, lines);
        return path;
    }

    [Fact]
    public void Coexist_CriticalTemperatureThatOverflows_RefusedAtTheModel()
    {
        // Tc = 1e300 K used to be reported as "too close to the critical temperature".
        var result = Run("coexist", Propane("critical_temperature", "critical_temperature      1e300 K | invented"), "-T", "300");
        AssertFailure(result, 4, "outside the range of double precision");
    }

    [Fact]
    public void Coexist_TwuParametersThatOverflow_RefusedNamingThem()
    {
        var result = Run("coexist", Propane("alpha_twu_pr", "alpha_twu_pr              1000 1000 1000 | invented"), "-T", "300", "--alpha", "twu");
        AssertFailure(result, 4, "Twu parameters 1000, 1000, 1000 of propane");
    }

    [Fact]
    public void Coexist_GeneralisedTwuWithOmegaMinusHalf_RefusedNamingTheRange()
    {
        // It used to give a negative latent heat.
        var result = Run("coexist", Propane("acentric_factor", "acentric_factor           -0.5 | invented"), "-T", "300", "--alpha", "twu");
        AssertFailure(result, 4, "where the generalised Twu (1995) alpha function stays positive and decreasing");
    }

    [Fact]
    public void Coexist_VolumeShiftOfMinus1e300_RefusedWithItsOwnMessage()
    {
        AssertFailure(Run("coexist", "propane", "-T", "300", "--volume-shift", "-1e300"), 4, "is below minus the co-volume");
    }

    [Theory]
    [InlineData("1 K, 1 Pa", "holds for T/Tc from 0.3 to 1")]
    [InlineData("300 K, 1 Pa", "outside the accepted range -0.5 to 2")]
    public void Estimate_VapourPressureOutsideTheMethod_Refused(string point, string message)
    {
        // "1 K, 1 Pa" used to write omega = -0.371 silently.
        var result = Run("fluids", "estimate", "--name", "x", "--molar-mass", "44 g/mol", "--tc", "370 K", "--pc", "4.2 MPa", "--tb", "231 K", "--vapour-pressure", point);
        AssertFailure(result, 4, message);
    }

    [Fact]
    public void Audit_CoefficientsThatOverflow_Refused()
    {
        var result = Run("audit", "--form", "antoine", "--coefficients", "1e300,1e300,1", "--fluid", "propane");
        AssertFailure(result, 4, "antoine coefficients 1E+300, 1E+300, 1 overflow");
    }

    [Fact]
    public void FluidsCheck_BoilingPointMiss_Exit8ReportStillPrinted()
    {
        // Tb = 280 K against the model's 231 K: a 17.5 % miss. It used to exit 0.
        var result = Run("fluids", "check", Propane("normal_boiling_point", "normal_boiling_point      280 K | invented"));
        Assert.Equal(8, result.ExitCode);
        Assert.Contains("WARNING", result.Stdout, StringComparison.Ordinal);
        Assert.Single(result.StderrLines);
        Assert.Contains("check failed: the model's normal boiling point", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void FluidsCheck_ConsistentFile_Exit0()
    {
        var result = Run("fluids", "check", FitData.ExamplePath("../../fluids/propane.fluid"));
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Empty(result.Stderr);
    }

    [Theory]
    [InlineData("pro\u202Epane", "pro\\u202Epane")]
    [InlineData("pro\0pane", "pro\\u0000pane")]
    public void ControlCharactersInAName_EscapedInTheError(string name, string shown)
    {
        var result = Run("coexist", name, "-T", "300");
        AssertFailure(result, 3, shown);
        Assert.DoesNotContain(name, result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Curve_FromJustBelowTheLimit_MessageShowsTheDifference()
    {
        // Water's lowest valid temperature is its triple point, 273.16 K; 273.15999 K is below it
        // by 1e-5 K, which 7 digits cannot show ("273.16 K is below ... 273.16 K").
        var result = Run("curve", "water", "--from", "273.15999 K");
        AssertFailure(result, 4, "273.15999 K is below the triple point 273.16 K of water");
    }

    [Fact]
    public void FluidFile_NameWithABidiOverride_RefusedAndEscapedInTheError()
    {
        // A name is echoed raw in every table title, so it is refused at the file, and the
        // error line does not carry the raw character either.
        var result = Run("coexist", Propane("name", "name                      pro\u202Epane"), "-T", "300");
        AssertFailure(result, 3, "must not contain control or invisible format characters (U+202E at position 4)");
        Assert.DoesNotContain("\u202E", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void FluidsCheck_PathWithABidiOverride_EchoedEscapedOnStdout()
    {
        // A right-to-left override in a file name would reverse what follows it on a terminal.
        string path = Path.Combine(_directory, "a\u202Eb.fluid");
        File.WriteAllText(path, CatalogFileText("propane.fluid"));

        var result = Run("fluids", "check", path);

        Assert.Equal(0, result.ExitCode);
        Assert.DoesNotContain("\u202E", result.Stdout, StringComparison.Ordinal);
        Assert.Contains("a\\u202Eb.fluid", result.Stdout, StringComparison.Ordinal);
    }
}
