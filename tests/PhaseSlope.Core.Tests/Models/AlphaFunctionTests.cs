using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Models;

public class AlphaFunctionTests
{
    /// <summary>Propane's Tc in K (the catalog value); any positive Tc would do.</summary>
    private const double Tc = 369.89;

    /// <summary>Relative step of the central differences, near the optimum ε^(1/3) for a
    /// two-point first derivative.</summary>
    private const double Step = 1e-5;

    /// <summary>Error bound of the central difference relative to |f|/T + |f'|: truncation is
    /// Step²·T²·|f'''|/6 / |f'|, and T²f'''/f' is O(10) for these smooth functions of Tr, so
    /// ~1e-9; rounding is ε/Step ≈ 2e-11. 1e-7 leaves a factor 100 and still catches any wrong
    /// term, which would be off by O(1).</summary>
    private const double Tolerance = 1e-7;

    /// <summary>Reduced temperatures below and above Tc, away from Tc by more than the stencil.</summary>
    public static TheoryData<double> ReducedTemperatures() => new() { 0.3, 0.55, 0.7, 0.95, 0.999, 1.001, 1.05, 1.5, 3.0 };

    /// <summary>Test constants of the Twu form (not a published fluid set): L, M, N of the size
    /// found in fitted sets, with N ≠ 2 so no exponent is special.</summary>
    private static TwuAlpha TestTwu() => new(0.35, 0.86, 1.7, Tc, "test values");

    /// <summary>Test constants of the Mathias–Copeman form with all three terms and both signs.</summary>
    private static MathiasCopemanAlpha TestMathiasCopeman() => new(0.62, -0.35, 0.8, Tc, "test values");

    private static void CheckDerivatives(IAlphaFunction alpha, double temperature, string what)
    {
        AlphaValue a = alpha.Evaluate(temperature);
        double h = Step * temperature;
        AlphaValue plus = alpha.Evaluate(temperature + h);
        AlphaValue minus = alpha.Evaluate(temperature - h);
        double first = (plus.Value - minus.Value) / (2 * h);
        double second = (plus.FirstDerivative - minus.FirstDerivative) / (2 * h);
        AssertClose.Absolute(a.FirstDerivative, first, Tolerance * (Math.Abs(a.Value) / temperature + Math.Abs(a.FirstDerivative)), $"{what} dalpha/dT");
        AssertClose.Absolute(a.SecondDerivative, second,
            Tolerance * (Math.Abs(a.FirstDerivative) / temperature + Math.Abs(a.SecondDerivative)), $"{what} d2alpha/dT2");
        double third = (plus.SecondDerivative - minus.SecondDerivative) / (2 * h);
        AssertClose.Absolute(alpha.ThirdDerivative(temperature), third,
            Tolerance * (Math.Abs(a.SecondDerivative) / temperature + Math.Abs(alpha.ThirdDerivative(temperature))), $"{what} d3alpha/dT3");
    }

    [Theory]
    [MemberData(nameof(ReducedTemperatures))]
    public void SoaveAndInverseRoot_AnalyticDerivatives_EqualCentralDifferences(double tr)
    {
        CheckDerivatives(new SoaveAlpha(0.6, Tc, "test value"), tr * Tc, $"Soave at Tr = {tr}");
        CheckDerivatives(new InverseRootAlpha(Tc), tr * Tc, $"inverse root at Tr = {tr}");
    }

    [Theory]
    [MemberData(nameof(ReducedTemperatures))]
    public void Twu_AnalyticDerivatives_EqualCentralDifferences(double tr)
    {
        CheckDerivatives(TestTwu(), tr * Tc, $"Twu at Tr = {tr}");
    }

    [Theory]
    [MemberData(nameof(ReducedTemperatures))]
    public void GeneralisedTwu_AnalyticDerivatives_EqualCentralDifferences(double tr)
    {
        foreach (double omega in new[] { 0.0, 0.152, 0.649 })
        {
            CheckDerivatives(new GeneralisedTwuAlpha(omega, Tc), tr * Tc, $"generalised Twu omega = {omega} at Tr = {tr}");
        }
    }

    [Theory]
    [MemberData(nameof(ReducedTemperatures))]
    public void MathiasCopeman_AnalyticDerivatives_EqualCentralDifferences(double tr)
    {
        CheckDerivatives(TestMathiasCopeman(), tr * Tc, $"Mathias-Copeman at Tr = {tr}");
    }

    [Fact]
    public void Twu_Value_IsTheFormulaOfTheForm()
    {
        // α = Tr^(N(M−1))·exp[L(1 − Tr^(NM))] written out; the two differ only by rounding, a
        // few ε, so 1e-14.
        foreach (double tr in new[] { 0.4, 0.7, 1.3 })
        {
            double expected = Math.Pow(tr, 1.7 * (0.86 - 1)) * Math.Exp(0.35 * (1 - Math.Pow(tr, 1.7 * 0.86)));
            AssertClose.Relative(expected, TestTwu().Evaluate(tr * Tc).Value, 1e-14, $"Twu alpha at Tr = {tr}");
        }
    }

    [Fact]
    public void EveryAlpha_AtTc_IsExactlyOne()
    {
        // At Tr = 1 each form reduces to 1 by exact operations (1^p = 1, exp(0) = 1, x = 0), so
        // exact equality holds and is required.
        IAlphaFunction[] alphas =
        [
            TestTwu(),
            new GeneralisedTwuAlpha(0.152, Tc),
            new GeneralisedTwuAlpha(0.649, Tc),
            TestMathiasCopeman(),
            new SoaveAlpha(0.7, Tc, "test"),
            new InverseRootAlpha(Tc),
            new ConstantAlpha(),
        ];
        foreach (IAlphaFunction alpha in alphas)
        {
            Assert.Equal(1.0, alpha.Evaluate(Tc).Value);
        }
    }

    [Fact]
    public void MathiasCopeman_WithoutC2AndC3_IsSoaveBitForBit()
    {
        // The expanded second-derivative numerator reduces to c1(1 + c1) by exact operations when
        // c2 = c3 = 0, so the two classes must agree exactly, below and above Tc.
        foreach (double m in new[] { 0.3, 0.62, 1.1 })
        {
            var soave = new SoaveAlpha(m, Tc, "test");
            var mc = new MathiasCopemanAlpha(m, 0, 0, Tc, "test");
            foreach (double tr in new[] { 0.3, 0.5, 0.7, 0.9, 0.999, 1.0, 1.2, 2.0 })
            {
                Assert.Equal(soave.Evaluate(tr * Tc), mc.Evaluate(tr * Tc));
            }
        }
    }

    [Fact]
    public void MathiasCopeman_AboveTc_IsSoaveWithC1()
    {
        // Above Tc the paper uses [1 + c1(1 − √Tr)]²: c2 and c3 must not enter.
        var mc = TestMathiasCopeman();
        var soave = new SoaveAlpha(mc.C1, Tc, "test");
        foreach (double tr in new[] { 1.0001, 1.3, 2.5 })
        {
            Assert.Equal(soave.Evaluate(tr * Tc), mc.Evaluate(tr * Tc));
        }
    }

    [Fact]
    public void MathiasCopeman_AtTc_FirstDerivativeContinuousSecondJumpsByC2OverTcSquared()
    {
        // Documented behaviour: dα/dT = −c1/Tc on both sides; d²α/dT² drops by c2/Tc² going
        // above Tc. Evaluated 1e-9·Tc either side, where the smooth change of each branch is
        // ~1e-9 relative, so 1e-7 separates the jump (here 0.35/Tc², 30 % of the value) clearly.
        var mc = TestMathiasCopeman();
        AlphaValue below = mc.Evaluate(Tc * (1 - 1e-9));
        AlphaValue above = mc.Evaluate(Tc * (1 + 1e-9));

        AssertClose.Relative(-mc.C1 / Tc, below.FirstDerivative, 1e-7, "dalpha/dT below Tc");
        AssertClose.Relative(-mc.C1 / Tc, above.FirstDerivative, 1e-7, "dalpha/dT above Tc");
        AssertClose.Relative((mc.C1 * (1 + mc.C1) + 2 * mc.C2) / (2 * Tc * Tc), below.SecondDerivative, 1e-7, "d2alpha/dT2 below Tc");
        AssertClose.Relative(mc.C1 * (1 + mc.C1) / (2 * Tc * Tc), above.SecondDerivative, 1e-7, "d2alpha/dT2 above Tc");
    }

    [Theory]
    [InlineData(0.0)]
    [InlineData(0.152)]
    [InlineData(0.649)]
    public void GeneralisedTwu_SubAndSupercriticalSets_JoinSmoothlyAtTc(double omega)
    {
        // The two recalled constant sets are separate numbers, yet the paper's sets join with
        // continuous dα/dT and d²α/dT² at Tc. With constants of 6–7 significant digits the
        // joins hold to ~1e-6 (first) and ~1e-5 (second derivative, which multiplies more
        // constants); measured 3e-7 and 9e-6 for ω = 0.152. 1e-5 and 1e-4 allow for that; a
        // error in the third decimal of any supercritical constant breaks the first join by more than
        // 1e-4 at ω = 0 (α0 set) or ω = 0.649 (mostly α1).
        var alpha = new GeneralisedTwuAlpha(omega, Tc);
        AlphaValue below = alpha.Evaluate(Tc * (1 - 1e-12));
        AlphaValue above = alpha.Evaluate(Tc * (1 + 1e-12));

        AssertClose.Relative(below.FirstDerivative, above.FirstDerivative, 1e-5, $"omega = {omega} dalpha/dT across Tc");
        AssertClose.Relative(below.SecondDerivative, above.SecondDerivative, 1e-4, $"omega = {omega} d2alpha/dT2 across Tc");
    }
}
