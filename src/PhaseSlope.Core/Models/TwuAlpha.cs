using System.Globalization;

namespace PhaseSlope.Core.Models;

/// <summary>The alpha function of Twu, Bluck, Cunningham &amp; Coon, Fluid Phase Equilib. 69, 33
/// (1991): α = Tr^(N(M−1))·exp[L(1 − Tr^(NM))], with three constants L, M, N fitted for one
/// fluid and one cubic form.</summary>
/// <remarks>
/// With p = N(M − 1), q = NM and Tr = T/Tc, ln α = p·ln Tr + L(1 − Tr^q), so
/// dα/dT = α·g with g = (p − L·q·Tr^q)/T, and
/// d²α/dT² = α·[g² − (p − L·q·Tr^q)/T² − L·q²·Tr^q/T²].
/// α(Tc) = 1 for any L, M, N. One set of constants is used at every temperature.
/// </remarks>
public sealed class TwuAlpha : IAlphaFunction
{
    private readonly double _criticalTemperature;
    private readonly double _p;
    private readonly double _q;

    /// <summary>Creates the alpha function from L, M, N and the critical temperature in K.</summary>
    /// <param name="l">L (dimensionless).</param>
    /// <param name="m">M (dimensionless).</param>
    /// <param name="n">N (dimensionless).</param>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="source">Where the constants come from, for <see cref="Description"/>.</param>
    public TwuAlpha(double l, double m, double n, double criticalTemperature, string source)
    {
        Preconditions.Finite(l, "Twu L");
        Preconditions.Finite(m, "Twu M");
        Preconditions.Finite(n, "Twu N");
        Preconditions.Positive(criticalTemperature, "critical temperature");
        L = l;
        M = m;
        N = n;
        _criticalTemperature = criticalTemperature;
        _p = n * (m - 1);
        _q = n * m;
        var c = CultureInfo.InvariantCulture;
        Description = $"alpha = Tr^(N(M-1)) exp[L(1 - Tr^(NM))] (Twu et al. 1991), L = {l.ToString("R", c)}, M = {m.ToString("R", c)}, N = {n.ToString("R", c)} ({source})";
    }

    /// <summary>L.</summary>
    public double L { get; }

    /// <summary>M.</summary>
    public double M { get; }

    /// <summary>N.</summary>
    public double N { get; }

    /// <inheritdoc />
    public string Description { get; }

    /// <inheritdoc />
    public AlphaValue Evaluate(double temperature)
    {
        double tr = temperature / _criticalTemperature;
        double trq = Math.Pow(tr, _q);
        double alpha = Math.Pow(tr, _p) * Math.Exp(L * (1 - trq));
        double k = _p - L * _q * trq;             // T·d ln α/dT
        double g = k / temperature;               // d ln α/dT
        double gT = -(k + L * _q * _q * trq) / (temperature * temperature);   // d²ln α/dT²
        return new AlphaValue(alpha, alpha * g, alpha * (g * g + gT));
    }

    /// <inheritdoc />
    /// <remarks>With ℓ = ln α, K = N(M − 1) − L·NM·Tr^(NM) and Q = L(NM)²·Tr^(NM): ℓ′ = K/T,
    /// ℓ″ = −(K + Q)/T², ℓ‴ = [2K + Q(3 − NM)]/T³, and α‴ = α(ℓ′³ + 3ℓ′ℓ″ + ℓ‴).</remarks>
    public double ThirdDerivative(double temperature)
    {
        double tr = temperature / _criticalTemperature;
        double trq = Math.Pow(tr, _q);
        double alpha = Math.Pow(tr, _p) * Math.Exp(L * (1 - trq));
        double k = _p - L * _q * trq;
        double q = L * _q * _q * trq;
        double t = temperature;
        double l1 = k / t, l2 = -(k + q) / (t * t), l3 = (2 * k + q * (3 - _q)) / (t * t * t);
        return alpha * (l1 * l1 * l1 + 3 * l1 * l2 + l3);
    }
}
