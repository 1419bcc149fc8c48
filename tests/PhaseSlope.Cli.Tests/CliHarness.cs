using System.Globalization;
using System.Text.Json;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Tests;

/// <summary>What one run of the tool produced.</summary>
internal sealed record CliResult(int ExitCode, string Stdout, string Stderr)
{
    /// <summary>Standard error split into lines, without the final line break.</summary>
    public string[] StderrLines => Stderr.Length == 0 ? [] : Stderr.TrimEnd('\n').Split('\n');

    public override string ToString() => $"exit {ExitCode}; stdout: <{Stdout}>; stderr: <{Stderr}>";
}

/// <summary>Runs the tool in-process and checks the shape of its output.</summary>
internal static class CliHarness
{
    /// <summary>Runs <see cref="CliApp.Run"/> with string writers.</summary>
    public static CliResult Run(params string[] args)
    {
        using var stdout = new StringWriter(CultureInfo.InvariantCulture);
        using var stderr = new StringWriter(CultureInfo.InvariantCulture);
        int code = CliApp.Run(args, stdout, stderr);
        return new CliResult(code, stdout.ToString(), stderr.ToString());
    }

    /// <summary>Runs the tool, requires exit 0 and an empty standard error, and parses standard
    /// output as JSON.</summary>
    public static JsonElement RunJson(params string[] args)
    {
        var result = Run(args);
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.True(result.Stderr.Length == 0, result.ToString());
        using var document = StrictJson.Parse(result.Stdout);
        return document.RootElement.Clone();
    }

    /// <summary>Runs the tool, requires exit 0 and an empty standard error, and returns stdout.</summary>
    public static string RunText(params string[] args)
    {
        var result = Run(args);
        Assert.True(result.ExitCode == 0, result.ToString());
        Assert.True(result.Stderr.Length == 0, result.ToString());
        return result.Stdout;
    }

    /// <summary>The error contract: the expected exit code, nothing on standard output, exactly
    /// one line on standard error that starts with "phaseslope: error: ", and no stack trace.</summary>
    public static void AssertFailure(CliResult result, int expectedCode, string? messagePart = null)
    {
        Assert.True(result.ExitCode == expectedCode, $"expected exit {expectedCode}; {result}");
        Assert.True(result.Stdout.Length == 0, $"stdout must be empty; {result}");
        Assert.True(result.StderrLines.Length == 1, $"expected exactly one stderr line; {result}");
        Assert.StartsWith("phaseslope: error: ", result.Stderr, StringComparison.Ordinal);
        Assert.EndsWith("\n", result.Stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", result.Stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("Exception", result.Stderr, StringComparison.Ordinal);
        if (messagePart is not null)
        {
            Assert.Contains(messagePart, result.Stderr, StringComparison.Ordinal);
        }
    }

    /// <summary>The text of a shipped catalog file, read from the resource embedded in the core.</summary>
    public static string CatalogFileText(string fileName)
    {
        using var stream = typeof(FluidCatalog).Assembly.GetManifestResourceStream(FluidCatalog.ResourcePrefix + fileName)
            ?? throw new InvalidOperationException($"no embedded catalog file {fileName}");
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }

    /// <summary>The bits of a double, for exact comparisons with a readable failure.</summary>
    public static void AssertSameDouble(double expected, double actual, string what)
        => Assert.True(BitConverter.DoubleToInt64Bits(expected) == BitConverter.DoubleToInt64Bits(actual),
            $"{what}: expected {expected:R}, got {actual:R}");

    /// <summary>Relative tolerance of a number read back from a table: tables print
    /// <see cref="PhaseSlope.Cli.Output.NumberText.Digits"/> (6) significant digits, and rounding
    /// to six moves a value by at most half a unit in the sixth, 5e-6 of it.</summary>
    public const double TableDigits = 5e-6;

    /// <summary>Asserts |actual − expected| ≤ tolerance·|expected|.</summary>
    public static void AssertRelative(double expected, double actual, double tolerance, string what)
        => Assert.True(Math.Abs(actual - expected) <= tolerance * Math.Abs(expected),
            $"{what}: expected {expected:R} within {tolerance:G3} relative, got {actual:R}");
}

/// <summary>A fresh folder under the system temp folder, deleted on dispose.</summary>
internal sealed class TempFolder : IDisposable
{
    public TempFolder()
    {
        Path = Directory.CreateTempSubdirectory("phaseslope-clitests-").FullName;
    }

    public string Path { get; }

    public string File(string name) => System.IO.Path.Combine(Path, name);

    /// <summary>Names of every entry in the folder, sorted.</summary>
    public string[] Entries() => [.. Directory.EnumerateFileSystemEntries(Path).Select(System.IO.Path.GetFileName).Order(StringComparer.Ordinal)!];

    public void Dispose()
    {
        try
        {
            Directory.Delete(Path, recursive: true);
        }
        catch (IOException)
        {
            // Best effort: a leftover temp folder is harmless.
        }
    }
}

/// <summary>Sets the current culture (and UI culture) of this thread and restores it on dispose.</summary>
internal sealed class CultureScope : IDisposable
{
    private readonly CultureInfo _culture = CultureInfo.CurrentCulture;
    private readonly CultureInfo _uiCulture = CultureInfo.CurrentUICulture;

    public CultureScope(string name)
    {
        var culture = CultureInfo.GetCultureInfo(name);
        CultureInfo.CurrentCulture = culture;
        CultureInfo.CurrentUICulture = culture;
    }

    public void Dispose()
    {
        CultureInfo.CurrentCulture = _culture;
        CultureInfo.CurrentUICulture = _uiCulture;
    }
}
