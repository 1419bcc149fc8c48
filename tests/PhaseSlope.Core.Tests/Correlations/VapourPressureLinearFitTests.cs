using System.Globalization;
using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Tests.TestSupport;
using Xunit.Abstractions;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

/// <summary>The forms linear in their parameters are solved by a direct linear least-squares
/// solve: it must be the minimum Levenberg–Marquardt finds, be declared only for forms that are
/// really linear, and stay right (and in linear memory) for large inputs.</summary>
public class VapourPressureLinearFitTests(ITestOutputHelper output)
{
    // Saturation pressure of water, °C and kPa as printed (five significant figures) in the
    // IAPWS-95 steam tables (Wagner & Pruss, J. Phys. Chem. Ref. Data 31, 387 (2002)), recalled
    // from memory. A misremembered last digit would not matter: the direct solve and the
    // iterative one below see the same data.
    private static readonly (string Celsius, string KiloPascal)[] SteamTable =
    [
        ("0.01", "0.6117"), ("10", "1.2282"), ("20", "2.3393"), ("30", "4.2470"), ("40", "7.3851"),
        ("50", "12.352"), ("60", "19.946"), ("70", "31.201"), ("80", "47.416"), ("90", "70.183"),
        ("100", "101.42"), ("120", "198.67"), ("140", "361.53"), ("160", "618.23"), ("180", "1002.8"),
        ("200", "1554.9"), ("220", "2319.6"), ("240", "3346.9"), ("260", "4692.3"), ("280", "6416.6"),
        ("300", "8587.9"), ("320", "11284"), ("340", "14601"), ("360", "18666"),
    ];

    /// <summary>The steam-table points with the standard uncertainty of printing: half a unit of
    /// the last digit shown, uniformly distributed, u = 0.5·10^(−d)/√3. The weights so differ
    /// from point to point (8e-5 to 2e-6 relative), which exercises the weighting of both solvers.</summary>
    private static VapourPressurePoint[] SteamTablePoints()
        => [.. SteamTable.Select(row =>
        {
            int decimals = row.KiloPascal.Contains('.') ? row.KiloPascal.Length - row.KiloPascal.IndexOf('.') - 1 : 0;
            double unit = Math.Pow(10, -decimals) * 1e3; // Pa
            double t = double.Parse(row.Celsius, CultureInfo.InvariantCulture) + 273.15;
            double p = double.Parse(row.KiloPascal, CultureInfo.InvariantCulture) * 1e3;
            return new VapourPressurePoint(t, p, 0.5 * unit / Math.Sqrt(3));
        })];

    private static VapourPressureForm LinearForm(string id) => id switch
    {
        "clausius-clapeyron" => new ClausiusClapeyronForm(),
        "kirchhoff" => new KirchhoffForm(),
        "riedel" => new RiedelForm(),
        "wagner-3-6" => WagnerForm.ThreeSix(WaterTc, WaterPc),
        "wagner-2.5-5" => WagnerForm.TwoHalfFive(WaterTc, WaterPc),
        _ => WagnerForm.SixTerm(WaterTc, WaterPc),
    };

    /// <summary>A form seen as nonlinear, so that the fitter takes it through Levenberg–Marquardt
    /// from the given start instead of solving it directly.</summary>
    private sealed class IterativeView(VapourPressureForm inner, double[] start) : VapourPressureForm
    {
        public override string Id => inner.Id;

        public override string Description => inner.Description;

        public override IReadOnlyList<string> ParameterNames => inner.ParameterNames;

        public override double UpperLimit => inner.UpperLimit;

        public override double LnPressure(double temperature, IReadOnlyList<double> parameters) => inner.LnPressure(temperature, parameters);

        public override double Slope(double temperature, IReadOnlyList<double> parameters) => inner.Slope(temperature, parameters);

        public override double Curvature(double temperature, IReadOnlyList<double> parameters) => inner.Curvature(temperature, parameters);

        public override void LnPressureGradient(double temperature, IReadOnlyList<double> parameters, Span<double> gradient)
            => inner.LnPressureGradient(temperature, parameters, gradient);

        public override void SlopeGradient(double temperature, IReadOnlyList<double> parameters, Span<double> gradient)
            => inner.SlopeGradient(temperature, parameters, gradient);

        public override double[] StartingValues(IReadOnlyList<double> temperatures, IReadOnlyList<double> lnPressures, IReadOnlyList<double> weights)
            => [.. start];
    }

    /// <summary>Condition number of JᵀWJ after scaling it to unit diagonal (the equilibration
    /// the fitter's covariance uses): κ(J)² of the column-equilibrated weighted design matrix.</summary>
    private static double NormalConditionNumber(VapourPressureForm form, IReadOnlyList<double> parameters, IReadOnlyList<VapourPressurePoint> data, IReadOnlyList<double> weights)
    {
        int p = parameters.Count;
        var normal = Matrix<double>.Build.Dense(p, p);
        var g = new double[p];
        for (int i = 0; i < data.Count; i++)
        {
            form.LnPressureGradient(data[i].Temperature, parameters, g);
            for (int a = 0; a < p; a++)
            {
                for (int b = 0; b < p; b++)
                {
                    normal[a, b] += weights[i] * g[a] * g[b];
                }
            }
        }

        var d = Vector<double>.Build.Dense(p, j => 1 / Math.Sqrt(normal[j, j]));
        return Matrix<double>.Build.Dense(p, p, (a, b) => normal[a, b] * d[a] * d[b]).ConditionNumber();
    }

    [Theory]
    [InlineData("clausius-clapeyron")]
    [InlineData("kirchhoff")]
    [InlineData("riedel")]
    [InlineData("wagner-3-6")]
    [InlineData("wagner-2.5-5")]
    [InlineData("wagner-6")]
    public void Fit_LinearFormOnSteamTablePressures_IsTheMinimumLevenbergMarquardtFinds(string id)
    {
        var form = LinearForm(id);
        var data = SteamTablePoints();
        var direct = VapourPressureFitter.Fit(form, data);
        // Start 5 % off in every parameter, alternately high and low: far enough that the
        // minimiser has to work (the wagner-6 coefficients cancel to 1 part in 20, so the start
        // misses ln P by orders of magnitude more than the data's scatter).
        double[] start = [.. direct.Parameters.Select((v, j) => v * (j % 2 == 0 ? 1.05 : 0.95))];
        var iterative = VapourPressureFitter.Fit(new IterativeView(form, start), data);

        Assert.Equal(0, direct.Iterations);
        Assert.Equal(VapourPressureFitter.DirectLinearSolve, direct.StopReason);
        Assert.True(iterative.Iterations > 0, $"Levenberg–Marquardt did not iterate ({iterative.StopReason})");
        Assert.DoesNotContain("start kept", iterative.StopReason);

        // The direct solve is the minimum: the minimiser can come lower only by rounding. The QR
        // solve's parameters carry rounding with ‖√W·J·δθ‖ ≲ κ(J)·ε·‖√W·ln P‖, which lifts χ² above
        // the exact minimum by at most its square (10× margin on the norm, so 100× on χ²); the
        // evaluation of χ², 24 positive terms, rounds at ~1e-14 relative (allow 1e-12). A direct
        // solve off the minimum by a wrong weight or basis would lose by orders of magnitude more.
        // Measured when written: excess of the direct χ² at most 2.7e-11 relative (wagner-6,
        // allowed 1.2e-8 there); elsewhere within ±1.2e-12.
        double kappa = NormalConditionNumber(form, direct.Parameters, data, direct.Weights);
        double weightedNorm = Math.Sqrt(data.Select((d, i) => direct.Weights[i] * Math.Pow(Math.Log(d.Pressure), 2)).Sum());
        double rounding = Math.Sqrt(kappa) * 2.2e-16 * weightedNorm;
        double chiTolerance = 100 * rounding * rounding + 1e-12 * direct.ChiSquare;
        Assert.True(direct.ChiSquare <= iterative.ChiSquare + chiTolerance,
            $"direct chi-square {direct.ChiSquare:R} above the iterative one {iterative.ChiSquare:R} by more than {chiTolerance:G3}");
        // Parameters: the minimiser's inner step solves the normal equations (JᵀWJ + μD)δ = −JᵀWr,
        // whose condition number is κ(J)², so its answer carries rounding of up to about
        // κ(JᵀWJ)·ε relative to the largest |θ_j| (the Wagner coefficients partly cancel, so the
        // largest is the yardstick); the QR solve carries only κ(J)·ε. Allow 100·κ(JᵀWJ)·ε, at
        // least 1e-12. Measured when written: 6e-10 of max|θ| for riedel (bound 1.3e-7), 2e-12 for
        // wagner-6 (bound 3e-5), 1e-14 or less for the others.
        double scale = direct.Parameters.Max(Math.Abs);
        double tolerance = Math.Max(100 * kappa * 2.2e-16, 1e-12) * scale;
        double worst = 0;
        for (int j = 0; j < form.ParameterCount; j++)
        {
            worst = Math.Max(worst, Math.Abs(iterative.Parameters[j] - direct.Parameters[j]) / scale);
            AssertClose.Absolute(direct.Parameters[j], iterative.Parameters[j], tolerance, $"{id} {form.ParameterNames[j]}");
        }

        output.WriteLine($"{id}: κ(JᵀWJ) {kappa:G3}, tolerance {tolerance / scale:G3} of max|θ|, worst {worst:G3}; LM {iterative.Iterations} iterations "
            + $"({iterative.StopReason}), direct chi-square excess {direct.ChiSquare / iterative.ChiSquare - 1:G3} relative (allowed {chiTolerance / direct.ChiSquare:G3})");
        // Guard on the guard: a bound this loose would test nothing.
        Assert.True(tolerance < 1e-4 * scale, $"tolerance {tolerance} too loose (κ = {kappa})");
    }

    [Theory]
    [InlineData("clausius-clapeyron", true)]
    [InlineData("kirchhoff", true)]
    [InlineData("riedel", true)]
    [InlineData("wagner-3-6", true)]
    [InlineData("wagner-2.5-5", true)]
    [InlineData("wagner-6", true)]
    [InlineData("antoine", false)]
    public void IsLinearInParameters_DeclaredExactlyForTheAffineForms(string id, bool linear)
    {
        // The flag lets the fitter skip iteration, so it must be true only where ln P is affine in
        // θ: ln P(θ) − ln P(θ′) = Σ (θ_j − θ′_j)·∂ln P/∂θ_j at any θ. Checked between the water fit
        // and a point 10 % away in every parameter, at temperatures across the data range.
        var fit = WaterFits().Single(f => f.Form.Id == id);
        var form = fit.Form;
        Assert.Equal(linear, form.IsLinearInParameters);
        double[] theta = [.. fit.Parameters];
        double[] other = [.. theta.Select((v, j) => v * (j % 2 == 0 ? 1.1 : 0.9))];
        var g = new double[form.ParameterCount];
        double worst = 0;
        foreach (double t in Temperatures(280, 640, 13))
        {
            form.LnPressureGradient(t, other, g);
            double predicted = form.LnPressure(t, other) + theta.Select((v, j) => (v - other[j]) * g[j]).Sum();
            worst = Math.Max(worst, Math.Abs(form.LnPressure(t, theta) - predicted) / Math.Abs(form.LnPressure(t, theta)));
        }

        output.WriteLine($"{id}: largest departure from the affine identity {worst:G3} of |ln P|");
        // Affine: the identity holds to rounding of the sums (terms up to ~1e3 beside ln P ~ 10,
        // so ~1e-13); not affine: Antoine's C enters as 1/(T + C) and a 10 % step in it moves ln P
        // by ~1e-2, far beyond 1e-10.
        if (linear)
        {
            Assert.True(worst < 1e-10, $"{id} is declared linear but departs from the affine identity by {worst:G3}");
        }
        else
        {
            Assert.True(worst > 1e-6, $"{id} is declared nonlinear but is affine to {worst:G3}");
        }
    }

    [Fact]
    public void Fit_TwoHundredThousandNoiseFreePoints_RecoversTheIapwsCoefficients()
    {
        // 200 000 points: the full QR this used to build would need an n×n matrix of 320 GB. The
        // tolerance is the one the 38-point test uses, 10·κ(J)·1e-15 of max|a_j|, with κ(J) of the
        // column-equilibrated design matrix (√κ of its equilibrated normal matrix): the rounding
        // of ln P in the data (~1e-16·|ln P|) carried through a QR solve.
        var form = WagnerForm.SixTerm(WaterTc, WaterPc);
        var data = Points(WaterLnPressure, Temperatures(275, 645, 200_000));
        var fit = VapourPressureFitter.Fit(form, data);

        double kappa = Math.Sqrt(NormalConditionNumber(form, fit.Parameters, data, fit.Weights));
        double tolerance = 10 * kappa * 1e-15 * WaterCoefficients.Max(Math.Abs);
        for (int k = 0; k < 6; k++)
        {
            AssertClose.Absolute(WaterCoefficients[k], fit.Parameters[k], tolerance, $"a{k + 1}");
        }

        output.WriteLine($"κ(J) {kappa:G4}, tolerance {tolerance:G3}, max |Δa| {fit.Parameters.Select((v, k) => Math.Abs(v - WaterCoefficients[k])).Max():G3}");
        Assert.Equal(200_000, fit.Data.Count);
        Assert.True(tolerance < 1e-4, $"tolerance {tolerance} from κ = {kappa} is too loose to test anything");
    }

    [Fact]
    public void Fit_HundredThousandNoisyPoints_EstimatesWithinFourStandardErrorsAndScatterFromChiSquare()
    {
        // σ(ln P) = 1e-3, seeded. For a right covariance each (a_j − true)/SE is standard normal:
        // |z| > 4 has probability 6e-5 per parameter, and the seed is fixed, so the test is
        // deterministic; a covariance or weighting off by a factor of 2 shows as |z| of 4 or more
        // in typical seeds. With relative weights χ²/(n − p) estimates σ², with relative standard
        // deviation √(2/(n − p)) = 0.45 %: allow five of them.
        const double sigma = 1e-3;
        int n = 100_000;
        var form = WagnerForm.SixTerm(WaterTc, WaterPc);
        var fit = VapourPressureFitter.Fit(form, Points(WaterLnPressure, Temperatures(275, 645, n), sigma, new Random(2024)));

        for (int k = 0; k < 6; k++)
        {
            double z = (fit.Parameters[k] - WaterCoefficients[k]) / fit.StandardErrors[k];
            output.WriteLine($"a{k + 1}: z = {z:F2}");
            AssertClose.InRange(-4, 4, z, $"(a{k + 1} − true)/standard error");
        }

        double spread = 5 * Math.Sqrt(2.0 / (n - 6));
        AssertClose.Relative(sigma * sigma, fit.ReducedChiSquare!.Value, spread, "reduced chi-square against σ²");
    }

    [Fact]
    public void Fit_AntoineOnFiftyThousandPoints_RecoversItsConstantsThroughLevenbergMarquardt()
    {
        // Antoine is nonlinear in C and goes through Levenberg–Marquardt; with 50 000 points the
        // weight matrix MathNet used to build would have been 20 GB. Constants and tolerance as in
        // the 12-point test: the minimiser's stopping rule limits the recovery of the strongly
        // correlated A, B, C to ~1e-8 relative; 1e-6.
        // Water, log10(P/mmHg) = 8.07131 − 1730.63/(t/°C + 233.426) (commonly tabulated, from memory).
        double[] c = [Math.Log(10) * (8.07131 + Math.Log10(133.322)), Math.Log(10) * 1730.63, 233.426 - 273.15];
        var fit = VapourPressureFitter.Fit(new AntoineForm(), Points(t => c[0] - c[1] / (t + c[2]), Temperatures(275, 373, 50_000)));

        output.WriteLine($"{fit.Iterations} iterations, {fit.StopReason}");
        Assert.NotEqual(VapourPressureFitter.DirectLinearSolve, fit.StopReason);
        for (int k = 0; k < 3; k++)
        {
            AssertClose.Relative(c[k], fit.Parameters[k], 1e-6, fit.Form.ParameterNames[k]);
        }
    }
}
