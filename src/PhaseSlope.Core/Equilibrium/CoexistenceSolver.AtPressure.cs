using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Equilibrium;

public sealed partial class CoexistenceSolver
{
    /// <summary>Reduced distance below Tc of the highest temperature the pressure search visits.</summary>
    private const double PressureSearchTopGap = 1e-8;

    /// <summary>The coexistence state at pressure <paramref name="pressure"/> (Pa): the saturation
    /// temperature and both phases.</summary>
    /// <remarks>Newton iteration on T/Tc for ln Psat(T) = ln P, with the exact derivative
    /// d ln Psat/dT = (dPsat/dT)/Psat from the Clapeyron slope, safeguarded by bisection inside
    /// [<see cref="MinimumTemperature"/>, Tc·(1 − 1e-8)].</remarks>
    /// <exception cref="InvalidInputException">P is not finite and positive, is at or above Pc,
    /// or is below the saturation pressure at <see cref="MinimumTemperature"/>.</exception>
    public CoexistencePoint AtPressure(double pressure)
    {
        Preconditions.Positive(pressure, "pressure");
        double pc = Model.CriticalPressure;
        if (pressure >= pc)
        {
            throw new InvalidInputException("pressure", pressure,
                $"pressure {Preconditions.Format(pressure)} Pa is at or above the critical pressure {Preconditions.Format(pc)} Pa: no liquid-vapour coexistence");
        }

        double tc = Model.CriticalTemperature;
        var bottom = AtTemperature(MinimumTemperature);
        if (pressure < bottom.Pressure * (1 - BoundaryRoundingTolerance))
        {
            throw new InvalidInputException("pressure", pressure,
                $"pressure {Preconditions.Format(pressure)} Pa is below the saturation pressure {Preconditions.Format(bottom.Pressure)} Pa at the lowest valid temperature {Preconditions.Format(MinimumTemperature)} K");
        }

        var top = AtTemperature(tc * (1 - PressureSearchTopGap));
        if (pressure > top.Pressure)
        {
            throw new InvalidInputException("pressure", pressure,
                $"pressure {Preconditions.Format(pressure)} Pa is within {Preconditions.Format(PressureSearchTopGap)} of the critical pressure in reduced temperature; treat the state as critical");
        }

        int steps = 0;
        CoexistencePoint? last = null;
        double lnTarget = Math.Log(pressure);
        CoexistencePoint At(double reduced)
        {
            if (last is null || last.Temperature != reduced * tc)
            {
                last = AtTemperature(reduced * tc);
            }

            return last;
        }

        double F(double reduced)
        {
            steps++;
            return Math.Log(At(reduced).Pressure) - lnTarget;
        }

        double DF(double reduced)
        {
            var point = At(reduced);
            return point.Slope * tc / point.Pressure;
        }

        // The slack admits a root a rounding error below the limit (see BoundaryRoundingTolerance).
        double lo = MinimumTemperature * (1 - 0.5 * BoundaryRoundingTolerance) / tc;
        double hi = 1 - PressureSearchTopGap;
        if (!RobustNewtonRaphson.TryFindRoot(F, DF, lo, hi, 1e-13, Options.MaxIterations, 20, out double root))
        {
            throw new ConvergenceException(
                $"saturation temperature at {Preconditions.Format(pressure)} Pa did not converge", steps, last?.Pressure - pressure ?? double.NaN);
        }

        var point = At(root);
        return point with { Report = point.Report with { Method = CoexistenceMethod.TemperatureIteration, Iterations = steps } };
    }

    /// <summary>Like <see cref="AtPressure"/>, returning false instead of throwing.</summary>
    public bool TryAtPressure(double pressure, out CoexistencePoint? point)
        => TrySolve(() => AtPressure(pressure), out point);
}
