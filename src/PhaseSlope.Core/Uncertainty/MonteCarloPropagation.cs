using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Uncertainty;

/// <summary>Monte Carlo propagation: the inputs are drawn from a normal distribution with their
/// covariance, the model is rebuilt and the coexistence states solved again for every sample;
/// the standard uncertainty of each result is the sample standard deviation.</summary>
/// <remarks>The draws come from one <see cref="Random"/> seeded with the given seed, all drawn
/// before any solving in a fixed order (sample by sample, input by input; standard normals by
/// MathNet's <see cref="Normal"/>, correlated through the Cholesky factor of the covariance), so the
/// same seed gives the same numbers to the bit. Samples are then solved in parallel, each on its
/// own model and solver, and reduced in sample order, so the parallelism does not change a bit.
/// A curve is traced per sample with neighbour starts (<see cref="CoexistenceCurve.Through"/>):
/// about 4 model evaluations per state. A state at which some sample has no coexistence (T at or
/// above the sample's Tc, P at or above its Pc) or does not converge gets null values with the
/// count in the reason: a standard deviation over the samples that remain would be biased.</remarks>
public static class MonteCarloPropagation
{
    /// <summary>Fewest samples accepted: 2, the least that defines a standard deviation.</summary>
    public const int MinimumSamples = 2;

    /// <summary>Most samples accepted: 10 000 000 (memory: four numbers per sample and state).</summary>
    public const int MaximumSamples = 10_000_000;

    private const int Quantities = 4; // P (or T), Δh, ρL, ρV

    /// <summary>Standard uncertainties of coexistence states at given temperatures.</summary>
    /// <param name="parameters">The uncertain inputs and the model they build.</param>
    /// <param name="temperatures">Temperatures in K, below the nominal Tc (for a curve, increasing).</param>
    /// <param name="samples">Number of samples, <see cref="MinimumSamples"/> to <see cref="MaximumSamples"/>.</param>
    /// <param name="seed">Seed of the random draws.</param>
    /// <param name="progress">Receives the number of samples done, or null.</param>
    /// <returns>One result per temperature, in order.</returns>
    public static IReadOnlyList<CoexistenceUncertainty> AtTemperatures(CubicParameterization parameters, IReadOnlyList<double> temperatures,
        int samples, int seed, IProgress<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        ArgumentNullException.ThrowIfNull(temperatures);
        var draws = Draw(parameters, samples, seed);
        int count = temperatures.Count;
        var values = new double[samples * count * Quantities];
        Run(samples, progress, s =>
        {
            var span = values.AsSpan(s * count * Quantities, count * Quantities);
            span.Fill(double.NaN);
            if (Solver(parameters, draws[s]) is not { } solver)
            {
                return;
            }

            var inside = new List<int>(count);
            for (int i = 0; i < count; i++)
            {
                if (temperatures[i] < solver.CriticalTemperature)
                {
                    inside.Add(i);
                }
            }

            IReadOnlyList<CoexistencePoint>? curve = null;
            try
            {
                curve = CoexistenceCurve.Through(solver, inside.Select(i => temperatures[i]).ToArray());
            }
            catch (Exception ex) when (ex is ConvergenceException or InvalidInputException)
            {
                // Fall back to one state at a time below; states that still fail stay NaN.
            }

            for (int j = 0; j < inside.Count; j++)
            {
                var point = curve?[j] ?? Try(() => solver.AtTemperature(temperatures[inside[j]]));
                if (point is not null)
                {
                    Store(span, inside[j], point.Pressure, point);
                }
            }
        });
        return Reduce(values, samples, count, atFixedPressure: false, "their critical temperature is at or below this temperature");
    }

    /// <summary>Standard uncertainties of the coexistence state at a given pressure.</summary>
    /// <param name="parameters">The uncertain inputs and the model they build.</param>
    /// <param name="pressure">Pressure in Pa, below the nominal Pc.</param>
    /// <param name="samples">Number of samples.</param>
    /// <param name="seed">Seed of the random draws.</param>
    /// <param name="progress">Receives the number of samples done, or null.</param>
    public static CoexistenceUncertainty AtPressure(CubicParameterization parameters, double pressure, int samples, int seed, IProgress<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        var draws = Draw(parameters, samples, seed);
        var values = new double[samples * Quantities];
        Run(samples, progress, s =>
        {
            var span = values.AsSpan(s * Quantities, Quantities);
            span.Fill(double.NaN);
            if (Solver(parameters, draws[s]) is { } solver && pressure < solver.CriticalPressure
                && Try(() => solver.AtPressure(pressure)) is { } point)
            {
                Store(span, 0, point.Temperature, point);
            }
        });
        return Reduce(values, samples, 1, atFixedPressure: true, "their critical pressure is at or below this pressure")[0];
    }

    /// <summary>The sampled input vectors, in sample order: x = μ + L·z, z standard normal, L the
    /// Cholesky factor of the covariance (u·z per input when the covariance is diagonal).</summary>
    /// <exception cref="InvalidInputException">The sample count is out of range, or the covariance
    /// is not positive definite.</exception>
    public static double[][] Draw(CubicParameterization parameters, int samples, int seed)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        if (samples < MinimumSamples || samples > MaximumSamples)
        {
            throw new InvalidInputException("samples", samples,
                $"the number of samples must be between {MinimumSamples} and {MaximumSamples}, got {samples}");
        }

        var covariance = parameters.Covariance;
        int n = covariance.RowCount;
        bool diagonal = true;
        for (int i = 0; i < n && diagonal; i++)
        {
            for (int j = 0; j < n; j++)
            {
                if (i != j && covariance[i, j] != 0)
                {
                    diagonal = false;
                    break;
                }
            }
        }

        Matrix<double>? factor = null;
        if (!diagonal)
        {
            try
            {
                factor = covariance.Cholesky().Factor;
            }
            catch (ArgumentException)
            {
                throw new InvalidInputException("covariance", double.NaN, "the input covariance matrix is not positive definite");
            }
        }

        var mean = parameters.Inputs.Select(i => i.Value).ToArray();
        var random = new Random(seed);
        var z = new double[n];
        var result = new double[samples][];
        for (int s = 0; s < samples; s++)
        {
            for (int k = 0; k < n; k++)
            {
                z[k] = Normal.Sample(random, 0, 1);
            }

            var x = new double[n];
            for (int k = 0; k < n; k++)
            {
                double sum = mean[k];
                if (factor is null)
                {
                    sum += Math.Sqrt(covariance[k, k]) * z[k];
                }
                else
                {
                    for (int j = 0; j <= k; j++)
                    {
                        sum += factor[k, j] * z[j];
                    }
                }

                x[k] = sum;
            }

            result[s] = x;
        }

        return result;
    }

    private static void Run(int samples, IProgress<int>? progress, Action<int> body)
    {
        int done = 0;
        Parallel.For(0, samples, s =>
        {
            body(s);
            int finished = Interlocked.Increment(ref done);
            progress?.Report(finished);
        });
    }

    private static CoexistenceSolver? Solver(CubicParameterization parameters, double[] values)
    {
        try
        {
            var model = parameters.Build(values);
            double lowest = parameters.MinimumTemperature;
            return lowest < model.CriticalTemperature ? new CoexistenceSolver(model, lowest) : null;
        }
        catch (InvalidInputException)
        {
            return null;
        }
    }

    private static CoexistencePoint? Try(Func<CoexistencePoint> solve)
    {
        try
        {
            return solve();
        }
        catch (Exception ex) when (ex is ConvergenceException or InvalidInputException)
        {
            return null;
        }
    }

    private static void Store(Span<double> span, int index, double first, CoexistencePoint point)
    {
        int o = index * Quantities;
        span[o] = first;
        span[o + 1] = point.EnthalpyOfVaporization;
        span[o + 2] = point.Liquid.Density;
        span[o + 3] = point.Vapour.Density;
    }

    private static CoexistenceUncertainty[] Reduce(double[] values, int samples, int count, bool atFixedPressure, string why)
    {
        var result = new CoexistenceUncertainty[count];
        var u = new double[Quantities];
        for (int i = 0; i < count; i++)
        {
            int failed = 0;
            for (int s = 0; s < samples; s++)
            {
                if (double.IsNaN(values[((s * count) + i) * Quantities]))
                {
                    failed++;
                }
            }

            if (failed > 0)
            {
                result[i] = CoexistenceUncertainty.Undefined(PropagationMethod.MonteCarlo,
                    $"{failed} of {samples} samples have no coexistence state here ({why}, or the solver did not converge)");
                continue;
            }

            for (int q = 0; q < Quantities; q++)
            {
                // Two passes in sample order: the mean, then the sum of squared deviations.
                double mean = 0;
                for (int s = 0; s < samples; s++)
                {
                    mean += values[((s * count) + i) * Quantities + q];
                }

                mean /= samples;
                double squares = 0;
                for (int s = 0; s < samples; s++)
                {
                    double d = values[((s * count) + i) * Quantities + q] - mean;
                    squares += d * d;
                }

                u[q] = Math.Sqrt(squares / (samples - 1));
            }

            result[i] = atFixedPressure
                ? new CoexistenceUncertainty(PropagationMethod.MonteCarlo, u[0], 0, u[1], u[2], u[3], null)
                : new CoexistenceUncertainty(PropagationMethod.MonteCarlo, 0, u[0], u[1], u[2], u[3], null);
        }

        return result;
    }
}
