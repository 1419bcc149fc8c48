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

    /// <summary>Prints model evaluations per (P, h) and (P, s) flash on a warm engine, over 100
    /// single-phase states (0.5–1.5 Tc at 0.05–2 Pc) and 100 two-phase states (quality 0.1–0.9).</summary>
    public static void PrintFlashes(TextWriter output)
    {
        var inv = CultureInfo.InvariantCulture;
        output.WriteLine("| fluid | (P, h) single phase mean (max) | (P, s) single phase mean (max) | (P, h) two-phase mean (max) | (P, s) two-phase mean (max) | slowest (P, h) state |");
        output.WriteLine("|---|---|---|---|---|---|");
        foreach (string name in new[] { "propane", "water", "r-134a", "carbon dioxide" })
        {
            var fluid = FluidCatalog.Embedded.Find(name);
            var counting = new CountingModel(CubicModel.For(CubicModelKind.PengRobinson, fluid));
            var engine = new Core.Properties.PropertyModel(fluid, counting);
            double tc = engine.Solver.CriticalTemperature, pc = engine.Solver.CriticalPressure;
            var counts = new List<long>[4];
            (long Count, double T, double P) worst = (0, 0, 0);
            var solid = new Core.Solids.SolidRegion(fluid, engine.Solver);
            int skipped = 0;
            for (int k = 0; k < 4; k++)
            {
                counts[k] = [];
            }

            long Count(Core.Properties.StateProperty p, double value, double pressure)
            {
                counting.Reset();
                _ = engine.Flash(Core.Properties.StateProperty.Pressure, pressure, p, value);
                return counting.Evaluations;
            }

            _ = engine.Flash(Core.Properties.StateProperty.Pressure, 0.5 * pc, Core.Properties.StateProperty.Quality, 0.5); // warm
            for (int i = 0; i < 10; i++)
            {
                for (int j = 0; j < 10; j++)
                {
                    double t = Math.Max(engine.Solver.MinimumTemperature, (0.5 + 0.1 * i + 0.005) * tc);
                    double pressure = (0.05 + 0.2 * j) * pc;
                    if (t >= engine.FlashMaximumTemperature)
                    {
                        continue;
                    }

                    var state = engine.AtPressure(t, pressure);
                    if (solid.Refusal(t, pressure, state.Phase, state.Metastable) is not null)
                    {
                        // In the solid by the fluid's own data (carbon dioxide at its triple-point
                        // temperature above its triple-point pressure): the flash refuses it.
                        skipped++;
                    }
                    else
                    {
                        counts[0].Add(Count(Core.Properties.StateProperty.Enthalpy, state.Enthalpy!.Value, pressure));
                        if (counts[0][^1] > worst.Count)
                        {
                            worst = (counts[0][^1], t / tc, pressure / pc);
                        }

                        counts[1].Add(Count(Core.Properties.StateProperty.Entropy, state.Entropy!.Value, pressure));
                    }

                    double ts = engine.Solver.MinimumTemperature + (0.98 * tc - engine.Solver.MinimumTemperature) * (i + 0.5) / 10;
                    var mixture = engine.Flash(Core.Properties.StateProperty.Temperature, ts, Core.Properties.StateProperty.Quality, 0.1 + 0.08 * j);
                    counts[2].Add(Count(Core.Properties.StateProperty.Enthalpy, mixture.Enthalpy!.Value, mixture.Pressure));
                    counts[3].Add(Count(Core.Properties.StateProperty.Entropy, mixture.Entropy!.Value, mixture.Pressure));
                }
            }

            output.WriteLine(string.Create(inv,
                $"| {name} | {counts[0].Average():F1} ({counts[0].Max()}) | {counts[1].Average():F1} ({counts[1].Max()}) | {counts[2].Average():F1} ({counts[2].Max()}) | {counts[3].Average():F1} ({counts[3].Max()}) | {worst.T:F3} Tc, {worst.P:F2} Pc |")
                + (skipped > 0 ? string.Create(inv, $" ({skipped} single-phase states in the solid skipped)") : ""));
        }
    }

    private static long Curve(CountingModel counting, CoexistenceSolver solver, int points)
    {
        counting.Reset();
        _ = CoexistenceCurve.Trace(solver, points);
        return counting.Evaluations;
    }

    /// <summary>Prints points, model evaluations (ln φ of one phase with derivatives) and the
    /// landmarks of the lean-gas envelope (<see cref="EnvelopeBenchmarks"/>) for a few step limits.</summary>
    public static void PrintEnvelopes(TextWriter output)
    {
        var inv = CultureInfo.InvariantCulture;
        var model = new CubicMixtureModel(EnvelopeBenchmarks.Names.Select(n => CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find(n))).ToList());
        output.WriteLine("| maximum step | points | evaluations | per point | critical point K, MPa | cricondenbar K, MPa | cricondentherm K, MPa |");
        output.WriteLine("|---|---|---|---|---|---|---|");
        foreach (double step in new[] { 0.05, 0.1, EnvelopeBenchmarks.TwoHundredPointStep, 0.2 })
        {
            var envelope = new Core.Mixtures.EnvelopeTracer(model, Core.Mixtures.EnvelopeOptions.Default with { MaximumStep = step }).Trace(EnvelopeBenchmarks.Composition);
            static string Show(Core.Mixtures.EnvelopeLandmark? l) => l is { } v ? string.Create(CultureInfo.InvariantCulture, $"{v.Temperature:F2}, {v.Pressure / 1e6:F4}") : "none";
            output.WriteLine(string.Create(inv,
                $"| {step} | {envelope.Points.Count} | {envelope.Evaluations} | {envelope.Evaluations / (double)envelope.Points.Count:F1} | {Show(envelope.CriticalPoint)} | {Show(envelope.Cricondenbar)} | {Show(envelope.Cricondentherm)} |"));
        }
    }
}
