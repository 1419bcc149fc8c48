using System.Diagnostics;
using System.Text.Json;
using PhaseSlope.Cli.Output;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Output;

/// <summary>--out on every command that prints a result, and what the file system sees: devices
/// and pipes written through, symbolic links followed, the output file untouched on any failure.</summary>
public class OutputFileTests
{
    private const string Kept = "the user's old content\n";

    /// <summary>Stands for a copy of the catalog's propane file in the test's folder.</summary>
    private const string PropaneFile = "(propane file)";

    /// <summary>Every command that prints a result, as (arguments, whether the output is JSON).</summary>
    public static TheoryData<string[], bool> Commands() => new()
    {
        { ["coexist", "propane", "-T", "300", "--format", "json"], true },
        { ["coexist", "propane", "-T", "300"], false },
        { ["curve", "propane", "--points", "5", "--format", "json"], true },
        { ["state", "propane", "-T", "300", "-P", "100kPa", "--format", "json"], true },
        { ["derive", "propane", "-T", "300", "-P", "100kPa", "--of", "H", "--by", "T", "--hold", "P", "--format", "json"], true },
        { ["fluids", "list", "--format", "csv"], false },
        { ["fluids", "show", "propane", "--format", "json"], true },
        { ["fluids", "check", PropaneFile, "--format", "json"], true },
    };

    [Theory]
    [MemberData(nameof(Commands))]
    public void Out_EveryCommand_FileHoldsWhatStdoutWouldAndStdoutIsEmpty(string[] args, bool json)
    {
        using var folder = new TempFolder();
        string path = folder.File("result.out");
        string fluidFile = folder.File("propane.fluid");
        File.WriteAllText(fluidFile, CatalogFileText("propane.fluid"));
        args = [.. args.Select(a => a == PropaneFile ? fluidFile : a)];
        string expected = RunText(args);

        var result = Run([.. args, "--out", path]);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        var note = Assert.Single(result.StderrLines);
        Assert.StartsWith("phaseslope: wrote ", note, StringComparison.Ordinal);
        Assert.DoesNotContain("error", note, StringComparison.Ordinal);
        Assert.EndsWith(path, note, StringComparison.Ordinal);
        Assert.Equal(expected, File.ReadAllText(path));
        Assert.Equal(["propane.fluid", "result.out"], folder.Entries());
        if (json)
        {
            using var document = StrictJson.Parse(File.ReadAllText(path));
        }
    }

    [Fact]
    public void Out_FitLatentAudit_WrittenToTheFile()
    {
        using var folder = new TempFolder();
        string data = folder.File("data.csv");
        File.WriteAllText(data, "T [K],P [kPa]\n250,218.4\n270,415.6\n290,722.4\n310,1172.6\n330,1802.7\n");
        foreach (string[] args in new[]
        {
            new[] { "fit", data, "--form", "antoine", "--format", "json" },
            ["latent", data, "--fluid", "propane", "--form", "antoine", "--format", "json"],
            ["audit", "--form", "antoine", "--coefficients", "9.1058,1872.46,-25.16", "--log-base", "10", "--correlation-pressure-unit", "kPa", "--range", "250,330", "--format", "json"],
        })
        {
            string path = folder.File($"{args[0]}.json");
            var result = Run([.. args, "-o", path]);
            Assert.True(result.ExitCode is 0 or ExitCodes.AuditFailed, result.ToString());
            Assert.Equal("", result.Stdout);
            Assert.StartsWith("phaseslope: wrote ", Assert.Single(result.StderrLines), StringComparison.Ordinal);
            using var document = StrictJson.Parse(File.ReadAllText(path));
        }
    }

    /// <summary>Bad inputs of several kinds: each fails before the output file is opened.</summary>
    public static TheoryData<string[], int, string> Failures() => new()
    {
        { ["coexist", "propane", "-T", "1000"], ExitCodes.OutOfRange, "critical" },
        { ["coexist", "/dev/zero", "-T", "300"], ExitCodes.Fluid, "/dev/zero: cannot read fluid file: a line is longer than the limit of 64 KiB" },
        { ["fit", "/dev/zero"], ExitCodes.DataFile, "/dev/zero: cannot read data file: a line is longer than the limit of 64 KiB" },
        { ["state", "propane", "-T", "300"], ExitCodes.Usage, "" },
        { ["curve", "propane", "--points", "1"], ExitCodes.Usage, "--points" },
        { ["fluids", "show", "no-such-fluid-anywhere"], ExitCodes.Fluid, "no-such-fluid-anywhere" },
        { ["fluids", "estimate", "--name", "Bad Name", "--molar-mass", "58.12 g/mol", "--tc", "425 K", "--pc", "3.8 MPa", "--omega", "0.2"], ExitCodes.Usage, "--name: the canonical name must be lower case" },
        { ["fluids", "estimate", "--name", "heavy", "--molar-mass", "1e308 g/mol", "--tc", "425 K", "--pc", "3.8 MPa", "--omega", "0.2"], ExitCodes.Usage, "--molar-mass: implausible value" },
    };

    [Theory]
    [MemberData(nameof(Failures))]
    public void Out_BadInput_OneErrorLineAndTheOutputFileUntouched(string[] args, int code, string messagePart)
    {
        using var folder = new TempFolder();
        string path = folder.File("keep.fluid");
        File.WriteAllText(path, Kept);

        var result = Run([.. args, "--out", path]);

        AssertFailure(result, code, messagePart);
        Assert.DoesNotContain("keep.fluid", result.Stderr, StringComparison.Ordinal);
        Assert.Equal(Kept, File.ReadAllText(path));
        Assert.Equal(["keep.fluid"], folder.Entries());
    }

    [Fact]
    public void Out_DevNull_WrittenThroughAndStaysACharacterDevice()
    {
        Assert.Equal(FileKind.Special, FileKinds.Of("/dev/null"));

        var result = Run("coexist", "propane", "-T", "300", "--format", "json", "--out", "/dev/null");

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("", result.Stdout);
        Assert.Equal("phaseslope: wrote the coexistence state to /dev/null\n", result.Stderr);
        Assert.Equal(FileKind.Special, FileKinds.Of("/dev/null"));
    }

    [Fact]
    public void Out_SymbolicLinkChain_FinalTargetReplacedAndLinksKept()
    {
        using var folder = new TempFolder();
        string target = folder.File("target.json");
        File.WriteAllText(target, Kept);
        File.CreateSymbolicLink(folder.File("inner"), target);
        File.CreateSymbolicLink(folder.File("outer"), folder.File("inner"));

        var result = Run("coexist", "propane", "-T", "300", "--format", "json", "-o", folder.File("outer"));

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.NotNull(new FileInfo(folder.File("outer")).LinkTarget);
        Assert.NotNull(new FileInfo(folder.File("inner")).LinkTarget);
        Assert.Null(new FileInfo(target).LinkTarget);
        using var document = StrictJson.Parse(File.ReadAllText(target));
        Assert.Equal(300, document.RootElement.GetProperty("temperature_K").GetDouble());
        Assert.Equal(["inner", "outer", "target.json"], folder.Entries());
    }

    [Fact]
    public void Out_SymbolicLinkToDevNull_WrittenThroughAndLinkKept()
    {
        using var folder = new TempFolder();
        string link = folder.File("sink");
        File.CreateSymbolicLink(link, "/dev/null");

        var result = Run("curve", "propane", "--points", "4", "--format", "csv", "-o", link);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal("/dev/null", new FileInfo(link).LinkTarget);
        Assert.Equal(FileKind.Special, FileKinds.Of("/dev/null"));
        Assert.Equal(["sink"], folder.Entries());
    }

    [Fact]
    public void Out_SymbolicLinkLoop_ErrorNamesTheUsersPathAndNothingWritten()
    {
        using var folder = new TempFolder();
        File.CreateSymbolicLink(folder.File("a"), folder.File("b"));
        File.CreateSymbolicLink(folder.File("b"), folder.File("a"));
        string path = folder.File("a");

        var result = Run("coexist", "propane", "-T", "300", "-o", path);

        AssertFailure(result, ExitCodes.OutputFile, $"cannot write output file '{path}': cannot follow the path");
        Assert.Equal(["a", "b"], folder.Entries());
    }

    [Fact]
    public void Out_DanglingSymbolicLink_CreatesItsTarget()
    {
        using var folder = new TempFolder();
        File.CreateSymbolicLink(folder.File("link.csv"), folder.File("made.csv"));

        var result = Run("curve", "propane", "--points", "3", "--format", "csv", "-o", folder.File("link.csv"));

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.StartsWith("fluid,eos,", File.ReadAllText(folder.File("made.csv")), StringComparison.Ordinal);
        Assert.NotNull(new FileInfo(folder.File("link.csv")).LinkTarget);
    }

    [Fact]
    public async Task Out_Fifo_WrittenThroughToTheReader()
    {
        using var folder = new TempFolder();
        string fifo = folder.File("pipe");
        MakeFifo(fifo);
        string expected = RunText("fluids", "show", "propane", "--format", "json");
        var reader = Task.Run(() => File.ReadAllText(fifo));

        var result = Run("fluids", "show", "propane", "--format", "json", "-o", fifo);

        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.Equal(expected, await reader.WaitAsync(TimeSpan.FromSeconds(30)));
        Assert.Equal(FileKind.Special, FileKinds.Of(fifo));
        Assert.Equal(["pipe"], folder.Entries());
    }

    [Fact]
    public void Out_MissingFolder_ErrorNamesTheUsersPathNotTheTemporaryFile()
    {
        using var folder = new TempFolder();
        string path = Path.Combine(folder.Path, "missing", "out.json");

        var result = Run("coexist", "propane", "-T", "300", "-o", path);

        AssertFailure(result, ExitCodes.OutputFile, $"cannot write output file '{path}': folder does not exist");
        Assert.DoesNotContain(".tmp", result.Stderr, StringComparison.Ordinal);
        Assert.Empty(folder.Entries());
    }

    [Fact]
    public void Out_ReadOnlyFolder_PermissionDeniedNamesTheUsersPath()
    {
        if (Environment.UserName == "root" || OperatingSystem.IsWindows())
        {
            // Root writes anywhere; the case cannot arise.
            return;
        }

        using var folder = new TempFolder();
        string sub = folder.File("ro");
        Directory.CreateDirectory(sub);
        File.SetUnixFileMode(sub, UnixFileMode.UserRead | UnixFileMode.UserExecute);
        try
        {
            string path = Path.Combine(sub, "out.csv");
            var result = Run("coexist", "propane", "-T", "300", "-o", path);
            AssertFailure(result, ExitCodes.OutputFile, $"cannot write output file '{path}': permission denied");
            Assert.DoesNotContain(".tmp", result.Stderr, StringComparison.Ordinal);
        }
        finally
        {
            File.SetUnixFileMode(sub, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }
    }

    [Fact]
    public void Out_ReplacedFile_KeepsItsPermissionBits()
    {
        if (OperatingSystem.IsWindows())
        {
            return;
        }

        using var folder = new TempFolder();
        string path = folder.File("out.csv");
        File.WriteAllText(path, Kept);
        var mode = UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead;
        File.SetUnixFileMode(path, mode);

        AtomicFile.WriteAllText(path, "new\n");

        Assert.Equal("new\n", File.ReadAllText(path));
        Assert.Equal(mode, File.GetUnixFileMode(path));
    }

    [Fact]
    public void Write_WriterThrows_TemporaryFileRemovedAndTargetKept()
    {
        using var folder = new TempFolder();
        string path = folder.File("out.csv");
        File.WriteAllText(path, Kept);

        Assert.Throws<NonFiniteResultException>(() => AtomicFile.Write(path, text =>
        {
            text.Write(new string('x', 100_000));
            text.Write(NumberText.RoundTrip(double.PositiveInfinity));
        }));

        Assert.Equal(Kept, File.ReadAllText(path));
        Assert.Equal(["out.csv"], folder.Entries());
        Assert.Empty(AtomicFile.PendingFiles);
    }

    /// <summary>Makes a FIFO with mkfifo(1), inside a test's temp folder.</summary>
    internal static void MakeFifo(string path)
    {
        using var process = Process.Start(new ProcessStartInfo("mkfifo") { ArgumentList = { path }, UseShellExecute = false })!;
        process.WaitForExit();
        Assert.Equal(0, process.ExitCode);
    }
}
