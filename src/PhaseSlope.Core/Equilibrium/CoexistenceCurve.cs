using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Equilibrium;

/// <summary>Traces the saturation curve of a model between two temperatures.</summary>
public static class CoexistenceCurve
{
    /// <summary>Default number of points of a traced curve.</summary>
    public const int DefaultPoints = 40;

    /// <summary>Traces <paramref name="points"/> coexistence states from <paramref name="from"/> to
    /// <paramref name="to"/> (K). When <paramref name="to"/> equals Tc the last state is the critical
    /// point itself.</summary>
    /// <remarks>Points are spaced as T = Tc − (Tc − T_from)·(1 − x)²·…, i.e. evenly in
    /// √(Tc − T), so they crowd toward Tc where the densities and the latent heat change fastest
    /// (both go as (Tc − T)^½). When <paramref name="to"/> is below Tc the same spacing is applied
    /// to the interval, measured from Tc.</remarks>
    /// <exception cref="InvalidInputException">Fewer than 2 points, or a temperature outside
    /// [minimum temperature, Tc], or from ≥ to.</exception>
    public static IReadOnlyList<CoexistencePoint> Trace(CoexistenceSolver solver, double from, double to, int points = DefaultPoints)
    {
        ArgumentNullException.ThrowIfNull(solver);
        if (points < 2)
        {
            throw new InvalidInputException("points", points, $"a curve needs at least 2 points, got {points}");
        }

        if (points > 100_000)
        {
            throw new InvalidInputException("points", points, $"a curve is limited to 100000 points, got {points}");
        }

        double tc = solver.CriticalTemperature;
        Preconditions.Positive(from, "from temperature");
        Preconditions.Positive(to, "to temperature");
        if (to > tc)
        {
            throw new InvalidInputException("to temperature", to,
                $"end temperature {Preconditions.Format(to)} K is above the critical temperature {Preconditions.Format(tc)} K");
        }

        if (!(from < to))
        {
            throw new InvalidInputException("from temperature", from,
                $"start temperature {Preconditions.Format(from)} K must be below the end temperature {Preconditions.Format(to)} K");
        }

        // Even spacing in s = √(Tc − T) between the two ends.
        double sFrom = Math.Sqrt(tc - from);
        double sTo = Math.Sqrt(tc - to);
        var temperatures = new double[points];
        for (int i = 0; i < points; i++)
        {
            double s = sFrom + (sTo - sFrom) * i / (points - 1);
            temperatures[i] = i == 0 ? from : i == points - 1 ? to : tc - s * s;
        }

        return Through(solver, temperatures);
    }

    /// <summary>The coexistence states at the given temperatures (K, increasing, each below Tc
    /// or equal to it for the critical state), each started from its predecessors.</summary>
    /// <remarks>The start of each point is the polynomial through the last (up to four) solved
    /// points of ln ρL and ln ρV against s = √(Tc − T), in which a classical model's densities are
    /// smooth up to Tc; after the first point, the tangent of the first point's exact slopes.
    /// On a finely spaced curve this start is within ~1e-9 of the answer, and one Newton step
    /// plus its check (four model evaluations) finish the point. A start that fails falls back
    /// on a cold start, so the answer never depends on the spacing.</remarks>
    public static IReadOnlyList<CoexistencePoint> Through(CoexistenceSolver solver, IReadOnlyList<double> temperatures)
    {
        ArgumentNullException.ThrowIfNull(solver);
        ArgumentNullException.ThrowIfNull(temperatures);
        double tc = solver.CriticalTemperature;
        var result = new List<CoexistencePoint>(temperatures.Count);
        const int Order = 4;
        var s = new double[Order];
        var lnLiquid = new double[Order];
        var lnVapour = new double[Order];
        int history = 0;
        for (int i = 0; i < temperatures.Count; i++)
        {
            double t = temperatures[i];
            if (t >= tc)
            {
                result.Add(solver.CriticalPoint());
                continue;
            }

            double si = Math.Sqrt(tc - t);
            CoexistencePoint point = history switch
            {
                0 => solver.AtTemperature(t),
                1 => solver.AtTemperature(t, result[^1]),
                _ => solver.AtTemperatureFrom(t,
                    Math.Exp(Extrapolate(s, lnLiquid, history, si)), Math.Exp(Extrapolate(s, lnVapour, history, si))),
            };
            result.Add(point);

            // Keep the last Order points, newest last.
            if (history == Order)
            {
                Array.Copy(s, 1, s, 0, Order - 1);
                Array.Copy(lnLiquid, 1, lnLiquid, 0, Order - 1);
                Array.Copy(lnVapour, 1, lnVapour, 0, Order - 1);
                history--;
            }

            s[history] = si;
            lnLiquid[history] = Math.Log(point.Liquid.Density);
            lnVapour[history] = Math.Log(point.Vapour.Density);
            history++;
        }

        return result;
    }

    /// <summary>The Lagrange polynomial through (x[k], y[k]), k &lt; count, evaluated at <paramref name="at"/>.</summary>
    private static double Extrapolate(double[] x, double[] y, int count, double at)
    {
        double sum = 0;
        for (int k = 0; k < count; k++)
        {
            double weight = 1;
            for (int j = 0; j < count; j++)
            {
                if (j != k)
                {
                    weight *= (at - x[j]) / (x[k] - x[j]);
                }
            }

            sum += weight * y[k];
        }

        return sum;
    }

    /// <summary>The whole curve from the solver's lowest valid temperature to the critical point.</summary>
    public static IReadOnlyList<CoexistencePoint> Trace(CoexistenceSolver solver, int points = DefaultPoints)
    {
        ArgumentNullException.ThrowIfNull(solver);
        return Trace(solver, solver.MinimumTemperature, solver.CriticalTemperature, points);
    }
}
