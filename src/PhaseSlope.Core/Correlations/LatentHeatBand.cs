using MathNet.Numerics.Distributions;
using MathNet.Numerics.LinearAlgebra;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Correlations;

/// <summary>The uncertainty band of latent heats from P–T data: the fit covariance, the
/// uncertainty of Tc and Pc where the form or the volume model uses them, and the volume model,
/// combined; outside the data the band is never narrower than at the nearest end of the data.</summary>
/// <remarks>
/// Linear: u² = u_fit² + u_Tc² + u_Pc² + u_vol². u_fit is the delta method on the fit covariance
/// (<see cref="LatentHeatEstimator.At"/>); u_Tc is half the change of ΔH when the whole chain
/// (the form's Tc, the refit, the volume model) is rebuilt with Tc + u(Tc) and Tc − u(Tc) (a
/// central secant over the input's own uncertainty, which equals first-order propagation for
/// a response smooth on that scale; one-sided where Tc − u(Tc) lies below T), and likewise
/// u_Pc; u_vol is the volume model's relative uncertainty
/// (<see cref="LatentHeatEstimator.VolumeModelRelativeUncertainty"/>) times ΔH.
/// Monte Carlo: Tc, Pc are drawn, the chain rebuilt, the fit parameters drawn from the refit's
/// covariance (Cholesky), the volume factor from N(1, u_vol,rel); the band is the standard
/// deviation of ΔH over the samples, seeded and reproducible to the bit.
/// A Wagner fit is anchored at (Tc, Pc): with Tc and Pc taken as exact its band shrinks towards
/// Tc, beyond the data (57 → 21 J/mol in the example that prompted this class). Both the Tc, Pc
/// terms and the floor at the data end stop that.
/// </remarks>
public sealed class LatentHeatBand
{
    private readonly Func<double, double, LatentHeatEstimator> _build;
    private readonly LatentHeatEstimator?[] _shifted = new LatentHeatEstimator?[4];

    /// <summary>Creates the band.</summary>
    /// <param name="build">Builds the estimator (refit and volume model) for a given Tc (K) and Pc (Pa).</param>
    /// <param name="nominal">The estimator at the nominal Tc and Pc.</param>
    /// <param name="criticalTemperatureUncertainty">u(Tc), K (0 when not known or not used).</param>
    /// <param name="criticalPressureUncertainty">u(Pc), Pa (0 when not known or not used).</param>
    public LatentHeatBand(Func<double, double, LatentHeatEstimator> build, LatentHeatEstimator nominal,
        double criticalTemperatureUncertainty, double criticalPressureUncertainty)
    {
        ArgumentNullException.ThrowIfNull(build);
        ArgumentNullException.ThrowIfNull(nominal);
        _build = build;
        Nominal = nominal;
        bool used = nominal.Fit.Form.UsesCriticalPoint || nominal.VolumeModel != VolumeChangeModel.IdealGas;
        bool known = nominal.CriticalTemperature is not null && nominal.CriticalPressure is not null;
        CriticalTemperatureUncertainty = used && known ? criticalTemperatureUncertainty : 0;
        CriticalPressureUncertainty = used && known ? criticalPressureUncertainty : 0;
    }

    /// <summary>The estimator at the nominal Tc and Pc.</summary>
    public LatentHeatEstimator Nominal { get; }

    /// <summary>u(Tc) propagated, K (0 when the chain does not use Tc).</summary>
    public double CriticalTemperatureUncertainty { get; }

    /// <summary>u(Pc) propagated, Pa.</summary>
    public double CriticalPressureUncertainty { get; }

    /// <summary>Latent heats with the combined band by linear propagation, the band held at the
    /// nearest data end outside the data.</summary>
    public IReadOnlyList<LatentHeatPoint> Linear(IReadOnlyList<double> temperatures)
    {
        ArgumentNullException.ThrowIfNull(temperatures);
        var points = temperatures.Select(LinearAt).ToArray();
        return HoldAtDataEnds(points, LinearAt);
    }

    /// <summary>Latent heats with the band by Monte Carlo, the band held at the nearest data end
    /// outside the data.</summary>
    /// <param name="temperatures">Temperatures, K.</param>
    /// <param name="samples">Number of samples, at least 2.</param>
    /// <param name="seed">Seed of the draws.</param>
    /// <param name="progress">Receives the number of samples done, or null.</param>
    /// <exception cref="InvalidInputException">A sample gives no latent heat at one of the
    /// temperatures (a sampled Tc below it).</exception>
    public IReadOnlyList<LatentHeatPoint> MonteCarlo(IReadOnlyList<double> temperatures, int samples, int seed, IProgress<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(temperatures);
        if (samples < 2)
        {
            throw new InvalidInputException("samples", samples, $"the number of samples must be at least 2, got {samples}");
        }

        double[] all = [.. temperatures, Nominal.Fit.MinimumTemperature, Nominal.Fit.MaximumTemperature];
        var nominal = all.Select(LinearAt).ToArray();
        int k = Nominal.Fit.Parameters.Count;
        int width = 3 + k;
        var random = new Random(seed);
        var z = new double[samples * width];
        for (int i = 0; i < z.Length; i++)
        {
            z[i] = Normal.Sample(random, 0, 1);
        }

        var values = new double[samples * all.Length];
        int done = 0;
        Parallel.For(0, samples, s =>
        {
            var draw = new double[width];
            Array.Copy(z, s * width, draw, 0, width);
            var estimator = Nominal;
            if (CriticalTemperatureUncertainty > 0 || CriticalPressureUncertainty > 0)
            {
                double tc = Nominal.CriticalTemperature!.Value + CriticalTemperatureUncertainty * draw[0];
                double pc = Nominal.CriticalPressure!.Value + CriticalPressureUncertainty * draw[1];
                estimator = Try(() => _build(tc, pc));
            }

            if (estimator is not null)
            {
                estimator = Try(() => WithDrawnParameters(estimator, draw[3..].ToArray()));
            }

            for (int i = 0; i < all.Length; i++)
            {
                double value = double.NaN;
                if (estimator is not null && Try(() => estimator.At(all[i])) is { } point)
                {
                    double relative = estimator.VolumeModelRelativeUncertainty(point.Temperature, point.Pressure, point.CompressibilityChange) ?? 0;
                    value = point.EnthalpyOfVaporization * (1 + relative * draw[2]);
                }

                values[s * all.Length + i] = value;
            }

            progress?.Report(Interlocked.Increment(ref done));
        });

        var result = new LatentHeatPoint[all.Length];
        for (int i = 0; i < all.Length; i++)
        {
            int failed = 0;
            double mean = 0;
            for (int s = 0; s < samples; s++)
            {
                double v = values[s * all.Length + i];
                if (double.IsNaN(v))
                {
                    failed++;
                }

                mean += v;
            }

            if (failed > 0)
            {
                throw new InvalidInputException("temperature", all[i],
                    $"Monte Carlo: {failed} of {samples} samples give no latent heat at {Preconditions.Format(all[i])} K (a sampled Tc at or below it, or a sampled fit whose vapour pressure does not rise there); choose temperatures further below Tc or use --uncertainty linear");
            }

            mean /= samples;
            double squares = 0;
            for (int s = 0; s < samples; s++)
            {
                double d = values[s * all.Length + i] - mean;
                squares += d * d;
            }

            result[i] = nominal[i] with { StandardUncertainty = Math.Sqrt(squares / (samples - 1)) };
        }

        var low = result[^2];
        var high = result[^1];
        return HoldAtDataEnds(result[..^2], t => t <= low.Temperature ? low : high);
    }

    private LatentHeatPoint LinearAt(double temperature)
    {
        var point = Nominal.At(temperature);
        double uTc = Secant(0, CriticalTemperatureUncertainty, temperature, point.EnthalpyOfVaporization);
        double uPc = Secant(2, CriticalPressureUncertainty, temperature, point.EnthalpyOfVaporization);
        double critical = Math.Sqrt(uTc * uTc + uPc * uPc);
        double volume = point.VolumeModelUncertainty ?? 0;
        double total = Math.Sqrt(point.FitUncertainty * point.FitUncertainty + critical * critical + volume * volume);
        return point with { StandardUncertainty = total, CriticalPointUncertainty = critical };
    }

    /// <summary>Half the change of ΔH between the chain rebuilt at +u and −u of Tc (slot 0) or Pc
    /// (slot 2); one-sided where one side has no latent heat at T.</summary>
    private double Secant(int slot, double u, double temperature, double nominal)
    {
        if (u == 0)
        {
            return 0;
        }

        double? up = Shifted(slot, +u) is { } e1 ? Try(() => e1.At(temperature))?.EnthalpyOfVaporization : null;
        double? down = Shifted(slot + 1, -u) is { } e2 ? Try(() => e2.At(temperature))?.EnthalpyOfVaporization : null;
        return (up, down) switch
        {
            (double a, double b) => Math.Abs(a - b) / 2,
            (double a, null) => Math.Abs(a - nominal),
            (null, double b) => Math.Abs(nominal - b),
            _ => throw new InvalidInputException("temperature", temperature,
                $"no latent heat at {Preconditions.Format(temperature)} K with Tc or Pc moved by its standard uncertainty on either side"),
        };
    }

    private LatentHeatEstimator? Shifted(int slot, double delta)
    {
        if (_shifted[slot] is null)
        {
            double tc = Nominal.CriticalTemperature!.Value, pc = Nominal.CriticalPressure!.Value;
            _shifted[slot] = slot < 2 ? Try(() => _build(tc + delta, pc)) : Try(() => _build(tc, pc + delta));
        }

        return _shifted[slot];
    }

    private static LatentHeatEstimator WithDrawnParameters(LatentHeatEstimator estimator, double[] z)
    {
        var fit = estimator.Fit;
        if (!fit.CovarianceDefined || z.Length == 0)
        {
            return estimator;
        }

        int k = fit.Parameters.Count;
        var covariance = Matrix<double>.Build.Dense(k, k, (i, j) => fit.Covariance[i, j]);
        var factor = covariance.Cholesky().Factor;
        var drawn = new double[k];
        for (int i = 0; i < k; i++)
        {
            double sum = fit.Parameters[i];
            for (int j = 0; j <= i; j++)
            {
                sum += factor[i, j] * z[j];
            }

            drawn[i] = sum;
        }

        return new LatentHeatEstimator(fit with { Parameters = drawn }, estimator.VolumeModel, estimator.Solver, estimator.CriticalTemperature, estimator.CriticalPressure);
    }

    /// <summary>Outside the data the band is raised to the band at the nearest data end.</summary>
    private IReadOnlyList<LatentHeatPoint> HoldAtDataEnds(IReadOnlyList<LatentHeatPoint> points, Func<double, LatentHeatPoint> atEnd)
    {
        double low = Nominal.Fit.MinimumTemperature, high = Nominal.Fit.MaximumTemperature;
        LatentHeatPoint? lowEnd = null, highEnd = null;
        var result = new LatentHeatPoint[points.Count];
        for (int i = 0; i < points.Count; i++)
        {
            var p = points[i];
            if (p.Temperature < low || p.Temperature > high)
            {
                var end = p.Temperature < low ? lowEnd ??= atEnd(low) : highEnd ??= atEnd(high);
                if (end.StandardUncertainty > p.StandardUncertainty)
                {
                    p = p with { StandardUncertainty = end.StandardUncertainty, BandHeldAtDataEnd = true };
                }
            }

            result[i] = p;
        }

        return result;
    }

    private static T? Try<T>(Func<T> f) where T : class
    {
        try
        {
            return f();
        }
        catch (Exception ex) when (ex is InvalidInputException or ConvergenceException)
        {
            return null;
        }
        catch (ArgumentException)
        {
            // A sampled covariance that is not positive definite (Cholesky) or a form refused.
            return null;
        }
    }
}
