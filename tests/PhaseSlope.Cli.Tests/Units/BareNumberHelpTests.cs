using System.Text.RegularExpressions;

namespace PhaseSlope.Cli.Tests.Units;

/// <summary>Every option that takes a physical quantity says in its help what a bare number means.</summary>
public class BareNumberHelpTests
{
    /// <summary>The help text of one option of a command: its line and any wrapped continuation lines.</summary>
    private static string OptionHelp(string[] command, string option)
    {
        var result = CliHarness.Run([.. command, "--help"]);
        Assert.True(result.ExitCode == 0, result.ToString());
        string[] lines = result.Stdout.Replace("\r", "").Split('\n');
        int start = Array.FindIndex(lines, line => Regex.IsMatch(line, $@"^\s+(-\w, )?{Regex.Escape(option)}(?![\w-])"));
        Assert.True(start >= 0, $"{string.Join(' ', command)} --help has no {option}:\n{result.Stdout}");
        var text = new List<string> { lines[start] };
        for (int i = start + 1; i < lines.Length && lines[i].StartsWith("    ", StringComparison.Ordinal) && !lines[i].TrimStart().StartsWith('-'); i++)
        {
            text.Add(lines[i].Trim());
        }

        return string.Join(' ', text);
    }

    [Theory]
    [InlineData("coexist", "--temperature", "bare number: K")]
    [InlineData("coexist", "--pressure", "bare number: Pa")]
    [InlineData("curve", "--from", "bare number: K")]
    [InlineData("curve", "--to", "bare number: K")]
    [InlineData("state", "--temperature", "bare number: K")]
    [InlineData("state", "--pressure", "bare number: Pa")]
    [InlineData("state", "--density", "bare number: mol/m3")]
    [InlineData("state", "--volume-shift", "bare number: m3/mol")]
    [InlineData("state", "--reference", "bare numbers: T in K, P in Pa")]
    [InlineData("derive", "--temperature", "bare number: K")]
    [InlineData("derive", "--pressure", "bare number: Pa")]
    [InlineData("derive", "--density", "bare number: mol/m3")]
    [InlineData("fit", "--tc", "bare number: K")]
    [InlineData("fit", "--pc", "bare number: Pa")]
    [InlineData("fit", "--temperature-unit", "bare numbers in this unit")]
    [InlineData("fit", "--pressure-unit", "bare numbers in this unit")]
    [InlineData("latent", "--tc", "bare number: K")]
    [InlineData("latent", "--pc", "bare number: Pa")]
    [InlineData("latent", "--temperature", "bare number: K")]
    [InlineData("latent", "--from", "bare number: K")]
    [InlineData("latent", "--to", "bare number: K")]
    [InlineData("audit", "--range", "bare numbers in --correlation-temperature-unit")]
    [InlineData("audit", "--threshold", "bare number: percent")]
    [InlineData("audit", "--coefficients", "bare numbers in the printed form's own units")]
    [InlineData("audit", "--coefficients2", "bare numbers in its own convention")]
    [InlineData("plot", "--temperature-unit", "bare numbers in this unit")]
    [InlineData("plot", "--pressure-unit", "bare numbers in this unit")]
    [InlineData("fluids estimate", "--tc", "bare number: K")]
    [InlineData("fluids estimate", "--pc", "bare number: Pa")]
    [InlineData("fluids estimate", "--tb", "bare number: K")]
    [InlineData("fluids estimate", "--molar-mass", "bare number: refused")]
    [InlineData("fluids estimate", "--vapour-pressure", "bare numbers: K and Pa")]
    public void Help_QuantityOption_SaysWhatABareNumberMeans(string command, string option, string phrase)
    {
        Assert.Contains(phrase, OptionHelp(command.Split(' '), option), StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("state")]
    [InlineData("derive")]
    public void Help_DensityHasNoSingleLetterAlias(string command)
    {
        // -D differed from plot's -d only by case; only --density remains.
        Assert.DoesNotContain("-D,", OptionHelp([command], "--density"), StringComparison.Ordinal);
    }

    [Fact]
    public void State_SingleLetterDensityAlias_IsAnUnknownOption()
    {
        var result = CliHarness.Run("state", "propane", "-T", "300", "-D", "11000");
        CliHarness.AssertFailure(result, ExitCodes.Usage, "-D");
    }
}
