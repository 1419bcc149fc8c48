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

    /// <summary>Σ(Δ ln K)² below which successive substitution hands over to Newton: K within about
    /// 1 % of the solution, close enough for Newton's quadratic convergence with its line search
    /// (and the restricted step where the Hessian is not positive definite); a tighter switch
    /// only spends more substitution steps (measured on the benchmark gas: 1e-6 cost 4 more
    /// evaluations per flash).</summary>
    public const double NewtonSwitch = 1e-4;

    /// <summary>The isothermal flash: the stable state of a feed at (T, P).</summary>
    /// <remarks>
    /// <para>First the tangent-plane-distance test (<see cref="StabilityAnalysis"/>, stopping at the
    /// first trial with negative tm, which proves the split and starts it; where that trial is a
    /// shallow point next to the feed, which would start the split at the trivial solution, both
    /// trials are converged and the other starts it); a stable feed is
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
    /// step shortened to keep every amount positive and halved while G rises. Where the Hessian is
    /// not positive definite (near the critical point, where G is nearly flat along the line joining
    /// the phases; the plain step there pointed uphill and substitution crawled, so 5 states within
    /// 1 % of the test gas's critical point ran out of Newton steps) the step is the restricted
    /// Newton step of <see cref="TrustRegionStep"/> in scaled amounts, accepted only where G falls,
    /// its radius adapted to the ratio of actual to predicted change. Converged when
    /// max_i |ln f_i^V − ln f_i^L| &lt; 1e-11, or below 1e-8 when a Newton step no longer halves it
    /// (the rounding floor where ln φ is large; the residual reached is in the report).</para>
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
        var stability = StabilityAnalysis.Test(Model, temperature, pressure, z, lnK, stopWhenUnstable: true);
        int evaluations = stability.ModelEvaluations;
        if (stability.IsStable)
        {
            return SinglePhase(temperature, pressure, z, stability, evaluations);
        }

        if (Shallow(stability.Lowest, z))
        {
            // The trial that proved instability is shallow and next to the feed (a stationary point
            // of tm near the feed, the feed near its own spinodal, tm of order −1e-9 to −1e-5), whose
            // K-values are all near 1 and lead substitution into the trivial split (the
            // 10-component gas at 230 K and 4.25 MPa did so and failed after 50 Newton steps). The
            // full test runs both trials, so a distinct phase (there the liquid-like trial, tm −4.1)
            // starts the split. Should the full test not converge, the first result (which proved
            // instability) stands.
            try
            {
                var full = StabilityAnalysis.Test(Model, temperature, pressure, z, lnK, stopWhenUnstable: false);
                evaluations += full.ModelEvaluations;
                stability = full;
            }
            catch (ConvergenceException)
            {
                // Keep the first result.
            }
        }

        var vapourTrial = stability.VapourLike;
        var liquidTrial = stability.LiquidLike;
        bool vapourFound = !vapourTrial.IsTrivial && vapourTrial.TangentPlaneDistance < -StabilityAnalysis.NegativeDistance;
        bool liquidFound = !liquidTrial.IsTrivial && liquidTrial.TangentPlaneDistance < -StabilityAnalysis.NegativeDistance;
        if (vapourFound && liquidFound && Shallow(vapourTrial, z) != Shallow(liquidTrial, z))
        {
            // One trial is a shallow point next to the feed and the other is not: start from the other alone.
            (vapourFound, liquidFound) = Shallow(vapourTrial, z) ? (false, true) : (true, false);
        }

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

    /// <summary>A weak start for the split: a trial whose tm, though below
    /// −<see cref="StabilityAnalysis.NegativeDistance"/> (so it proves instability), is above −1e-3 RT
    /// per mole of trial phase, at a composition near the feed (Σ (ln w_i/z_i)² &lt; 1, K-values within
    /// a factor of about 1.4 of 1). On the 10-component test gas the shallow stationary points that
    /// led substitution into the trivial split had tm −3e-9 to −1.3e-5 at Σ (ln w_i/z_i)² of 2e-4 to
    /// 0.12, while the deep trials of its splits have tm −0.03 to −5 and the incipient phases near its
    /// phase boundaries lie far from the feed (Σ of order 10 to 100).</summary>
    private static bool Shallow(StabilityTrial trial, double[] z)
    {
        if (!(trial.TangentPlaneDistance > -1e-3))
        {
            return false;
        }

        double apart = 0;
        for (int i = 0; i < z.Length; i++)
        {
            double d = Math.Log(trial.Composition[i] / z[i]);
            apart += d * d;
        }

        return apart < 1;
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

    /// <summary>Newton's method on the amounts of the smaller phase (the other is z minus them, so a
    /// vanishing phase keeps its precision) from a substitution state inside (0, 1).</summary>
    private MixtureFlashResult Newton(double temperature, double pressure, double[] z, SplitState start, StabilityResult stability,
        int substitution, int accelerated, int evaluations)
    {
        int n = z.Length;
        // a: the primary (smaller) phase, b = z − a. swapped: a is the liquid.
        bool swapped = start.Beta > 0.5;
        var a = new double[n];
        var b = new double[n];
        for (int i = 0; i < n; i++)
        {
            a[i] = swapped ? (1 - start.Beta) * start.X[i] : start.Beta * start.Y[i];
            b[i] = z[i] - a[i];
        }

        var xa = new double[n];
        var xb = new double[n];
        var lnPhiA = new double[n];
        var lnPhiB = new double[n];
        var dNA = new double[n * n];
        var dNB = new double[n * n];
        var gradient = new double[n];
        var nextA = new double[n];
        var nextB = new double[n];
        var nxa = new double[n];
        var nxb = new double[n];
        var nLnPhiA = new double[n];
        var nLnPhiB = new double[n];
        var nDNA = new double[n * n];
        var nDNB = new double[n * n];
        double densityA = 0, densityB = 0;
        double gibbs = EvaluateAmounts(temperature, pressure, a, b, xa, xb, lnPhiA, lnPhiB, dNA, dNB, ref densityA, ref densityB, ref evaluations);
        int newton = 0;
        // Trust radius of the restricted step, in amounts scaled by √(1/a_i + 1/b_i) (the ideal part
        // of the Hessian's diagonal), so that a unit step changes G by about ½ RT per mole of feed.
        double radius = 1;
        double residual, previousResidual = double.PositiveInfinity;
        while (true)
        {
            residual = 0;
            for (int i = 0; i < n; i++)
            {
                gradient[i] = Math.Log(xa[i]) + lnPhiA[i] - Math.Log(xb[i]) - lnPhiB[i];
                residual = Math.Max(residual, Math.Abs(gradient[i]));
            }

            // 1e-11 in ln f: the fugacities agree to 1e-11 relative, a few hundred roundings of ln φ.
            // Where ln φ is large (a light gas dissolved in a cold liquid) rounding can hold the
            // residual above that: below 1e-8, a Newton step that no longer halves it has reached
            // the rounding floor, and the residual reached is reported.
            if (residual < 1e-11 || (residual < 1e-8 && residual > 0.5 * previousResidual))
            {
                break;
            }

            previousResidual = residual;

            if (++newton > MaxFlashNewtonSteps)
            {
                throw new ConvergenceException($"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa did not converge in {MaxFlashNewtonSteps} Newton steps",
                    newton, residual);
            }

            double totalA = a.Sum(), totalB = b.Sum();
            var h = Matrix<double>.Build.Dense(n, n);
            var rhs = Vector<double>.Build.Dense(n);
            for (int i = 0; i < n; i++)
            {
                rhs[i] = -gradient[i];
                for (int j = 0; j < n; j++)
                {
                    h[i, j] = (dNA[i * n + j] - 1) / totalA + (dNB[i * n + j] - 1) / totalB;
                }

                h[i, i] += 1 / a[i] + 1 / b[i];
            }

            Vector<double>? step = null;
            try
            {
                step = h.Cholesky().Solve(rhs);
            }
            catch (ArgumentException)
            {
                // Not positive definite: the restricted step below.
            }

            if (step is null)
            {
                // The Hessian is indefinite (near the critical point, where G is nearly flat along the
                // direction joining the phases and SS crawls): the restricted Newton step on G.
                gibbs = RestrictedStep(temperature, pressure, z, h, gradient, ref radius, a, b, xa, xb, lnPhiA, lnPhiB, dNA, dNB,
                    nextA, nextB, nxa, nxb, nLnPhiA, nLnPhiB, nDNA, nDNB, ref densityA, ref densityB, gibbs, ref evaluations, out bool stepped);
                if (!stepped)
                {
                    throw new ConvergenceException($"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa found no descent of the Gibbs energy at a point that is not its minimum",
                        newton, residual);
                }

                continue;
            }

            double scale = 1;
            for (int i = 0; i < n; i++)
            {
                // Keep 0 < a_i < z_i: go at most 90 % of the way to either bound.
                if (a[i] + step[i] <= 0)
                {
                    scale = Math.Min(scale, -0.9 * a[i] / step[i]);
                }
                else if (b[i] - step[i] <= 0)
                {
                    scale = Math.Min(scale, 0.9 * b[i] / step[i]);
                }
            }

            bool moved = false;
            for (int search = 0; search < 20; search++, scale *= 0.5)
            {
                for (int i = 0; i < n; i++)
                {
                    nextA[i] = a[i] + scale * step[i];
                    nextB[i] = z[i] - nextA[i];
                }

                double da = densityA, db = densityB;
                double nextGibbs = EvaluateAmounts(temperature, pressure, nextA, nextB, nxa, nxb, nLnPhiA, nLnPhiB, nDNA, nDNB, ref da, ref db, ref evaluations);
                // Accept a step that does not raise G beyond rounding (1e-14 relative of |G|); once the
                // gradient is below 1e-8 Newton is in its quadratic range and the change of G (of the
                // order of the gradient squared) is below G's rounding, so the full step is taken.
                if (double.IsFinite(nextGibbs) && (residual < 1e-8 || nextGibbs <= gibbs + 1e-14 * Math.Max(1, Math.Abs(gibbs))))
                {
                    gibbs = nextGibbs;
                    (a, nextA) = (nextA, a);
                    (b, nextB) = (nextB, b);
                    (xa, nxa) = (nxa, xa);
                    (xb, nxb) = (nxb, xb);
                    (lnPhiA, nLnPhiA) = (nLnPhiA, lnPhiA);
                    (lnPhiB, nLnPhiB) = (nLnPhiB, lnPhiB);
                    (dNA, nDNA) = (nDNA, dNA);
                    (dNB, nDNB) = (nDNB, dNB);
                    (densityA, densityB) = (da, db);
                    moved = true;
                    break;
                }
            }

            if (!moved)
            {
                if (residual < 1e-8)
                {
                    // G no longer decreases at rounding: the minimum is as converged as rounding allows.
                    break;
                }

                // No descent along the Newton direction far from the minimum: a substitution step.
                gibbs = SubstitutionStep(temperature, pressure, z, swapped, a, b, xa, xb, lnPhiA, lnPhiB, dNA, dNB, ref densityA, ref densityB, ref evaluations, residual, ref substitution, newton);
            }
        }

        var (l, v, densityL, densityV) = swapped ? (a, b, densityA, densityB) : (b, a, densityB, densityA);

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

        double vapourTotal = v.Sum(), liquidTotal = l.Sum();
        double beta = vapourTotal / (vapourTotal + liquidTotal);
        var liquidX = Normalised(l);
        var vapourY = Normalised(v);
        if (densityV > densityL)
        {
            // The phase called vapour while iterating is the denser one: swap the labels.
            (liquidX, vapourY, densityL, densityV, beta) = (vapourY, liquidX, densityV, densityL, liquidTotal / (vapourTotal + liquidTotal));
        }

        var liquidPhase = Phase(temperature, pressure, liquidX, densityL, ref evaluations);
        var vapourPhase = Phase(temperature, pressure, vapourY, densityV, ref evaluations);
        return new MixtureFlashResult(temperature, pressure, z, beta, liquidPhase, vapourPhase, stability, change,
            new MixtureSolverReport(substitution, newton, evaluations, residual, accelerated));
    }

    /// <summary>One restricted Newton step on G where its Hessian is indefinite (<see cref="TrustRegionStep"/>
    /// in amounts scaled by D_i = √(1/a_i + 1/b_i)), kept inside 0 &lt; a_i &lt; z_i and accepted only if G
    /// falls; the radius shrinks to a quarter of a rejected or poorly predicted step and doubles after
    /// a well-predicted one on the boundary. On acceptance the current arrays take the new point
    /// (swapped with the next-point buffers) and G there is returned.</summary>
    private double RestrictedStep(double temperature, double pressure, double[] z, Matrix<double> h, double[] gradient, ref double radius,
        double[] a, double[] b, double[] xa, double[] xb, double[] lnPhiA, double[] lnPhiB, double[] dNA, double[] dNB,
        double[] nextA, double[] nextB, double[] nxa, double[] nxb, double[] nLnPhiA, double[] nLnPhiB, double[] nDNA, double[] nDNB,
        ref double densityA, ref double densityB, double gibbs, ref int evaluations, out bool stepped)
    {
        int n = z.Length;
        var scaling = new double[n];
        var scaledGradient = new double[n];
        var scaled = Matrix<double>.Build.Dense(n, n);
        for (int i = 0; i < n; i++)
        {
            scaling[i] = Math.Sqrt(1 / a[i] + 1 / b[i]);
            scaledGradient[i] = gradient[i] / scaling[i];
        }

        for (int i = 0; i < n; i++)
        {
            for (int j = 0; j < n; j++)
            {
                scaled[i, j] = h[i, j] / (scaling[i] * scaling[j]);
            }
        }

        var u = new double[n];
        var s = new double[n];
        for (int attempt = 0; attempt < 30; attempt++)
        {
            TrustRegionStep.Solve(scaled, scaledGradient, radius, u);
            double length = Math.Sqrt(u.Sum(x => x * x));
            double scale = 1;
            for (int i = 0; i < n; i++)
            {
                s[i] = u[i] / scaling[i];
                if (a[i] + s[i] <= 0)
                {
                    scale = Math.Min(scale, -0.9 * a[i] / s[i]);
                }
                else if (b[i] - s[i] <= 0)
                {
                    scale = Math.Min(scale, 0.9 * b[i] / s[i]);
                }
            }

            // The quadratic model's change for the (possibly shortened) step.
            double linear = 0, quadratic = 0;
            for (int i = 0; i < n; i++)
            {
                s[i] *= scale;
                linear += gradient[i] * s[i];
                double hs = 0;
                for (int j = 0; j < n; j++)
                {
                    hs += h[i, j] * s[j];
                }

                quadratic += s[i] * hs;
            }

            double predicted = linear + 0.5 * quadratic;
            for (int i = 0; i < n; i++)
            {
                nextA[i] = a[i] + s[i];
                nextB[i] = z[i] - nextA[i];
            }

            double da = densityA, db = densityB;
            double nextGibbs = EvaluateAmounts(temperature, pressure, nextA, nextB, nxa, nxb, nLnPhiA, nLnPhiB, nDNA, nDNB, ref da, ref db, ref evaluations);
            double ratio = (nextGibbs - gibbs) / predicted;
            bool accepted = double.IsFinite(nextGibbs) && nextGibbs < gibbs;
            radius = !accepted || ratio < 0.25 ? 0.25 * scale * length
                : ratio > 0.75 && scale * length > 0.99 * radius ? 2 * radius
                : radius;
            if (accepted)
            {
                nextA.CopyTo(a, 0);
                nextB.CopyTo(b, 0);
                nxa.CopyTo(xa, 0);
                nxb.CopyTo(xb, 0);
                nLnPhiA.CopyTo(lnPhiA, 0);
                nLnPhiB.CopyTo(lnPhiB, 0);
                nDNA.CopyTo(dNA, 0);
                nDNB.CopyTo(dNB, 0);
                (densityA, densityB) = (da, db);
                stepped = true;
                return nextGibbs;
            }
        }

        stepped = false;
        return gibbs;
    }

    /// <summary>One successive-substitution step from the current amounts (K from the current
    /// fugacity coefficients, β from Rachford–Rice), written back into a and b and evaluated.</summary>
    private double SubstitutionStep(double temperature, double pressure, double[] z, bool swapped, double[] a, double[] b, double[] xa, double[] xb,
        double[] lnPhiA, double[] lnPhiB, double[] dNA, double[] dNB, ref double densityA, ref double densityB, ref int evaluations,
        double residual, ref int substitution, int newton)
    {
        int n = z.Length;
        var lnK = new double[n];
        for (int i = 0; i < n; i++)
        {
            lnK[i] = swapped ? lnPhiA[i] - lnPhiB[i] : lnPhiB[i] - lnPhiA[i];
        }

        var fallback = new SplitState(n);
        Evaluate(temperature, pressure, z, lnK, fallback);
        evaluations += 2;
        substitution++;
        if (!fallback.Inside)
        {
            throw new ConvergenceException($"the flash at {Preconditions.Format(temperature)} K and {Preconditions.Format(pressure)} Pa left the two-phase range while converging",
                substitution + newton, residual);
        }

        for (int i = 0; i < n; i++)
        {
            a[i] = swapped ? (1 - fallback.Beta) * fallback.X[i] : fallback.Beta * fallback.Y[i];
            b[i] = z[i] - a[i];
        }

        return EvaluateAmounts(temperature, pressure, a, b, xa, xb, lnPhiA, lnPhiB, dNA, dNB, ref densityA, ref densityB, ref evaluations);
    }

    /// <summary>Fugacities and their amount derivatives of two phases of amounts a and b (mole
    /// fractions into xa and xb); returns G/RT per mole of feed, +∞ where an amount is not positive.</summary>
    private double EvaluateAmounts(double temperature, double pressure, double[] a, double[] b, double[] xa, double[] xb,
        double[] lnPhiA, double[] lnPhiB, double[] dNA, double[] dNB, ref double densityA, ref double densityB, ref int evaluations)
    {
        int n = a.Length;
        double totalA = a.Sum(), totalB = b.Sum();
        for (int i = 0; i < n; i++)
        {
            xa[i] = a[i] / totalA;
            xb[i] = b[i] / totalB;
            if (!(xa[i] > 0) || !(xb[i] > 0))
            {
                return double.PositiveInfinity;
            }
        }

        densityA = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, xa, MixtureRoot.Stable, lnPhiA, dN: dNA);
        densityB = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, xb, MixtureRoot.Stable, lnPhiB, dN: dNB);
        evaluations += 2;
        double g = 0;
        for (int i = 0; i < n; i++)
        {
            g += a[i] * (Math.Log(xa[i]) + lnPhiA[i]) + b[i] * (Math.Log(xb[i]) + lnPhiB[i]);
        }

        return g;
    }
}
