using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Properties.StateVariable;

namespace PhaseSlope.Core.Tests.Properties;

/// <summary>The saturated phases of <see cref="PropertyModel.Coexistence"/>: latent heats from
/// the absolute caloric properties against the Clapeyron equation, and the along-line slopes
/// against differences of the solver's own outputs.</summary>
public class CoexistencePropertiesTests(ITestOutputHelper output)
{
    public static TheoryData<string, CubicModelKind, AlphaForm> Engines => new()
    {
        { "propane", CubicModelKind.PengRobinson, AlphaForm.Default },
        { "water", CubicModelKind.SoaveRedlichKwong, AlphaForm.Default },
        { "ethanol", CubicModelKind.PengRobinson1978, AlphaForm.Default },
        { "toluene", CubicModelKind.PengRobinson, AlphaForm.Twu },
        { "nitrogen", CubicModelKind.RedlichKwong, AlphaForm.Default },
        { "carbon-dioxide", CubicModelKind.VanDerWaals, AlphaForm.Default },
    };

    private static readonly double[] ReducedTemperatures = [0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 0.95, 0.98, 0.99];

    /// <summary>The reduced temperatures of the list in [lo, hi] that the solver accepts (water's
    /// triple point is at T/Tc = 0.42, carbon dioxide's at 0.71, nitrogen's at 0.50).</summary>
    private static IEnumerable<double> Temperatures(PropertyModel engine, double lo, double hi)
        => ReducedTemperatures.Where(r => r >= lo && r <= hi)
            .Select(r => r * engine.Solver.CriticalTemperature)
            .Where(t => t >= engine.Solver.MinimumTemperature);

    [Theory]
    [MemberData(nameof(Engines))]
    public void LatentHeats_FromCaloricProperties_EqualClapeyron(string fluid, CubicModelKind kind, AlphaForm alpha)
    {
        // Clapeyron (any thermodynamics text): Δh = T·Δv·dPsat/dT and Δs = Δh/T = Δv·dPsat/dT;
        // also Δu = Δh − P·Δv. Here h_V − h_L comes from the absolute enthalpies (ideal part,
        // offsets and all) and the slope from the solver. The absolute h are at most ~10 times Δh
        // (near Tc, where Δh shrinks), so their rounding leaves ~1e-14 relative; the equilibrium
        // itself (Δg = 0 to the solver's fugacity residual ~1e-15) enters Δs = Δh/T at
        // RT·1e-15/Δh: 1e-9 allows for both with a wide margin.
        var engine = TestSupport.Engines.For(fluid, kind, alpha);
        double worst = 0;
        foreach (double t in Temperatures(engine, 0.4, 0.99))
        {
            var point = engine.Solver.AtTemperature(t);
            var c = engine.Coexistence(point);
            double dv = c.Vapour.State.MolarVolume - c.Liquid.State.MolarVolume;
            double clapeyron = t * dv * point.Slope;
            string at = $"{fluid} {kind} at {t / engine.Solver.CriticalTemperature:F2} Tc";
            AssertClose.Relative(clapeyron, c.EnthalpyOfVaporization, 1e-9, $"h_V - h_L = T dv dPsat/dT, {at}");
            AssertClose.Relative(point.EnthalpyOfVaporization, c.EnthalpyOfVaporization, 1e-9, $"h_V - h_L = solver dh, {at}");
            AssertClose.Relative(dv * point.Slope, c.EntropyOfVaporization, 1e-9, $"s_V - s_L = dv dPsat/dT, {at}");
            AssertClose.Relative(c.EnthalpyOfVaporization / t, c.EntropyOfVaporization, 1e-9, $"s_V - s_L = dh/T, {at}");
            AssertClose.Relative(c.EnthalpyOfVaporization - point.Pressure * dv, c.Vapour.State.InternalEnergy!.Value - c.Liquid.State.InternalEnergy!.Value, 1e-9, $"u_V - u_L, {at}");
            worst = Math.Max(worst, Math.Max(
                AssertClose.RelativeDifference(clapeyron, c.EnthalpyOfVaporization),
                AssertClose.RelativeDifference(dv * point.Slope, c.EntropyOfVaporization)));
        }

        output.WriteLine($"{fluid} {kind}: worst relative deviation from Clapeyron {worst:E2}");
    }

    /// <summary>Truncation part of the tolerance of the along-line differences: the step is 1e-4·T,
    /// at most 1/500 of the distance Tc − T that sets the scale of variation up to 0.95·Tc, so the
    /// five-point truncation error is ~(1/500)⁴ ≈ 2e-11 relative; 1e-8 allows a factor 500.</summary>
    private const double TruncationTolerance = 1e-8;

    /// <summary>Relative error of one solver output (densities, pressure): the pressure iteration
    /// stops at 1e-14 in ln P, and the roots are then exact to rounding.</summary>
    private const double SolverRelativeError = 1e-13;

    [Theory]
    [MemberData(nameof(Engines))]
    public void AlongLineSlopes_EqualCentralDifferencesOfSolverOutputs(string fluid, CubicModelKind kind, AlphaForm alpha)
    {
        var engine = TestSupport.Engines.For(fluid, kind, alpha);
        double worst = 0;
        foreach (double t in Temperatures(engine, 0.5, 0.95))
        {
            var c = engine.Coexistence(engine.Solver.AtTemperature(t));
            double step = 1e-4 * t;
            var near = new Dictionary<double, CoexistenceProperties>();
            CoexistenceProperties At(double tt) => near.TryGetValue(tt, out var known) ? known : near[tt] = engine.Coexistence(engine.Solver.AtTemperature(tt));
            double slope = c.Point.Slope;
            foreach (var (name, select) in new (string, Func<CoexistenceProperties, SaturatedPhase>)[] { ("liquid", x => x.Liquid), ("vapour", x => x.Vapour) })
            {
                var phase = select(c);
                var s = phase.State;
                // Each along-line slope is (∂X/∂T)_P + (∂X/∂P)_T·dPsat/dT: the tolerance is relative
                // to the larger of the two terms, since the sum can pass through zero (the vapour's
                // ds/dT of a dry fluid).
                double Scale(StateVariable x) => Math.Abs(PartialDerivatives.Of(s, x, T, P)) + Math.Abs(PartialDerivatives.Of(s, x, P, T) * slope);
                var checks = new (string What, double Exact, double Scale, Func<ThermodynamicState, double> Value, double ValueScale)[]
                {
                    ("drho/dT", phase.DensitySlope!.Value, s.Density * s.Density * Scale(V), x => x.Density, s.Density),
                    ("dh/dT", phase.EnthalpySlope!.Value, Scale(H), x => x.Enthalpy!.Value, Math.Abs(s.Enthalpy!.Value) + Math.Abs(c.EnthalpyOfVaporization)),
                    ("ds/dT", phase.EntropySlope!.Value, Scale(S), x => x.Entropy!.Value, Math.Abs(s.Entropy!.Value) + Math.Abs(c.EntropyOfVaporization)),
                    ("du/dT", phase.InternalEnergySlope!.Value, Scale(U), x => x.InternalEnergy!.Value, Math.Abs(s.InternalEnergy!.Value) + Math.Abs(c.EnthalpyOfVaporization)),
                };
                foreach (var check in checks)
                {
                    double difference = FiniteDifference.Central5(tt => check.Value(select(At(tt)).State), t, step);
                    // Rounding: 1.5·(error of one evaluation)/δ, the evaluation error being the
                    // solver's relative error times the size of the value (h, s, u carry the jump
                    // Δh, Δs as their sensitivity to which root is found).
                    double tolerance = TruncationTolerance * check.Scale + 1.5 * SolverRelativeError * check.ValueScale / step;
                    string what = $"{fluid} {kind} {name} {check.What} at {t / engine.Solver.CriticalTemperature:F2} Tc";
                    AssertClose.Absolute(check.Exact, difference, tolerance, what);
                    worst = Math.Max(worst, Math.Abs(difference - check.Exact) / check.Scale);
                }
            }

            Assert.Equal(c.Vapour.SaturationHeatCapacity!.Value, t * c.Vapour.EntropySlope!.Value);
        }

        output.WriteLine($"{fluid} {kind}: worst deviation of along-line slopes from differences {worst:E2} (relative to term size)");
    }
}
