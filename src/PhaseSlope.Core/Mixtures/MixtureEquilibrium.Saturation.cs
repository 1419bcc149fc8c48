using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

public sealed partial class MixtureEquilibrium
{
    /// <summary>Cap on Newton steps of a bubble or dew point.</summary>
    public const int MaxSaturationNewtonSteps = 60;

    /// <summary>Successive-substitution steps that refine Wilson's start of a bubble or dew point at
    /// given temperature before Newton.</summary>
    public const int SaturationSubstitutionSteps = 4;

    /// <summary>The bubble point of a liquid feed at temperature T: the pressure at which the
    /// first bubble of vapour forms, and its composition.</summary>
    /// <exception cref="InvalidInputException">Bad temperature or composition.</exception>
    /// <exception cref="ConvergenceException">No bubble point found (the iteration fell into the
    /// trivial solution, where vapour and liquid are the same phase: typically above the
    /// mixture's critical or cricondentherm temperature), or no convergence.</exception>
    public MixtureSaturationPoint BubbleAtTemperature(double temperature, IReadOnlyList<double> feed)
        => Saturation(MixtureSaturationKind.Bubble, atTemperature: true, temperature, feed);

    /// <summary>The bubble point of a liquid feed at pressure P: the temperature at which it starts
    /// to boil.</summary>
    /// <exception cref="InvalidInputException">Bad pressure or composition.</exception>
    /// <exception cref="ConvergenceException">No bubble point found (trivial solution, typically above the
    /// cricondenbar) or no convergence.</exception>
    public MixtureSaturationPoint BubbleAtPressure(double pressure, IReadOnlyList<double> feed)
        => Saturation(MixtureSaturationKind.Bubble, atTemperature: false, pressure, feed);

    /// <summary>The dew point of a vapour feed at temperature T: the pressure at which the first drop
    /// of liquid forms, and its composition (the lower dew pressure of the envelope where there are two).</summary>
    /// <exception cref="InvalidInputException">Bad temperature or composition.</exception>
    /// <exception cref="ConvergenceException">No dew point found (trivial solution) or no convergence.</exception>
    public MixtureSaturationPoint DewAtTemperature(double temperature, IReadOnlyList<double> feed)
        => Saturation(MixtureSaturationKind.Dew, atTemperature: true, temperature, feed);

    /// <summary>The dew point of a vapour feed at pressure P: the temperature at which it starts to condense.</summary>
    /// <exception cref="InvalidInputException">Bad pressure or composition.</exception>
    /// <exception cref="ConvergenceException">No dew point found (trivial solution) or no convergence.</exception>
    public MixtureSaturationPoint DewAtPressure(double pressure, IReadOnlyList<double> feed)
        => Saturation(MixtureSaturationKind.Dew, atTemperature: false, pressure, feed);

    /// <summary>The temperature glide of a blend at pressure P: its bubble and dew points at P.</summary>
    /// <exception cref="InvalidInputException">Bad pressure or composition.</exception>
    /// <exception cref="ConvergenceException">The bubble or dew point was not found.</exception>
    public MixtureGlide Glide(double pressure, IReadOnlyList<double> feed)
        => new(pressure, BubbleAtPressure(pressure, feed), DewAtPressure(pressure, feed));

    /// <summary>Bubble or dew point by Newton's method on u = (ln K_1 … ln K_n, ln P or ln T).</summary>
    /// <remarks>
    /// Equations (Michelsen &amp; Mollerup, Thermodynamic Models, 2nd ed. (2007), ch. 12): with the
    /// incipient phase's amounts w_i = z_i K_i (bubble) or z_i/K_i (dew),
    /// F_i = ln K_i + ln φ_i^V − ln φ_i^L = 0 and F_{n+1} = Σ w_i − 1 = 0. The Jacobian is exact:
    /// ∂F_i/∂ln K_j = δ_ij + Φ^inc_ij·w_j/Σw (Φ = n·∂ln φ_i/∂n_j of the incipient phase),
    /// ∂F_i/∂ln P = P(∂ln φ_i^V/∂P − ∂ln φ_i^L/∂P), ∂F_i/∂ln T = T(∂ln φ_i^V/∂T − ∂ln φ_i^L/∂T),
    /// ∂F_{n+1}/∂ln K_j = ±w_j. The start is Wilson's K with the pressure (or temperature) that
    /// makes Σ w_i = 1 under it; at given T a few substitution steps (ln K ← ln φ^L − ln φ^V,
    /// P ← P·Σw for a bubble, P ← P/Σw for a dew) refine it. The feed phase is taken on its
    /// liquid (bubble) or vapour (dew) root, the incipient phase on the other. Steps are limited
    /// to 0.5 in any ln variable. Converged when the largest Newton step is below 1e-12 and the
    /// largest residual below 1e-11, or when the residual is below 1e-8 and a Newton step no longer
    /// halves it (the rounding floor of ln φ in a dense liquid; the residual reached is reported). Guard: a point where the two phases have the same composition
    /// and density (the trivial solution) is refused. Components absent from the feed (z_i = 0) are
    /// allowed: their K is solved at infinite dilution; with one component present the point is
    /// that component's saturation point.</remarks>
    private MixtureSaturationPoint Saturation(MixtureSaturationKind kind, bool atTemperature, double value, IReadOnlyList<double> feed)
    {
        Preconditions.Positive(value, atTemperature ? "temperature" : "pressure");
        var z = Feed(feed, requirePresent: false);
        int n = z.Length;
        bool bubble = kind == MixtureSaturationKind.Bubble;
        int evaluations = 0;
        var lnK = new double[n];
        double temperature, pressure;
        if (atTemperature)
        {
            temperature = value;
            WilsonLnK(temperature, 1, lnK);   // ln K at 1 Pa; ln K(P) = ln K(1 Pa) − ln P
            double sum = 0;
            for (int i = 0; i < n; i++)
            {
                sum += bubble ? z[i] * Math.Exp(lnK[i]) : z[i] * Math.Exp(-lnK[i]);
            }

            pressure = bubble ? sum : 1 / sum;
        }
        else
        {
            pressure = value;
            temperature = WilsonTemperature(bubble, pressure, z);
        }

        WilsonLnK(temperature, pressure, lnK);
        var w = new double[n];
        var lnPhiL = new double[n];
        var lnPhiV = new double[n];
        var dN = new double[n * n];
        var dTL = new double[n];
        var dTV = new double[n];
        var dPL = new double[n];
        var dPV = new double[n];
        var feedRoot = bubble ? MixtureRoot.Liquid : MixtureRoot.Vapour;
        var incipientRoot = bubble ? MixtureRoot.Vapour : MixtureRoot.Liquid;
        int substitution = 0;
        if (atTemperature)
        {
            for (; substitution < SaturationSubstitutionSteps; substitution++)
            {
                double sum = Incipient(bubble, z, lnK, w);
                Fugacities(bubble, temperature, pressure, z, w, feedRoot, incipientRoot, lnPhiL, lnPhiV, default, default, default, default, default);
                evaluations += 2;
                for (int i = 0; i < n; i++)
                {
                    lnK[i] = lnPhiL[i] - lnPhiV[i];
                }

                pressure = bubble ? pressure * sum : pressure / sum;
            }
        }

        double lnP = Math.Log(pressure), lnT = Math.Log(temperature);
        double residual = double.PositiveInfinity, previousResidual = double.PositiveInfinity;
        double densityL = 0, densityV = 0;
        for (int newton = 1; ; newton++)
        {
            if (newton > MaxSaturationNewtonSteps)
            {
                throw new ConvergenceException(
                    $"no {(bubble ? "bubble" : "dew")} point found at {Describe(atTemperature, value)}: Newton did not converge in {MaxSaturationNewtonSteps} steps "
                    + $"(there may be none at this {(atTemperature ? "temperature" : "pressure")}: outside the phase envelope, or close to the mixture's critical point)",
                    MaxSaturationNewtonSteps, residual);
            }

            // The given variable stays exactly as given; only the unknown moves.
            if (atTemperature)
            {
                pressure = Math.Exp(lnP);
            }
            else
            {
                temperature = Math.Exp(lnT);
            }

            double sum = Incipient(bubble, z, lnK, w);
            (densityL, densityV) = Fugacities(bubble, temperature, pressure, z, w, feedRoot, incipientRoot, lnPhiL, lnPhiV, dN,
                atTemperature ? default : dTL, atTemperature ? default : dTV, atTemperature ? dPL : default, atTemperature ? dPV : default);
            evaluations += 2;
            var jacobian = Matrix<double>.Build.Dense(n + 1, n + 1);
            var f = Vector<double>.Build.Dense(n + 1);
            residual = Math.Abs(sum - 1);
            for (int i = 0; i < n; i++)
            {
                f[i] = lnK[i] + lnPhiV[i] - lnPhiL[i];
                residual = Math.Max(residual, Math.Abs(f[i]));
                for (int j = 0; j < n; j++)
                {
                    jacobian[i, j] = dN[i * n + j] * w[j] / sum;
                }

                jacobian[i, i] += 1;
                jacobian[i, n] = atTemperature ? pressure * (dPV[i] - dPL[i]) : temperature * (dTV[i] - dTL[i]);
                jacobian[n, i] = bubble ? w[i] : -w[i];
            }

            f[n] = sum - 1;
            var step = jacobian.LU().Solve(-f);
            double largest = step.AbsoluteMaximum();
            if (!double.IsFinite(largest))
            {
                throw new ConvergenceException($"the {(bubble ? "bubble" : "dew")} point at {Describe(atTemperature, value)} met a singular Jacobian", newton, residual);
            }

            double scale = largest > 0.5 ? 0.5 / largest : 1;
            for (int i = 0; i < n; i++)
            {
                lnK[i] += scale * step[i];
            }

            if (atTemperature)
            {
                lnP += scale * step[n];
            }
            else
            {
                lnT += scale * step[n];
            }

            // Trivial solution: both phases of one composition (to 1e-4) and density (to 0.1 %). A
            // pure component has equal compositions but distinct densities, so it passes; a genuine
            // point this close to the critical point is not resolved either.
            double apart = 0;
            for (int i = 0; i < n; i++)
            {
                apart = Math.Max(apart, Math.Abs(w[i] / sum - z[i]));
            }

            if (apart < 1e-4 && Math.Abs(densityL - densityV) < 1e-3 * Math.Max(densityL, densityV))
            {
                throw new ConvergenceException(
                    $"no {(bubble ? "bubble" : "dew")} point at {Describe(atTemperature, value)}: the iteration reached the trivial solution (liquid and vapour identical), as it does outside the phase envelope",
                    newton, residual);
            }

            // Converged: the step is at rounding (1e-12 in ln P, ln T and ln K) and the equations
            // hold to 1e-11 (a few hundred roundings of ln φ); or, as in the flash, the residual is
            // below 1e-8 and a Newton step no longer halves it. That is the rounding floor of ln φ:
            // a dense liquid far below its critical point has ∂ln φ/∂ln ρ of some tens, so the
            // rounding of its density root puts 1e-12 to 1e-10 into ln φ^L (ethanol + water at 320 K
            // with k_ij = -0.1 sat at 1.9e-12 (x = 0.5) and 6e-11 (x = 0.1) for 56 steps, the pressure
            // settled to 11 digits). The residual reached is in the report.
            bool atFloor = residual < 1e-8 && residual > 0.5 * previousResidual;
            previousResidual = residual;
            if ((largest < 1e-12 && residual < 1e-11) || atFloor)
            {
                if (atTemperature)
                {
                    pressure = Math.Exp(lnP);
                }
                else
                {
                    temperature = Math.Exp(lnT);
                }

                double total = Incipient(bubble, z, lnK, w);
                var incipient = new double[n];
                for (int i = 0; i < n; i++)
                {
                    incipient[i] = w[i] / total;
                }

                var liquidX = bubble ? z : incipient;
                var vapourY = bubble ? incipient : z;
                var liquid = Phase(temperature, pressure, liquidX, densityL, ref evaluations);
                var vapour = Phase(temperature, pressure, vapourY, densityV, ref evaluations);
                return new MixtureSaturationPoint(kind, temperature, pressure, liquid, vapour,
                    new MixtureSolverReport(substitution, newton, evaluations, residual));
            }
        }
    }

    private static string Describe(bool atTemperature, double value)
        => atTemperature ? $"{Preconditions.Format(value)} K" : $"{Preconditions.Format(value)} Pa";

    /// <summary>The incipient phase's amounts w (z·K or z/K); returns Σw.</summary>
    private static double Incipient(bool bubble, double[] z, double[] lnK, double[] w)
    {
        double sum = 0;
        for (int i = 0; i < z.Length; i++)
        {
            w[i] = z[i] * Math.Exp(bubble ? lnK[i] : -lnK[i]);
            sum += w[i];
        }

        return sum;
    }

    /// <summary>ln φ of the liquid and vapour of a bubble (liquid = feed) or dew (vapour = feed)
    /// point, with the incipient phase's dN into <paramref name="dN"/>; returns (ρL, ρV).</summary>
    private (double Liquid, double Vapour) Fugacities(bool bubble, double temperature, double pressure, double[] z, double[] w,
        MixtureRoot feedRoot, MixtureRoot incipientRoot, double[] lnPhiL, double[] lnPhiV, Span<double> dN,
        Span<double> dTL, Span<double> dTV, Span<double> dPL, Span<double> dPV)
    {
        if (bubble)
        {
            double l = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, z, feedRoot, lnPhiL, dTL, dPL);
            double v = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, incipientRoot, lnPhiV, dTV, dPV, dN);
            return (l, v);
        }
        else
        {
            double v = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, z, feedRoot, lnPhiV, dTV, dPV);
            double l = Model.LnFugacityCoefficientsAtPressure(temperature, pressure, w, incipientRoot, lnPhiL, dTL, dPL, dN);
            return (l, v);
        }
    }

    /// <summary>The temperature at which Wilson's K-values put the feed at its bubble (Σ z_i K_i = 1)
    /// or dew (Σ z_i/K_i = 1) point at pressure P: Newton in 1/T, where ln K is linear.</summary>
    private double WilsonTemperature(bool bubble, double pressure, double[] z)
    {
        // ln K_i = a_i − b_i/T with a_i = ln(Pc_i/P) + 5.373(1 + ω_i), b_i = 5.373(1 + ω_i)Tc_i.
        double inverse = 0;
        for (int i = 0; i < z.Length; i++)
        {
            inverse += z[i] / (0.7 * _tc[i]);
        }

        for (int iteration = 0; iteration < 100; iteration++)
        {
            double s = 0, ds = 0;
            for (int i = 0; i < z.Length; i++)
            {
                if (z[i] == 0)
                {
                    continue;
                }

                double b = WilsonKValues.Slope * (1 + _omega[i]) * _tc[i];
                double lnK = Math.Log(_pc[i] / pressure) + WilsonKValues.Slope * (1 + _omega[i]) - b * inverse;
                double term = z[i] * Math.Exp(bubble ? lnK : -lnK);
                s += term;
                ds += bubble ? -b * term : b * term;
            }

            // f = ln Σ: monotone in 1/T; step limited to 20 % of 1/T.
            double step = -Math.Log(s) / (ds / s);
            step = Math.Clamp(step, -0.2 * inverse, 0.2 * inverse);
            inverse += step;
            if (Math.Abs(step) < 1e-12 * inverse)
            {
                break;
            }
        }

        return 1 / inverse;
    }
}
