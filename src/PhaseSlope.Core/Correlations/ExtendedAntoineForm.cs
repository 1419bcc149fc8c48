namespace PhaseSlope.Core.Correlations;

/// <summary>Extended Antoine form, ln P = A + B/(T + C) + D·T + E·ln T + F·T^G (P in Pa, T in
/// K): the general seven-constant form in which process-design data compilations print vapour
/// pressures. It holds the Antoine form (D = E = F = 0, B &lt; 0; Antoine 1888), the Kirchhoff
/// form (C = D = F = 0; Kirchhoff 1858) and the Riedel form (C = D = 0, G = 6; Riedel, Chem. Ing.
/// Tech. 26, 83 (1954)) as special cases. PhaseSlope's identifier is <c>antoine-extended</c>.</summary>
/// <remarks>Used by the audit to evaluate printed sets; with a pole at T = −C and a free exponent
/// G, seven constants are too many to fit to a handful of points, so <c>fit</c> does not offer it.
/// d ln P/dT = −B/(T + C)² + D + E/T + F·G·T^(G−1).</remarks>
public sealed class ExtendedAntoineForm : VapourPressureForm
{
    /// <inheritdoc />
    public override string Id => "antoine-extended";

    /// <inheritdoc />
    public override string Description => "ln(P/Pa) = A + B/(T/K + C) + D (T/K) + E ln(T/K) + F (T/K)^G (extended Antoine form)";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; } = ["A", "B", "C", "D", "E", "F", "G"];

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p)
        => p[0] + p[1] / (t + p[2]) + p[3] * t + p[4] * Math.Log(t) + p[5] * Math.Pow(t, p[6]);

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p)
    {
        double u = t + p[2];
        return -p[1] / (u * u) + p[3] + p[4] / t + p[5] * p[6] * Math.Pow(t, p[6] - 1);
    }

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p)
    {
        double u = t + p[2];
        return 2 * p[1] / (u * u * u) - p[4] / (t * t) + p[5] * p[6] * (p[6] - 1) * Math.Pow(t, p[6] - 2);
    }

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        double u = t + p[2];
        double power = Math.Pow(t, p[6]);
        g[0] = 1;
        g[1] = 1 / u;
        g[2] = -p[1] / (u * u);
        g[3] = t;
        g[4] = Math.Log(t);
        g[5] = power;
        g[6] = p[5] * power * Math.Log(t);
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        double u = t + p[2];
        double power = Math.Pow(t, p[6] - 1);
        g[0] = 0;
        g[1] = -1 / (u * u);
        g[2] = 2 * p[1] / (u * u * u);
        g[3] = 1;
        g[4] = 1 / t;
        g[5] = p[6] * power;
        g[6] = p[5] * power * (1 + p[6] * Math.Log(t));
    }

    /// <inheritdoc />
    /// <remarks>C = 0 and G = 6 (the Riedel exponent) make the form linear in A, B, D, E and F;
    /// their weighted least-squares solution is the start.</remarks>
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w)
    {
        var c = LinearFit(t, lnP, w, _ => 1, x => 1 / x, x => x, Math.Log, x => Math.Pow(x, 6));
        return [c[0], c[1], 0, c[2], c[3], c[4], 6];
    }
}
