using System.Diagnostics;
using System.Text.Json;

namespace PhaseSlope.Cli.Tests.EndToEnd;

/// <summary>The tool's project file as <c>dotnet publish</c>, <c>dotnet pack</c> and a plain build
/// evaluate it (<c>dotnet msbuild -getProperty</c>: evaluation only, nothing is restored or
/// built). Publishing itself takes too long for the test suite; the README's install commands
/// were run by hand.</summary>
public class ToolProjectTests
{
    /// <summary>Safety stop for a hung process; not a performance check.</summary>
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(120);

    private static readonly string[] Names =
    [
        "RuntimeIdentifier", "NETCoreSdkRuntimeIdentifier", "PublishReadyToRun", "PublishAot", "SelfContained",
        "PackAsTool", "ToolCommandName", "PackageId", "InvariantGlobalization",
    ];

    private static string ProjectPath()
    {
        for (var folder = new DirectoryInfo(AppContext.BaseDirectory); folder is not null; folder = folder.Parent)
        {
            string project = Path.Combine(folder.FullName, "src", "PhaseSlope.Cli", "PhaseSlope.Cli.csproj");
            if (File.Exists(project))
            {
                return project;
            }
        }

        throw new InvalidOperationException($"no src/PhaseSlope.Cli above {AppContext.BaseDirectory}");
    }

    /// <summary>The evaluated properties of the tool's project with the given global properties.</summary>
    private static Dictionary<string, string> Evaluate(params string[] globalProperties)
    {
        string host = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } h && File.Exists(h) ? h : "dotnet";
        var start = new ProcessStartInfo(host)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
            WorkingDirectory = Path.GetDirectoryName(ProjectPath())!,
        };
        start.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        start.Environment["DOTNET_NOLOGO"] = "1";
        start.ArgumentList.Add("msbuild");
        start.ArgumentList.Add(ProjectPath());
        start.ArgumentList.Add("-nologo");
        start.ArgumentList.Add("-nodeReuse:false");
        foreach (string name in Names)
        {
            start.ArgumentList.Add($"-getProperty:{name}");
        }

        foreach (string property in globalProperties)
        {
            start.ArgumentList.Add($"-p:{property}");
        }

        var result = ProcessRunner.Run(start, Timeout, "dotnet msbuild");
        Assert.True(result.ExitCode == 0, $"dotnet msbuild exit {result.ExitCode}: {result.Stdout} {result.Stderr}");
        using var document = StrictJson.Parse(result.Stdout);
        return document.RootElement.GetProperty("Properties").EnumerateObject()
            .ToDictionary(p => p.Name, p => p.Value.GetString() ?? "", StringComparer.Ordinal);
    }

    [Fact]
    public void PlainBuild_IsPortableAndNotPrecompiled()
    {
        // What `dotnet build` and `dotnet test` see: no runtime identifier, so the Debug loop and
        // its restore are the same as without the publish settings.
        var p = Evaluate();

        Assert.Equal("", p["RuntimeIdentifier"]);
        Assert.NotEqual("true", p["PublishReadyToRun"]);
        Assert.Equal("true", p["InvariantGlobalization"]);
    }

    [Fact]
    public void Publish_IsReadyToRunFrameworkDependentForTheSdksRuntime()
    {
        var p = Evaluate("_IsPublishing=true", "Configuration=Release");

        Assert.NotEqual("", p["NETCoreSdkRuntimeIdentifier"]);
        Assert.Equal(p["NETCoreSdkRuntimeIdentifier"], p["RuntimeIdentifier"]);
        Assert.Equal("true", p["PublishReadyToRun"]);
        Assert.Equal("false", p["SelfContained"]);
    }

    [Fact]
    public void PublishAot_IsNativeNotReadyToRun()
    {
        var p = Evaluate("_IsPublishing=true", "Configuration=Release", "PublishAot=true");

        Assert.Equal(p["NETCoreSdkRuntimeIdentifier"], p["RuntimeIdentifier"]);
        Assert.Equal("true", p["PublishAot"]);
        Assert.NotEqual("true", p["PublishReadyToRun"]);
    }

    [Fact]
    public void Pack_IsAReadyToRunToolNamedPhaseslope()
    {
        var p = Evaluate("_IsPacking=true", "Configuration=Release");

        Assert.Equal("true", p["PackAsTool"]);
        Assert.Equal("phaseslope", p["ToolCommandName"]);
        Assert.Equal("phaseslope", p["PackageId"]);
        Assert.Equal(p["NETCoreSdkRuntimeIdentifier"], p["RuntimeIdentifier"]);
        Assert.Equal("true", p["PublishReadyToRun"]);
    }
}
