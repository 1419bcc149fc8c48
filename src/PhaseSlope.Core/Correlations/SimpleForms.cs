namespace PhaseSlope.Core.Correlations;

/// <summary>Clausius–Clapeyron two-constant form, ln P = A − B/T (P in Pa, T in K): a constant
/// latent heat and an ideal-gas vapour (Clausius 1850, Clapeyron 1834).</summary>
public sealed class ClausiusClapeyronForm : VapourPressureForm
{
    /// <inheritdoc />
    public override string Id => "clausius-clapeyron";

    /// <inheritdoc />
    public override string Description => "ln(P/Pa) = A - B/(T/K) (Clausius-Clapeyron two-constant form)";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; } = ["A", "B"];

    /// <inheritdoc />
    public override bool IsLinearInParameters => true;

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p) => p[0] - p[1] / t;

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p) => p[1] / (t * t);

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p) => -2 * p[1] / (t * t * t);

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        g[0] = 1;
        g[1] = -1 / t;
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        g[0] = 0;
        g[1] = 1 / (t * t);
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w)
    {
        var c = LinearFit(t, lnP, w, _ => 1, x => -1 / x);
        return c;
    }
}

/// <summary>Antoine form, ln P = A − B/(T + C) (P in Pa, T in K; Antoine 1888). It has a pole at
/// T = −C and is meant for a limited range, typically well below Tc.</summary>
public sealed class AntoineForm : VapourPressureForm
{
    /// <inheritdoc />
    public override string Id => "antoine";

    /// <inheritdoc />
    public override string Description => "ln(P/Pa) = A - B/(T/K + C) (Antoine 1888)";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; } = ["A", "B", "C"];

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p) => p[0] - p[1] / (t + p[2]);

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p)
    {
        double u = t + p[2];
        return p[1] / (u * u);
    }

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p)
    {
        double u = t + p[2];
        return -2 * p[1] / (u * u * u);
    }

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        double u = t + p[2];
        g[0] = 1;
        g[1] = -1 / u;
        g[2] = p[1] / (u * u);
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        double u = t + p[2];
        g[0] = 0;
        g[1] = 1 / (u * u);
        g[2] = -2 * p[1] / (u * u * u);
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w)
    {
        // For a fixed C the form is linear in A and B: scan C over the range handbook fits span
        // (from −0.8·Tmin to +0.2·Tmin), keep the C whose best line fits best, and solve for A
        // and B there by the QR of LinearFit.
        double tMin = t.Min();
        double bestC = 0;
        double bestSse = double.PositiveInfinity;
        for (int k = 0; k <= 100; k++)
        {
            double c = tMin * (-0.8 + k / 100.0);
            double sse = LineMisfit(t, lnP, w, c);
            if (sse < bestSse)
            {
                bestSse = sse;
                bestC = c;
            }
        }

        var ab = LinearFit(t, lnP, w, _ => 1, x => -1 / (x + bestC));
        return [ab[0], ab[1], bestC];
    }

    /// <summary>Weighted χ² of the best straight line ln P = A + B·x, x = −1/(T + C), by the
    /// centred closed form of a two-parameter fit.</summary>
    /// <remarks>Written out rather than by a MathNet QR per candidate: the scan has 101
    /// candidates, and 101 QR factorisations of an n×2 matrix allocate ~9 kB per data point
    /// (about 1 GB of short-lived arrays per fit to 100 000 points); these sums allocate nothing. Centring keeps the sums accurate, and
    /// only the comparison between candidates uses them: χ² is stationary at the best line, so
    /// its rounding differs from the QR's only in the second order.</remarks>
    private static double LineMisfit(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w, double c)
    {
        int n = t.Count;
        double sw = 0, sx = 0, sy = 0;
        for (int i = 0; i < n; i++)
        {
            double x = -1 / (t[i] + c);
            sw += w[i];
            sx += w[i] * x;
            sy += w[i] * lnP[i];
        }

        double xMean = sx / sw, yMean = sy / sw;
        double sxx = 0, sxy = 0;
        for (int i = 0; i < n; i++)
        {
            double dx = -1 / (t[i] + c) - xMean;
            sxx += w[i] * dx * dx;
            sxy += w[i] * dx * (lnP[i] - yMean);
        }

        double slope = sxy / sxx;
        double sse = 0;
        for (int i = 0; i < n; i++)
        {
            double r = lnP[i] - yMean - slope * (-1 / (t[i] + c) - xMean);
            sse += w[i] * r * r;
        }

        return sse;
    }
}

/// <summary>Kirchhoff three-constant form, ln P = A + B/T + C·ln T (P in Pa, T in K;
/// Kirchhoff 1858): the latent heat linear in T.</summary>
public sealed class KirchhoffForm : VapourPressureForm
{
    /// <inheritdoc />
    public override string Id => "kirchhoff";

    /// <inheritdoc />
    public override string Description => "ln(P/Pa) = A + B/(T/K) + C ln(T/K) (Kirchhoff 1858)";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; } = ["A", "B", "C"];

    /// <inheritdoc />
    public override bool IsLinearInParameters => true;

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p) => p[0] + p[1] / t + p[2] * Math.Log(t);

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p) => -p[1] / (t * t) + p[2] / t;

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p) => 2 * p[1] / (t * t * t) - p[2] / (t * t);

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        g[0] = 1;
        g[1] = 1 / t;
        g[2] = Math.Log(t);
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        g[0] = 0;
        g[1] = -1 / (t * t);
        g[2] = 1 / t;
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w)
        => LinearFit(t, lnP, w, _ => 1, x => 1 / x, Math.Log);
}

/// <summary>Riedel form, ln P = A + B/T + C·ln T + D·T⁶ (P in Pa, T in K; Riedel, Chem. Ing.
/// Tech. 26, 83 (1954)); the T⁶ term bends the curve toward the critical point.</summary>
public sealed class RiedelForm : VapourPressureForm
{
    /// <inheritdoc />
    public override string Id => "riedel";

    /// <inheritdoc />
    public override string Description => "ln(P/Pa) = A + B/(T/K) + C ln(T/K) + D (T/K)^6 (Riedel 1954)";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames { get; } = ["A", "B", "C", "D"];

    /// <inheritdoc />
    public override bool IsLinearInParameters => true;

    /// <inheritdoc />
    public override double LnPressure(double t, IReadOnlyList<double> p) => p[0] + p[1] / t + p[2] * Math.Log(t) + p[3] * Math.Pow(t, 6);

    /// <inheritdoc />
    public override double Slope(double t, IReadOnlyList<double> p) => -p[1] / (t * t) + p[2] / t + 6 * p[3] * Math.Pow(t, 5);

    /// <inheritdoc />
    public override double Curvature(double t, IReadOnlyList<double> p) => 2 * p[1] / (t * t * t) - p[2] / (t * t) + 30 * p[3] * Math.Pow(t, 4);

    /// <inheritdoc />
    public override void LnPressureGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        g[0] = 1;
        g[1] = 1 / t;
        g[2] = Math.Log(t);
        g[3] = Math.Pow(t, 6);
    }

    /// <inheritdoc />
    public override void SlopeGradient(double t, IReadOnlyList<double> p, Span<double> g)
    {
        g[0] = 0;
        g[1] = -1 / (t * t);
        g[2] = 1 / t;
        g[3] = 6 * Math.Pow(t, 5);
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> t, IReadOnlyList<double> lnP, IReadOnlyList<double> w)
        => LinearFit(t, lnP, w, _ => 1, x => 1 / x, Math.Log, x => Math.Pow(x, 6));
}
