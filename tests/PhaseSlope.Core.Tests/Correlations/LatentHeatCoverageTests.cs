using MathNet.Numerics.Distributions;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

/// <summary>Frequentist coverage of the delta-method uncertainty u(ΔH): repeated noisy datasets
/// from a known 2.5-5 curve, fitted by the same form, and the fraction of trials where the true
/// ΔH lies within ±u and ±2u of the estimate.</summary>
public class LatentHeatCoverageTests(ITestOutputHelper output)
{
    private const int Trials = 400;
    private const int PointsPerSet = 15;
    private const double Sigma = 0.002; // σ(ln P)
    private const double Interior = 450.0; // K, inside the 300–600 K data

    /// <summary>Fractions of trials with |ΔH_est − ΔH_true| ≤ u and ≤ 2u.</summary>
    private (double One, double Two) Coverage(bool absolute, int seed)
    {
        var form = WagnerForm.TwoHalfFive(WaterTc, WaterPc);
        var temperatures = Temperatures(300, 600, PointsPerSet);
        // Ideal-gas volumes: ΔZ = 1 in both the estimate and the truth, so the check is on the
        // slope's uncertainty alone (ΔH_true = R·T²·d lnP/dT of the generating curve).
        double h = 1e-3;
        double trueSlope = FiniteDifference.Central5(TwoHalfFiveLnPressure, Interior, h);
        double trueHeat = Constants.GasConstant * Interior * Interior * trueSlope;
        var random = new Random(seed);
        int one = 0, two = 0;
        for (int trial = 0; trial < Trials; trial++)
        {
            var fit = VapourPressureFitter.Fit(form, Points(TwoHalfFiveLnPressure, temperatures, Sigma, random, withUncertainty: absolute));
            Assert.Equal(absolute, fit.AbsoluteUncertainties);
            var point = new LatentHeatEstimator(fit, VolumeChangeModel.IdealGas).At(Interior);
            double miss = Math.Abs(point.EnthalpyOfVaporization - trueHeat);
            one += miss <= point.StandardUncertainty ? 1 : 0;
            two += miss <= 2 * point.StandardUncertainty ? 1 : 0;
        }

        return ((double)one / Trials, (double)two / Trials);
    }

    /// <summary>Expected ± 3 binomial standard errors at 400 trials (SE = √(p(1−p)/400):
    /// 2.3 % at p ≈ 0.68, 1.1–1.3 % at p ≈ 0.93–0.95). The form is linear in its parameters and the
    /// truth lies in it, so the ± u interval is exact apart from the sampling of the scatter:
    /// with a known σ (absolute uncertainties) the coverage is the normal 68.27 % / 95.45 %;
    /// with σ estimated from the residuals (relative weights) it is Student's t with
    /// n − p = 11 degrees of freedom, P(|t₁₁| ≤ 1) ≈ 65.9 %, P(|t₁₁| ≤ 2) ≈ 92.9 %.
    /// A u off by a factor 1.5 either way moves the ±u coverage to ≈ 50 % or ≈ 87 %, outside.</summary>
    private static void AssertCoverage(double expected, double actual, string what)
    {
        double se = Math.Sqrt(expected * (1 - expected) / Trials);
        AssertClose.InRange(expected - 3 * se, expected + 3 * se, actual, $"{what} (expected {expected:F4})");
    }

    [Fact]
    public void Coverage_RelativeWeights_MatchesStudentTWithElevenDegreesOfFreedom()
    {
        var (one, two) = Coverage(absolute: false, seed: 20240601);
        output.WriteLine($"relative weights: ±u {one:P1}, ±2u {two:P1}");
        int dof = PointsPerSet - 4;
        AssertCoverage(2 * StudentT.CDF(0, 1, dof, 1) - 1, one, "coverage of ±u");
        AssertCoverage(2 * StudentT.CDF(0, 1, dof, 2) - 1, two, "coverage of ±2u");
    }

    [Fact]
    public void Coverage_AbsoluteUncertainties_MatchesTheNormalDistribution()
    {
        var (one, two) = Coverage(absolute: true, seed: 777);
        output.WriteLine($"absolute uncertainties: ±u {one:P1}, ±2u {two:P1}");
        AssertCoverage(2 * Normal.CDF(0, 1, 1) - 1, one, "coverage of ±u");
        AssertCoverage(2 * Normal.CDF(0, 1, 2) - 1, two, "coverage of ±2u");
    }
}
