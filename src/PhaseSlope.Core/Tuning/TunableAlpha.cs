using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Core.Tuning;

/// <summary>An alpha family whose parameters can be tuned to data: it builds the alpha function
/// from a parameter vector, gives the exact derivatives ∂α/∂θ that move Psat, and a start.</summary>
public abstract class TunableAlpha
{
    /// <summary>The family.</summary>
    public abstract AlphaForm Form { get; }

    /// <summary>The parameter names, in order.</summary>
    public IReadOnlyList<string> ParameterNames => CubicModel.AlphaParameterNames(Form);

    /// <summary>Whether the published form asks for a convex α (d²α/dT² &gt; 0) as well as a
    /// positive, decreasing one: the Twu (1991) function's parameters are constrained so in the
    /// consistency analysis of the form (Le Guennec, Privat &amp; Jaubert, Fluid Phase Equilib. 429,
    /// 301 (2016); from memory). For the polynomial forms convexity is reported, not required.</summary>
    public abstract bool RequiresConvexity { get; }

    /// <summary>The alpha function with parameters <paramref name="parameters"/>.</summary>
    public abstract IAlphaFunction Create(IReadOnlyList<double> parameters, double criticalTemperature, string source);

    /// <summary>∂α/∂θ_j at <paramref name="temperature"/>, written into <paramref name="gradient"/>.</summary>
    public abstract void Gradient(double temperature, double criticalTemperature, IReadOnlyList<double> parameters, Span<double> gradient);

    /// <summary>∂(dα/dT)/∂θ_j at <paramref name="temperature"/>, written into <paramref name="gradient"/>.</summary>
    public abstract void SlopeGradient(double temperature, double criticalTemperature, IReadOnlyList<double> parameters, Span<double> gradient);

    /// <summary>∂(d²α/dT²)/∂θ_j at <paramref name="temperature"/>, written into <paramref name="gradient"/>.</summary>
    public abstract void CurvatureGradient(double temperature, double criticalTemperature, IReadOnlyList<double> parameters, Span<double> gradient);

    /// <summary>The fluid's parameter set with its covariance as uncertain inputs for the
    /// propagation (<see cref="AlphaParameterUncertainty"/>): values, covariance, how to build α,
    /// and the exact ∂α/∂θ and ∂(dα/dT)/∂θ.</summary>
    /// <param name="set">The fluid's parameter set.</param>
    /// <param name="covariance">Its covariance.</param>
    /// <param name="criticalTemperature">The nominal Tc in K (the sensitivities are those of the nominal model).</param>
    public static AlphaParameterUncertainty Uncertainty(AlphaParameterSet set, double[,] covariance, double criticalTemperature)
    {
        ArgumentNullException.ThrowIfNull(set);
        ArgumentNullException.ThrowIfNull(covariance);
        var family = Of(set.Form);
        var values = set.Values.ToArray();
        var names = family.ParameterNames;
        var inputs = values.Select((v, j) => new UncertainInput($"alpha_{names[j]}", v, Math.Sqrt(Math.Max(covariance[j, j], 0)), set.Source)).ToArray();
        return new AlphaParameterUncertainty(
            inputs,
            Matrix<double>.Build.DenseOfArray(covariance),
            (tc, p) => family.Create(p, tc, set.Source),
            (t, k) =>
            {
                var g = new double[values.Length];
                var gs = new double[values.Length];
                family.Gradient(t, criticalTemperature, values, g);
                family.SlopeGradient(t, criticalTemperature, values, gs);
                return (g[k], gs[k]);
            })
        {
            CriticalSensitivity = set.CriticalSensitivity is { } d ? Matrix<double>.Build.DenseOfArray(d) : null,
            CurvatureSensitivity = (t, k) =>
            {
                var gc = new double[values.Length];
                family.CurvatureGradient(t, criticalTemperature, values, gc);
                return gc[k];
            },
        };
    }

    /// <summary>Starting parameters equivalent (or close) to the model's own alpha function for ω.</summary>
    public abstract double[] Start(CubicModelKind kind, double acentricFactor, double criticalTemperature);

    /// <summary>The family of <paramref name="form"/>.</summary>
    public static TunableAlpha Of(AlphaForm form) => form switch
    {
        AlphaForm.Soave => new SoaveFamily(),
        AlphaForm.MathiasCopeman => new MathiasCopemanFamily(),
        AlphaForm.Twu => new TwuFamily(),
        _ => throw new ArgumentOutOfRangeException(nameof(form), form, "the model's own alpha function has no parameters to tune"),
    };

    /// <summary>The model's own Soave slope m = κ(ω) (Peng–Robinson 1976 or 1978, or Soave 1972).</summary>
    private static double OwnSlope(CubicModelKind kind, double omega, double tc)
        => kind.Entry().OwnAlpha(omega, tc) is SoaveAlpha soave
            ? soave.Slope
            : throw new ArgumentOutOfRangeException(nameof(kind), kind, "the model's own alpha function is not of the Soave form");

    private sealed class SoaveFamily : TunableAlpha
    {
        public override AlphaForm Form => AlphaForm.Soave;

        public override bool RequiresConvexity => false;

        public override IAlphaFunction Create(IReadOnlyList<double> p, double tc, string source) => new SoaveAlpha(p[0], tc, source);

        public override void Gradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α = g², g = 1 + m·x, x = 1 − √Tr: ∂α/∂m = 2g·x.
            double x = 1 - Math.Sqrt(temperature / tc);
            gradient[0] = 2 * (1 + p[0] * x) * x;
        }

        public override void SlopeGradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α′ = 2g·m·x′ with x′ = dx/dT = −1/(2√(T·Tc)): ∂α′/∂m = 2x′·(g + m·x) = 2x′·(1 + 2m·x).
            var (x, dx, _, _) = RootTerm.At(temperature, tc);
            gradient[0] = 2 * dx * (1 + 2 * p[0] * x);
        }

        public override void CurvatureGradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α″ = 2m²x′² + 2(1 + m·x)·m·x″: ∂α″/∂m = 4m·x′² + 2x″·(1 + 2m·x).
            var (x, x1, x2, _) = RootTerm.At(temperature, tc);
            gradient[0] = 4 * p[0] * x1 * x1 + 2 * x2 * (1 + 2 * p[0] * x);
        }

        public override double[] Start(CubicModelKind kind, double omega, double tc) => [OwnSlope(kind, omega, tc)];
    }

    private sealed class MathiasCopemanFamily : TunableAlpha
    {
        public override AlphaForm Form => AlphaForm.MathiasCopeman;

        public override bool RequiresConvexity => false;

        public override IAlphaFunction Create(IReadOnlyList<double> p, double tc, string source) => new MathiasCopemanAlpha(p[0], p[1], p[2], tc, source);

        public override void Gradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // Below Tc α = g², g = 1 + c1x + c2x² + c3x³: ∂α/∂ck = 2g·x^k. Above Tc only c1 acts
            // (MathiasCopemanAlpha uses the Soave form there).
            double x = 1 - Math.Sqrt(temperature / tc);
            bool subcritical = temperature <= tc;
            double g = subcritical ? 1 + x * (p[0] + x * (p[1] + x * p[2])) : 1 + p[0] * x;
            gradient[0] = 2 * g * x;
            gradient[1] = subcritical ? 2 * g * x * x : 0;
            gradient[2] = subcritical ? 2 * g * x * x * x : 0;
        }

        public override void SlopeGradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α′ = 2g·g_x·x′: ∂α′/∂ck = 2x′·(x^k·g_x + g·k·x^(k−1)); above Tc only c1 acts.
            var (x, dx, _, _) = RootTerm.At(temperature, tc);
            bool subcritical = temperature <= tc;
            double c2 = subcritical ? p[1] : 0, c3 = subcritical ? p[2] : 0;
            double g = 1 + x * (p[0] + x * (c2 + x * c3));
            double gx = p[0] + x * (2 * c2 + 3 * c3 * x);
            gradient[0] = 2 * dx * (x * gx + g);
            gradient[1] = subcritical ? 2 * dx * (x * x * gx + 2 * g * x) : 0;
            gradient[2] = subcritical ? 2 * dx * (x * x * x * gx + 3 * g * x * x) : 0;
        }

        public override void CurvatureGradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α″ = 2g′² + 2g·g″ with g′ = g_x·x′, g″ = g_xx·x′² + g_x·x″; for c_k:
            // ∂g = x^k, ∂g′ = k·x^(k−1)·x′, ∂g″ = k(k−1)·x^(k−2)·x′² + k·x^(k−1)·x″.
            var (x, x1, x2, _) = RootTerm.At(temperature, tc);
            bool subcritical = temperature <= tc;
            double c2 = subcritical ? p[1] : 0, c3 = subcritical ? p[2] : 0;
            double g = 1 + x * (p[0] + x * (c2 + x * c3));
            double gx = p[0] + x * (2 * c2 + 3 * c3 * x);
            double gxx = 2 * c2 + 6 * c3 * x;
            double g1 = gx * x1, g2 = gxx * x1 * x1 + gx * x2;
            for (int k = 1; k <= 3; k++)
            {
                if (k > 1 && !subcritical)
                {
                    gradient[k - 1] = 0;
                    continue;
                }

                double dg = Math.Pow(x, k);
                double dg1 = k * Math.Pow(x, k - 1) * x1;
                double dg2 = (k > 1 ? k * (k - 1) * Math.Pow(x, k - 2) * x1 * x1 : 0) + k * Math.Pow(x, k - 1) * x2;
                gradient[k - 1] = 4 * g1 * dg1 + 2 * dg * g2 + 2 * g * dg2;
            }
        }

        // With c2 = c3 = 0 the Mathias–Copeman function is the Soave form with m = c1.
        public override double[] Start(CubicModelKind kind, double omega, double tc) => [OwnSlope(kind, omega, tc), 0, 0];
    }

    private sealed class TwuFamily : TunableAlpha
    {
        public override AlphaForm Form => AlphaForm.Twu;

        public override bool RequiresConvexity => true;

        public override IAlphaFunction Create(IReadOnlyList<double> p, double tc, string source) => new TwuAlpha(p[0], p[1], p[2], tc, source);

        public override void Gradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // ln α = N(M − 1)·ln Tr + L(1 − Tr^(NM)), ∂α/∂θ = α·∂ln α/∂θ.
            double l = p[0], m = p[1], n = p[2];
            double lnTr = Math.Log(temperature / tc);
            double power = Math.Exp(n * m * lnTr);
            double alpha = Math.Exp(n * (m - 1) * lnTr + l * (1 - power));
            gradient[0] = alpha * (1 - power);
            gradient[1] = alpha * (n * lnTr - l * power * n * lnTr);
            gradient[2] = alpha * ((m - 1) * lnTr - l * power * m * lnTr);
        }

        public override void SlopeGradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α′ = α·q with q = d ln α/dT = [N(M − 1) − L·N·M·Tr^(NM)]/T, so ∂α′/∂θ = ∂α/∂θ·q + α·∂q/∂θ.
            double l = p[0], m = p[1], n = p[2];
            double lnTr = Math.Log(temperature / tc);
            double power = Math.Exp(n * m * lnTr);
            double alpha = Math.Exp(n * (m - 1) * lnTr + l * (1 - power));
            double q = (n * (m - 1) - l * n * m * power) / temperature;
            Span<double> da = stackalloc double[3];
            Gradient(temperature, tc, p, da);
            gradient[0] = da[0] * q + alpha * (-n * m * power / temperature);
            gradient[1] = da[1] * q + alpha * (n - l * n * power * (1 + m * n * lnTr)) / temperature;
            gradient[2] = da[2] * q + alpha * ((m - 1) - l * m * power * (1 + n * m * lnTr)) / temperature;
        }

        public override void CurvatureGradient(double temperature, double tc, IReadOnlyList<double> p, Span<double> gradient)
        {
            // α″ = α(ℓ′² + ℓ″), ℓ′ = K/T, ℓ″ = −(K + Q)/T², K = p − L·q·E, Q = L·q²·E, E = Tr^q,
            // p = N(M − 1), q = NM; ∂α″/∂θ = ∂α/∂θ·(ℓ′² + ℓ″) + α·(2ℓ′·∂K/T − (∂K + ∂Q)/T²).
            double l = p[0], m = p[1], n = p[2];
            double t = temperature;
            double lnTr = Math.Log(t / tc);
            double q = n * m, pw = n * (m - 1);
            double e = Math.Exp(q * lnTr);
            double alpha = Math.Exp(pw * lnTr + l * (1 - e));
            double k = pw - l * q * e, qq = l * q * q * e;
            double l1 = k / t, l2 = -(k + qq) / (t * t);
            Span<double> da = stackalloc double[3];
            Gradient(temperature, tc, p, da);
            // ∂K and ∂Q for L, M, N.
            Span<double> dk = [-q * e, n - l * n * e * (1 + q * lnTr), (m - 1) - l * m * e * (1 + q * lnTr)];
            Span<double> dq = [q * q * e, l * n * q * e * (2 + q * lnTr), l * m * q * e * (2 + q * lnTr)];
            for (int j = 0; j < 3; j++)
            {
                gradient[j] = da[j] * (l1 * l1 + l2) + alpha * (2 * l1 * dk[j] / t - (dk[j] + dq[j]) / (t * t));
            }
        }

        // The generalised Twu (1995) constants for Peng–Robinson below Tc, interpolated in ω as
        // the generalised function interpolates α (a start, not a model: the fit moves it).
        public override double[] Start(CubicModelKind kind, double omega, double tc)
            => [0.125283 + omega * (0.511614 - 0.125283), 0.911807 + omega * (0.784054 - 0.911807), 1.948150 + omega * (2.812520 - 1.948150)];
    }
}
