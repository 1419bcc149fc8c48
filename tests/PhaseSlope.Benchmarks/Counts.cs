using System.Globalization;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Benchmarks;

/// <summary>Model evaluations per operation, counted exactly with <see cref="CountingModel"/>:
/// the machine-independent half of docs/performance.md (<c>-- counts</c>).</summary>
public static class Counts
{
    /// <summary>Prints the counts for a few fluids with Peng–Robinson.</summary>
    public static void Print(TextWriter output)
    {
        var inv = CultureInfo.InvariantCulture;
        output.WriteLine("| fluid | curve 40 pts | curve 1 000 pts | curve 10 000 pts | cold at T mean (max) | at P mean (max) | one-off per solver |");
        output.WriteLine("|---|---|---|---|---|---|---|");
        foreach (string name in new[] { "propane", "water", "r-134a", "carbon dioxide", "n-decane", "helium" })
        {
            var fluid = FluidCatalog.Embedded.Find(name);
            var counting = new CountingModel(CubicModel.For(CubicModelKind.PengRobinson, fluid));
            var solver = new CoexistenceSolver(counting, CoexistenceSolver.LowestValidTemperature(fluid));
            double tmin = solver.MinimumTemperature;
            double tc = solver.CriticalTemperature;
            // First use pays for the model's own acentric factor and the critical series: the
            // difference between a first and a second 1 000-point curve.
            long first = Curve(counting, solver, 1000);
            long oneOff = first - Curve(counting, solver, 1000);
            var perPoint = new Dictionary<int, double>();
            foreach (int n in new[] { 40, 1000, 10000 })
            {
                perPoint[n] = Curve(counting, solver, n) / (double)n;
            }

            var cold = new List<long>();
            var atPressure = new List<long>();
            for (int i = 0; i < 200; i++)
            {
                double t = tmin + (0.9999 * tc - tmin) * (i + 0.5) / 200;
                counting.Reset();
                double p = solver.AtTemperature(t).Pressure;
                cold.Add(counting.Evaluations);
                counting.Reset();
                _ = solver.AtPressure(p);
                atPressure.Add(counting.Evaluations);
            }

            output.WriteLine(string.Create(inv,
                $"| {name} | {perPoint[40]:F2} | {perPoint[1000]:F2} | {perPoint[10000]:F2} | {cold.Average():F1} ({cold.Max()}) | {atPressure.Average():F1} ({atPressure.Max()}) | {oneOff} |"));
        }
    }

    private static long Curve(CountingModel counting, CoexistenceSolver solver, int points)
    {
        counting.Reset();
        _ = CoexistenceCurve.Trace(solver, points);
        return counting.Evaluations;
    }
}
