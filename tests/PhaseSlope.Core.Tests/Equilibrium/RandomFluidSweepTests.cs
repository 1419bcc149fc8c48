using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;
using Xunit.Abstractions;

namespace PhaseSlope.Core.Tests.Equilibrium;

/// <summary>A seeded sweep of random (invented) fluids through every model: coexistence must
/// converge everywhere from 0.3·Tc to 1 − 1e-9 of Tc, with the equal-fugacity residual below the
/// solver's tolerance and Tsat(Psat(T)) = T.</summary>
public class RandomFluidSweepTests(ITestOutputHelper output)
{
    private static readonly CubicModelKind[] Kinds =
    [
        CubicModelKind.PengRobinson, CubicModelKind.PengRobinson1978, CubicModelKind.SoaveRedlichKwong,
        CubicModelKind.RedlichKwong, CubicModelKind.VanDerWaals,
    ];

    [Fact]
    public void HundredThousandRandomFluids_AllConverge()
    {
        // Tc 5–1000 K and Pc 0.1–100 MPa log-uniform, ω −0.4…1.6 uniform, every model, and the
        // generalised Twu alpha for a third of the Peng–Robinson cases. T uniform in
        // [0.3 Tc, 0.999 Tc] for 80 % of the cases, else 10^(−3…−9) below Tc. Seed fixed, so a
        // failure is reproducible. Psat spans about 1e-16 Pa to Pc (docs/validation.md prints the lowest).
        const int cases = 100_000;
        var sweep = Sweep(cases);
        var failures = sweep.Failures;
        double worstResidual = sweep.WorstResidual, worstRoundTrip = sweep.WorstRoundTrip;
        output.WriteLine($"{cases} random fluids: {failures.Count} failures, worst |ln phiL - ln phiV| {worstResidual:E2}, worst |Tsat(Psat(T))/T - 1| {worstRoundTrip:E2}");
        Assert.True(failures.Count == 0, string.Join(Environment.NewLine, failures.Take(10)));
        // The solver's fugacity tolerance (CoexistenceOptions default).
        Assert.True(worstResidual <= 1e-12, $"worst residual {worstResidual}");
        // d ln P/d ln T is at most ~60 here, so 1e-14 relative in Psat is ~1e-15 in T; the
        // near-critical states carry up to ~1e-10 relative density uncertainty, which moves T by
        // far less: 1e-11 bounds the round trip.
        Assert.True(worstRoundTrip <= 1e-11, $"worst round trip {worstRoundTrip}");
    }

    /// <summary>What the seeded sweep found (also printed on docs/validation.md by the generator).</summary>
    /// <param name="Failures">One line per state that did not converge.</param>
    /// <param name="WorstResidual">Worst |ln φL − ln φV|.</param>
    /// <param name="WorstRoundTrip">Worst |Tsat(Psat(T))/T − 1|.</param>
    /// <param name="LowestPressure">The lowest saturation pressure reached, Pa.</param>
    public sealed record SweepResult(IReadOnlyList<string> Failures, double WorstResidual, double WorstRoundTrip, double LowestPressure);

    /// <summary>The sweep: Tc 5–1000 K and Pc 0.1–100 MPa log-uniform, ω −0.4…1.6 uniform, every
    /// model, and the generalised Twu alpha for a third of the Peng–Robinson cases; T uniform in
    /// [0.3 Tc, 0.999 Tc] for 80 % of the cases, else 10^(−3…−9) below Tc. Seed fixed, so a
    /// failure is reproducible.</summary>
    public static SweepResult Sweep(int cases)
    {
        var random = new Random(20261202);
        double worstResidual = 0, worstRoundTrip = 0, lowestPressure = double.MaxValue;
        var failures = new List<string>();
        for (int i = 0; i < cases; i++)
        {
            double tc = 5 * Math.Pow(200, random.NextDouble());
            double pc = 1e5 * Math.Pow(1000, random.NextDouble());
            double omega = -0.4 + 2.0 * random.NextDouble();
            var kind = Kinds[random.Next(Kinds.Length)];
            bool twu = kind == CubicModelKind.PengRobinson && random.Next(3) == 0;
            var model = twu
                ? new CubicModel(kind, CubicForm.PengRobinson, new GeneralisedTwuAlpha(omega, tc), tc, pc)
                : CubicModel.For(kind, tc, pc, omega);
            var solver = new CoexistenceSolver(model, 0.3 * tc);
            double t = random.NextDouble() < 0.8
                ? 0.3 * tc + (0.999 * tc - 0.3 * tc) * random.NextDouble()
                : tc * (1 - Math.Pow(10, -3 - 6 * random.NextDouble()));
            try
            {
                var point = solver.AtTemperature(t);
                worstResidual = Math.Max(worstResidual, point.Report.FugacityResidual);
                lowestPressure = Math.Min(lowestPressure, point.Pressure);
                var back = solver.AtPressure(point.Pressure);
                worstRoundTrip = Math.Max(worstRoundTrip, Math.Abs(back.Temperature / t - 1));
            }
            catch (PhaseSlopeException ex)
            {
                failures.Add($"Tc {tc:R} K, Pc {pc:R} Pa, omega {omega:R}, {kind}{(twu ? " + Twu" : "")}, T/Tc {t / tc:R}: {ex.Message}");
            }
        }

        return new SweepResult(failures, worstResidual, worstRoundTrip, lowestPressure);
    }
}
