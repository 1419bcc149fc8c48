using MathNet.Numerics.RootFinding;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Mixtures;

/// <summary>The P–x–y (isothermal) or T–x–y (isobaric) diagram of a binary mixture, from the
/// bubble point of each liquid composition, and its azeotrope where it has one.</summary>
/// <param name="Kind">Isothermal or isobaric.</param>
/// <param name="Temperature">The fixed T (isothermal), K; null otherwise.</param>
/// <param name="Pressure">The fixed P (isobaric), Pa; null otherwise.</param>
/// <param name="Points">The bubble points in increasing x_1, from x_1 = 0 to x_1 = 1 (the pure
/// ends are the pure fluids' saturation points), the azeotrope included as a point where there is one.</param>
/// <param name="Azeotrope">The azeotrope, or null where y_1 − x_1 keeps its sign.</param>
/// <param name="ModelEvaluations">Model evaluations of every bubble point, the azeotrope's search included.</param>
public sealed record BinaryDiagram(BinaryDiagramKind Kind, double? Temperature, double? Pressure,
    IReadOnlyList<BinaryDiagramPoint> Points, Azeotrope? Azeotrope, int ModelEvaluations)
{
    /// <summary>The default number of liquid compositions, the ends included.</summary>
    public const int DefaultPoints = 41;

    /// <summary>The fewest compositions accepted.</summary>
    public const int MinimumPoints = 3;

    /// <summary>The most compositions accepted.</summary>
    public const int MaximumPoints = 10_001;

    /// <summary>Tolerance of the azeotrope's x_1 (Brent).</summary>
    public const double AzeotropeTolerance = 1e-11;

    /// <summary>The P–x–y diagram at temperature T.</summary>
    /// <param name="equilibrium">The engine of a two-component mixture model.</param>
    /// <param name="temperature">T, K: below both components' critical temperatures (of the model), so
    /// that both ends are saturation points.</param>
    /// <param name="points">Liquid compositions, the ends included (<see cref="DefaultPoints"/>).</param>
    /// <exception cref="InvalidInputException">Not a binary, bad T, T at or above a component's Tc, bad count.</exception>
    /// <exception cref="ConvergenceException">A bubble point was not found.</exception>
    public static BinaryDiagram AtTemperature(MixtureEquilibrium equilibrium, double temperature, int points = DefaultPoints)
    {
        Check(equilibrium, points);
        Preconditions.Positive(temperature, "temperature");
        for (int i = 0; i < 2; i++)
        {
            double tc = equilibrium.Model.Components[i].CriticalTemperature;
            if (!(temperature < tc))
            {
                throw new InvalidInputException("temperature", temperature,
                    $"{Preconditions.Format(temperature)} K is not below the critical temperature of {equilibrium.Components[i].Name} ({Preconditions.Format(tc)} K): the P-x-y diagram would not reach x = {(i == 0 ? 1 : 0)}");
            }
        }

        double? last = null;
        MixtureSaturationPoint Bubble(double x)
        {
            var point = BubbleAtTemperature(equilibrium, temperature, [x, 1 - x], last);
            last = point.Pressure;
            return point;
        }

        return Build(equilibrium.Model, BinaryDiagramKind.Isothermal, temperature, points, Bubble);
    }

    /// <summary>The T–x–y diagram at pressure P.</summary>
    /// <param name="equilibrium">The engine of a two-component mixture model.</param>
    /// <param name="pressure">P, Pa: below both components' critical pressures.</param>
    /// <param name="points">Liquid compositions, the ends included (<see cref="DefaultPoints"/>).</param>
    /// <exception cref="InvalidInputException">Not a binary, bad P, P at or above a component's Pc, bad count.</exception>
    /// <exception cref="ConvergenceException">A bubble point was not found.</exception>
    public static BinaryDiagram AtPressure(MixtureEquilibrium equilibrium, double pressure, int points = DefaultPoints)
    {
        Check(equilibrium, points);
        Preconditions.Positive(pressure, "pressure");
        for (int i = 0; i < 2; i++)
        {
            double pc = equilibrium.Model.Components[i].CriticalPressure;
            if (!(pressure < pc))
            {
                throw new InvalidInputException("pressure", pressure,
                    $"{Preconditions.Format(pressure)} Pa is not below the critical pressure of {equilibrium.Components[i].Name} ({Preconditions.Format(pc)} Pa): the T-x-y diagram would not reach x = {(i == 0 ? 1 : 0)}");
            }
        }

        return Build(equilibrium.Model, BinaryDiagramKind.Isobaric, pressure, points, x => equilibrium.BubbleAtPressure(pressure, [x, 1 - x]));
    }

    /// <summary>Cap on the Newton steps of the fallback in <see cref="BubbleAtTemperature"/>.</summary>
    public const int MaxFallbackSteps = 40;

    /// <summary>The bubble point at T of liquid <paramref name="z"/>: <see cref="MixtureEquilibrium.BubbleAtTemperature"/>,
    /// or, where that does not converge from Wilson's start (it fails for some close-boiling pairs at
    /// low pressure, where every K is near 1), Newton's method in P on the bubble point at given P:
    /// P ← P + (dP/dT)_x·(T − T_bubble(P)), the slope being the bubble line's generalized Clapeyron
    /// slope at fixed x (<see cref="MixtureClapeyron.BubbleLine"/>), which is the exact derivative, so
    /// the iteration converges quadratically; it stops when |T_bubble(P) − T| &lt; 1e-11·T.</summary>
    /// <param name="equilibrium">The engine.</param>
    /// <param name="temperature">T, K.</param>
    /// <param name="z">The liquid.</param>
    /// <param name="start">A pressure to start the fallback from (a neighbour's), or null for Wilson's estimate.</param>
    private static MixtureSaturationPoint BubbleAtTemperature(MixtureEquilibrium equilibrium, double temperature, double[] z, double? start)
    {
        try
        {
            return equilibrium.BubbleAtTemperature(temperature, z);
        }
        catch (ConvergenceException direct)
        {
            // From the neighbour's pressure first, then from Wilson's estimate: the bubble point at
            // given P converges from one where it does not from the other.
            var lnK = new double[z.Length];
            equilibrium.WilsonLnK(temperature, 1, lnK);   // K at 1 Pa: P = Σ z_i K_i(1 Pa)
            double wilson = 0;
            for (int i = 0; i < z.Length; i++)
            {
                wilson += z[i] * Math.Exp(lnK[i]);
            }

            double error = double.PositiveInfinity;
            foreach (double first in start is double p0 ? new[] { p0, wilson } : [wilson])
            {
                try
                {
                    double pressure = first;
                    for (int step = 0; step < MaxFallbackSteps; step++)
                    {
                        var point = equilibrium.BubbleAtPressure(pressure, z);
                        error = temperature - point.Temperature;
                        if (Math.Abs(error) < 1e-11 * temperature)
                        {
                            return point;
                        }

                        var slope = MixtureClapeyron.BubbleLine(equilibrium.Model, point.Temperature, point.Pressure, z, [.. point.Vapour.MoleFractions]);
                        // Limit the step to a factor of 2 in P, as the saturation solvers limit ln P steps.
                        pressure = Math.Clamp(pressure + slope.Slope * error, 0.5 * pressure, 2 * pressure);
                    }
                }
                catch (ConvergenceException)
                {
                    // Try the next start.
                }
            }

            throw new ConvergenceException($"{direct.Message}; the fallback on the bubble point at given pressure did not reach {Preconditions.Format(temperature)} K either",
                MaxFallbackSteps, Math.Abs(error));
        }
    }

    /// <summary>The liquid compositions: x_1 = (1 − cos(πk/(N−1)))/2, denser towards the pure
    /// ends, where the dew line curves most (its slope there is set by the infinite-dilution K).</summary>
    public static double[] Compositions(int points)
    {
        var x = new double[points];
        for (int k = 0; k < points; k++)
        {
            x[k] = k == 0 ? 0 : k == points - 1 ? 1 : 0.5 * (1 - Math.Cos(Math.PI * k / (points - 1)));
        }

        return x;
    }

    private static void Check(MixtureEquilibrium equilibrium, int points)
    {
        ArgumentNullException.ThrowIfNull(equilibrium);
        if (equilibrium.Model.ComponentCount != 2)
        {
            throw new InvalidInputException("components", equilibrium.Model.ComponentCount,
                $"a binary diagram needs two components; this mixture has {equilibrium.Model.ComponentCount}");
        }

        if (points < MinimumPoints || points > MaximumPoints)
        {
            throw new InvalidInputException("points", points, $"the number of compositions must be from {MinimumPoints} to {MaximumPoints}, got {points}");
        }
    }

    /// <remarks>The azeotrope is where g(x_1) = (y_1 − x_1)/(x_1 x_2) changes sign. Divided by
    /// x_1 x_2, g has finite ends, K_1^∞ − 1 at x_1 = 0 and 1 − K_2^∞ at x_1 = 1 (both from the
    /// infinite-dilution K of the pure-end bubble points), so an azeotrope between an end and its
    /// neighbour is bracketed too. The bracket is refined by Brent's method to
    /// <see cref="AzeotropeTolerance"/> in x_1; g going from + to − is a maximum of pressure (y_1 &gt; x_1
    /// below it, so dP/dx_1 &gt; 0 there by the Gibbs–Konovalov theorem). Only the first sign change
    /// is located; a binary with two azeotropes (rare) reports the one at lower x_1.</remarks>
    private static BinaryDiagram Build(Models.CubicMixtureModel model, BinaryDiagramKind kind, double value, int count, Func<double, MixtureSaturationPoint> bubble)
    {
        var xs = Compositions(count);
        var points = new List<BinaryDiagramPoint>(count + 1);
        var g = new double[count];
        int evaluations = 0;
        for (int k = 0; k < count; k++)
        {
            var point = bubble(xs[k]);
            evaluations += point.Report.ModelEvaluations;
            points.Add(ToPoint(model, xs[k], point));
            g[k] = k == 0 ? point.KValues[0] - 1
                : k == count - 1 ? 1 - point.KValues[1]
                : (point.Vapour.MoleFractions[0] - xs[k]) / (xs[k] * (1 - xs[k]));
        }

        Azeotrope? azeotrope = null;
        for (int k = 0; k + 1 < count && azeotrope is null; k++)
        {
            if (g[k] == 0 && k > 0)
            {
                azeotrope = Locate(model, points[k].Point, g[k - 1] > 0 ? AzeotropeKind.MaximumPressure : AzeotropeKind.MinimumPressure, 0);
            }
            else if (g[k] * g[k + 1] < 0)
            {
                int iterations = 0;
                double Relative(double x)
                {
                    iterations++;
                    var p = bubble(x);
                    evaluations += p.Report.ModelEvaluations;
                    return (p.Vapour.MoleFractions[0] - x) / (x * (1 - x));
                }

                double lo = Math.Max(xs[k], 1e-12), hi = Math.Min(xs[k + 1], 1 - 1e-12);
                double root = Brent.FindRoot(Relative, lo, hi, AzeotropeTolerance, 200);
                var at = bubble(root);
                evaluations += at.Report.ModelEvaluations;
                azeotrope = Locate(model, at, g[k] > 0 ? AzeotropeKind.MaximumPressure : AzeotropeKind.MinimumPressure, iterations);
                points.Insert(k + 1, ToPoint(model, root, at));
            }
        }

        return kind == BinaryDiagramKind.Isothermal
            ? new BinaryDiagram(kind, value, null, points, azeotrope, evaluations)
            : new BinaryDiagram(kind, null, value, points, azeotrope, evaluations);
    }

    private static BinaryDiagramPoint ToPoint(Models.CubicMixtureModel model, double x, MixtureSaturationPoint point)
        => new(x, point.Vapour.MoleFractions[0], point.Temperature, point.Pressure, point,
            MixtureClapeyron.BubbleLine(model, point.Temperature, point.Pressure, [.. point.Liquid.MoleFractions], [.. point.Vapour.MoleFractions]));

    private static Azeotrope Locate(Models.CubicMixtureModel model, MixtureSaturationPoint point, AzeotropeKind kind, int iterations)
    {
        double x = point.Liquid.MoleFractions[0];
        double y = point.Vapour.MoleFractions[0];
        // At x = y the bubble line's slope is the azeotrope's: MixtureClapeyron weights by y = x.
        double[] liquid = [.. point.Liquid.MoleFractions];
        double[] vapour = [.. point.Vapour.MoleFractions];
        var slope = MixtureClapeyron.BubbleLine(model, point.Temperature, point.Pressure, liquid, vapour);
        return new Azeotrope(kind, x, point.Temperature, point.Pressure, point, slope, iterations, Math.Abs(y - x));
    }
}
