using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>The coexistence state at pressure <paramref name="pressure"/> (Pa): the saturation
    /// temperature and both phases.</summary>
    /// <exception cref="InvalidInputException">P is not finite and positive, is at or above Pc,
    /// is below the fluid's sourced triple-point pressure (<see cref="TriplePoint"/>), or is below
    /// the saturation pressure at <see cref="MinimumTemperature"/> (at a triple point, the model's
    /// own vapour pressure there above the sourced one).</exception>
    /// <exception cref="ConvergenceException">No route met the tolerance.</exception>
    public CoexistencePoint AtPressure(double pressure) => AtPressure(pressure, null);

    /// <summary>The coexistence state at <paramref name="pressure"/> (Pa), started from a nearby
    /// solved point when one is given (carried along the line by its exact slopes).</summary>
    /// <remarks>Newton iteration on T and the logarithms of both densities for PL = P, PV = P and
    /// gL = gV, two model evaluations per step. With E_L = PL − P, E_V = PV − P,
    /// E_G = (gL − gV)/RT and P_T = (∂P/∂T)_ρ, a = (∂P/∂ρ)_T, the linear system eliminates to
    /// ΔT·[∂E_G/∂T − (P_T,L/ρL − P_T,V/ρV)/RT] = −E_G + (E_L/ρL − E_V/ρV)/RT, then
    /// Δln ρ = −(E + P_T·ΔT)/(ρ·a) for each phase. Without a neighbour the start is the
    /// coexistence state at an ancillary temperature (the inverse of the corresponding-states
    /// vapour pressure; near Pc the critical isochore), carried to P by its slopes.</remarks>
    /// <exception cref="InvalidInputException">As <see cref="AtPressure(double)"/>.</exception>
    /// <exception cref="ConvergenceException">No route met the tolerance.</exception>
    public CoexistencePoint AtPressure(double pressure, CoexistencePoint? near)
    {
        Preconditions.Positive(pressure, "pressure");
        double pc = CriticalPressure;
        if (pressure >= pc)
        {
            throw new InvalidInputException("pressure", pressure,
                $"pressure {Preconditions.Format(pressure)} Pa is at or above the critical pressure {Preconditions.Format(pc)} Pa: no liquid-vapour coexistence");
        }

        // Below the sourced triple-point pressure no liquid exists, whatever the model says; the
        // 1e-12 is rounding of a pressure converted from another unit.
        if (TriplePoint is { Pressure: double triple } limit && pressure < triple * (1 - BoundaryRoundingTolerance))
        {
            var (given, _) = Preconditions.Apart(pressure, triple);
            throw new InvalidInputException("pressure", pressure,
                $"no liquid exists below {limit.PressureText}: at {given} Pa the solid sublimes (see curve --line sublimation)");
        }

        var work = new Work();
        string? failure = null;
        if (1 - pressure / pc < 0.01 && pressure > Series(work).TopPressure)
        {
            return SeriesAtPressure(pressure, work) ?? throw new ConvergenceException(
                $"saturation temperature at {Preconditions.Format(pressure)} Pa did not converge on the critical series", work.Evaluations, double.NaN);
        }

        CoexistenceStart startKind = CoexistenceStart.Neighbour;
        if (near is null || near.IsCritical)
        {
            double estimate = AncillaryTemperature(pressure, work);
            estimate = Math.Min(Math.Max(estimate, MinimumTemperature), CriticalTemperature * (1 - 1e-6));
            near = Solve(estimate, null, work);
            startKind = near.Report.Start;
        }

        var point = IterateAtPressure(pressure, near, startKind, work, ref failure);
        if (point is null)
        {
            // A second start: the state at the temperature the first attempt was heading for.
            double estimate = ClausiusClapeyronTemperature(near, pressure);
            if (estimate > MinimumTemperature * 0.5 && estimate < CriticalTemperature)
            {
                near = Solve(Math.Max(estimate, MinimumTemperature), null, work);
                point = IterateAtPressure(pressure, near, near.Report.Start, work, ref failure);
            }
        }

        if (point is null)
        {
            double bottom = BottomPressure();
            if (pressure < bottom)
            {
                throw BelowBottom(pressure, bottom);
            }

            throw new ConvergenceException(
                $"saturation temperature at {Preconditions.Format(pressure)} Pa did not converge ({failure})", work.Evaluations, double.NaN);
        }

        if (point.Temperature < MinimumTemperature * (1 - BoundaryRoundingTolerance))
        {
            throw BelowBottom(pressure, BottomPressure());
        }

        return point;
    }

    /// <summary>Like <see cref="AtPressure(double)"/>, returning false instead of throwing.</summary>
    public bool TryAtPressure(double pressure, out CoexistencePoint? point)
        => TrySolve(() => AtPressure(pressure), out point);

    private double BottomPressure() => AtTemperature(MinimumTemperature).Pressure;

    /// <summary>The refusal of a pressure below <paramref name="bottom"/>, the saturation
    /// pressure at the lowest valid temperature (solved once by the caller).</summary>
    private InvalidInputException BelowBottom(double pressure, double bottom)
    {
        var (given, limit) = Preconditions.Apart(pressure, bottom);
        if (TriplePoint is { } triple)
        {
            // At or above the sourced triple-point pressure, but the model's vapour pressure at the
            // triple point lies higher: the model's own inconsistency, named with both numbers.
            string sourced = triple.Pressure is double pt
                ? $", above the sourced triple-point pressure {Preconditions.Format(pt)} Pa ({triple.PressureSource}) by {Preconditions.Format(100 * (bottom / pt - 1))} %"
                : "";
            return new InvalidInputException("pressure", pressure,
                $"the model's saturation temperature at {given} Pa falls below the triple point {Preconditions.Format(MinimumTemperature)} K of {triple.FluidName}: the model's vapour pressure at the triple point is {limit} Pa{sourced}; below it this model has no liquid-vapour coexistence above the triple point");
        }

        return new InvalidInputException("pressure", pressure,
            $"pressure {given} Pa is below the saturation pressure {limit} Pa at the lowest valid temperature {Preconditions.Format(MinimumTemperature)} K");
    }

    private CoexistencePoint? IterateAtPressure(double pressure, CoexistencePoint near, CoexistenceStart start, Work work, ref string? failure)
    {
        double tc = CriticalTemperature;
        double lowest = 0.5 * MinimumTemperature;

        // The start: T on the tangent of ln P against 1/T, densities along their slopes, linear in √(Tc − T).
        double t = ClausiusClapeyronTemperature(near, pressure);
        if (!(t > lowest && t < tc))
        {
            t = near.Temperature;
        }

        double s0 = Math.Sqrt(tc - near.Temperature);
        double s = Math.Sqrt(tc - t);
        double Carry(Properties.PhaseState phase)
        {
            double slopeT = (near.Slope - phase.PressureTemperatureDerivative) / phase.PressureDensityDerivative;
            return phase.Density * Math.Exp(slopeT / phase.Density * (-2 * s0) * (s - s0));
        }

        double rhoL = Carry(near.Liquid);
        double rhoV = Carry(near.Vapour);
        if (!(rhoV > 0 && rhoV < rhoL && rhoL < _densityBound))
        {
            (t, rhoL, rhoV) = (near.Temperature, near.Liquid.Density, near.Vapour.Density);
        }

        var track = new NewtonTrack(this, work, t, rhoL, rhoV);
        while (track.Iteration < Options.MaxIterations)
        {
            track.Iteration++;
            var (dl, dv) = (track.Liquid, track.Vapour);
            t = dl.Temperature;
            rhoL = dl.Density;
            rhoV = dv.Density;
            double rt = R * t;
            double aL = dl.PressureDRho;
            double aV = dv.PressureDRho;
            if (!(aL > 0 && aV > 0))
            {
                failure = "a phase left its stable branch";
                break;
            }

            double pl = dl.Pressure;
            double pv = dv.Pressure;
            double eL = pl - pressure;
            double eV = pv - pressure;
            double eG = Math.Log(rhoL / rhoV) + (dl.Value - dv.Value) / rt + (pl / rhoL - pv / rhoV) / rt;
            double ptL = dl.PressureDT;
            double ptV = dv.PressureDT;
            // ∂E_G/∂T at constant densities (the ideal-gas parts cancel between the phases).
            double gT = (dl.DT - dv.DT) / rt - (dl.Value - dv.Value) / (rt * t)
                        + (ptL / rhoL - ptV / rhoV) / rt - (pl / rhoL - pv / rhoV) / (rt * t);
            double c = gT - (ptL / rhoL - ptV / rhoV) / rt;
            double dT = (-eG + (eL / rhoL - eV / rhoV) / rt) / c;
            double du = (-eL - ptL * dT) / (rhoL * aL);
            double dw = (-eV - ptV * dT) / (rhoV * aV);
            double step = Math.Max(Math.Abs(dT) / t, Math.Max(Math.Abs(du), Math.Abs(dw)));
            if (!double.IsFinite(step))
            {
                failure = "singular Jacobian";
                break;
            }

            double noiseF2 = RoundingUnit * (GibbsScale(dl, rt) + GibbsScale(dv, rt));
            double noise = 8 * Math.Max(
                (RoundingUnit * PressureScale(dl, rt) + Math.Abs(ptL) * Math.Abs(noiseF2 / c)) / (rhoL * aL),
                (RoundingUnit * PressureScale(dv, rt) + Math.Abs(ptV) * Math.Abs(noiseF2 / c)) / (rhoV * aV));
            if (track.Done(step, noise))
            {
                break;
            }

            if (!track.Move(dT, du, dw, step > 0.5 ? 0.5 / step : 1, lowestTemperature: 0.5 * MinimumTemperature))
            {
                failure = "no step keeps both phases on their stable branches below Tc";
                break;
            }
        }

        var finished = track.Finish(pressure, CoexistenceMethod.TemperatureIteration, start, ref failure);
        if (finished is null)
        {
            failure ??= $"temperature iteration stalled with a correction of {Preconditions.Format(track.BestStep)}";
        }

        return finished;
    }

    /// <summary>The temperature where the tangent of ln Psat against 1/T at a solved point
    /// reaches ln P: 1/T = 1/T0 − ln(P/P0)·P0/(T0²·dPsat/dT). Exact for a constant latent heat
    /// and an ideal-gas vapour, so good over decades of pressure where the tangent of P(T) is not.</summary>
    private static double ClausiusClapeyronTemperature(CoexistencePoint near, double pressure)
    {
        double t0 = near.Temperature;
        double inverse = 1 / t0 - Math.Log(pressure / near.Pressure) * near.Pressure / (t0 * t0 * near.Slope);
        return inverse > 0 ? 1 / inverse : t0;
    }
}
