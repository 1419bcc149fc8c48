using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Mixtures;

/// <summary>The Rachford–Rice solver against roots worked by hand.</summary>
public sealed class RachfordRiceTests
{
    [Fact]
    public void Solve_BinaryInsideTheSplit_GivesTheHandRoot()
    {
        // z = (0.5, 0.5), K = (2, 0.5): 0.5/(1 + β) = 0.25/(1 − 0.5β) gives β = 1/2 exactly
        // (worked by hand). Tolerance 1e-15: the solver stops at rounding of β.
        var root = RachfordRice.Solve([0.5, 0.5], [2.0, 0.5]);
        Assert.True(root.IsTwoPhase);
        AssertClose.Absolute(0.5, root.VapourFraction, 1e-15, "vapour fraction");
        Assert.True(root.Residual < 1e-15, $"residual {root.Residual}");
    }

    [Fact]
    public void Solve_OnePhaseFeed_ReportsSinglePhaseOrTheNegativeFlashRoot()
    {
        // z = (0.2, 0.8), K = (2, 0.5): 0.2(1 − 0.5β) = 0.4(1 + β) gives β = −0.4 (by hand), inside
        // the asymptotes (1/(1 − 2), 1/(1 − 0.5)) = (−1, 2): a liquid at these K-values.
        var single = RachfordRice.Solve([0.2, 0.8], [2.0, 0.5]);
        Assert.False(single.IsTwoPhase);
        Assert.Equal(0, single.VapourFraction);
        var negative = RachfordRice.Solve([0.2, 0.8], [2.0, 0.5], negativeFlash: true);
        Assert.False(negative.IsTwoPhase);
        AssertClose.Absolute(-0.4, negative.VapourFraction, 1e-15, "negative-flash vapour fraction");
        // Vapour side: z = (0.8, 0.2) gives 0.8(1 − 0.5β) = 0.1(1 + β), β = 1.4 (by hand).
        var vapour = RachfordRice.Solve([0.8, 0.2], [2.0, 0.5], negativeFlash: true);
        AssertClose.Absolute(1.4, vapour.VapourFraction, 1e-14, "negative-flash vapour fraction above 1");
        Assert.Equal(1, RachfordRice.Solve([0.8, 0.2], [2.0, 0.5]).VapourFraction);
    }

    [Fact]
    public void Solve_NearAnAsymptote_StaysInsideTheBracket()
    {
        // A wide K range (1e4 to 1e-4) puts the root close to the asymptote β = 1/(1 − K_max);
        // an unguarded Newton step from β = 0.5 would leave it. g(β) must vanish at the root
        // (to 1e-12 of its scale Σ z|K − 1| ~ 1e3).
        double[] z = [0.001, 0.499, 0.5];
        double[] k = [1e4, 0.9, 1e-4];
        var root = RachfordRice.Solve(z, k, negativeFlash: true);
        double g = 0;
        for (int i = 0; i < z.Length; i++)
        {
            g += z[i] * (k[i] - 1) / (1 + root.VapourFraction * (k[i] - 1));
        }

        Assert.True(Math.Abs(g) < 1e-9, $"g = {g} at beta = {root.VapourFraction}");
        Assert.True(root.VapourFraction > 1 / (1 - 1e4) && root.VapourFraction < 1 / (1 - 1e-4));
    }

    [Fact]
    public void Solve_AllKOnOneSide_IsRefusedForANegativeFlash()
    {
        Assert.Throws<InvalidInputException>(() => RachfordRice.Solve([0.5, 0.5], [2.0, 3.0], negativeFlash: true));
        Assert.Throws<InvalidInputException>(() => RachfordRice.Solve([0.5, 0.5], [2.0, double.NaN]));
    }
}
