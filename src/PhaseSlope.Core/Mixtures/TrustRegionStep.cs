using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.LinearAlgebra.Factorization;

namespace PhaseSlope.Core.Mixtures;

/// <summary>The restricted (trust-region) Newton step: the minimiser of the quadratic model
/// q(s) = g·s + ½ sᵀHs over |s| ≤ Δ for a symmetric H that need not be positive definite, by
/// the eigen-decomposition of H and the scalar shift μ ≥ max(0, −λ_min) with
/// s(μ) = −(H + μI)⁻¹g and |s(μ)| = Δ (Moré &amp; Sorensen, "Computing a trust region step",
/// SIAM J. Sci. Stat. Comput. 4, 553 (1983); Nocedal &amp; Wright, Numerical Optimization, 2nd ed.
/// (2006), §4.3, including the "hard case"). The shift is the Hessian modification Michelsen
/// recommends for the stability and phase-split minimisations where the Hessian is indefinite
/// (Michelsen &amp; Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 10). Used only off the common
/// path (the solvers take the plain Newton step where H is positive definite), so the n³
/// eigen-decomposition of a small matrix is affordable.</summary>
internal static class TrustRegionStep
{
    /// <summary>Writes the step into <paramref name="step"/> and returns the model's change
    /// q(s) (≤ 0).</summary>
    public static double Solve(Matrix<double> h, ReadOnlySpan<double> g, double radius, Span<double> step)
    {
        int n = g.Length;
        Evd<double> evd = h.Evd(Symmetricity.Symmetric);
        var q = evd.EigenVectors;
        Span<double> lambda = stackalloc double[n];
        Span<double> gHat = stackalloc double[n];
        int lowest = 0;
        for (int k = 0; k < n; k++)
        {
            lambda[k] = evd.EigenValues[k].Real;
            double s = 0;
            for (int i = 0; i < n; i++)
            {
                s += q[i, k] * g[i];
            }

            gHat[k] = s;
            if (lambda[k] < lambda[lowest])
            {
                lowest = k;
            }
        }

        double floor = Math.Max(0, -lambda[lowest]);
        double mu;
        double extra = 0;
        if (lambda[lowest] > 0 && Norm(lambda, gHat, 0) <= radius)
        {
            mu = 0;
        }
        else
        {
            // |s(μ)| falls monotonically from +∞ (or a finite value in the hard case) at μ = floor to
            // below Δ at floor + |g|/Δ (every λ_k + μ ≥ |g|/Δ there): bisection on that bracket.
            double gNorm = 0;
            for (int k = 0; k < n; k++)
            {
                gNorm += gHat[k] * gHat[k];
            }

            gNorm = Math.Sqrt(gNorm);
            double lo = floor, hi = floor + gNorm / radius;
            double atFloor = Norm(lambda, gHat, floor * (1 + 1e-12) + 1e-300);
            if (atFloor <= radius && lambda[lowest] <= 0)
            {
                // Hard case: g has (almost) no component along the lowest eigenvector; move along it to the boundary.
                mu = floor * (1 + 1e-12) + 1e-300;
                extra = Math.Sqrt(Math.Max(0, radius * radius - atFloor * atFloor));
            }
            else
            {
                for (int iteration = 0; iteration < 100 && hi - lo > 1e-14 * hi; iteration++)
                {
                    double mid = 0.5 * (lo + hi);
                    if (Norm(lambda, gHat, mid) > radius)
                    {
                        lo = mid;
                    }
                    else
                    {
                        hi = mid;
                    }
                }

                mu = hi;
            }
        }

        Span<double> sHat = stackalloc double[n];
        double change = 0;
        for (int k = 0; k < n; k++)
        {
            double denominator = lambda[k] + mu;
            sHat[k] = denominator > 0 ? -gHat[k] / denominator : 0;
        }

        sHat[lowest] += gHat[lowest] > 0 ? -extra : extra;
        for (int k = 0; k < n; k++)
        {
            change += gHat[k] * sHat[k] + 0.5 * lambda[k] * sHat[k] * sHat[k];
        }

        for (int i = 0; i < n; i++)
        {
            double s = 0;
            for (int k = 0; k < n; k++)
            {
                s += q[i, k] * sHat[k];
            }

            step[i] = s;
        }

        return change;
    }

    private static double Norm(ReadOnlySpan<double> lambda, ReadOnlySpan<double> gHat, double mu)
    {
        double sum = 0;
        for (int k = 0; k < lambda.Length; k++)
        {
            double denominator = lambda[k] + mu;
            if (denominator <= 0)
            {
                return double.PositiveInfinity;
            }

            double s = gHat[k] / denominator;
            sum += s * s;
        }

        return Math.Sqrt(sum);
    }
}
