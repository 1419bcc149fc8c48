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

        double tc = solver.Model.CriticalTemperature;
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
        var result = new List<CoexistencePoint>(points);
        for (int i = 0; i < points; i++)
        {
            double s = sFrom + (sTo - sFrom) * i / (points - 1);
            double t = i == 0 ? from : i == points - 1 ? to : tc - s * s;
            result.Add(t >= tc ? solver.CriticalPoint() : solver.AtTemperature(t));
        }

        return result;
    }

    /// <summary>The whole curve from the solver's lowest valid temperature to the critical point.</summary>
    public static IReadOnlyList<CoexistencePoint> Trace(CoexistenceSolver solver, int points = DefaultPoints)
    {
        ArgumentNullException.ThrowIfNull(solver);
        return Trace(solver, solver.MinimumTemperature, solver.Model.CriticalTemperature, points);
    }
}
