using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.Equilibrium;

public class CoexistenceCurveTests
{
    private static CoexistenceSolver Solver(string fluid = "propane", CubicModelKind kind = CubicModelKind.PengRobinson)
        => CoexistenceSolver.For(FluidCatalog.Embedded.Find(fluid), kind);

    [Theory]
    [InlineData("propane", CubicModelKind.PengRobinson)]
    [InlineData("water", CubicModelKind.PengRobinson)]
    [InlineData("methanol", CubicModelKind.PengRobinson1978)]
    [InlineData("carbon dioxide", CubicModelKind.SoaveRedlichKwong)]
    [InlineData("argon", CubicModelKind.RedlichKwong)]
    [InlineData("nitrogen", CubicModelKind.VanDerWaals)]
    public void Trace_WholeCurve_RunsFromMinimumTemperatureToTheCriticalPoint(string fluid, CubicModelKind kind)
    {
        var solver = Solver(fluid, kind);

        var curve = CoexistenceCurve.Trace(solver);

        Assert.Equal(CoexistenceCurve.DefaultPoints, curve.Count);
        Assert.Equal(solver.MinimumTemperature, curve[0].Temperature);
        Assert.True(curve[^1].IsCritical);
        Assert.Equal(solver.CriticalTemperature, curve[^1].Temperature);
        Assert.All(curve.Take(curve.Count - 1), p => Assert.Equal(StopReason.Converged, p.Report.StopReason));
        for (int i = 1; i < curve.Count; i++)
        {
            Assert.True(curve[i].Temperature > curve[i - 1].Temperature, $"T not increasing at point {i}");
            Assert.True(curve[i].Pressure > curve[i - 1].Pressure, $"P not increasing at point {i}");
            Assert.True(curve[i].Liquid.Density <= curve[i - 1].Liquid.Density, $"liquid density not falling at point {i}");
            Assert.True(curve[i].Vapour.Density >= curve[i - 1].Vapour.Density, $"vapour density not rising at point {i}");
        }
    }

    [Fact]
    public void Trace_Spacing_CrowdsPointsTowardTc()
    {
        // Points are evenly spaced in √(Tc − T), so each step in T is smaller than the one before:
        // ΔT_i ∝ (2(n−1−i) + 1)·const, strictly decreasing toward Tc.
        var solver = Solver();

        var curve = CoexistenceCurve.Trace(solver, 12);

        double[] steps = [.. curve.Zip(curve.Skip(1), (a, b) => b.Temperature - a.Temperature)];
        for (int i = 1; i < steps.Length; i++)
        {
            Assert.True(steps[i] < steps[i - 1], $"step {i} ({steps[i]} K) not smaller than step {i - 1} ({steps[i - 1]} K)");
        }

        // Last step / first step = 1/(2n − 3) for n points: 1/21 for 12.
        Assert.Equal(1.0 / 21.0, steps[^1] / steps[0], 10);
    }

    [Fact]
    public void Trace_EndBelowTc_EndsAtThatTemperatureWithoutCriticalPoint()
    {
        var solver = Solver();
        double tc = solver.CriticalTemperature;

        var curve = CoexistenceCurve.Trace(solver, 0.5 * tc, 0.9 * tc, 5);

        Assert.Equal(5, curve.Count);
        Assert.Equal(0.5 * tc, curve[0].Temperature);
        Assert.Equal(0.9 * tc, curve[^1].Temperature);
        Assert.DoesNotContain(curve, p => p.IsCritical);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(0)]
    [InlineData(-5)]
    [InlineData(100_001)]
    public void Trace_BadPointCount_ThrowsNamingPoints(int points)
    {
        var ex = Assert.Throws<InvalidInputException>(() => CoexistenceCurve.Trace(Solver(), points));

        Assert.Equal("points", ex.Field);
    }

    [Fact]
    public void Trace_EndAboveTc_ThrowsNamingTheEnd()
    {
        var solver = Solver();
        double tc = solver.CriticalTemperature;

        var ex = Assert.Throws<InvalidInputException>(() => CoexistenceCurve.Trace(solver, 0.5 * tc, 1.01 * tc));

        Assert.Equal("to temperature", ex.Field);
    }

    [Fact]
    public void Trace_StartNotBelowEnd_ThrowsNamingTheStart()
    {
        var solver = Solver();
        double tc = solver.CriticalTemperature;

        Assert.Equal("from temperature", Assert.Throws<InvalidInputException>(() => CoexistenceCurve.Trace(solver, 0.8 * tc, 0.7 * tc)).Field);
        Assert.Equal("from temperature", Assert.Throws<InvalidInputException>(() => CoexistenceCurve.Trace(solver, 0.8 * tc, 0.8 * tc)).Field);
    }

    [Theory]
    [InlineData(double.NaN, 300.0, "from temperature")]
    [InlineData(-1.0, 300.0, "from temperature")]
    [InlineData(200.0, double.NaN, "to temperature")]
    [InlineData(200.0, 0.0, "to temperature")]
    public void Trace_NotAFinitePositiveTemperature_ThrowsNamingIt(double from, double to, string field)
    {
        var ex = Assert.Throws<InvalidInputException>(() => CoexistenceCurve.Trace(Solver(), from, to));

        Assert.Equal(field, ex.Field);
    }

    [Fact]
    public void Trace_StartBelowMinimumTemperature_ThrowsInvalidInput()
    {
        var solver = Solver();

        var ex = Assert.Throws<InvalidInputException>(() => CoexistenceCurve.Trace(solver, 0.5 * solver.MinimumTemperature, 300));

        Assert.Equal(0.5 * solver.MinimumTemperature, ex.Value);
    }

    [Fact]
    public void Trace_NullSolver_Throws()
    {
        Assert.Throws<ArgumentNullException>(() => CoexistenceCurve.Trace(null!));
    }
}
