using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Equilibrium;

/// <summary>The solver's cost in model evaluations, counted exactly (these are counts, not
/// timings: speed is measured with BenchmarkDotNet in tests/PhaseSlope.Benchmarks).</summary>
public class SolverCostTests
{
    private static (CountingModel Counter, CoexistenceSolver Solver) Counted(string fluid, CubicModelKind kind)
    {
        var data = FluidCatalog.Embedded.Find(fluid);
        var counter = new CountingModel(CubicModel.For(kind, data));
        return (counter, new CoexistenceSolver(counter, CoexistenceSolver.LowestValidTemperature(data)));
    }

    [Theory]
    [MemberData(nameof(Cases.EveryModel), MemberType = typeof(Cases))]
    public void Trace_ThousandPoints_AtMostFourEvaluationsPerPoint(CubicModelKind kind)
    {
        // The target for a traced curve: 2–4 evaluations per point once the solver is
        // warm (its one-off work, the model's own ω and the critical series, done by a first curve).
        var (counter, solver) = Counted("propane", kind);
        _ = CoexistenceCurve.Trace(solver, 1000);
        counter.Reset();

        var curve = CoexistenceCurve.Trace(solver, 1000);

        double perPoint = counter.Evaluations / 1000.0;
        Assert.True(perPoint <= 4.0, $"{kind}: {perPoint} evaluations per point");
        // The solver's own count agrees with the wrapper's: the report is honest.
        Assert.Equal(counter.Evaluations, curve.Sum(p => (long)p.Report.ModelEvaluations));
    }

    [Theory]
    [MemberData(nameof(Cases.EveryFluidAndModel), MemberType = typeof(Cases))]
    public void ColdPoints_AtMost40AtTemperatureAnd60AtPressure(string fluid, CubicModelKind kind)
    {
        var (counter, solver) = Counted(fluid, kind);
        _ = solver.AtTemperature(0.5 * (solver.MinimumTemperature + solver.CriticalTemperature)); // one-off ω
        double tmin = solver.MinimumTemperature;
        double tc = solver.CriticalTemperature;
        for (int i = 0; i < 12; i++)
        {
            double t = tmin + (0.995 * tc - tmin) * i / 11;
            counter.Reset();
            var point = solver.AtTemperature(t);
            Assert.True(counter.Evaluations <= 40, $"{fluid} {kind} at {t} K: {counter.Evaluations} evaluations");
            counter.Reset();
            var back = solver.AtPressure(point.Pressure);
            Assert.True(counter.Evaluations <= 60, $"{fluid} {kind} at {point.Pressure} Pa: {counter.Evaluations} evaluations");
            // d ln P/d ln T is 5–40 on these curves: 1e-12 relative in T is far above rounding.
            AssertClose.Relative(t, back.Temperature, 1e-12, $"{fluid} {kind} Tsat(Psat(T))");
        }
    }

    [Fact]
    public void Trace_CostIsLinearInPoints()
    {
        // Every point costs the same few evaluations, so ten times the points cost (about) ten
        // times as much; finer spacing only helps the extrapolated start (factor 8–11 allowed).
        var (counter, solver) = Counted("water", CubicModelKind.PengRobinson);
        _ = CoexistenceCurve.Trace(solver, 1000);
        counter.Reset();
        _ = CoexistenceCurve.Trace(solver, 1000);
        long thousand = counter.Evaluations;
        counter.Reset();
        _ = CoexistenceCurve.Trace(solver, 10000);
        double ratio = counter.Evaluations / (double)thousand;
        Assert.InRange(ratio, 8, 11);
    }
}
