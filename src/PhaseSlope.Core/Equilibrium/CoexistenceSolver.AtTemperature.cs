using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>The coexistence state at temperature <paramref name="temperature"/> (K):
    /// saturation pressure and both densities.</summary>
    /// <exception cref="InvalidInputException">T is not finite and positive, is below
    /// <see cref="MinimumTemperature"/>, or is at or above Tc.</exception>
    /// <exception cref="ConvergenceException">No route met the tolerance.</exception>
    public CoexistencePoint AtTemperature(double temperature) => AtTemperature(temperature, null);

    /// <summary>The coexistence state at <paramref name="temperature"/> (K), started from a nearby
    /// solved point of the same solver when one is given: its densities carried to
    /// <paramref name="temperature"/> along their exact slopes dρ/dT|σ = (dPsat/dT − (∂P/∂T)_ρ)/(∂P/∂ρ)_T,
    /// linear in √(Tc − T). The answer does not depend on the start; only the cost does.</summary>
    /// <exception cref="InvalidInputException">As <see cref="AtTemperature(double)"/>.</exception>
    /// <exception cref="ConvergenceException">No route met the tolerance.</exception>
    public CoexistencePoint AtTemperature(double temperature, CoexistencePoint? near)
    {
        CheckTemperature(temperature);
        return Solve(temperature, near, new Work());
    }

    private CoexistencePoint Solve(double temperature, CoexistencePoint? near, Work work, bool seriesAllowed = true)
    {
        if (seriesAllowed && 1 - temperature / CriticalTemperature < CriticalSeriesReducedGap)
        {
            return SeriesPoint(temperature, work);
        }

        string? failure = null;
        if (near is not null && !near.IsCritical && near.Temperature < CriticalTemperature)
        {
            double s0 = Math.Sqrt(CriticalTemperature - near.Temperature);
            double s = Math.Sqrt(CriticalTemperature - temperature);
            double LnDensity(Properties.PhaseState phase)
            {
                double slopeT = (near.Slope - phase.PressureTemperatureDerivative) / phase.PressureDensityDerivative;
                // d ln ρ/ds = (dρ/dT)/ρ · dT/ds with T = Tc − s², dT/ds = −2s.
                return Math.Log(phase.Density) + slopeT / phase.Density * (-2 * s0) * (s - s0);
            }

            var point = Iterate(temperature, Math.Exp(LnDensity(near.Liquid)), Math.Exp(LnDensity(near.Vapour)), CoexistenceStart.Neighbour, work, ref failure);
            if (point is not null)
            {
                return point;
            }
        }

        return Cold(temperature, work, failure);
    }

    /// <summary>Like <see cref="AtTemperature(double)"/>, returning false instead of throwing.</summary>
    public bool TryAtTemperature(double temperature, out CoexistencePoint? point)
        => TrySolve(() => AtTemperature(temperature), out point);

    /// <summary>The state at T started from given densities (a traced curve's extrapolation);
    /// falls back on a cold start if the Newton iteration from them fails.</summary>
    internal CoexistencePoint AtTemperatureFrom(double temperature, double liquidDensity, double vapourDensity)
    {
        CheckTemperature(temperature);
        var work = new Work();
        if (1 - temperature / CriticalTemperature < CriticalSeriesReducedGap)
        {
            return SeriesPoint(temperature, work);
        }

        string? failure = null;
        return Iterate(temperature, liquidDensity, vapourDensity, CoexistenceStart.Neighbour, work, ref failure)
            ?? Cold(temperature, work, failure);
    }

    private CoexistencePoint Cold(double temperature, Work work, string? failure)
    {
        if (temperature / CriticalTemperature >= CriticalScalingReducedTemperature)
        {
            var (liquid, vapour) = CriticalScalingStart(temperature);
            var point = Iterate(temperature, liquid, vapour, CoexistenceStart.CriticalScaling, work, ref failure);
            if (point is not null)
            {
                return point;
            }
        }
        else if (AncillaryStart(temperature, work, out double liquid, out double vapour))
        {
            var point = Iterate(temperature, liquid, vapour, CoexistenceStart.Ancillary, work, ref failure);
            if (point is not null)
            {
                return point;
            }
        }

        if (BracketingStart(temperature, work, out double l, out double v, ref failure))
        {
            var point = Iterate(temperature, l, v, CoexistenceStart.Bracketing, work, ref failure);
            if (point is not null)
            {
                return point with { Report = point.Report with { Method = CoexistenceMethod.PressureIteration } };
            }
        }

        if (1 - temperature / CriticalTemperature < 1e-6)
        {
            throw new ConvergenceException(
                $"temperature {Preconditions.Format(temperature)} K is too close to the critical temperature {Preconditions.Format(CriticalTemperature)} K for two phases to be resolved in double precision ({failure})",
                work.Evaluations, double.NaN);
        }

        throw new ConvergenceException(
            $"coexistence at {Preconditions.Format(temperature)} K did not converge ({failure})", work.Evaluations, double.NaN);
    }

    private void CheckTemperature(double temperature)
    {
        Preconditions.Positive(temperature, "temperature");
        if (temperature >= CriticalTemperature)
        {
            throw new InvalidInputException("temperature", temperature,
                $"temperature {Preconditions.Format(temperature)} K is at or above the critical temperature {Preconditions.Format(CriticalTemperature)} K: no liquid-vapour coexistence");
        }

        // A temperature that lands a few ulps below the limit through unit conversion
        // (0.01 degC + 273.15 is 273.15999999999997, below a 273.16 K triple point) is accepted
        // and solved where it is: the limit is physical, not a numerical edge.
        if (temperature < MinimumTemperature * (1 - BoundaryRoundingTolerance))
        {
            var (given, limit) = Preconditions.Apart(temperature, MinimumTemperature);
            throw new InvalidInputException("temperature", temperature, TriplePoint is { } triple
                ? $"temperature {given} K is below the triple point {limit} K of {triple.FluidName}: no liquid exists there, the condensed phase is the solid, which sublimes (see curve --line sublimation)"
                : $"temperature {given} K is below the lowest valid temperature {limit} K");
        }
    }

    /// <summary>Relative slack at the lowest valid temperature (and the matching pressure), for
    /// values that differ from the limit only by rounding.</summary>
    private const double BoundaryRoundingTolerance = 1e-12;

    /// <summary>Newton iteration on u = ln ρL, w = ln ρV at fixed T for equal pressure and equal
    /// Gibbs energy; null when it cannot proceed from this start.</summary>
    /// <remarks>
    /// F1 = (PL − PV)/RT and F2 = (gL − gV)/RT = ln(ρL/ρV) + (A_r,L − A_r,V)/RT + (PL/ρL − PV/ρV)/RT.
    /// With a = (∂P/∂ρ)_T and ∂(g/RT)/∂ln ρ = a/RT (Gibbs–Duhem) the Jacobian is
    /// [[ρL·aL, −ρV·aV], [aL, −aV]]/RT, whose solution is
    /// Δu = −RT(F1 − ρV·F2)/((ρL − ρV)·aL), Δw = RT(ρL·F2 − F1)/((ρL − ρV)·aV).
    /// Each step evaluates the model once per phase; the state returned is the last one
    /// evaluated, so nothing is evaluated twice. A step that would leave a phase's stable branch
    /// ((∂P/∂ρ)_T ≤ 0) or cross the other phase is halved. The reported pressure is the vapour's,
    /// which (unlike a dense liquid's) is computed from its density without cancellation.
    /// </remarks>
    private CoexistencePoint? Iterate(double temperature, double liquidDensity, double vapourDensity, CoexistenceStart start, Work work, ref string? failure)
    {
        double rt = R * temperature;
        double rhoL = liquidDensity;
        double rhoV = vapourDensity;
        if (!(rhoV > 0 && rhoV < rhoL && rhoL < _densityBound))
        {
            failure = "start outside the density range";
            return null;
        }

        var track = new NewtonTrack(this, work, temperature, rhoL, rhoV);
        while (track.Iteration < Options.MaxIterations)
        {
            track.Iteration++;
            var (dl, dv) = (track.Liquid, track.Vapour);
            double aL = dl.PressureDRho;
            double aV = dv.PressureDRho;
            if (!(aL > 0 && aV > 0))
            {
                failure = "a phase left its stable branch";
                break;
            }

            rhoL = dl.Density;
            rhoV = dv.Density;
            double pl = dl.Pressure;
            double pv = dv.Pressure;
            double f1 = (pl - pv) / rt;
            double f2 = Math.Log(rhoL / rhoV) + (dl.Value - dv.Value) / rt + (pl / rhoL - pv / rhoV) / rt;
            double gap = rhoL - rhoV;
            double du = -rt * (f1 - rhoV * f2) / (gap * aL);
            double dw = rt * (rhoL * f2 - f1) / (gap * aV);
            double step = Math.Max(Math.Abs(du), Math.Abs(dw));
            if (!double.IsFinite(step))
            {
                failure = "singular Jacobian";
                break;
            }

            // The correction that rounding alone produces: each pressure carries about ε·(ρRT +
            // ρ²|A_r,ρ|) of error, each Gibbs energy ε·(|A_r| + P/ρ + RT)/RT, amplified by the
            // same factors as F1 and F2 (a factor 8 of margin).
            double noiseF1 = RoundingUnit * (PressureScale(dl, rt) + PressureScale(dv, rt)) / rt;
            double noiseF2 = RoundingUnit * (GibbsScale(dl, rt) + GibbsScale(dv, rt));
            double noise = 8 * rt * Math.Max((noiseF1 + rhoV * noiseF2) / (gap * aL), (rhoL * noiseF2 + noiseF1) / (gap * aV));
            if (track.Done(step, noise))
            {
                break;
            }

            if (!track.Move(0, du, dw, step > 1 ? 1 / step : 1, lowestTemperature: 0))
            {
                failure = "no step keeps both phases on their stable branches";
                break;
            }
        }

        var finished = track.Finish(null, CoexistenceMethod.DensityIteration, start, ref failure);
        if (finished is null)
        {
            failure ??= $"density iteration stalled with a correction of {Preconditions.Format(track.BestStep)}";
        }

        return finished;
    }

    /// <summary>Double-precision unit roundoff.</summary>
    private const double RoundingUnit = 1.1102230246251565e-16;

    /// <summary>Size of the terms P = ρRT + ρ²·A_r,ρ is summed from, Pa.</summary>
    private static double PressureScale(in HelmholtzDerivatives d, double rt)
        => d.Density * (rt + d.Density * Math.Abs(d.DRho));

    /// <summary>Size of the terms of g/RT = ln ρ + A_r/RT + P/(ρRT) + …, dimensionless.</summary>
    private static double GibbsScale(in HelmholtzDerivatives d, double rt)
        => 1 + (Math.Abs(d.Value) + PressureScale(d, rt) / d.Density) / rt;
}
