using MathNet.Numerics.Differentiation;
using MathNet.Numerics.Integration;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Tests.TestSupport;

namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>The analytic derivative and integrals of <see cref="IdealGasHeatCapacity"/> against
/// numerical differentiation and quadrature of <see cref="IdealGasHeatCapacity.HeatCapacity"/>.</summary>
public class IdealGasHeatCapacityTests
{
    private const double R = Constants.GasConstant;

    // Gauss–Legendre with 128 points integrates these smooth, non-oscillating integrands over
    // at most a factor 20 in T to near machine precision; 1e-11 relative leaves room for the
    // cancellation in the antiderivative differences.
    private const int QuadratureOrder = 128;
    private const double IntegralTolerance = 1e-11;

    // A 7-point central difference with MathNet's step choice is accurate to about 1e-10 for
    // these functions (truncation O(h⁶), rounding ~ eps/h); 1e-8 relative is ample yet far
    // below any algebraic slip (which would be of order one).
    private const double DerivativeTolerance = 1e-8;

    /// <summary>Power terms only, with exponents 0, −1, a fraction and a polynomial degree;
    /// T_r = 150 K so the reducing temperature enters every formula.</summary>
    private static IdealGasHeatCapacity PurePower() => new(
        [(3.5, 0), (40.0, -1), (0.8, 0.5), (1.2, 1), (-0.05, 3), (2.0, -2)],
        150.0, [], 50, 1000, "test correlation");

    /// <summary>Planck–Einstein terms only, characteristic temperatures from well below to
    /// well above the test temperatures (x = u/T from about 0.05 to 60).</summary>
    private static IdealGasHeatCapacity PureEinstein() => new(
        [], 1.0, [(2.0, 60.0), (3.0, 900.0), (1.5, 3000.0), (0.7, 12000.0)], 50, 1000, "test correlation");

    /// <summary>Both kinds, in the reduced form of a reference equation (T_r = 300 K).</summary>
    private static IdealGasHeatCapacity Mixed() => new(
        [(4.0, 0), (0.3, 1), (-0.02, 2), (0.5, -1), (1.1, 0.75)],
        300.0, [(1.3, 500.0), (2.4, 1500.0), (0.9, 4000.0)], 50, 1000, "test correlation");

    public static TheoryData<string> Correlations() => new() { "power", "einstein", "mixed" };

    private static IdealGasHeatCapacity Get(string which) => which switch
    {
        "power" => PurePower(),
        "einstein" => PureEinstein(),
        _ => Mixed(),
    };

    [Theory]
    [MemberData(nameof(Correlations))]
    public void HeatCapacityDerivative_MatchesNumericalDerivative(string which)
    {
        IdealGasHeatCapacity cp = Get(which);
        var numerical = new NumericalDerivative(7, 3);
        foreach (double t in new[] { 60.0, 120.0, 298.15, 500.0, 950.0 })
        {
            double expected = numerical.EvaluateDerivative(cp.HeatCapacity, t, 1);
            double actual = cp.HeatCapacityDerivative(t);
            // Relative to the size of cp°/T so that a derivative near zero is not over-demanded.
            AssertClose.Absolute(expected, actual, DerivativeTolerance * cp.HeatCapacity(t) / t,
                $"{which}: dcp°/dT at {t} K");
        }
    }

    [Theory]
    [MemberData(nameof(Correlations))]
    public void EnthalpyIntegral_MatchesQuadrature(string which)
    {
        IdealGasHeatCapacity cp = Get(which);
        foreach ((double from, double to) in new[] { (50.0, 1000.0), (298.15, 400.0), (700.0, 120.0) })
        {
            double expected = GaussLegendreRule.Integrate(cp.HeatCapacity, from, to, QuadratureOrder);
            double actual = cp.EnthalpyIntegral(from, to);
            AssertClose.Relative(expected, actual, IntegralTolerance, $"{which}: ∫cp° dT from {from} to {to} K");
        }
    }

    [Theory]
    [MemberData(nameof(Correlations))]
    public void EntropyIntegral_MatchesQuadrature(string which)
    {
        IdealGasHeatCapacity cp = Get(which);
        foreach ((double from, double to) in new[] { (50.0, 1000.0), (298.15, 400.0), (700.0, 120.0) })
        {
            double expected = GaussLegendreRule.Integrate(t => cp.HeatCapacity(t) / t, from, to, QuadratureOrder);
            double actual = cp.EntropyIntegral(from, to);
            AssertClose.Relative(expected, actual, IntegralTolerance, $"{which}: ∫cp°/T dT from {from} to {to} K");
        }
    }

    [Fact]
    public void Integrals_FromATemperatureToItself_AreZero()
    {
        IdealGasHeatCapacity cp = Mixed();

        Assert.Equal(0.0, cp.EnthalpyIntegral(298.15, 298.15));
        Assert.Equal(0.0, cp.EntropyIntegral(298.15, 298.15));
    }

    [Fact]
    public void ExponentMinusOne_EnthalpyIsLogarithmic()
    {
        // ∫ c·(T/T_r)^(−1) dT = c·T_r·ln(T2/T1), written out by hand.
        var cp = new IdealGasHeatCapacity([(40.0, -1)], 150.0, [], 50, 1000, "test");

        AssertClose.Relative(R * 40.0 * 150.0 * Math.Log(1000.0 / 50.0), cp.EnthalpyIntegral(50, 1000), 1e-14,
            "∫ c (T/T_r)^-1 dT");
    }

    [Fact]
    public void ExponentZero_EntropyIsLogarithmic()
    {
        // ∫ c/T dT = c·ln(T2/T1), written out by hand.
        var cp = new IdealGasHeatCapacity([(3.5, 0)], 150.0, [], 50, 1000, "test");

        AssertClose.Relative(R * 3.5 * Math.Log(1000.0 / 50.0), cp.EntropyIntegral(50, 1000), 1e-14, "∫ c/T dT");
        AssertClose.Relative(R * 3.5 * 950.0, cp.EnthalpyIntegral(50, 1000), 1e-14, "∫ c dT");
    }

    [Fact]
    public void EinsteinTerm_AtXEqualsOne_HasClosedFormValue()
    {
        // E(1) = e/(e − 1)², written out by hand.
        var cp = new IdealGasHeatCapacity([], 1.0, [(2.0, 400.0)], 50, 1000, "test");
        double e = Math.E;

        AssertClose.Relative(R * 2.0 * e / ((e - 1) * (e - 1)), cp.HeatCapacity(400.0), 1e-14, "cp° at u/T = 1");
    }

    [Fact]
    public void EinsteinTerm_Limits_FullyExcitedAndFrozen()
    {
        // E(x) → 1 − x²/12 as x → 0 (fully excited vibration) and → x²e^(−x) as x → ∞ (frozen);
    // at x = 1e6 e^(−x) underflows to zero, which must give 0, not NaN.
        var cp = new IdealGasHeatCapacity([], 1.0, [(1.0, 1.0)], 1e-3, 1e7, "test");

        AssertClose.Relative(R * (1 - 1e-12 / 12), cp.HeatCapacity(1e6), 1e-14, "cp° at u/T = 1e-6");
        AssertClose.Relative(R * 250000.0 * Math.Exp(-500), cp.HeatCapacity(0.002), 1e-12, "cp° at u/T = 500");
        Assert.Equal(0.0, cp.HeatCapacity(1e-6));
        Assert.True(double.IsFinite(cp.HeatCapacityDerivative(1e-3)) && double.IsFinite(cp.EntropyIntegral(1e-3, 1)));
    }

    [Fact]
    public void InRange_IncludesBothEnds()
    {
        IdealGasHeatCapacity cp = Mixed();

        Assert.True(cp.InRange(50) && cp.InRange(1000) && cp.InRange(298.15));
        Assert.False(cp.InRange(49.999) || cp.InRange(1000.001));
    }
}
