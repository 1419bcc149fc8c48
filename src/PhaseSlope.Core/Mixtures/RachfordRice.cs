using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Mixtures;

/// <summary>The Rachford–Rice equation g(β) = Σ z_i (K_i − 1)/(1 + β(K_i − 1)) = 0 for the vapour
/// fraction β of a feed z at fixed K-values (Rachford &amp; Rice, J. Petrol. Technol. 4(10), 19
/// (1952)), solved by Newton's method kept inside a bracket that shrinks at every step, with a
/// bisection step whenever Newton would leave it (the safeguard of Michelsen &amp; Mollerup,
/// Thermodynamic Models, 2nd ed. (2007), ch. 10). g decreases monotonically between its
/// asymptotes β_min = 1/(1 − K_max) and β_max = 1/(1 − K_min), so the root is unique there.</summary>
public static class RachfordRice
{
    /// <summary>Default cap on iterations: bisection alone halves the bracket 200 times, far below
    /// rounding.</summary>
    public const int DefaultMaxIterations = 200;

    /// <summary>Solves for β.</summary>
    /// <param name="feed">The feed mole fractions z (non-negative, summing to 1).</param>
    /// <param name="k">The K-values (positive).</param>
    /// <param name="negativeFlash">Solve outside (0, 1) too (within the asymptotes) when the feed is
    /// one phase at these K-values; otherwise such a feed returns β = 0 (liquid, g(0) ≤ 0) or
    /// β = 1 (vapour, g(1) ≥ 0) without solving.</param>
    /// <param name="maxIterations">Cap on iterations.</param>
    /// <exception cref="InvalidInputException">A K-value is not finite and positive, or every K
    /// is on the same side of 1 with a negative flash asked for (no root).</exception>
    public static RachfordRiceSolution Solve(ReadOnlySpan<double> feed, ReadOnlySpan<double> k, bool negativeFlash = false, int maxIterations = DefaultMaxIterations)
    {
        double kMin = double.PositiveInfinity, kMax = 0;
        for (int i = 0; i < k.Length; i++)
        {
            if (!(k[i] > 0) || !double.IsFinite(k[i]))
            {
                throw new InvalidInputException("K", k[i], $"K-value {Preconditions.Format(k[i])} of component {i} is not finite and positive");
            }

            if (feed[i] > 0)
            {
                kMin = Math.Min(kMin, k[i]);
                kMax = Math.Max(kMax, k[i]);
            }
        }

        double g0 = G(feed, k, 0, out _);
        double g1 = G(feed, k, 1, out _);
        double lo, hi;
        if (g0 > 0 && g1 < 0)
        {
            lo = 0;
            hi = 1;
        }
        else if (!negativeFlash)
        {
            return new RachfordRiceSolution(g0 <= 0 ? 0 : 1, false, 0, 0);
        }
        else
        {
            if (!(kMin < 1 && kMax > 1))
            {
                throw new InvalidInputException("K", kMin < 1 ? kMax : kMin,
                    "every K-value of the present components is on the same side of 1: the Rachford-Rice equation has no root");
            }

            // Between the asymptotes, on the side where the root lies.
            (lo, hi) = g0 <= 0 ? (1 / (1 - kMax), 0.0) : (1.0, 1 / (1 - kMin));
        }

        double beta = 0.5 * (lo + hi);
        double residual = double.PositiveInfinity;
        for (int iteration = 1; iteration <= maxIterations; iteration++)
        {
            double g = G(feed, k, beta, out double dg);
            residual = Math.Abs(g);
            double newton = -g / dg;
            // Converged when the Newton correction reaches rounding of β (g is then zero to rounding).
            if (g == 0 || Math.Abs(newton) <= 1e-15 * Math.Max(1, Math.Abs(beta)))
            {
                return new RachfordRiceSolution(beta, beta > 0 && beta < 1, iteration, residual);
            }

            if (g > 0)
            {
                lo = beta;
            }
            else
            {
                hi = beta;
            }

            double next = beta + newton;
            if (!(next > lo && next < hi))
            {
                next = 0.5 * (lo + hi);
            }

            if (hi - lo <= 1e-15 * Math.Max(1, Math.Abs(beta)))
            {
                return new RachfordRiceSolution(next, next > 0 && next < 1, iteration, Math.Abs(G(feed, k, next, out _)));
            }

            beta = next;
        }

        throw new ConvergenceException($"the Rachford-Rice equation did not converge in {maxIterations} iterations", maxIterations, residual);
    }

    /// <summary>g(β) and dg/dβ.</summary>
    private static double G(ReadOnlySpan<double> feed, ReadOnlySpan<double> k, double beta, out double derivative)
    {
        double g = 0, dg = 0;
        for (int i = 0; i < feed.Length; i++)
        {
            if (feed[i] == 0)
            {
                continue;
            }

            double c = k[i] - 1;
            double t = 1 / (1 + beta * c);
            g += feed[i] * c * t;
            dg -= feed[i] * c * c * t * t;
        }

        derivative = dg;
        return g;
    }
}
