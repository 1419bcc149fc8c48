using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

public sealed partial class MixtureEquilibrium
{
    /// <summary>Cap on successive-substitution steps of a flash before it gives up (Newton normally
    /// takes over long before).</summary>
    public const int MaxSubstitutionSteps = 100;

    /// <summary>Successive-substitution steps after which a slowly converging flash (near a
    /// critical point, where the dominant eigenvalue of the iteration approaches 1) switches to
    /// Newton's method.</summary>
    public const int SlowSubstitutionSteps = 15;

    /// <summary>Cap on Newton steps of a flash.</summary>
    public const int MaxFlashNewtonSteps = 50;

    /// <summary>Σ(Δ ln K)² below which successive substitution hands over to Newton: close enough
    /// for Newton's quadratic convergence (Michelsen &amp; Mollerup 2007, ch. 10, switch at 1e-5
    /// or below).</summary>
    public const double NewtonSwitch = 1e-6;

    /// <summary>The isothermal flash: the stable state of a feed at (T, P).</summary>
    /// <remarks>
    /// <para>First the tangent-plane-distance test (<see cref="StabilityAnalysis"/>); a stable feed is
    /// one phase, labelled liquid or vapour by its root (the denser of two roots is liquid; with one
    /// root, T below Kay's pseudo-critical temperature Σ z_i Tc_i is liquid-like, a rule of thumb
    /// (Kay, Ind. Eng. Chem. 28, 1014 (1936))). An unstable feed is split starting from the
    /// K-values of the trial phases: successive substitution ln K_i ← ln φ_i^L(x) − ln φ_i^V(y),
    /// the vapour fraction from <see cref="RachfordRice"/> (negative flash allowed while iterating),
    /// accelerated every fifth step by the dominant-eigenvalue extrapolation (Crowe &amp; Nishio,
    /// AIChE J. 21, 528 (1975); Michelsen, Fluid Phase Equilib. 9, 21 (1982), "Part II. Phase-split
    /// calculation"), kept only when it lowers the Gibbs energy. Once Σ(Δ ln K)² &lt;
    /// <see cref="NewtonSwitch"/>, or after <see cref="SlowSubstitutionSteps"/> steps (near a critical
    /// point), Newton's method on the vapour amounts v_i minimises the Gibbs energy with the exact
    /// Hessian H_ij = (δ_ij/y_i − 1 + Φ^V_ij)/V + (δ_ij/x_i − 1 + Φ^L_ij)/L (Φ = n·∂ln φ_i/∂n_j), the
    /// step shortened to keep every amount positive and halved while G rises. Converged when
    /// max_i |ln f_i^V − ln f_i^L| &lt; 1e-11.</para>
    /// <para>The liquid amounts are l = z − v, so the material balance closes to rounding. The split is
    /// checked to have a lower Gibbs energy than the single phase
    /// (<see cref="MixtureFlashResult.GibbsEnergyChange"/> &lt; 0).</para>
    /// </remarks>
    /// <exception cref="InvalidInputException">T or P not finite and positive; a composition with the
    /// wrong length, an absent or negative component, or not summing to 1.</exception>
    /// <exception cref="ConvergenceException">The split did not converge, or converged to a state no
    /// lower in Gibbs energy than the single phase.</exception>
    public MixtureFlashResult Flash(double temperature, double pressure, IReadOnlyList<double> feed)
    {
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(pressure, "pressure");
        var z = Feed(feed, requirePresent: true);
        int n = z.Length;
        var lnK = new double[n];
        WilsonLnK(temperature, pressure, lnK);
        var stability = StabilityAnalysis.Test(Model, temperature, pressure, z, lnK);
        int evaluations = stability.ModelEvaluations;
        if (stability.IsStable)
        {
            return SinglePhase(temperature, pressure, z, stability, evaluations);
        }

        var vapourTrial = stability.VapourLike;
        var liquidTrial = stability.LiquidLike;
        bool vapourFound = !vapourTrial.IsTrivial && vapourTrial.TangentPlaneDistance < -StabilityAnalysis.NegativeDistance;
        bool liquidFound = !liquidTrial.IsTrivial && liquidTrial.TangentPlaneDistance < -StabilityAnalysis.NegativeDistance;
        if (vapourFound && liquidFound)
        {
            // Both trials found a phase; when they found the same one, K from one trial and the feed.
            double apart = 0;
            for (int i = 0; i < n; i++)
            {
                double d = Math.Log(vapourTrial.Composition[i] / liquidTrial.Composition[i]);
                apart += d * d;
            }

            if (apart < 1e-4)
            {
                (vapourFound, liquidFound) = vapourTrial.TangentPlaneDistance <= liquidTrial.TangentPlaneDistance ? (true, false) : (false, true);
            }
        }

        for (int i = 0; i < n; i++)
        {
            lnK[i] = vapourFound && liquidFound ? Math.Log(vapourTrial.Composition[i] / liquidTrial.Composition[i])
                : vapourFound ? Math.Log(vapourTrial.Composition[i] / z[i])
                : Math.Log(z[i] / liquidTrial.Composition[i]);
        }

        return Split(temperature, pressure, z, lnK, stability, evaluations);
    }

    private MixtureFlashResult SinglePhase(double temperature, double pressure, double[] z, StabilityResult stability, int evaluations)
    {
        Span<double> roots = stackalloc double[2];
        evaluations++;
        int count = Model.DensityRoots(temperature, pressure, z, roots);
        Span<double> lnPhi = stackalloc double[z.Length];
        double density = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, z, MixtureRoot.Stable, lnPhi);
        evaluations++;
        bool liquid;
        if (count == 2)
        {
            liquid = density == roots[1];
        }
        else
        {
            double pseudoCritical = 0;
            for (int i = 0; i < z.Length; i++)
            {
                pseudoCritical += z[i] * _tc[i];
            }

            liquid = temperature < pseudoCritical;
        }

        var phase = Phase(temperature, pressure, z, density, ref evaluations);
        return new MixtureFlashResult(temperature, pressure, z, liquid ? 0 : 1, liquid ? phase : null, liquid ? null : phase, stability, 0,
            new MixtureSolverReport(0, 0, evaluations, 0));
    }

    /// <summary>The split state of one successive-substitution step: the Rachford–Rice root at ln K,
    /// the phase compositions and their fugacity coefficients.</summary>
    private sealed class SplitState(int n)
    {
        public double Beta;
        public double Gibbs;
        public double LiquidDensity;
        public double VapourDensity;
        public readonly double[] K = new double[n];
        public readonly double[] X = new double[n];
        public readonly double[] Y = new double[n];
        public readonly double[] LnPhiL = new double[n];
        public readonly double[] LnPhiV = new double[n];

        public bool Inside => Beta > 0 && Beta < 1;
    }

    /// <summary>Evaluates the split at ln K (two fugacity evaluations); Gibbs energy per mole of
    /// feed over RT, meaningful when 0 &lt; β &lt; 1.</summary>
    private void Evaluate(double temperature, double pressure, double[] z, double[] lnK, SplitState state)
    {
        int n = z.Length;
        for (int i = 0; i < n; i++)
        {
            state.K[i] = Math.Exp(lnK[i]);
        }

        state.Beta = RachfordRice.Solve(z, state.K, negativeFlash: true).VapourFraction;
        double sx = 0, sy = 0;
        for (int i = 0; i < n; i++)
        {
            state.X[i] = z[i] / (1 + state.Beta * (state.K[i] - 1));
            state.Y[i] = state.K[i] * state.X[i];
            sx += state.X[i];
            sy += state.Y[i];
        }

        for (int i = 0; i < n; i++)
        {
            state.X[i] /= sx;
            state.Y[i] /= sy;
        }

        state.LiquidDensity = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, state.X, MixtureRoot.Stable, state.LnPhiL);
        state.VapourDensity = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, state.Y, MixtureRoot.Stable, state.LnPhiV);
        double g = 0;
        for (int i = 0; i < n; i++)
        {
            g += (1 - state.Beta) * state.X[i] * (Math.Log(state.X[i]) + state.LnPhiL[i]) + state.Beta * state.Y[i] * (Math.Log(state.Y[i]) + state.LnPhiV[i]);
        }

        state.Gibbs = g;
    }

    private MixtureFlashResult Split(double temperature, double pressure, double[] z, double[] lnK, StabilityResult stability, int evaluations)
    {
        int n = z.Length;
        var state = new SplitState(n);
        var candidate = new SplitState(n);
        var delta = new double[n];
        var previous = new double[n];
        var trial = new double[n];
        int substitution = 0, accelerated = 0;
        bool havePrevious = false;
        Evaluate(temperature, pressure, z, lnK, state);
        evaluations += 2;
        while (true)
        {
            double change = 0;
            for (int i = 0; i < n; i++)
            {
                delta[i] = state.LnPhiL[i] - state.LnPhiV[i] - lnK[i];
                change += delta[i] * delta[i];
            }

            if (state.Inside && (change < NewtonSwitch || substitution >= SlowSubstitutionSteps))
            {
                break;
            }

            if (++substitution > MaxSubstitutionSteps)
            {
                throw new ConvergenceException($"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa did not converge in {MaxSubstitutionSteps} substitution steps",
                    substitution, Math.Sqrt(change));
            }

            bool accepted = false;
            if (havePrevious && substitution % 5 == 0 && state.Inside)
            {
                // Dominant eigenvalue λ of the substitution map from two successive corrections; the
                // extrapolation ln K + Δ/(1 − λ) sums the geometric tail of the iteration.
                double num = 0, den = 0;
                for (int i = 0; i < n; i++)
                {
                    num += delta[i] * previous[i];
                    den += previous[i] * previous[i];
                }

                double lambda = num / den;
                if (lambda > 0 && lambda < 1)
                {
                    for (int i = 0; i < n; i++)
                    {
                        trial[i] = lnK[i] + delta[i] / (1 - lambda);
                    }

                    Evaluate(temperature, pressure, z, trial, candidate);
                    evaluations += 2;
                    if (candidate.Inside && candidate.Gibbs < state.Gibbs)
                    {
                        accepted = true;
                        accelerated++;
                        trial.CopyTo(lnK, 0);
                        (state, candidate) = (candidate, state);
                    }
                }
            }

            delta.CopyTo(previous, 0);
            havePrevious = true;
            if (!accepted)
            {
                for (int i = 0; i < n; i++)
                {
                    lnK[i] += delta[i];
                }

                Evaluate(temperature, pressure, z, lnK, state);
                evaluations += 2;
            }
        }

        return Newton(temperature, pressure, z, state, stability, substitution, accelerated, evaluations);
    }

    /// <summary>Newton's method on the vapour amounts from a substitution state inside (0, 1).</summary>
    private MixtureFlashResult Newton(double temperature, double pressure, double[] z, SplitState start, StabilityResult stability,
        int substitution, int accelerated, int evaluations)
    {
        int n = z.Length;
        var v = new double[n];
        var l = new double[n];
        for (int i = 0; i < n; i++)
        {
            v[i] = start.Beta * start.Y[i];
            l[i] = z[i] - v[i];
        }

        var x = new double[n];
        var y = new double[n];
        var lnPhiL = new double[n];
        var lnPhiV = new double[n];
        var dNL = new double[n * n];
        var dNV = new double[n * n];
        var gradient = new double[n];
        var nextV = new double[n];
        var nextL = new double[n];
        double densityL = 0, densityV = 0;
        double gibbs = EvaluateAmounts(temperature, pressure, v, l, x, y, lnPhiL, lnPhiV, dNL, dNV, ref densityL, ref densityV, ref evaluations);
        int newton = 0;
        double residual;
        while (true)
        {
            residual = 0;
            for (int i = 0; i < n; i++)
            {
                gradient[i] = Math.Log(y[i]) + lnPhiV[i] - Math.Log(x[i]) - lnPhiL[i];
                residual = Math.Max(residual, Math.Abs(gradient[i]));
            }

            // 1e-11 in ln f: the fugacities agree to 1e-11 relative, a few hundred roundings of ln φ.
            if (residual < 1e-11)
            {
                break;
            }

            if (++newton > MaxFlashNewtonSteps)
            {
                throw new ConvergenceException($"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa did not converge in {MaxFlashNewtonSteps} Newton steps",
                    newton, residual);
            }

            double vapour = v.Sum(), liquid = l.Sum();
            var h = Matrix<double>.Build.Dense(n, n);
            var rhs = Vector<double>.Build.Dense(n);
            for (int i = 0; i < n; i++)
            {
                rhs[i] = -gradient[i];
                for (int j = 0; j < n; j++)
                {
                    h[i, j] = (dNV[i * n + j] - 1) / vapour + (dNL[i * n + j] - 1) / liquid;
                }

                h[i, i] += 1 / v[i] + 1 / l[i];
            }

            var step = h.LU().Solve(rhs);
            double descent = 0;
            double scale = 1;
            for (int i = 0; i < n; i++)
            {
                descent += step[i] * gradient[i];
                // Keep 0 < v_i < z_i: go at most 90 % of the way to either bound.
                if (v[i] + step[i] <= 0)
                {
                    scale = Math.Min(scale, -0.9 * v[i] / step[i]);
                }
                else if (l[i] - step[i] <= 0)
                {
                    scale = Math.Min(scale, 0.9 * l[i] / step[i]);
                }
            }

            if (!(descent < 0))
            {
                throw new ConvergenceException($"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa met a Gibbs-energy Hessian that is not positive definite (Newton step uphill)",
                    newton, residual);
            }

            bool moved = false;
            for (int search = 0; search < 20; search++, scale *= 0.5)
            {
                for (int i = 0; i < n; i++)
                {
                    nextV[i] = v[i] + scale * step[i];
                    nextL[i] = z[i] - nextV[i];
                }

                double dl = densityL, dv = densityV;
                var nx = new double[n];
                var ny = new double[n];
                var nLnPhiL = new double[n];
                var nLnPhiV = new double[n];
                var nDNL = new double[n * n];
                var nDNV = new double[n * n];
                double nextGibbs = EvaluateAmounts(temperature, pressure, nextV, nextL, nx, ny, nLnPhiL, nLnPhiV, nDNL, nDNV, ref dl, ref dv, ref evaluations);
                // Accept a step that does not raise G beyond rounding (1e-14 relative of |G|).
                if (nextGibbs <= gibbs + 1e-14 * Math.Max(1, Math.Abs(gibbs)))
                {
                    gibbs = nextGibbs;
                    nextV.CopyTo(v, 0);
                    nextL.CopyTo(l, 0);
                    nx.CopyTo(x, 0);
                    ny.CopyTo(y, 0);
                    nLnPhiL.CopyTo(lnPhiL, 0);
                    nLnPhiV.CopyTo(lnPhiV, 0);
                    nDNL.CopyTo(dNL, 0);
                    nDNV.CopyTo(dNV, 0);
                    (densityL, densityV) = (dl, dv);
                    moved = true;
                    break;
                }
            }

            if (!moved)
            {
                // G no longer decreases at rounding: the minimum is as converged as rounding allows.
                break;
            }
        }

        // The single phase's Gibbs energy, to confirm the split is the stable state.
        var lnPhiFeed = new double[n];
        Model.LnFugacityCoefficientsAtPressure(temperature, pressure, z, MixtureRoot.Stable, lnPhiFeed);
        evaluations++;
        double feedGibbs = 0;
        for (int i = 0; i < n; i++)
        {
            feedGibbs += z[i] * (Math.Log(z[i]) + lnPhiFeed[i]);
        }

        double change = gibbs - feedGibbs;
        if (!(change < 0) || Math.Abs(densityL - densityV) <= 1e-6 * Math.Max(densityL, densityV))
        {
            throw new ConvergenceException(
                $"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa converged to a split that is not below the single phase in Gibbs energy (change {Preconditions.Format(change)} RT per mole)",
                substitution + newton, residual);
        }

        double beta = v.Sum() / (v.Sum() + l.Sum());
        var liquidX = Normalised(l);
        var vapourY = Normalised(v);
        if (densityV > densityL)
        {
            // The phase called vapour while iterating is the denser one: swap the labels.
            (liquidX, vapourY, densityL, densityV, beta) = (vapourY, liquidX, densityV, densityL, 1 - beta);
        }

        var liquidPhase = Phase(temperature, pressure, liquidX, densityL, ref evaluations);
        var vapourPhase = Phase(temperature, pressure, vapourY, densityV, ref evaluations);
        return new MixtureFlashResult(temperature, pressure, z, beta, liquidPhase, vapourPhase, stability, change,
            new MixtureSolverReport(substitution, newton, evaluations, residual, accelerated));
    }

    /// <summary>Fugacities and their amount derivatives of both phases at amounts (v, l); returns G/RT
    /// per mole of feed.</summary>
    private double EvaluateAmounts(double temperature, double pressure, double[] v, double[] l, double[] x, double[] y,
        double[] lnPhiL, double[] lnPhiV, double[] dNL, double[] dNV, ref double densityL, ref double densityV, ref int evaluations)
    {
        int n = v.Length;
        double vapour = v.Sum(), liquid = l.Sum();
        for (int i = 0; i < n; i++)
        {
            x[i] = l[i] / liquid;
            y[i] = v[i] / vapour;
            if (!(x[i] > 0) || !(y[i] > 0))
            {
                return double.PositiveInfinity;
            }
        }

        densityL = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, x, MixtureRoot.Stable, lnPhiL, dN: dNL);
        densityV = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, y, MixtureRoot.Stable, lnPhiV, dN: dNV);
        evaluations += 2;
        double g = 0;
        for (int i = 0; i < n; i++)
        {
            g += l[i] * (Math.Log(x[i]) + lnPhiL[i]) + v[i] * (Math.Log(y[i]) + lnPhiV[i]);
        }

        return g;
    }
}
