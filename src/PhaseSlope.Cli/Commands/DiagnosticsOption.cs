using System.CommandLine;
using System.Diagnostics;
using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>--diagnostics</c>: after a successful solve, one JSON line on standard error with
/// what the solver did, so that its cost and accuracy can be checked without a profiler.</summary>
/// <remarks>Keys: <c>points</c> (states solved), <c>eos_evaluations</c> (residual-Helmholtz
/// evaluations of the whole command, counted by wrapping the model in a
/// <see cref="CountingModel"/>, the one-off per-solver work included), <c>density_root_solves</c>,
/// <c>iterations</c> (Newton iterations summed over the points), <c>max_residual</c> (largest
/// |ln φL − ln φV|), <c>max_density_uncertainty</c> (largest stated relative density uncertainty),
/// <c>methods</c> (points per route), <c>elapsed_s</c> (wall time of the command body).
/// Standard output is unchanged.</remarks>
internal sealed class DiagnosticsOption
{
    private readonly Option<bool> _option = new("--diagnostics")
    {
        Description = "After solving, write one JSON line of solver statistics (points, eos_evaluations, iterations, max_residual, elapsed_s) to stderr",
    };

    private Stopwatch? _clock;
    private CountingModel? _counter;

    /// <summary>Adds the option to a command.</summary>
    public void AddTo(Command command) => command.Options.Add(_option);

    /// <summary>Whether --diagnostics was given.</summary>
    public bool Given(ParseResult parse) => parse.GetValue(_option);

    /// <summary>Starts the clock and wraps the model in a counter when <paramref name="enabled"/>;
    /// returns the model every later call must use.</summary>
    public IResidualModel Begin(bool enabled, IResidualModel model)
    {
        if (!enabled)
        {
            return model;
        }

        _clock = Stopwatch.StartNew();
        _counter = new CountingModel(model);
        return _counter;
    }

    /// <summary>Writes the line for the solved points when the option was given.</summary>
    public void End(CliIo io, IReadOnlyList<CoexistencePoint> points)
    {
        if (_clock is null || _counter is null)
        {
            return;
        }

        double elapsed = _clock.Elapsed.TotalSeconds;
        string line = JsonText.WriteLine(json =>
        {
            json.WriteStartObject();
            json.WriteFinite("points", points.Count);
            json.WriteFinite("eos_evaluations", _counter.Evaluations);
            json.WriteFinite("density_root_solves", _counter.RootSolves);
            json.WriteFinite("iterations", points.Sum(p => p.Report.Iterations));
            json.WriteFinite("max_residual", points.Max(p => p.Report.FugacityResidual));
            json.WriteFinite("max_density_uncertainty", points.Max(p => p.Report.DensityUncertainty));
            json.WriteStartObject("methods");
            foreach (var group in points.GroupBy(p => p.Report.Method).OrderBy(g => g.Key))
            {
                json.WriteFinite(CoexistenceWriter.Kebab(group.Key.ToString()), group.Count());
            }

            json.WriteEndObject();
            json.WriteFinite("elapsed_s", elapsed);
            json.WriteEndObject();
        });
        io.Error.WriteLine(line);
    }
}
