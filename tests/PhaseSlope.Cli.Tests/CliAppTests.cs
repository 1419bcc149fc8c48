using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests;

public class CliAppTests
{
    [Fact]
    public void Run_Help_ExitZeroListsCommandsOnStdout()
    {
        var result = Run("--help");

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stderr);
        foreach (string command in new[] { "coexist", "curve", "fluids" })
        {
            Assert.Contains(command, result.Stdout, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("coexist", "--temperature")]
    [InlineData("curve", "--points")]
    [InlineData("fluids", "list")]
    public void Run_CommandHelp_ExitZeroDescribesOptions(string command, string expected)
    {
        var result = Run(command, "--help");

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stderr);
        Assert.Contains(expected, result.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Run_Success_NothingOnStderr()
    {
        var result = Run("coexist", "propane", "--temperature", "300");

        Assert.Equal(0, result.ExitCode);
        Assert.Equal("", result.Stderr);
        Assert.NotEmpty(result.Stdout);
    }

    [Fact]
    public void Run_UnknownOptionAndMissingCommand_ReportsTheUnknownWord()
    {
        // The unknown word is more telling than the "required command" error it also causes.
        AssertFailure(Run("fluids", "--colour"), ExitCodes.Usage, "--colour");
    }
}
