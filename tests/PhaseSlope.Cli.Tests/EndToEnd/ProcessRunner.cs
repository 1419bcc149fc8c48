using System.Diagnostics;

namespace PhaseSlope.Cli.Tests.EndToEnd;

/// <summary>Runs a prepared process to completion with standard input closed, collecting both
/// output streams, and fails the test if it does not exit in time.</summary>
internal static class ProcessRunner
{
    public static CliResult Run(ProcessStartInfo start, TimeSpan timeout, string what)
    {
        start.RedirectStandardInput = true;
        start.RedirectStandardOutput = true;
        start.RedirectStandardError = true;
        using var process = Process.Start(start) ?? throw new InvalidOperationException($"{what} did not start");
        process.StandardInput.Close();
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            Assert.Fail($"{what} did not exit within {timeout.TotalSeconds} s");
        }

        process.WaitForExit();
        return new CliResult(process.ExitCode, stdout.Result, stderr.Result);
    }
}
