using System.Diagnostics;
using System.Text.Json;

namespace PhaseSlope.Cli.Tests.EndToEnd;

/// <summary>The built tool run as a real process: <c>dotnet phaseslope.dll ...</c>. The runs are
/// few, since each starts a runtime.</summary>
public class PhaseslopeProcessTests
{
    /// <summary>Safety stop for a hung process; not a performance check.</summary>
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(60);

    private static CliResult RunProcess(params string[] args)
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "phaseslope.dll");
        Assert.True(File.Exists(dll), $"the built tool is missing: {dll}");
        string host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } h && File.Exists(h) ? h : "dotnet";

        var start = new ProcessStartInfo(host)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
            WorkingDirectory = Path.GetTempPath(),
        };
        start.ArgumentList.Add(dll);
        foreach (string arg in args)
        {
            start.ArgumentList.Add(arg);
        }

        return ProcessRunner.Run(start, Timeout, $"phaseslope {string.Join(' ', args)}");
    }

    [Fact]
    public void CurvePropane_ExitZeroAndTableEndsWithTheCriticalPoint()
    {
        var result = RunProcess("curve", "propane");

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stderr);
        Assert.StartsWith("Saturation curve of propane", result.Stdout, StringComparison.Ordinal);
        var table = Assert.Single(TableLayout.Find(result.Stdout));
        TableLayout.AssertAligned(table);
        Assert.Equal(40, table.Rows.Count);
        var last = table.Cells(table.Rows[^1]);
        Assert.Equal("369.89", last[0]);
        Assert.Equal(last[2], last[3]);
        Assert.Contains("the last one the critical point", result.Stdout, StringComparison.Ordinal);
        Assert.Contains("Model estimates.", result.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void PlotPng_TheBuiltToolLoadsSkiaAndWritesTheFigure()
    {
        // The native rendering library must come with the built tool, not from the machine.
        string folder = Directory.CreateTempSubdirectory("phaseslope-e2e-plot-").FullName;
        try
        {
            string path = Path.Combine(folder, "pt.png");
            var result = RunProcess("plot", "propane", "--diagram", "p-t", "--out", path, "--width", "500", "--height", "320");
            Assert.True(result.ExitCode == 0, result.ToString());
            Assert.Equal("", result.Stdout);
            Assert.Equal("", result.Stderr);
            byte[] png = File.ReadAllBytes(path);
            Assert.Equal(0x89, png[0]);
            Assert.Equal(500, System.Buffers.Binary.BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(16, 4)));
            Assert.Equal(320, System.Buffers.Binary.BinaryPrimitives.ReadInt32BigEndian(png.AsSpan(20, 4)));
            Assert.Equal(["pt.png"], Directory.EnumerateFiles(folder).Select(Path.GetFileName));
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    [Fact]
    public void Help_ExitZeroListsCommands()
    {
        var result = RunProcess("--help");

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stderr);
        Assert.Contains("coexist", result.Stdout, StringComparison.Ordinal);
        Assert.Contains("curve", result.Stdout, StringComparison.Ordinal);
        Assert.Contains("fluids", result.Stdout, StringComparison.Ordinal);
        Assert.Contains("plot", result.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void CoexistJson_ExitZeroAndSameAsInProcess()
    {
        string[] args = ["coexist", "water", "--pressure", "1 atm", "--format", "json"];
        var result = RunProcess(args);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stderr);
        using var document = StrictJson.Parse(result.Stdout);
        Assert.Equal("water", document.RootElement.GetProperty("fluid").GetString());
        Assert.Equal(CliHarness.RunText(args), result.Stdout);
    }

    public static TheoryData<int, string[]> OneErrorPerExitCode => new()
    {
        { ExitCodes.Usage, ["coexist", "propane", "--temperature", "3..0"] },
        { ExitCodes.Fluid, ["coexist", "propanne", "--temperature", "300"] },
        { ExitCodes.OutOfRange, ["coexist", "propane", "--temperature", "400"] },
        { ExitCodes.NotConverged, ["coexist", CliIoTests.VanishingAttraction, "--alpha", "twu", "--temperature", "200"] },
        { ExitCodes.OutputFile, ["curve", "propane", "--points", "3", "--out", Path.Combine(Path.GetTempPath(), "phaseslope-no-such-folder-3f1c", "curve.csv")] },
    };

    [Theory]
    [MemberData(nameof(OneErrorPerExitCode))]
    public void Error_EachExitCode_OneStderrLineAndEmptyStdout(int expectedCode, string[] args)
    {
        CliHarness.AssertFailure(RunProcess(args), expectedCode);
    }
}
