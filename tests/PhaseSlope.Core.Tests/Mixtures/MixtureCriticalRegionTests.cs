using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Mixtures.MixtureTestSystems;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The P–T flash of the invented 10-component gas (k_ij = 0) near its envelope and its
/// critical point, where the stability test's Newton stalled at an indefinite Hessian (a shallow
/// minimum of tm merging with a saddle just outside the envelope) and the split's Newton fell
/// back to crawling substitution steps (G nearly flat near the critical point). Every state is
/// checked against the defining equations recomputed here from the model, not against stored
/// numbers.</summary>
public sealed class MixtureCriticalRegionTests
{
    /// <summary>tm of a single phase may be as low as −1e-10 (<see cref="StabilityAnalysis.NegativeDistance"/>):
    /// the stationary points are converged to a gradient of 1e-10 in α, so tm is resolved to about
    /// that, and a split whose Gibbs energy lies within 1e-10 RT of the single phase is below what
    /// the test can tell apart from it.</summary>
    private const double TmTolerance = StabilityAnalysis.NegativeDistance;

    /// <summary>The 13 states (of a 1 K × 0.05 MPa grid) that failed with ConvergenceException before
    /// the restricted-step Newton: 8 in the stability test (207 K to 232 K, just above the
    /// envelope), 5 in the split (within about 1 % of the critical point).</summary>
    [Theory]
    [InlineData(207, 6.05)]
    [InlineData(216, 7.10)]
    [InlineData(218, 7.35)]
    [InlineData(220, 7.60)]
    [InlineData(222, 7.85)]
    [InlineData(224, 8.10)]
    [InlineData(229, 8.70)]
    [InlineData(232, 9.05)]
    [InlineData(239, 9.70)]
    [InlineData(240, 9.75)]
    [InlineData(242, 9.90)]
    [InlineData(242, 9.95)]
    [InlineData(243, 9.95)]
    public void Flash_StatesThatFailedBefore_Converge(double temperature, double megapascals)
    {
        var engine = Engine(0, NaturalGasNames);
        double pressure = megapascals * 1e6;
        var flash = engine.Flash(temperature, pressure, NaturalGas);
        Check(engine, flash, independentStability: true);
    }

    /// <summary>The whole 12,221-state grid, T 150 to 250 K by 1 K and P 4.5 to 10.5 MPa by
    /// 0.05 MPa (the dense part of the envelope, its cricondenbar and its critical point at
    /// about 241 K and 9.98 MPa): every state converges and passes the checks.</summary>
    [Fact]
    public void Flash_FineGridAcrossTheCriticalRegion_ConvergesEverywhere()
    {
        var engine = Engine(0, NaturalGasNames);
        int splits = 0;
        var failures = new List<string>();
        for (int a = 0; a <= 100; a++)
        {
            for (int b = 0; b <= 120; b++)
            {
                double t = 150 + a, p = 4.5e6 + 0.05e6 * b;
                try
                {
                    var flash = engine.Flash(t, p, NaturalGas);
                    Check(engine, flash, independentStability: false);
                    splits += flash.IsTwoPhase ? 1 : 0;
                }
                catch (ConvergenceException e)
                {
                    failures.Add($"{t} K, {p} Pa: {e.Message}");
                }
            }
        }

        Assert.True(failures.Count == 0, $"{failures.Count} failures:\n" + string.Join("\n", failures.Take(20)));
        // The grid holds a large part of the two-phase region (the envelope's bubble and dew
        // branches cross it), so a solver that never split would fail here.
        Assert.True(splits > 1000, $"{splits} two-phase states");
    }

    /// <summary>States at relative offsets 1e-3, 1e-4 and 1e-5 in T and P around the mixture critical
    /// point of <see cref="CriticalPointCriteria"/> (about 241.0 K and 9.985 MPa). All converge. Closer
    /// than about 1e-5 the split, where there is one, has tm above −1e-10 RT (the resolution of the
    /// stability test) and the flash reports the single phase, which the checks accept as stable to
    /// that resolution (measured: at T_c(1 + 1e-5) and P_c the split is resolved with
    /// ΔG = −1.4e-10 RT; at T_c(1 + 1e-6) the lowest tm is −2e-12 and the flash gives one phase).</summary>
    [Theory]
    [InlineData(1e-3)]
    [InlineData(1e-4)]
    [InlineData(1e-5)]
    [InlineData(1e-6)]
    public void Flash_AroundTheCriticalPoint_ConvergesAndPassesTheChecks(double offset)
    {
        var engine = Engine(0, NaturalGasNames);
        var critical = Assert.Single(CriticalPointCriteria.Locate(engine.Model, NaturalGas));
        foreach (int dt in new[] { -1, 0, 1 })
        {
            foreach (int dp in new[] { -1, 0, 1 })
            {
                var flash = engine.Flash(critical.Temperature * (1 + dt * offset), critical.Pressure * (1 + dp * offset), NaturalGas);
                Check(engine, flash, independentStability: true);
            }
        }

        if (offset >= 1e-4)
        {
            // Above T_c (the gas's critical point lies on the bubble side, retrograde region above it)
            // the state at P_c(1 − offset) is two-phase: the flash must resolve it, not call it one phase.
            var inside = engine.Flash(critical.Temperature * (1 + offset), critical.Pressure * (1 - offset), NaturalGas);
            Assert.True(inside.IsTwoPhase, $"offset {offset}: two phases expected, tm {inside.Stability.TangentPlaneDistance}");
        }
    }

    /// <summary>A single phase must be stable (its own test's lowest tm ≥ −tolerance, and with
    /// <paramref name="independentStability"/> also the test-side substitution of
    /// <see cref="TangentPlane"/>); a split must close the material balance to 1e-12, have equal
    /// fugacities to 1e-8 in ln f and a lower Gibbs energy than the feed, each recomputed here.</summary>
    private static void Check(MixtureEquilibrium engine, MixtureFlashResult flash, bool independentStability)
    {
        double t = flash.Temperature, p = flash.Pressure;
        var z = NaturalGas;
        int n = z.Length;
        string at = $"{t} K, {p} Pa";
        if (!flash.IsTwoPhase)
        {
            Assert.True(flash.Stability.IsStable, $"{at}: one phase must be a stable one");
            Assert.True(flash.Stability.TangentPlaneDistance >= -TmTolerance, $"{at}: tm {flash.Stability.TangentPlaneDistance}");
            if (independentStability)
            {
                // tm below −tolerance at any trial composition would prove the feed unstable.
                double tm = TangentPlane.Minimum(engine.Model, t, p, z);
                Assert.True(tm >= -TmTolerance, $"{at}: the test-side trial found tm {tm}");
            }

            return;
        }

        var x = flash.Liquid!.MoleFractions.ToArray();
        var y = flash.Vapour!.MoleFractions.ToArray();
        double beta = flash.VapourFraction;
        Assert.True(beta > 0 && beta < 1, $"{at}: vapour fraction {beta} of a split");
        var measured = MeasureSplit(engine, flash, z);
        // Material balance to 1e-12: the solver keeps l = z − v, so only the normalisation of the
        // two compositions rounds (a few 1e-16); 1e-12 is the requirement for every flash.
        Assert.True(measured.Balance <= 1e-12, $"{at}: material balance off by {measured.Balance}");
        // Equal fugacities to 1e-8 in ln f: the flash's acceptance bound at the rounding floor of
        // ln φ (MixtureEquilibrium.Flash; it normally stops below 1e-11).
        Assert.True(measured.Fugacity <= 1e-8, $"{at}: ln f differ by {measured.Fugacity}");
        // The split must lower G (strictly: near the critical point ΔG is of order −1e-10 RT, far
        // above the 1e-15 rounding of the sums of terms of order 1).
        Assert.True(measured.GibbsChange < 0, $"{at}: recomputed ΔG {measured.GibbsChange}");
        Assert.True(flash.GibbsEnergyChange < 0, $"{at}: reported ΔG {flash.GibbsEnergyChange}");
    }

    /// <summary>What a split is checked by: the largest material-balance error, the largest
    /// difference of ln f between the phases, and ΔG/RT of the split recomputed from the model.</summary>
    public sealed record SplitMeasure(double Balance, double Fugacity, double GibbsChange);

    /// <summary>Measures a two-phase flash result against the feed <paramref name="z"/>, each phase on
    /// the stable root of its own composition as the flash evaluates it (also used by the
    /// docs/validation.md generator).</summary>
    public static SplitMeasure MeasureSplit(MixtureEquilibrium engine, MixtureFlashResult flash, IReadOnlyList<double> z)
    {
        double t = flash.Temperature, p = flash.Pressure, beta = flash.VapourFraction;
        var x = flash.Liquid!.MoleFractions.ToArray();
        var y = flash.Vapour!.MoleFractions.ToArray();
        var feed = z.ToArray();
        int n = feed.Length;
        var lnPhiL = new double[n];
        var lnPhiV = new double[n];
        var lnPhiZ = new double[n];
        engine.Model.LnFugacityCoefficientsAtPressure(t, p, x, MixtureRoot.Stable, lnPhiL);
        engine.Model.LnFugacityCoefficientsAtPressure(t, p, y, MixtureRoot.Stable, lnPhiV);
        engine.Model.LnFugacityCoefficientsAtPressure(t, p, feed, MixtureRoot.Stable, lnPhiZ);
        double balance = 0, fugacity = 0, gibbsChange = 0;
        for (int i = 0; i < n; i++)
        {
            balance = Math.Max(balance, Math.Abs(feed[i] - ((1 - beta) * x[i] + beta * y[i])));
            fugacity = Math.Max(fugacity, Math.Abs(Math.Log(x[i]) + lnPhiL[i] - Math.Log(y[i]) - lnPhiV[i]));
            gibbsChange += (1 - beta) * x[i] * (Math.Log(x[i]) + lnPhiL[i]) + beta * y[i] * (Math.Log(y[i]) + lnPhiV[i])
                           - feed[i] * (Math.Log(feed[i]) + lnPhiZ[i]);
        }

        return new SplitMeasure(balance, fugacity, gibbsChange);
    }
}
