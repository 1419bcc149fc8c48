using PhaseSlope.Core.Correlations;

namespace PhaseSlope.Core.Tests.Correlations;

/// <summary>Synthetic vapour-pressure data for the correlation tests: the IAPWS saturation
/// equation for water and seeded Gaussian noise.</summary>
internal static class SyntheticSaturationData
{
    /// <summary>Tc of water, K (IAPWS; Wagner &amp; Pruss, J. Phys. Chem. Ref. Data 22, 783 (1993), from memory).</summary>
    public const double WaterTc = 647.096;

    /// <summary>Pc of water, Pa (same source, from memory).</summary>
    public const double WaterPc = 22.064e6;

    /// <summary>The six coefficients a1…a6 of the saturation-pressure equation
    /// ln(P/Pc) = (Tc/T)(a1τ + a2τ^1.5 + a3τ³ + a4τ^3.5 + a5τ⁴ + a6τ^7.5), τ = 1 − T/Tc
    /// (Wagner &amp; Pruss 1993, from memory).</summary>
    public static readonly double[] WaterCoefficients =
        [-7.85951783, 1.84408259, -11.7866497, 22.6807411, -15.9618719, 1.80122502];

    /// <summary>ln(P/Pa) of saturated water at T (K), written out independently of WagnerForm.</summary>
    public static double WaterLnPressure(double t)
    {
        double[] a = WaterCoefficients;
        double tau = 1 - t / WaterTc;
        double sum = a[0] * tau + a[1] * Math.Pow(tau, 1.5) + a[2] * Math.Pow(tau, 3)
            + a[3] * Math.Pow(tau, 3.5) + a[4] * Math.Pow(tau, 4) + a[5] * Math.Pow(tau, 7.5);
        return Math.Log(WaterPc) + WaterTc / t * sum;
    }

    /// <summary>ln(P/Pa) of a Wagner 2.5-5 form for water with the Ambrose–Walton coefficients at
    /// ω = 0.3443 (a_i = c0_i + ω·c1_i + ω²·c2_i: a smooth, realistic 2.5-5 curve).</summary>
    public static double TwoHalfFiveLnPressure(double t)
    {
        var (f0, f1, f2) = PhaseSlope.Core.Estimation.CorrespondingStates.AmbroseWaltonTerms(t / WaterTc);
        const double w = 0.3443;
        return Math.Log(WaterPc) + f0 + w * f1 + w * w * f2;
    }

    /// <summary>n temperatures evenly spaced from low to high inclusive.</summary>
    public static double[] Temperatures(double low, double high, int n)
        => [.. Enumerable.Range(0, n).Select(i => low + (high - low) * i / (n - 1))];

    /// <summary>Points (T, exp(ln P(T) + σ·ε)) with ε standard normal from the given generator
    /// (null for noise-free data). With <paramref name="withUncertainty"/> each point carries
    /// u(P) = σ·P, i.e. u(ln P) = σ.</summary>
    public static VapourPressurePoint[] Points(Func<double, double> lnPressure, IReadOnlyList<double> temperatures, double sigma = 0, Random? random = null, bool withUncertainty = false)
        => [.. temperatures.Select(t =>
        {
            double p = Math.Exp(lnPressure(t) + (random is null ? 0 : sigma * Gaussian(random)));
            return new VapourPressurePoint(t, p, withUncertainty ? sigma * p : null);
        })];

    /// <summary>A standard normal deviate by the Box–Muller transform.</summary>
    public static double Gaussian(Random random)
    {
        double u1 = 1 - random.NextDouble(); // (0, 1]: the logarithm stays finite
        double u2 = random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u1)) * Math.Cos(2 * Math.PI * u2);
    }

    /// <summary>Fits of every fitted form to noise-free IAPWS water data from 280 K to 640 K
    /// (30 points): representative parameters of each form.</summary>
    public static IReadOnlyList<VapourPressureFit> WaterFits()
    {
        var data = Points(WaterLnPressure, Temperatures(280, 640, 30));
        VapourPressureForm[] forms =
        [
            new ClausiusClapeyronForm(), new AntoineForm(), new KirchhoffForm(), new RiedelForm(),
            WagnerForm.ThreeSix(WaterTc, WaterPc), WagnerForm.TwoHalfFive(WaterTc, WaterPc), WagnerForm.SixTerm(WaterTc, WaterPc),
        ];
        return [.. forms.Select(f => VapourPressureFitter.Fit(f, data))];
    }
}
