using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary><c>--diagnostics</c> on coexist and curve, and the <c>model</c> object every
/// coexistence and state JSON carries.</summary>
public class DiagnosticsTests
{
    private static readonly string[] Keys = ["points", "eos_evaluations", "density_root_solves", "iterations", "max_residual", "max_density_uncertainty", "methods", "elapsed_s"];

    [Theory]
    [InlineData("coexist", "propane", "--temperature", "300")]
    [InlineData("coexist", "propane", "--pressure", "1 MPa")]
    [InlineData("curve", "propane", "--points", "200")]
    public void Diagnostics_OneJsonLineOnStderr_StdoutUnchanged(params string[] args)
    {
        var plain = Run([.. args, "--format", "json"]);
        var diagnosed = Run([.. args, "--format", "json", "--diagnostics"]);

        Assert.Equal(0, diagnosed.ExitCode);
        Assert.Equal(plain.Stdout, diagnosed.Stdout);
        Assert.Single(diagnosed.StderrLines);
        using var line = StrictJson.Parse(diagnosed.StderrLines[0]);
        var root = line.RootElement;
        foreach (string key in Keys)
        {
            Assert.True(root.TryGetProperty(key, out _), $"missing {key} in {diagnosed.StderrLines[0]}");
        }

        int points = root.GetProperty("points").GetInt32();
        Assert.Equal(args[0] == "curve" ? 200 : 1, points);
        // The solver's residual bound (CoexistenceOptions default).
        Assert.True(root.GetProperty("max_residual").GetDouble() <= 1e-12);
        long evaluations = root.GetProperty("eos_evaluations").GetInt64();
        Assert.True(evaluations > 0);
        if (args[0] == "curve")
        {
            // Traced points cost 4–8 evaluations each at this spacing, plus the one-off work of
            // the solver (about 60 for the critical series and the model's own omega) and the
            // reference state: well under 10 per point. The old solver spent ~590.
            Assert.True(evaluations < 10 * points, $"{evaluations} evaluations for {points} points");
        }
    }

    [Fact]
    public void Json_NamesTheWholeModel()
    {
        var json = RunJson("coexist", "propane", "--temperature", "300", "--eos", "pr", "--alpha", "twu", "--volume-shift", "peneloux", "--format", "json");
        var model = json.GetProperty("model");
        Assert.Equal("pr", json.GetProperty("eos").GetString());
        Assert.Equal("pr", model.GetProperty("equation").GetString());
        Assert.Contains("Peng-Robinson", model.GetProperty("title").GetString(), StringComparison.Ordinal);
        Assert.Contains("Twu", model.GetProperty("alpha").GetString(), StringComparison.Ordinal);
        Assert.NotEqual(0, model.GetProperty("volume_shift_m3_mol").GetDouble());

        var state = RunJson("state", "propane", "--temperature", "300", "--pressure", "1 bar", "--format", "json");
        Assert.Equal("pr", state.GetProperty("model").GetProperty("equation").GetString());
        Assert.Equal(0, state.GetProperty("model").GetProperty("volume_shift_m3_mol").GetDouble());
    }
}
