using MathNet.Numerics;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Fits the interaction parameter k_12 of a binary to measured VLE points by weighted
/// least squares on the bubble pressure and, where measured, the vapour composition.</summary>
/// <remarks>
/// <para>Residuals of point i at T_i and x_1,i: r_P = (P_bubble − P_i)/(P_i·σ_P) (relative, so that
/// points at low and high pressure count alike) and, where y_1,i is measured,
/// r_y = (y_1,bubble − y_1,i)/σ_y. The defaults σ_P = 0.01 (1 % of P) and σ_y = 0.01 are common
/// practice for the scatter of binary VLE measurements, not properties of any one data set.</para>
/// <para>Why a scalar minimizer: with one parameter S(k) = Σ r² is a function of one variable, so
/// MathNet's bounded golden-section search (<c>FindMinimum.OfScalarFunctionConstrained</c>) finds its
/// minimum without a Jacobian of every bubble point in k (which a Gauss–Newton or
/// Levenberg–Marquardt step would need and we only have by finite differences). A coarse scan over
/// [<see cref="LowerBound"/>, <see cref="UpperBound"/>] first picks the basin, so the golden section
/// does not stop in a local minimum or run into k where a bubble point does not exist.</para>
/// <para>Standard error: at the minimum, with J_i = ∂r_i/∂k (central difference, step
/// <see cref="DifferenceStep"/>; the bubble points converge to ~1e-12, so the difference is good to
/// ~1e-6 relative) and m residuals, the linearised least-squares covariance is
/// s²·(JᵀJ)⁻¹ with s² = S/(m − 1), so σ_k = √(S/((m − 1)·Σ J_i²)).</para>
/// </remarks>
public static class InteractionFit
{
    /// <summary>Lowest k_12 searched.</summary>
    public const double LowerBound = -0.3;

    /// <summary>Highest k_12 searched.</summary>
    public const double UpperBound = 0.5;

    /// <summary>Step of the coarse scan.</summary>
    public const double ScanStep = 0.02;

    /// <summary>Tolerance of the golden-section search in k_12.</summary>
    public const double Tolerance = 1e-7;

    /// <summary>Step of the central difference for the Jacobian in k_12.</summary>
    public const double DifferenceStep = 1e-5;

    /// <summary>The default relative standard uncertainty of a measured pressure (common practice).</summary>
    public const double DefaultPressureUncertainty = 0.01;

    /// <summary>The default standard uncertainty of a measured y_1 (common practice).</summary>
    public const double DefaultVapourUncertainty = 0.01;

    private const double Infeasible = 1e300;

    /// <summary>Fits k_12 of two components for one cubic model.</summary>
    /// <param name="components">The two fluids, in the order of the data's x_1 and y_1.</param>
    /// <param name="kind">The cubic model.</param>
    /// <param name="data">At least two points (at least as many residuals as... one more than the parameter, for the standard error).</param>
    /// <param name="alpha">The alpha function of both components.</param>
    /// <param name="volumeShift">Each component's volume shift, or null for none.</param>
    /// <param name="pressureUncertainty">σ_P, relative.</param>
    /// <param name="vapourUncertainty">σ_y, mole fraction.</param>
    /// <exception cref="InvalidInputException">Not two components, too few points, a point outside range
    /// (T, P not positive, x_1 or y_1 outside [0, 1]).</exception>
    /// <exception cref="ConvergenceException">No k_12 in the searched range gives a bubble point at every
    /// data point, or none at the minimum.</exception>
    public static InteractionFitResult Fit(IReadOnlyList<Fluid> components, CubicModelKind kind, IReadOnlyList<BinaryVlePoint> data,
        AlphaForm alpha = AlphaForm.Default, Func<Fluid, double>? volumeShift = null,
        double pressureUncertainty = DefaultPressureUncertainty, double vapourUncertainty = DefaultVapourUncertainty)
    {
        ArgumentNullException.ThrowIfNull(components);
        ArgumentNullException.ThrowIfNull(data);
        if (components.Count != 2)
        {
            throw new InvalidInputException("components", components.Count, $"a k_ij fit needs two components; got {components.Count}");
        }

        if (data.Count < 2)
        {
            throw new InvalidInputException("data", data.Count, $"a k_ij fit needs at least 2 data points (1 parameter and its standard error); got {data.Count}");
        }

        Preconditions.Positive(pressureUncertainty, "pressure uncertainty");
        Preconditions.Positive(vapourUncertainty, "vapour uncertainty");
        foreach (var point in data)
        {
            ArgumentNullException.ThrowIfNull(point);
            Preconditions.Positive(point.Temperature, "temperature");
            Preconditions.Positive(point.Pressure, "pressure");
            Fraction(point.LiquidFraction, "x1");
            if (point.VapourFraction is double y)
            {
                Fraction(y, "y1");
            }
        }

        var models = components.Select(f => CubicModel.For(kind, f, alpha, volumeShift?.Invoke(f) ?? 0)).ToArray();
        int m = data.Count + data.Count(p => p.VapourFraction is not null);
        int objectiveEvaluations = 0;
        int modelEvaluations = 0;

        double[]? Residuals(double k, List<InteractionFitPoint>? keep)
        {
            var equilibrium = new MixtureEquilibrium(new CubicMixtureModel(models, [0, k, k, 0]), components);
            var r = new double[m];
            int j = 0;
            foreach (var point in data)
            {
                double[] z = [point.LiquidFraction, 1 - point.LiquidFraction];
                double pressure;
                double y;
                try
                {
                    var bubble = equilibrium.BubbleAtTemperature(point.Temperature, z);
                    modelEvaluations += bubble.Report.ModelEvaluations;
                    pressure = bubble.Pressure;
                    y = bubble.Vapour.MoleFractions[0];
                }
                catch (ConvergenceException)
                {
                    // Fallback: the bubble point at the measured P, its temperature error turned into
                    // a pressure error by the bubble line's Clapeyron slope at fixed x,
                    // P(T_data) ≈ P_data + (dP/dT)_x·(T_data − T_bubble(P_data)) (first order; exact
                    // as the deviation vanishes). Newton from Wilson's start at given T fails for some
                    // strongly non-ideal liquids where the start at given P does not.
                    MixtureSaturationPoint bubble;
                    try
                    {
                        bubble = equilibrium.BubbleAtPressure(point.Pressure, z);
                    }
                    catch (ConvergenceException)
                    {
                        return null;
                    }

                    modelEvaluations += bubble.Report.ModelEvaluations;
                    var slope = MixtureClapeyron.BubbleLine(equilibrium.Model, bubble.Temperature, bubble.Pressure, z, [.. bubble.Vapour.MoleFractions]);
                    pressure = point.Pressure + slope.Slope * (point.Temperature - bubble.Temperature);
                    y = bubble.Vapour.MoleFractions[0];
                    if (!(pressure > 0))
                    {
                        return null;
                    }
                }

                r[j++] = (pressure - point.Pressure) / (point.Pressure * pressureUncertainty);
                if (point.VapourFraction is double measured)
                {
                    r[j++] = (y - measured) / vapourUncertainty;
                }

                keep?.Add(new InteractionFitPoint(point, pressure, y));
            }

            return r;
        }

        double Objective(double k)
        {
            objectiveEvaluations++;
            var r = Residuals(k, null);
            // A k without a bubble point at every data point is outside the feasible set; a huge
            // finite value (the golden section refuses non-finite ones) keeps the search away from
            // it, and the result is checked to be feasible below.
            return r is null ? Infeasible : r.Sum(v => v * v);
        }

        double best = double.NaN, bestValue = Infeasible;
        for (double k = LowerBound; k <= UpperBound + 1e-12; k += ScanStep)
        {
            double value = Objective(k);
            if (value < bestValue)
            {
                bestValue = value;
                best = k;
            }
        }

        if (double.IsNaN(best))
        {
            throw new ConvergenceException(
                $"no k_ij from {LowerBound} to {UpperBound} gives a bubble point at every data point: check the data's units and component order", objectiveEvaluations, double.PositiveInfinity);
        }

        double lo = Math.Max(LowerBound, best - ScanStep), hi = Math.Min(UpperBound, best + ScanStep);
        double kij = FindMinimum.OfScalarFunctionConstrained(Objective, lo, hi, Tolerance, 500);
        var points = new List<InteractionFitPoint>(data.Count);
        var residuals = Residuals(kij, points)
            ?? throw new ConvergenceException($"no bubble point at every data point at the fitted k_ij = {kij:G6}", objectiveEvaluations, double.PositiveInfinity);
        double s = residuals.Sum(v => v * v);
        var plus = Residuals(kij + DifferenceStep, null);
        var minus = Residuals(kij - DifferenceStep, null);
        if (plus is null && minus is null)
        {
            throw new ConvergenceException($"no bubble point at every data point on either side of the fitted k_ij = {kij:G6} (for its standard error)", objectiveEvaluations, s);
        }

        // Central difference; one-sided where the minimum lies at the edge of the k_ij for which
        // every data point has a bubble point (a liquid that splits into two liquids beyond it).
        double jtj = 0;
        for (int i = 0; i < m; i++)
        {
            double d = plus is not null && minus is not null ? (plus[i] - minus[i]) / (2 * DifferenceStep)
                : plus is not null ? (plus[i] - residuals[i]) / DifferenceStep
                : (residuals[i] - minus![i]) / DifferenceStep;
            jtj += d * d;
        }

        if (!(jtj > 0))
        {
            throw new InvalidInputException("data", data.Count, "the data do not depend on k_ij (every point is a pure component, x1 = 0 or 1): k_ij cannot be fitted");
        }

        double standardError = Math.Sqrt(s / ((m - 1) * jtj));
        var withY = points.Where(p => p.VapourDeviation is not null).ToArray();
        return new InteractionFitResult(kij, standardError, points,
            points.Average(p => Math.Abs(p.RelativePressureDeviation)),
            withY.Length == 0 ? null : withY.Average(p => Math.Abs(p.VapourDeviation!.Value)),
            s, m, objectiveEvaluations, modelEvaluations);
    }

    private static void Fraction(double value, string field)
    {
        if (!(value >= 0 && value <= 1))
        {
            throw new InvalidInputException(field, value, $"{field} must be a mole fraction from 0 to 1, got {Preconditions.Format(value)}");
        }
    }
}
