using System.Diagnostics;
using System.Globalization;
using System.Runtime.InteropServices;

namespace PhaseSlope.Cli.Tests.EndToEnd;

/// <summary>SIGTERM while the built tool writes a large output file leaves no temporary file and
/// no partial target.</summary>
public class SignalTests
{
    /// <summary>Safety stop for a hung process; not a performance check.</summary>
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(60);

    [DllImport("libc", EntryPoint = "kill")]
    private static extern int Kill(int pid, int signal);

    [Fact]
    public async Task Sigterm_WhileWritingAFitFile_TemporaryFileRemoved()
    {
        if (!OperatingSystem.IsLinux())
        {
            return;
        }

        string folder = Directory.CreateTempSubdirectory("phaseslope-e2e-signal-").FullName;
        try
        {
            // 120 000 points: the fit takes a moment and the JSON (about 29 MB) streams for a
            // while, so the temporary file is seen before the write ends.
            string data = Path.Combine(folder, "data.csv");
            using (var writer = new StreamWriter(data))
            {
                writer.Write("T [K],P [Pa]\n");
                for (int i = 0; i < 120_000; i++)
                {
                    double t = 250 + 100.0 * i / 120_000;
                    writer.Write(string.Create(CultureInfo.InvariantCulture, $"{t:R},{Math.Exp(20.5 - 2400 / (t - 30)):R}\n"));
                }
            }

            string output = Path.Combine(folder, "fit.json");
            string dll = Path.Combine(AppContext.BaseDirectory, "phaseslope.dll");
            string host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } h && File.Exists(h) ? h : "dotnet";
            var start = new ProcessStartInfo(host) { UseShellExecute = false, RedirectStandardError = true, RedirectStandardOutput = true, WorkingDirectory = folder };
            foreach (string arg in new[] { dll, "fit", data, "--form", "antoine", "--format", "json", "--out", output })
            {
                start.ArgumentList.Add(arg);
            }

            using var process = Process.Start(start)!;
            var stderr = process.StandardError.ReadToEndAsync();
            var stdout = process.StandardOutput.ReadToEndAsync();
            string? temp = null;
            var clock = Stopwatch.StartNew();
            while (temp is null && !process.HasExited && clock.Elapsed < Timeout)
            {
                temp = Directory.EnumerateFiles(folder, ".fit.json.*.tmp").FirstOrDefault();
                Thread.Sleep(temp is null ? 5 : 0);
            }

            Assert.True(temp is not null, $"no temporary file appeared before the tool ended (exit {(process.HasExited ? process.ExitCode : -1)})");
            Assert.Equal(0, Kill(process.Id, 15));
            if (!process.WaitForExit(Timeout))
            {
                process.Kill(entireProcessTree: true);
                Assert.Fail("phaseslope did not end after SIGTERM");
            }

            Assert.Equal(143, process.ExitCode);
            Assert.Equal("", await stdout);
            _ = await stderr;
            Assert.Equal(["data.csv"], Directory.EnumerateFileSystemEntries(folder).Select(f => Path.GetFileName(f)).ToArray());
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }
}
