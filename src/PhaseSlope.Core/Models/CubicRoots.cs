namespace PhaseSlope.Core.Models;

/// <summary>Density roots of a cubic equation of state at given (T, P) in closed form.</summary>
/// <remarks>
/// With U = e1 + e2, W = e1·e2 (e_i = δ′_i·b) and b′ the repulsive co-volume,
/// P = RT/(v − b′) − aα/(v² + Uv + W) multiplied out is
/// P·v³ + [P(U − b′) − RT]·v² + [P(W − U·b′) − RT·U + aα]·v − [P·W·b′ + RT·W + aα·b′] = 0.
/// In Z = Pv/(RT) the coefficients are of order one; the roots come from the trigonometric
/// form when all three are real and from Cardano's formula when one is. Each root is then
/// polished by Newton steps on P(v) itself (the same pressure the Helmholtz function gives),
/// which recovers the digits the closed form loses for a dense liquid beside a dilute vapour.
/// Of three real roots the middle one is mechanically unstable and dropped; a root is kept only
/// where (∂P/∂v)_T &lt; 0 and v &gt; b′. No Helmholtz evaluation is made.
/// </remarks>
internal static class CubicRoots
{
    private const double R = Constants.GasConstant;

    public static int Find(double temperature, double pressure, double b, double bRep, double delta1, double delta2, double aAlpha, Span<double> roots)
    {
        double rt = R * temperature;
        double e1 = delta1 * b;
        double e2 = delta2 * b;
        double u = e1 + e2;
        double w = e1 * e2;

        // Coefficients of Z³ + c2·Z² + c1·Z + c0 with Z = P·v/(RT).
        double s = pressure / rt;
        double c2 = s * (u - bRep) - 1;
        double c1 = s * s * (w - u * bRep) - s * u + s * aAlpha / rt;
        double c0 = -(s * s * s * w * bRep + s * s * w + s * s * aAlpha * bRep / rt);

        Span<double> z = stackalloc double[3];
        int real = SolveCubic(c2, c1, c0, z);
        if (c0 != 0)
        {
            // The closed form gives each root to an absolute error of ~1e-16 of the largest, which
            // at Psat/Pc ~ 1e-14 leaves nothing of a liquid Z of 1e-12 (it may even lose the root).
            // The reversed cubic in y = 1/Z, y³ + (c1/c0)·y² + (c2/c0)·y + 1/c0 = 0, has the
            // liquid and middle roots as its largest, so there they come out to full relative
            // precision; the vapour root stays with the direct form.
            Span<double> y = stackalloc double[3];
            if (SolveCubic(c1 / c0, c2 / c0, 1 / c0, y) == 3 && y[2] > 0 && y[1] > 0)
            {
                double vapour = z[real == 3 ? 2 : 0];
                z[0] = 1 / y[2];
                z[1] = 1 / y[1];
                z[2] = Math.Max(vapour, z[1]);
                real = 3;
            }
        }

        int count = 0;
        double lastKept = double.NaN;
        for (int i = 0; i < real; i++)
        {
            if (real == 3 && i == 1)
            {
                continue; // the middle root lies on the unstable branch
            }

            double v = z[i] / s;
            if (!(v > bRep))
            {
                continue;
            }

            v = Polish(v, rt, bRep, u, w, aAlpha, pressure);
            if (!(v > bRep) || !(PressureVolumeSlope(v, rt, bRep, u, w, aAlpha) < 0))
            {
                continue;
            }

            double rho = 1 / v;
            if (count > 0 && Math.Abs(rho - lastKept) <= 1e-12 * rho)
            {
                continue;
            }

            roots[count++] = rho;
            lastKept = rho;
        }

        // Increasing density: the roots came in increasing Z, i.e. decreasing density.
        if (count == 2)
        {
            (roots[0], roots[1]) = (roots[1], roots[0]);
        }

        return count;
    }

    private static double PressureAt(double v, double rt, double bRep, double u, double w, double aAlpha)
        => rt / (v - bRep) - aAlpha / (v * (v + u) + w);

    private static double PressureVolumeSlope(double v, double rt, double bRep, double u, double w, double aAlpha)
    {
        double d = v * (v + u) + w;
        double r = v - bRep;
        return -rt / (r * r) + aAlpha * (2 * v + u) / (d * d);
    }

    /// <summary>Newton on P(v) = P; stops when the step no longer shrinks (rounding) or after 4 steps.</summary>
    private static double Polish(double v, double rt, double bRep, double u, double w, double aAlpha, double pressure)
    {
        double lastStep = double.PositiveInfinity;
        for (int i = 0; i < 4; i++)
        {
            double slope = PressureVolumeSlope(v, rt, bRep, u, w, aAlpha);
            if (!(slope < 0))
            {
                break;
            }

            double step = (PressureAt(v, rt, bRep, u, w, aAlpha) - pressure) / slope;
            double next = v - step;
            if (!(next > bRep) || !(Math.Abs(step) < lastStep))
            {
                break;
            }

            v = next;
            lastStep = Math.Abs(step);
            if (lastStep <= 1e-16 * v)
            {
                break;
            }
        }

        return v;
    }

    /// <summary>Real roots of x³ + a·x² + b·x + c = 0 in increasing order; returns 1 or 3.</summary>
    internal static int SolveCubic(double a, double b, double c, Span<double> x)
    {
        // Depressed cubic x = y − a/3: y³ + p·y + q = 0.
        double a3 = a / 3;
        double p = b - a * a3;
        double q = c + a3 * (2 * a3 * a3 - b);
        double p3 = p / 3;
        double q2 = q / 2;
        double disc = q2 * q2 + p3 * p3 * p3;
        if (disc < 0)
        {
            // Three real roots: y = 2√(−p/3)·cos(θ/3 − 2πk/3).
            double m = Math.Sqrt(-p3);
            // disc < 0 means q2² < (−p/3)³, so |q2|/m³ < 1 exactly; the clamp only absorbs the
            // last-bit rounding of that ratio next to a double root, never a wrong input.
            double cos = Math.Clamp(-q2 / (m * m * m), -1, 1);
            double theta = Math.Acos(cos) / 3;
            double y0 = 2 * m * Math.Cos(theta);
            double y1 = 2 * m * Math.Cos(theta - 2 * Math.PI / 3);
            double y2 = 2 * m * Math.Cos(theta + 2 * Math.PI / 3);
            x[0] = Math.Min(y0, Math.Min(y1, y2)) - a3;
            x[2] = Math.Max(y0, Math.Max(y1, y2)) - a3;
            x[1] = y0 + y1 + y2 - (x[0] + a3) - (x[2] + a3) - a3;
            return 3;
        }

        // One real root (or a repeated one): Cardano, written to avoid cancellation.
        double sq = Math.Sqrt(disc);
        double t = Math.Cbrt(-q2 + (q2 <= 0 ? sq : -sq));
        double y = t != 0 ? t - p3 / t : 0;
        x[0] = y - a3;
        return 1;
    }
}
