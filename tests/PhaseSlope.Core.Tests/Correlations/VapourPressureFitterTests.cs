using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

public class VapourPressureFitterTests(ITestOutputHelper output)
{
    // Water-like constants of the simple forms, used only to generate data.
    // Clausius–Clapeyron: ln(P/Pa) = 25.0 − 5000/T (101 kPa near 370 K).
    private static readonly double[] ClausiusClapeyronConstants = [25.0, 5000.0];

    // Antoine for water, log10(P/mmHg) = 8.07131 − 1730.63/(t/°C + 233.426), 1–100 °C
    // (the commonly tabulated set, from memory), converted to ln(P/Pa) with T in K:
    // A = ln10·(8.07131 + log10 133.322), B = ln10·1730.63, C = 233.426 − 273.15.
    private static readonly double[] AntoineConstants =
        [Math.Log(10) * (8.07131 + Math.Log10(133.322)), Math.Log(10) * 1730.63, 233.426 - 273.15];

    // ---- recovery of the generating constants ----

    [Fact]
    public void Fit_SixTermWagnerOnIapwsWaterData_RecoversTheSixCoefficients()
    {
        var form = WagnerForm.SixTerm(WaterTc, WaterPc);
        var temperatures = Temperatures(275, 645, 38);
        var fit = VapourPressureFitter.Fit(form, Points(WaterLnPressure, temperatures));

        // Conditioning: the design matrix J_ij = (Tc/T_i)·τ_i^(e_j) with unit-norm columns. The
        // data carry rounding of ~1e-16·|ln P| ≈ 2e-15 in ln P; the coefficients' relative error
        // is bounded by about κ(J)·(that)/|ln(P/Pc)|, times the ratio of a column's scale to its
        // coefficient. Rather than trust the bound blindly, compute κ and allow 10·κ·1e-15
        // relative to the largest |a_j| (the coefficients partly cancel: a3…a5 ~ 10–20 give
        // sums ~ 1, so absolute error on the scale of max|a_j| is the right yardstick).
        var j = Matrix<double>.Build.Dense(temperatures.Length, 6, (i, k) => WaterTc / temperatures[i] * Math.Pow(1 - temperatures[i] / WaterTc, form.Exponents[k]));
        for (int k = 0; k < 6; k++)
        {
            j.SetColumn(k, j.Column(k).Normalize(2));
        }

        double kappa = j.ConditionNumber();
        double tolerance = 10 * kappa * 1e-15 * WaterCoefficients.Max(Math.Abs);
        double worst = 0;
        for (int k = 0; k < 6; k++)
        {
            double error = Math.Abs(fit.Parameters[k] - WaterCoefficients[k]);
            worst = Math.Max(worst, error);
            AssertClose.Absolute(WaterCoefficients[k], fit.Parameters[k], tolerance, $"a{k + 1}");
        }

        output.WriteLine($"condition number {kappa:G4}, tolerance {tolerance:G3}, worst |Δa| {worst:G3}, max deviation {fit.MaximumDeviationPercent:G3} %");
        // Guard on the guard: a six-term basis this ill-conditioned would make the test vacuous.
        Assert.True(tolerance < 1e-4, $"tolerance {tolerance} from κ = {kappa} is too loose to test anything");
    }

    [Fact]
    public void Fit_ClausiusClapeyronNoiseFree_RecoversItsConstants()
    {
        var fit = VapourPressureFitter.Fit(new ClausiusClapeyronForm(),
            Points(t => ClausiusClapeyronConstants[0] - ClausiusClapeyronConstants[1] / t, Temperatures(280, 400, 10)));

        // Linear in A and B: the linearised start is the exact QR solution, a 10×2 system with
        // unit-norm columns and κ of order 10²; 1e-10 relative is rounding with a wide margin.
        AssertClose.Relative(ClausiusClapeyronConstants[0], fit.Parameters[0], 1e-10, "A");
        AssertClose.Relative(ClausiusClapeyronConstants[1], fit.Parameters[1], 1e-10, "B");
        AssertClose.Absolute(0, fit.ChiSquare, 1e-20, "chi-square");
    }

    [Fact]
    public void Fit_AntoineNoiseFree_RecoversItsConstants()
    {
        double[] c = AntoineConstants;
        var fit = VapourPressureFitter.Fit(new AntoineForm(), Points(t => c[0] - c[1] / (t + c[2]), Temperatures(275, 373, 12)));

        output.WriteLine($"Antoine: A {fit.Parameters[0]:R} (true {c[0]:R}), B {fit.Parameters[1]:R} ({c[1]:R}), C {fit.Parameters[2]:R} ({c[2]:R}); {fit.Iterations} iterations, {fit.StopReason}");
        // Nonlinear in C, with A, B, C strongly correlated (|ρ| > 0.99), so the minimiser's
        // stopping tolerance, not rounding, limits the recovery: measured when written 1e-9
        // (A), 3e-9 (B), 1.2e-8 (C) relative. 1e-6 relative in each.
        for (int k = 0; k < 3; k++)
        {
            AssertClose.Relative(c[k], fit.Parameters[k], 1e-6, fit.Form.ParameterNames[k]);
        }
    }

    [Theory]
    [InlineData("clausius-clapeyron", 11)]
    [InlineData("clausius-clapeyron", 12)]
    [InlineData("antoine", 21)]
    [InlineData("antoine", 22)]
    [InlineData("wagner-6", 31)]
    public void Fit_NoisyData_EstimatesWithinThreeStandardErrors(string id, int seed)
    {
        double[] c = AntoineConstants;
        var (form, truth, lnP, temperatures) = id switch
        {
            "clausius-clapeyron" => ((VapourPressureForm)new ClausiusClapeyronForm(), ClausiusClapeyronConstants,
                (Func<double, double>)(t => ClausiusClapeyronConstants[0] - ClausiusClapeyronConstants[1] / t), Temperatures(280, 400, 15)),
            "antoine" => (new AntoineForm(), AntoineConstants, t => c[0] - c[1] / (t + c[2]), Temperatures(275, 373, 15)),
            _ => (WagnerForm.SixTerm(WaterTc, WaterPc), WaterCoefficients, WaterLnPressure, Temperatures(275, 645, 40)),
        };
        // σ(ln P) = 0.2 % (a good static measurement).
        var fit = VapourPressureFitter.Fit(form, Points(lnP, temperatures, 0.002, new Random(seed)));

        // With p ≤ 6 estimates, each |z| > 3 has probability 0.27 %; the seeds are fixed, so the
        // outcome is deterministic, and 3 standard errors flags a covariance off by a factor ≳ 2.
        for (int k = 0; k < truth.Length; k++)
        {
            double z = (fit.Parameters[k] - truth[k]) / fit.StandardErrors[k];
            output.WriteLine($"{id} seed {seed} {form.ParameterNames[k]}: z = {z:F2}");
            AssertClose.InRange(-3, 3, z, $"{id} seed {seed}: ({form.ParameterNames[k]} − true)/standard error");
        }
    }

    // ---- choice of form by AICc ----

    private static VapourPressureForm[] Candidates() =>
    [
        new ClausiusClapeyronForm(), new AntoineForm(), new KirchhoffForm(), new RiedelForm(),
        WagnerForm.ThreeSix(WaterTc, WaterPc), WagnerForm.TwoHalfFive(WaterTc, WaterPc),
    ];

    [Fact]
    public void FitAll_NoisyWagnerTwoHalfFiveData_PicksAWagnerFormAndOrdersByAicc()
    {
        var data = Points(TwoHalfFiveLnPressure, Temperatures(300, 630, 25), 1e-3, new Random(5));
        var fits = VapourPressureFitter.FitAll(Candidates(), data);

        foreach (var f in fits)
        {
            output.WriteLine($"{f.Form.Id}: AICc {f.Aicc:F1}, reduced chi2 {f.ReducedChiSquare:G3}");
        }

        Assert.Equal(Candidates().Length, fits.Count);
        Assert.StartsWith("wagner", fits[0].Form.Id);
        for (int i = 1; i < fits.Count; i++)
        {
            Assert.True(fits[i - 1].Aicc <= fits[i].Aicc, $"AICc not ascending at {i}: {fits[i - 1].Aicc} then {fits[i].Aicc}");
        }

        var cc = fits.Single(f => f.Form.Id == "clausius-clapeyron");
        // Over 300–630 K ln P is visibly curved in 1/T: the two-constant form misfits by far more
        // than the noise, so its AICc is worse by tens of units, not by a marginal amount.
        Assert.True(cc.Aicc - fits[0].Aicc > 20, $"Clausius-Clapeyron AICc {cc.Aicc} vs best {fits[0].Aicc}");
        // AICc as defined: n·ln(χ²/n) + 2K + 2K(K+1)/(n−K−1), K = p + 1.
        int n = data.Length, k = fits[0].Parameters.Count + 1;
        AssertClose.Relative(n * Math.Log(fits[0].ChiSquare / n) + 2 * k + 2.0 * k * (k + 1) / (n - k - 1), fits[0].Aicc!.Value, 1e-12, "AICc of the best fit");
    }

    [Fact]
    public void FitAll_FourPoints_ThrowsInvalidInputSayingTooFew()
    {
        var data = Points(TwoHalfFiveLnPressure, Temperatures(300, 400, 4));
        var ex = Assert.Throws<InvalidInputException>(() => VapourPressureFitter.FitAll(Candidates(), data));
        Assert.Contains("too few", ex.Message);
        Assert.Contains("4 points", ex.Message);
    }

    [Fact]
    public void Fit_AntoineWithThreePoints_ThrowsInvalidInputNamingTheNeed()
    {
        var data = Points(TwoHalfFiveLnPressure, Temperatures(300, 400, 3));
        var ex = Assert.Throws<InvalidInputException>(() => VapourPressureFitter.Fit(new AntoineForm(), data));
        Assert.Contains("needs at least 4 points, got 3", ex.Message);
    }

    [Fact]
    public void Fit_DuplicateTemperature_ThrowsInvalidInput()
    {
        var data = Points(TwoHalfFiveLnPressure, [300, 320, 340, 340, 360, 380]);
        var ex = Assert.Throws<InvalidInputException>(() => VapourPressureFitter.Fit(new KirchhoffForm(), data));
        Assert.Contains("share the temperature 340", ex.Message);
        Assert.Equal(340, ex.Value);
    }

    [Theory]
    [InlineData(WaterTc)]
    [InlineData(660.0)]
    public void Fit_WagnerWithPointAtOrAboveTc_ThrowsInvalidInput(double tHigh)
    {
        var data = Points(TwoHalfFiveLnPressure, Temperatures(300, 600, 6)).Append(new VapourPressurePoint(tHigh, 2.2e7)).ToArray();
        var ex = Assert.Throws<InvalidInputException>(() => VapourPressureFitter.Fit(WagnerForm.TwoHalfFive(WaterTc, WaterPc), data));
        Assert.Contains("critical temperature", ex.Message);
        Assert.Equal(tHigh, ex.Value);
    }
}
