using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>The coexistence state at temperature <paramref name="temperature"/> (K):
    /// saturation pressure and both densities.</summary>
    /// <exception cref="InvalidInputException">T is not finite and positive, is below
    /// <see cref="MinimumTemperature"/>, or is at or above Tc.</exception>
    /// <exception cref="ConvergenceException">Neither route met the tolerance.</exception>
    public CoexistencePoint AtTemperature(double temperature)
    {
        CheckTemperature(temperature);
        string? failure = null;
        bool densityFirst = temperature / Model.CriticalTemperature > DensityRouteReducedTemperature;
        if (!SpinodalWindow.TryFind(Model, temperature, out var window))
        {
            throw new ConvergenceException(
                $"temperature {Preconditions.Format(temperature)} K is too close to the critical temperature {Preconditions.Format(Model.CriticalTemperature)} K for two phases to be resolved in double precision",
                0, double.NaN);
        }

        for (int attempt = 0; attempt < 2; attempt++)
        {
            bool useDensity = densityFirst == (attempt == 0);
            var point = useDensity
                ? SolveByDensities(temperature, window, ref failure)
                : SolveByPressure(temperature, window, ref failure);
            if (point is not null && Acceptable(point))
            {
                return point;
            }

            if (point is not null)
            {
                failure = $"residual {Preconditions.Format(point.Report.FugacityResidual)} after {point.Report.Iterations} iterations";
            }
        }

        throw new ConvergenceException(
            $"coexistence at {Preconditions.Format(temperature)} K did not converge ({failure})", Options.MaxIterations, double.NaN);
    }

    /// <summary>Like <see cref="AtTemperature"/>, returning false instead of throwing.</summary>
    public bool TryAtTemperature(double temperature, out CoexistencePoint? point)
        => TrySolve(() => AtTemperature(temperature), out point);

    private void CheckTemperature(double temperature)
    {
        Preconditions.Positive(temperature, "temperature");
        if (temperature >= Model.CriticalTemperature)
        {
            throw new InvalidInputException("temperature", temperature,
                $"temperature {Preconditions.Format(temperature)} K is at or above the critical temperature {Preconditions.Format(Model.CriticalTemperature)} K: no liquid-vapour coexistence");
        }

        // A temperature that lands a few ulps below the limit through unit conversion
        // (0.01 degC + 273.15 is 273.15999999999997, below a 273.16 K triple point) is accepted
        // and solved where it is: the limit is physical, not a numerical edge.
        if (temperature < MinimumTemperature * (1 - BoundaryRoundingTolerance))
        {
            throw new InvalidInputException("temperature", temperature,
                $"temperature {Preconditions.Format(temperature)} K is below the lowest valid temperature {Preconditions.Format(MinimumTemperature)} K");
        }
    }

    /// <summary>Relative slack at the lowest valid temperature (and the matching pressure), for
    /// values that differ from the limit only by rounding.</summary>
    private const double BoundaryRoundingTolerance = 1e-12;

    private CoexistencePoint? SolveByPressure(double temperature, SpinodalWindow window, ref string? failure)
    {
        int evaluations = 0;
        double Difference(double lnP)
        {
            evaluations++;
            double p = Math.Exp(lnP);
            double rhoL = window.LiquidRoot(Model, temperature, p);
            double rhoV = window.VapourRoot(Model, temperature, p);
            var liquid = Properties.PhaseState.EvaluateAtPressure(Model, temperature, rhoL, p);
            var vapour = Properties.PhaseState.EvaluateAtPressure(Model, temperature, rhoV, p);
            return liquid.LnFugacityCoefficient - vapour.LnFugacityCoefficient;
        }

        double Slope(double lnP)
        {
            // d(ln φL − ln φV)/d ln P at constant T = Z_L − Z_V.
            double p = Math.Exp(lnP);
            double rhoL = window.LiquidRoot(Model, temperature, p);
            double rhoV = window.VapourRoot(Model, temperature, p);
            return p / (R * temperature) * (1 / rhoL - 1 / rhoV);
        }

        // Stay 1e-9 (relative) inside the window so both roots exist despite rounding in the
        // spinodal pressures. Below the liquid spinodal pressure (often negative) any tiny positive
        // pressure bounds Psat from below: there ln φL ≈ ln(Psat/P) ≫ 0 while ln φV ≈ 0.
        double upper = Math.Log(window.VapourPressure) - 1e-9;
        double lower = window.LiquidPressure > 0 ? Math.Log(window.LiquidPressure) + 1e-9 : upper - 460;
        if (!(lower < upper))
        {
            failure = "spinodal pressure window too narrow for the pressure iteration";
            return null;
        }
        double lnP;
        try
        {
            if (!RobustNewtonRaphson.TryFindRoot(Difference, Slope, lower, upper, 1e-14, Options.MaxIterations, 20, out lnP))
            {
                failure = "pressure iteration did not converge";
                return null;
            }
        }
        catch (Exception ex) when (ex is ArithmeticException or ArgumentException or MathNet.Numerics.NonConvergenceException)
        {
            failure = "pressure iteration left the spinodal window";
            return null;
        }

        double pressure = Math.Exp(lnP);
        return Build(temperature, pressure, window.LiquidRoot(Model, temperature, pressure),
            window.VapourRoot(Model, temperature, pressure), CoexistenceMethod.PressureIteration, evaluations);
    }

    /// <summary>Target of the density iteration on max(|PL − PV|/P, |gL − gV|/RT): two orders
    /// below the default fugacity tolerance, and above the rounding floor near Tc.</summary>
    private const double DensityIterationTolerance = 1e-14;

    private CoexistencePoint? SolveByDensities(double temperature, SpinodalWindow window, ref string? failure)
    {
        double rt = R * temperature;
        double rhoMax = Model.MaximumDensity;
        // Classical (mean-field) models have coexistence densities √3 times farther from the
        // inflection than the spinodals, to leading order in (1 − T/Tc).
        double sqrt3 = Math.Sqrt(3);
        double rhoV = Math.Max(window.InflectionDensity - sqrt3 * (window.InflectionDensity - window.VapourDensity), 0.5 * window.VapourDensity);
        double rhoL = Math.Min(window.InflectionDensity + sqrt3 * (window.LiquidDensity - window.InflectionDensity), 0.5 * (window.LiquidDensity + rhoMax));

        // Near Tc the Newton steps become noise-dominated once the residuals reach rounding
        // level ((∂P/∂ρ)_T → 0 amplifies the last bit of P), so the loop keeps the best iterate and
        // stops when it has not improved for a few steps.
        double bestNorm = double.PositiveInfinity;
        double bestL = rhoL, bestV = rhoV;
        int bestIteration = 0;
        int iteration = 0;
        while (iteration < Options.MaxIterations)
        {
            iteration++;
            var dl = Model.Residual(temperature, rhoL);
            var dv = Model.Residual(temperature, rhoV);
            double pl = dl.Pressure;
            double pv = dv.Pressure;
            // F1 = (PL − PV)/RT; F2 = (gL − gV)/RT with g = A_ig + A_r + P/ρ at equal T.
            double f1 = (pl - pv) / rt;
            double f2 = Math.Log(rhoL / rhoV) + (dl.Value - dv.Value) / rt + (pl / rhoL - pv / rhoV) / rt;
            double norm = Math.Max(Math.Abs(pl - pv) / Math.Max(Math.Abs(pl), Math.Abs(pv)), Math.Abs(f2));
            if (norm < bestNorm)
            {
                bestNorm = norm;
                bestL = rhoL;
                bestV = rhoV;
                bestIteration = iteration;
            }

            if (norm < DensityIterationTolerance || iteration - bestIteration > 5)
            {
                break;
            }

            double al = dl.PressureDRho / rt;
            double av = dv.PressureDRho / rt;
            double det = 1 / rhoL - 1 / rhoV;
            double stepV = (f1 / rhoL - f2) / (av * det);
            double stepL = (-f1 + av * stepV) / al;
            if (!double.IsFinite(stepV) || !double.IsFinite(stepL))
            {
                failure = "density iteration met a singular Jacobian";
                break;
            }

            // Damp the step so each density stays on its own side of the spinodal window.
            double lambda = 1;
            while (lambda > 1e-6
                   && !(rhoV + lambda * stepV > 0 && rhoV + lambda * stepV < window.VapourDensity
                        && rhoL + lambda * stepL > window.LiquidDensity && rhoL + lambda * stepL < rhoMax))
            {
                lambda *= 0.5;
            }

            rhoV += lambda * stepV;
            rhoL += lambda * stepL;
        }

        if (!(bestNorm < DensityIterationTolerance))
        {
            failure ??= $"density iteration stalled at residual {Preconditions.Format(bestNorm)}";
        }

        double pressure = Model.Pressure(temperature, bestV);
        return Build(temperature, pressure, bestL, bestV, CoexistenceMethod.DensityIteration, iteration);
    }
}
