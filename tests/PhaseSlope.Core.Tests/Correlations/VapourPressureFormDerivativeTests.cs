using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Tests.TestSupport;
using static PhaseSlope.Core.Tests.Correlations.SyntheticSaturationData;

namespace PhaseSlope.Core.Tests.Correlations;

/// <summary>Each form's analytic temperature derivatives and parameter gradients against central
/// differences of its own ln P, for parameters fitted to IAPWS water data (representative
/// magnitudes: Riedel's D ~ 1e-17 beside A ~ 10², Wagner's a_i ~ 1–20).</summary>
public class VapourPressureFormDerivativeTests
{
    private static readonly Lazy<IReadOnlyList<VapourPressureFit>> Fits = new(WaterFits);

    // Water's catalog-free constants for the predictive forms: Tc, Pc above, ω = 0.3443
    // (IAPWS Psat at Tr = 0.7, commonly tabulated value, from memory).
    private const double WaterOmega = 0.3443;

    public static TheoryData<string, double> FormsAndTemperatures()
    {
        var data = new TheoryData<string, double>();
        string[] ids = ["clausius-clapeyron", "antoine", "kirchhoff", "riedel", "antoine-extended", "wagner-3-6", "wagner-2.5-5", "wagner-6", "lee-kesler", "ambrose-walton"];
        foreach (string id in ids)
        {
            // Low, middle and near-critical (τ ≈ 0.04, where the τ^1.5 term's curvature is large).
            foreach (double t in new[] { 290.0, 450.0, 620.0 })
            {
                data.Add(id, t);
            }
        }

        return data;
    }

    private static (VapourPressureForm Form, double[] Parameters) Get(string id) => id switch
    {
        "lee-kesler" => (CorrespondingStatesForm.LeeKesler(WaterTc, WaterPc, WaterOmega), []),
        "ambrose-walton" => (CorrespondingStatesForm.AmbroseWalton(WaterTc, WaterPc, WaterOmega), []),
        // Perry's Chemical Engineers' Handbook, 7th ed., Table 2-6 water set (ln(P/Pa) = 73.649 −
        // 7258.2/T − 7.3037 ln T + 4.1653e-6 T², from memory) with C = −5 K and D = 1e-4 1/K
        // (invented) so that every parameter is non-zero and every gradient entry is exercised.
        "antoine-extended" => (new ExtendedAntoineForm(), [73.649, -7258.2, -5, 1e-4, -7.3037, 4.1653e-6, 2]),
        _ => Fits.Value.Single(f => f.Form.Id == id) is var fit ? (fit.Form, [.. fit.Parameters]) : default,
    };

    [Theory]
    [MemberData(nameof(FormsAndTemperatures))]
    public void Slope_AnyForm_EqualsCentralDifferenceOfLnPressure(string id, double t)
    {
        var (form, p) = Get(id);
        double h = 0.05;
        double fd = FiniteDifference.Central5(x => form.LnPressure(x, p), t, h);
        // Rounding: ln P ~ 10–20 is a sum of terms up to ~10³ (Riedel), ε_f ≲ 1e-13, so
        // 1.5·ε_f/h ≈ 3e-12 beside a slope of 1e-2 to 7e-2 1/K: 3e-10 relative. Truncation
        // h⁴·f⁽⁵⁾/30 is far smaller at these T (τ ≥ 0.04). 1e-8 leaves a margin of ~30.
        AssertClose.Relative(fd, form.Slope(t, p), 1e-8, $"{id} d lnP/dT at {t} K");
    }

    [Theory]
    [MemberData(nameof(FormsAndTemperatures))]
    public void Curvature_AnyForm_EqualsSecondCentralDifferenceOfLnPressure(string id, double t)
    {
        var (form, p) = Get(id);
        double h = 0.5;
        double F(double x) => form.LnPressure(x, p);
        // Five-point second difference: truncation h⁴·f⁽⁶⁾/90, rounding ~ 64·ε_f/(12h²) ≈ 3e-13
        // beside |d²lnP/dT²| of order 1e-5–1e-3 1/K² (for Clausius–Clapeyron 2B/T³ = 4e-5 at
        // 620 K with B ≈ 5000 K): ≲ 3e-8 relative. Near Tc the
        // τ^1.5 term gives f⁽⁶⁾ ~ Tc^-6·τ^-4.5 ≈ 5e-11 at 620 K: 3e-14 absolute. 1e-6 relative.
        double fd = (-F(t + 2 * h) + 16 * F(t + h) - 30 * F(t) + 16 * F(t - h) - F(t - 2 * h)) / (12 * h * h);
        AssertClose.Relative(fd, form.Curvature(t, p), 1e-6, $"{id} d2 lnP/dT2 at {t} K");
    }

    [Theory]
    [MemberData(nameof(FormsAndTemperatures))]
    public void PressureSlope_AnyFittedForm_EqualsCentralDifferenceOfPressure(string id, double t)
    {
        var (form, p) = Get(id);
        var fit = new VapourPressureFit
        {
            Form = form, Parameters = p, Covariance = new double[p.Length, p.Length],
            Data = [new(t, 1e5)], Weights = [1], AbsoluteUncertainties = false, ChiSquare = 0, Aicc = null, Iterations = 0, StopReason = "test",
        };
        double fd = FiniteDifference.Central5(fit.Pressure, t, 0.05);
        // exp() carries ln P's rounding (≲ 1e-13 absolute) into P relatively; same budget as
        // the slope test: 1e-8.
        AssertClose.Relative(fd, fit.PressureSlope(t), 1e-8, $"{id} dP/dT at {t} K");
    }

    [Theory]
    [MemberData(nameof(FormsAndTemperatures))]
    public void ParameterGradients_AnyFittedForm_EqualCentralDifferencesInParameters(string id, double t)
    {
        var (form, p) = Get(id);
        int n = p.Length;
        var gLn = new double[n];
        var gSlope = new double[n];
        form.LnPressureGradient(t, p, gLn);
        form.SlopeGradient(t, p, gSlope);
        Assert.True(n > 0 || id is "lee-kesler" or "ambrose-walton", $"{id} has parameters");

        // The largest single term g_j·θ_j sets the rounding of the difference quotients.
        double lnScale = Enumerable.Range(0, n).Select(j => Math.Abs(gLn[j] * p[j])).DefaultIfEmpty(0).Max();
        double slopeScale = Enumerable.Range(0, n).Select(j => Math.Abs(gSlope[j] * p[j])).DefaultIfEmpty(0).Max();
        for (int j = 0; j < n; j++)
        {
            int k = j;
            double h = 1e-4 * Math.Abs(p[j]);
            double[] Shifted(double v)
            {
                var q = (double[])p.Clone();
                q[k] = v;
                return q;
            }

            double fdLn = FiniteDifference.Central5(v => form.LnPressure(t, Shifted(v)), p[j], h);
            double fdSlope = FiniteDifference.Central5(v => form.Slope(t, Shifted(v)), p[j], h);
            // Rounding of the quotient ≈ 1.5·ε·scale/h = 1.5e-12·scale/|θ_j| (ε ~ 1e-16);
            // truncation vanishes for parameters entering linearly and is ~(1e-4)⁴ relative for
            // Antoine's C. Tolerance 1e-9·scale/|θ_j|: a margin of ~10³, while a wrong term
            // (error ~ |g_j| ~ term/|θ_j|, terms here ≥ 1e-3·scale) would exceed it by 10⁶.
            AssertClose.Absolute(fdLn, gLn[j], 1e-9 * lnScale / Math.Abs(p[j]), $"{id} d lnP/d{form.ParameterNames[j]} at {t} K");
            AssertClose.Absolute(fdSlope, gSlope[j], 1e-9 * slopeScale / Math.Abs(p[j]), $"{id} d(dlnP/dT)/d{form.ParameterNames[j]} at {t} K");
        }
    }
}
