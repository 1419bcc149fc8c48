using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Stability of a mixture at (T, P) by the tangent-plane distance (Michelsen, "The
/// isothermal flash problem. Part I. Stability", Fluid Phase Equilib. 9, 1 (1982)).</summary>
/// <remarks>
/// With d_i = ln z_i + ln φ_i(z) of the feed on its stable root, the modified tangent-plane
/// distance of a trial phase of mole numbers W is tm(W) = 1 + Σ W_i (ln W_i + ln φ_i(W) − d_i − 1);
/// the feed is stable when tm ≥ 0 at every stationary point. Two trials are made, vapour-like
/// (W = z·K) and liquid-like (W = z/K) from Wilson's K-values. Each is iterated by successive
/// substitution, ln W_i ← d_i − ln φ_i(W), then finished by Newton's method in α_i = 2√W_i, where
/// the Hessian is exact: H_ij = δ_ij + √(W_i W_j)·∂ln φ_i/∂W_j + δ_ij·g_i/α_i with the gradient
/// g_i = √W_i (ln W_i + ln φ_i − d_i) (Michelsen &amp; Mollerup, Thermodynamic Models, 2nd ed.
/// (2007), ch. 10); where that Hessian is indefinite the restricted step of
/// <see cref="TrustRegionStep"/> replaces the plain one. The trial phase takes the root of lower
/// Gibbs energy at its composition. Both trials are completed before the verdict: tm &lt; 0 at any
/// trial point proves instability, while stability needs every trial at a stationary point with
/// tm ≥ 0 (or at the trivial one), so a trial left unfinished is a
/// <see cref="ConvergenceException"/> only when no trial showed instability.
/// Every component of the feed must be present (z_i &gt; 0).</remarks>
public static class StabilityAnalysis
{
    /// <summary>tm below −1e-10 counts as negative: the stationary points are converged to a gradient
    /// of 1e-10, so tm is known to about that (its error is second order in the gradient, and ~1e-14
    /// from rounding of the sums).</summary>
    public const double NegativeDistance = 1e-10;

    /// <summary>Default cap on successive-substitution steps per trial before Newton takes over.</summary>
    public const int SubstitutionSteps = 8;

    /// <summary>Default cap on Newton steps per trial.</summary>
    public const int MaxNewtonSteps = 60;

    /// <summary>Tests the feed at (T, P), starting the trials from the given ln K (Wilson's).</summary>
    /// <exception cref="InvalidInputException">A component is absent from the feed, or the mixture
    /// has no density root at (T, P).</exception>
    public static StabilityResult Test(CubicMixtureModel model, double temperature, double pressure, ReadOnlySpan<double> feed, ReadOnlySpan<double> lnK)
        => Test(model, temperature, pressure, feed, lnK, stopWhenUnstable: false);

    /// <summary>Tests the feed; with <paramref name="stopWhenUnstable"/> a trial stops as soon as its
    /// tm is below −<see cref="NegativeDistance"/> (which already proves the feed unstable; the
    /// flash only needs the trial as a start), and the liquid-like trial is skipped when the
    /// vapour-like one has proved it. The trial returned is then not a stationary point.</summary>
    /// <exception cref="InvalidInputException">A component is absent from the feed, or the mixture
    /// has no density root at (T, P).</exception>
    /// <exception cref="ConvergenceException">A trial reached no stationary point in
    /// <see cref="MaxNewtonSteps"/> Newton steps and no trial found a negative tm.</exception>
    public static StabilityResult Test(CubicMixtureModel model, double temperature, double pressure, ReadOnlySpan<double> feed, ReadOnlySpan<double> lnK, bool stopWhenUnstable)
    {
        ArgumentNullException.ThrowIfNull(model);
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(pressure, "pressure");
        RequirePresent(feed);
        int n = feed.Length;
        int evaluations = 1;
        var d = new double[n];
        model.LnFugacityCoefficientsAtPressure(temperature, pressure, feed, MixtureRoot.Stable, d);
        for (int i = 0; i < n; i++)
        {
            d[i] += Math.Log(feed[i]);
        }

        var vapour = Trial(model, temperature, pressure, feed, d, lnK, +1, stopWhenUnstable, ref evaluations, out bool vapourConverged, out double vapourResidual);
        bool vapourNegative = !vapour.IsTrivial && vapour.TangentPlaneDistance < -NegativeDistance;
        bool liquidConverged = true;
        double liquidResidual = 0;
        var liquid = stopWhenUnstable && vapourNegative
            ? new StabilityTrial(feed.ToArray(), 0, true, 0)
            : Trial(model, temperature, pressure, feed, d, lnK, -1, stopWhenUnstable, ref evaluations, out liquidConverged, out liquidResidual);
        bool liquidNegative = !liquid.IsTrivial && liquid.TangentPlaneDistance < -NegativeDistance;
        // tm < 0 at any trial composition, stationary or not, proves the feed unstable; stability
        // rests on every trial having reached a stationary point with tm ≥ 0 (or the trivial one),
        // so both trials are always completed and only then is an unfinished one an error.
        if (!vapourNegative && !liquidNegative && !(vapourConverged && liquidConverged))
        {
            var unfinished = vapourConverged ? liquid : vapour;
            throw new ConvergenceException(
                $"the stability test did not converge in {MaxNewtonSteps} Newton steps at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa (the {(vapourConverged ? "liquid" : "vapour")}-like trial stopped at tm {Preconditions.Format(unfinished.TangentPlaneDistance)}, the other trial found no negative tm)",
                unfinished.Iterations, vapourConverged ? liquidResidual : vapourResidual);
        }

        return new StabilityResult(!vapourNegative && !liquidNegative, vapour, liquid, evaluations);
    }

    internal static void RequirePresent(ReadOnlySpan<double> feed)
    {
        double sum = 0;
        for (int i = 0; i < feed.Length; i++)
        {
            if (!(feed[i] > 0) || !double.IsFinite(feed[i]))
            {
                throw new InvalidInputException("composition", feed[i],
                    $"mole fraction {Preconditions.Format(feed[i])} of component {i}: a flash or stability test needs every component present (leave out absent ones)");
            }

            sum += feed[i];
        }

        if (Math.Abs(sum - 1) > 1e-9)
        {
            throw new InvalidInputException("composition", sum, $"mole fractions sum to {Preconditions.Format(sum)}, not 1");
        }
    }

    private static StabilityTrial Trial(CubicMixtureModel model, double temperature, double pressure, ReadOnlySpan<double> feed, double[] d,
        ReadOnlySpan<double> lnK, int side, bool stopWhenUnstable, ref int evaluations, out bool converged, out double residual)
    {
        int n = feed.Length;
        residual = 0;
        var lnW = new double[n];
        var w = new double[n];
        var lnPhi = new double[n];
        for (int i = 0; i < n; i++)
        {
            lnW[i] = Math.Log(feed[i]) + side * lnK[i];
            w[i] = Math.Exp(lnW[i]);
        }

        int iterations = 0;
        bool trivial = false;
        converged = false;
        // Successive substitution: each step lowers tm (Michelsen 1982) and leaves the trivial
        // solution's neighbourhood quickly if the feed is unstable.
        for (int step = 0; step < SubstitutionSteps; step++)
        {
            iterations++;
            evaluations++;
            model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, MixtureRoot.Stable, lnPhi);
            if (stopWhenUnstable && step > 0 && Distance(w, lnW, lnPhi, d) is double now && now < -NegativeDistance)
            {
                // tm(W) < 0 at the current W (its ln φ just evaluated) proves instability.
                double total = w.Sum();
                return new StabilityTrial(w.Select(x => x / total).ToArray(), now, false, iterations);
            }

            double change = 0, distance = 0;
            for (int i = 0; i < n; i++)
            {
                double next = d[i] - lnPhi[i];
                change += (next - lnW[i]) * (next - lnW[i]);
                lnW[i] = next;
                w[i] = Math.Exp(next);
                distance += (next - Math.Log(feed[i])) * (next - Math.Log(feed[i]));
            }

            if (distance < 1e-8)
            {
                trivial = true;
                break;
            }

            if (change < 1e-20)
            {
                converged = true;
                break;
            }
        }

        double tm;
        if (!trivial)
        {
            tm = converged ? Distance(w, lnW, lnPhi, d) : Newton(model, temperature, pressure, d, w, lnW, lnPhi, ref iterations, ref evaluations, out converged, out residual);
            double distance = 0;
            double total = w.Sum();
            for (int i = 0; i < n; i++)
            {
                distance += Math.Abs(w[i] / total - feed[i]);
            }

            // The trivial point has W = z and tm = 0; a trial that ends within 1e-6 of the feed is it.
            trivial = distance < 1e-6 && Math.Abs(tm) < 1e-8;
        }
        else
        {
            tm = 0;
            converged = true;
        }

        double sum = w.Sum();
        return new StabilityTrial(w.Select(x => x / sum).ToArray(), tm, trivial, iterations);
    }

    /// <summary>tm at W from ln φ(W) already evaluated.</summary>
    private static double Distance(double[] w, double[] lnW, double[] lnPhi, double[] d)
    {
        double tm = 1;
        for (int i = 0; i < w.Length; i++)
        {
            tm += w[i] * (lnW[i] + lnPhi[i] - d[i] - 1);
        }

        return tm;
    }

    /// <summary>Newton in α = 2√W from the substitution's last point; leaves w, lnW and lnPhi at the
    /// stationary point and returns tm there. Where the Hessian is positive definite the Newton
    /// step is taken with a halving line search on tm; where it is not (near a saddle of tm, or
    /// where a shallow minimum merges with a saddle just outside the phase boundary, where the
    /// plain step pointed uphill and the search stalled), the restricted step of
    /// <see cref="TrustRegionStep"/> follows the negative curvature downhill and its radius adapts
    /// to the ratio of actual to predicted change of tm. <paramref name="converged"/> is false
    /// after <see cref="MaxNewtonSteps"/> steps; tm is then the value at the last point.</summary>
    private static double Newton(CubicMixtureModel model, double temperature, double pressure, double[] d,
        double[] w, double[] lnW, double[] lnPhi, ref int iterations, ref int evaluations, out bool converged, out double residual)
    {
        int n = w.Length;
        residual = double.PositiveInfinity;
        var dN = new double[n * n];
        var gradient = new double[n];
        var restricted = new double[n];
        var trialW = new double[n];
        var trialLnW = new double[n];
        var trialLnPhi = new double[n];
        evaluations++;
        model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, MixtureRoot.Stable, lnPhi, dN: dN);
        double tm = Distance(w, lnW, lnPhi, d);
        // Trust radius in α (α_i = 2√W_i is of order 1 for a major component); adapted below.
        double radius = 0.5;
        converged = false;
        for (int step = 0; step < MaxNewtonSteps; step++)
        {
            iterations++;
            double total = w.Sum();
            double largest = 0;
            var h = Matrix<double>.Build.Dense(n, n);
            var rhs = Vector<double>.Build.Dense(n);
            for (int i = 0; i < n; i++)
            {
                double gi = lnW[i] + lnPhi[i] - d[i];
                double si = Math.Sqrt(w[i]);
                gradient[i] = si * gi;
                largest = Math.Max(largest, Math.Abs(gradient[i]));
                residual = largest;
                rhs[i] = -gradient[i];
                for (int j = 0; j < n; j++)
                {
                    h[i, j] = si * Math.Sqrt(w[j]) * dN[i * n + j] / total;
                }

                h[i, i] += 1 + 0.5 * gi;
            }

            // Converged when the gradient is 1e-10: tm is then known to ~1e-20 beyond rounding.
            if (largest < 1e-10)
            {
                converged = true;
                return tm;
            }

            Vector<double>? delta = null;
            try
            {
                delta = h.Cholesky().Solve(rhs);
            }
            catch (ArgumentException)
            {
                // Not positive definite: the restricted step below.
            }

            bool moved = false;
            if (delta is not null)
            {
                double lambda = 1;
                for (int search = 0; search < 30 && !moved; search++, lambda *= 0.5)
                {
                    for (int i = 0; i < n; i++)
                    {
                        restricted[i] = lambda * delta[i];
                    }

                    double trialTm = Move(model, temperature, pressure, d, w, restricted, trialW, trialLnW, trialLnPhi, dN, ref evaluations);
                    // Near the stationary point (gradient below 1e-8) the change of tm is below its
                    // rounding, so the full Newton step is taken.
                    moved = double.IsFinite(trialTm) && (largest < 1e-8 || trialTm <= tm + 1e-13 * Math.Max(1, Math.Abs(tm)));
                    if (moved)
                    {
                        tm = trialTm;
                    }
                }
            }
            else
            {
                for (int search = 0; search < 30 && !moved; search++)
                {
                    double predicted = TrustRegionStep.Solve(h, gradient, radius, restricted);
                    double length = Math.Sqrt(restricted.Sum(x => x * x));
                    double trialTm = Move(model, temperature, pressure, d, w, restricted, trialW, trialLnW, trialLnPhi, dN, ref evaluations);
                    double ratio = (trialTm - tm) / predicted;
                    // Accept only a real decrease of tm: an indefinite Hessian means the point is not
                    // yet a minimum, so there is room to descend.
                    moved = double.IsFinite(trialTm) && trialTm < tm;
                    radius = !moved || ratio < 0.25 ? 0.25 * length
                        : ratio > 0.75 && length > 0.99 * radius ? 2 * radius
                        : radius;
                    if (moved)
                    {
                        tm = trialTm;
                    }
                }
            }

            if (!moved)
            {
                // No descent at rounding level: the stationary point is as converged as it can be.
                evaluations++;
                model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, MixtureRoot.Stable, lnPhi);
                converged = true;
                return tm;
            }

            trialW.CopyTo(w, 0);
            trialLnW.CopyTo(lnW, 0);
            trialLnPhi.CopyTo(lnPhi, 0);
        }

        return tm;
    }

    /// <summary>tm at α + Δα (W = α²/4); the trial point's ln φ and its amount derivatives (into dN)
    /// are left in the trial arrays.</summary>
    private static double Move(CubicMixtureModel model, double temperature, double pressure, double[] d, double[] w, double[] step,
        double[] trialW, double[] trialLnW, double[] trialLnPhi, double[] dN, ref int evaluations)
    {
        for (int i = 0; i < w.Length; i++)
        {
            double alpha = 2 * Math.Sqrt(w[i]) + step[i];
            trialW[i] = Math.Max(0.25 * alpha * alpha, 1e-300);
            trialLnW[i] = Math.Log(trialW[i]);
        }

        evaluations++;
        model.LnFugacityCoefficientsAtPressure(temperature, pressure, trialW, MixtureRoot.Stable, trialLnPhi, dN: dN);
        return Distance(trialW, trialLnW, trialLnPhi, d);
    }
}
