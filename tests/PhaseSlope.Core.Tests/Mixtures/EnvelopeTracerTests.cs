using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The phase-envelope tracer (Michelsen 1980 style) against the pure saturation curve,
/// the Heidemann–Khalil critical point, an independent tangent-plane stability test and the
/// geometry of its own curve.</summary>
public sealed class EnvelopeTracerTests
{
    /// <summary>A lean natural gas, invented for these tests (mole fractions; typical of a
    /// pipeline gas, not a sourced analysis).</summary>
    internal static readonly string[] GasNames = ["methane", "ethane", "propane", "n-butane", "nitrogen", "carbon-dioxide"];

    internal static readonly double[] GasComposition = [0.85, 0.06, 0.03, 0.02, 0.02, 0.02];

    internal static CubicMixtureModel Mixture(params string[] names)
        => new(names.Select(n => CubicModel.For(CubicModelKind.PengRobinson, FluidCatalog.Embedded.Find(n))).ToList());

    [Fact]
    public void PureLimit_EqualsThePureSaturationCurve()
    {
        // Methane with ethane at zero amount: the feed is pure methane, ln K(methane) = 0 and the
        // envelope is methane's saturation curve (ethane's ln K is its infinite-dilution value).
        // Newton stops at 1e-10 in ln P and the pure solver at 1e-13: 1e-8 relative is the bound.
        // The pure limit is degenerate at the critical point itself (the equations' Jacobian is
        // singular there), so the points below 0.99 Tc are compared.
        var model = Mixture("methane", "ethane");
        var envelope = new EnvelopeTracer(model).Trace([1.0, 0.0]);
        var pure = new CoexistenceSolver(model.Components[0], 0.5 * model.Components[0].CriticalTemperature);
        var compared = envelope.Points.Where(p => p.Temperature < 0.99 * pure.CriticalTemperature).ToList();
        Assert.True(compared.Count > 20, $"only {compared.Count} points below 0.99 Tc");
        foreach (var point in compared)
        {
            Assert.Equal(EnvelopeBranch.Bubble, point.Branch);
            AssertClose.Relative(pure.AtTemperature(point.Temperature).Pressure, point.Pressure, 1e-8, $"saturation pressure at {point.Temperature} K");
            AssertClose.Absolute(1.0, point.IncipientComposition[0], 1e-12, "incipient phase is pure methane");
        }
    }

    public static TheoryData<string[], double[]> Feeds() => new()
    {
        { ["methane", "ethane"], [0.5, 0.5] },
        { ["methane", "ethane"], [0.8, 0.2] },
        { ["carbon-dioxide", "n-butane"], [0.6, 0.4] },
        { GasNames, GasComposition },
    };

    public static TheoryData<string[], double[]> AllFeeds()
    {
        var all = Feeds();
        all.Add(["propane", "n-butane"], [0.5, 0.5]); // close-boiling: both extrema lie beside the critical point
        return all;
    }

    [Theory]
    [MemberData(nameof(AllFeeds))]
    public void CriticalPoint_EqualsHeidemannKhalil(string[] names, double[] composition)
    {
        // Two independent routes to the same point of the same model: the crossing of ln K through
        // zero, interpolated (cubic Hermite in ln K) between points at ln K = ±0.02, and the
        // Heidemann–Khalil criteria solved to 1e-12. The Hermite error is of order
        // (Δ ln K)⁴·f''''/384 with Δ ln K = 0.04, 1e-7 to 1e-6 for the curvatures met here
        // (measured: ≤ 2.2e-6 in P and ≤ 2.4e-7 in T, the largest for the close-boiling pair, whose
        // ln K are small everywhere); 1e-5 relative leaves room and still fails for any wrong
        // criterion or crossing (those miss by percent).
        var model = Mixture(names);
        var envelope = new EnvelopeTracer(model).Trace(composition);
        Assert.Equal(EnvelopeStop.EndPressure, envelope.StopReason);
        var critical = Assert.IsType<EnvelopeLandmark>(envelope.CriticalPoint);
        var criteria = CriticalPointCriteria.Locate(model, composition);
        var nearest = criteria.MinBy(c => Math.Abs(c.Temperature - critical.Temperature));
        AssertClose.Relative(nearest.Temperature, critical.Temperature, 1e-5, "critical temperature");
        AssertClose.Relative(nearest.Pressure, critical.Pressure, 1e-5, "critical pressure");
        // The branches meet there: the last bubble and the first dew point straddle it.
        Assert.Contains(envelope.Points, p => p.Branch == EnvelopeBranch.Dew);
        Assert.True(envelope.Points.SkipWhile(p => p.Branch == EnvelopeBranch.Bubble).All(p => p.Branch == EnvelopeBranch.Dew), "one bubble branch, then one dew branch");
    }

    [Theory]
    [MemberData(nameof(Feeds))]
    public void Extrema_AreTheHighestPressureAndTemperatureOfADenseTrace(string[] names, double[] composition)
    {
        // The located cricondenbar and cricondentherm are maxima of the curve: no point of a trace
        // five times denser lies above them (beyond 1e-9, the Newton tolerance), and the densest
        // points come within 1e-4 of them (a parabola top between points 0.02 apart in ln T or
        // ln P is missed by at most (0.01)²/2 relative).
        var model = Mixture(names);
        var envelope = new EnvelopeTracer(model).Trace(composition);
        var dense = new EnvelopeTracer(model, EnvelopeOptions.Default with { MaximumStep = 0.02 }).Trace(composition);
        var bar = Assert.IsType<EnvelopeLandmark>(envelope.Cricondenbar);
        var therm = Assert.IsType<EnvelopeLandmark>(envelope.Cricondentherm);
        double highestP = dense.Points.Max(p => p.Pressure), highestT = dense.Points.Max(p => p.Temperature);
        Assert.True(highestP <= bar.Pressure * (1 + 1e-9), $"a traced point at {highestP} Pa lies above the cricondenbar {bar.Pressure} Pa");
        Assert.True(highestT <= therm.Temperature * (1 + 1e-9), $"a traced point at {highestT} K lies above the cricondentherm {therm.Temperature} K");
        AssertClose.Relative(bar.Pressure, highestP, 1e-4, "cricondenbar against the densest trace");
        AssertClose.Relative(therm.Temperature, highestT, 1e-4, "cricondentherm against the densest trace");
        var critical = envelope.CriticalPoint!.Value;
        Assert.True(bar.Pressure >= critical.Pressure && therm.Temperature >= critical.Temperature, "the critical point lies inside the box of the extrema");
    }

    [Fact]
    public void CloseBoiling_ExtremaBesideTheCriticalPoint()
    {
        // Propane + n-butane (equimolar): the envelope is a narrow loop and both extrema lie between
        // the last bubble and the first dew point (ln K = ±0.02), where they are interpolated (cubic
        // Hermite in ln K, as the critical point). They are the highest pressure and temperature of
        // the envelope (no traced point above, beyond the 1e-9 Newton tolerance), above the critical
        // point, and within the gap: less than 1 % above the critical pressure and temperature (the
        // straddling points lie 0.4 % below in pressure).
        var model = Mixture("propane", "n-butane");
        var envelope = new EnvelopeTracer(model).Trace([0.5, 0.5]);
        var critical = envelope.CriticalPoint!.Value;
        var bar = envelope.Cricondenbar!.Value;
        var therm = envelope.Cricondentherm!.Value;
        Assert.True(envelope.Points.All(p => p.Pressure <= bar.Pressure * (1 + 1e-9)), "a traced point above the cricondenbar");
        Assert.True(envelope.Points.All(p => p.Temperature <= therm.Temperature * (1 + 1e-9)), "a traced point above the cricondentherm");
        AssertClose.InRange(critical.Pressure, critical.Pressure * 1.01, bar.Pressure, "cricondenbar pressure");
        AssertClose.InRange(critical.Temperature, critical.Temperature * 1.01, therm.Temperature, "cricondentherm temperature");
    }

    [Fact]
    public void NaturalGas_LandmarksAreSensible()
    {
        // The invented lean gas above. Common practice (gas-processing handbooks): a lean gas has its
        // critical point at the low-temperature end of the envelope, left of the cricondenbar, and
        // its cricondentherm on the dew branch (retrograde condensation between the critical point
        // and the cricondentherm); with 2 % n-butane and 3 % propane the cricondentherm lies between
        // −40 °C and +10 °C and the cricondenbar between 6 and 12 MPa (ranges, not values).
        var model = Mixture(GasNames);
        var envelope = new EnvelopeTracer(model).Trace(GasComposition);
        var critical = envelope.CriticalPoint!.Value;
        var bar = envelope.Cricondenbar!.Value;
        var therm = envelope.Cricondentherm!.Value;
        Assert.Equal(EnvelopeBranch.Dew, therm.Branch);
        Assert.Equal(EnvelopeBranch.Dew, bar.Branch);
        Assert.True(critical.Temperature < bar.Temperature && bar.Temperature < therm.Temperature, "critical point, cricondenbar, cricondentherm in order of temperature");
        AssertClose.InRange(233.15, 283.15, therm.Temperature, "cricondentherm");
        AssertClose.InRange(6e6, 12e6, bar.Pressure, "cricondenbar");
        // The incipient dew phase near the cricondentherm is rich in the heavy ends: its n-butane
        // fraction exceeds the feed's (component 3).
        var dew = envelope.DewPoints.MaxBy(p => p.Temperature)!;
        Assert.True(dew.IncipientComposition[3] > GasComposition[3], "incipient liquid richer in n-butane than the feed");
    }

    public static TheoryData<string[], double[], int> StabilityCases() => new()
    {
        { ["methane", "ethane"], [0.5, 0.5], 0 },
        { GasNames, GasComposition, 0 },
    };

    [Theory]
    [MemberData(nameof(StabilityCases))]
    public void Envelope_IsWhereTheFeedTurnsUnstable(string[] names, double[] composition, int unused)
    {
        _ = unused;
        // An independent check by the tangent-plane distance (Michelsen, Fluid Phase Equilib. 9, 1
        // (1982)): at the temperature of an envelope point, the feed is unstable 0.5 % of the
        // pressure inside the envelope (a trial phase with tm < 0) and stable 0.5 % outside (every
        // trial returns to the feed, tm ≥ 0 to rounding). Low-pressure points only (below 2 MPa),
        // where "inside" is below a bubble point and above a dew point.
        var model = Mixture(names);
        var envelope = new EnvelopeTracer(model).Trace(composition);
        var checkedPoints = envelope.Points.Where(p => p.Pressure < 2e6).Where((_, i) => i % 4 == 0).ToList();
        Assert.Contains(checkedPoints, p => p.Branch == EnvelopeBranch.Bubble);
        Assert.Contains(checkedPoints, p => p.Branch == EnvelopeBranch.Dew);
        foreach (var point in checkedPoints)
        {
            double inside = point.Branch == EnvelopeBranch.Bubble ? 0.995 : 1.005;
            double outside = point.Branch == EnvelopeBranch.Bubble ? 1.005 : 0.995;
            double tmInside = TangentPlane.Minimum(model, point.Temperature, point.Pressure * inside, composition);
            double tmOutside = TangentPlane.Minimum(model, point.Temperature, point.Pressure * outside, composition);
            Assert.True(tmInside < -1e-6, $"{point.Branch} point {point.Temperature} K: feed should be unstable inside, tm = {tmInside}");
            Assert.True(tmOutside > -1e-9, $"{point.Branch} point {point.Temperature} K: feed should be stable outside, tm = {tmOutside}");
        }
    }

    [Fact]
    public void Trace_PointsAreSolutionsOfTheEquilibriumEquations()
    {
        // Every point satisfies equal fugacities between the feed and its incipient phase:
        // ln(y_i φ_i(y)) = ln(z_i φ_i(z)) to 1e-9 (Newton tolerance 1e-10 in ln K, ln T, ln P, times
        // the Jacobian's entries of order 1–10) and Σ y_i = 1.
        var model = Mixture(GasNames);
        var envelope = new EnvelopeTracer(model).Trace(GasComposition);
        var feed = new double[6];
        var incipient = new double[6];
        foreach (var point in envelope.Points)
        {
            var y = point.IncipientComposition.ToArray();
            bool bubble = point.Branch == EnvelopeBranch.Bubble;
            model.LnFugacityCoefficientsAtPressure(point.Temperature, point.Pressure, GasComposition, MixtureRoot.Stable, feed);
            model.LnFugacityCoefficientsAtPressure(point.Temperature, point.Pressure, y, MixtureRoot.Stable, incipient);
            for (int i = 0; i < 6; i++)
            {
                AssertClose.Absolute(Math.Log(GasComposition[i]) + feed[i], Math.Log(y[i]) + incipient[i], 1e-9, $"ln fugacity of {GasNames[i]} at {point.Temperature} K ({(bubble ? "bubble" : "dew")})");
            }
        }
    }

    [Fact]
    public void PointLimit_StopsWithItsReasonAndNoLandmarks()
    {
        // Ten points of the equimolar methane-ethane bubble line (about 1 MPa at most): the trace
        // says why it stopped, and gives no critical point, cricondenbar or cricondentherm that
        // it did not reach (null, not a value from the traced part).
        var model = Mixture("methane", "ethane");
        var envelope = new EnvelopeTracer(model, EnvelopeOptions.Default with { MaximumPoints = 10 }).Trace([0.5, 0.5]);
        Assert.Equal(EnvelopeStop.PointLimit, envelope.StopReason);
        Assert.Equal(10, envelope.Points.Count);
        Assert.All(envelope.Points, p => Assert.Equal(EnvelopeBranch.Bubble, p.Branch));
        Assert.Null(envelope.CriticalPoint);
        Assert.Null(envelope.Cricondenbar);
        Assert.Null(envelope.Cricondentherm);
        Assert.True(envelope.Points.Zip(envelope.Points.Skip(1)).All(p => p.Second.Pressure > p.First.Pressure), "the bubble line rises from the start pressure");
    }

    [Fact]
    public void BadInput_IsRefused()
    {
        var model = Mixture("methane", "ethane");
        Assert.Throws<InvalidInputException>(() => new EnvelopeTracer(model).Trace([0.5, 0.3, 0.2]));
        Assert.Throws<InvalidInputException>(() => new EnvelopeTracer(model).Trace([0.5, -0.5]));
        Assert.Throws<InvalidInputException>(() => new EnvelopeTracer(Mixture("methane")));
        Assert.Throws<InvalidInputException>(() => new EnvelopeTracer(model, EnvelopeOptions.Default with { MaximumStep = double.NaN }));
    }
}
