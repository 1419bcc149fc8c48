using System.Diagnostics;

namespace PhaseSlope.Cli.Tests.Reporting;

/// <summary>Chromium run headless on a local file: a screenshot, the DOM as parsed, and what the
/// browser logged. Chromium comes from the operating system's package (Debian: <c>chromium</c>);
/// <c>.ci/run</c> installs it when missing, and so does the first test run as root with apt-get.</summary>
internal static class HeadlessChromium
{
    /// <summary>The OS package that provides the browser.</summary>
    public const string Package = "chromium";

    /// <summary>Longest a render may take before it is killed and the test fails: a report renders
    /// in 2-3 s on the CI machine; a hung browser must not hang the test run.</summary>
    private static readonly TimeSpan RenderTimeout = TimeSpan.FromSeconds(120);

    private static readonly Lazy<string> Executable = new(Locate, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>The browser's path, installing the package first when it is missing and this
    /// process may (root with apt-get); otherwise one clear failure naming the package.</summary>
    public static string Path => Executable.Value;

    private static string? Find()
    {
        string[] names = ["chromium", "chromium-browser"];
        var folders = (Environment.GetEnvironmentVariable("PATH") ?? "").Split(System.IO.Path.PathSeparator, StringSplitOptions.RemoveEmptyEntries)
            .Concat(["/usr/bin", "/usr/local/bin", "/snap/bin"]);
        return folders.SelectMany(f => names.Select(n => System.IO.Path.Combine(f, n))).FirstOrDefault(File.Exists);
    }

    private static string Locate()
    {
        if (Find() is string found)
        {
            return found;
        }

        if (Environment.IsPrivilegedProcess && File.Exists("/usr/bin/apt-get"))
        {
            // As .ci/run does: the distribution's own package, no other source.
            var (code, _, error) = Run("/bin/sh", ["-c", $"apt-get update && apt-get install -y --no-install-recommends {Package}"], TimeSpan.FromMinutes(15));
            if (code == 0 && Find() is string installed)
            {
                return installed;
            }

            throw new InvalidOperationException($"installing the '{Package}' package failed (exit {code}): {error.Trim().Split('\n').LastOrDefault()}");
        }

        throw new InvalidOperationException($"the browser tests need Chromium: install the operating system package '{Package}' (Debian/Ubuntu: apt-get install {Package}), or run .ci/run as root, which installs it");
    }

    /// <summary>Renders <paramref name="html"/> to <paramref name="png"/> at 1280 × <paramref name="height"/>
    /// pixels; <paramref name="dark"/> asks for the dark colour scheme (prefers-color-scheme: dark).</summary>
    /// <returns>The exit code and everything the browser wrote to standard error.</returns>
    public static (int ExitCode, string Log) Screenshot(string html, string png, bool dark, int height = 4000)
    {
        using var profile = new TempFolder();
        List<string> arguments = [.. Common(profile.Path), "--enable-logging=stderr", "--v=0", $"--screenshot={png}", $"--window-size=1280,{height}"];
        if (dark)
        {
            arguments.Add("--force-dark-mode");
        }

        arguments.Add(new Uri(html).AbsoluteUri);
        var (code, output, error) = Run(Path, arguments, RenderTimeout);
        return (code, output + error);
    }

    /// <summary>Prints <paramref name="html"/> to <paramref name="pdf"/> (the print style sheet applies),
    /// in the dark colour scheme when <paramref name="dark"/>.</summary>
    public static (int ExitCode, string Log) PrintToPdf(string html, string pdf, bool dark)
    {
        using var profile = new TempFolder();
        List<string> arguments = [.. Common(profile.Path), "--enable-logging=stderr", "--v=0", "--no-pdf-header-footer", $"--print-to-pdf={pdf}"];
        if (dark)
        {
            arguments.Add("--force-dark-mode");
        }

        arguments.Add(new Uri(html).AbsoluteUri);
        var (code, output, error) = Run(Path, arguments, RenderTimeout);
        return (code, output + error);
    }

    /// <summary>The DOM of <paramref name="html"/> as the browser built it (--dump-dom).</summary>
    public static (int ExitCode, string Dom, string Log) DumpDom(string html)
    {
        using var profile = new TempFolder();
        var (code, output, error) = Run(Path, [.. Common(profile.Path), "--enable-logging=stderr", "--v=0", "--dump-dom", new Uri(html).AbsoluteUri], RenderTimeout);
        return (code, output, error);
    }

    /// <summary>Flags of every run: headless, no sandbox (CI runs as root in a container), no
    /// GPU, a fresh profile, and no network at all (every host name resolves to nothing, and the
    /// browser's own background traffic is switched off), so a page that names an outside
    /// resource cannot fetch it.</summary>
    private static string[] Common(string profile) =>
    [
        "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
        "--disable-component-update", "--disable-sync", "--disable-extensions", "--host-resolver-rules=MAP * ~NOTFOUND", $"--user-data-dir={profile}",
    ];

    /// <summary>Browser log lines that mean the page went wrong: console messages (the page has
    /// no script, so any is an error), failed loads and blocked resources.</summary>
    public static string[] PageErrors(string log)
        => [.. log.Split('\n').Where(l => l.Contains(":CONSOLE", StringComparison.Ordinal) || l.Contains("net::ERR_", StringComparison.Ordinal)
            || l.Contains("Failed to load", StringComparison.OrdinalIgnoreCase) || l.Contains("Refused to", StringComparison.Ordinal))];

    private static (int Code, string Output, string Error) Run(string file, IEnumerable<string> arguments, TimeSpan timeout)
    {
        var start = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string argument in arguments)
        {
            start.ArgumentList.Add(argument);
        }

        using var process = Process.Start(start) ?? throw new InvalidOperationException($"cannot start {file}");
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        if (!process.WaitForExit(timeout))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException($"{System.IO.Path.GetFileName(file)} did not finish within {timeout.TotalSeconds} s");
        }

        process.WaitForExit();
        return (process.ExitCode, output.Result, error.Result);
    }
}
