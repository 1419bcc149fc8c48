using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Correlations;

/// <summary>Weighted least squares of vapour-pressure forms in ln P, and selection among forms by
/// the corrected Akaike information criterion.</summary>
/// <remarks>A form linear in its parameters (<see cref="VapourPressureForm.IsLinearInParameters"/>)
/// is solved directly by its weighted linear least squares (thin QR); the others by
/// Levenberg–Marquardt from MathNet.Numerics, started from the form's linearised fit. Time and
/// memory are linear in the number of points (docs/performance.md).</remarks>
public static class VapourPressureFitter
{
    /// <summary>The <see cref="VapourPressureFit.StopReason"/> of a form solved directly by linear
    /// least squares (<see cref="VapourPressureForm.IsLinearInParameters"/>).</summary>
    public const string DirectLinearSolve = "direct linear least squares";

    /// <summary>Fits a form to data.</summary>
    /// <exception cref="InvalidInputException">Too few points for the form (it needs at least one
    /// more point than parameters), a duplicate temperature, or a point at or above the form's
    /// upper limit (Tc for the Wagner and corresponding-states forms), a pressure at or above the
    /// form's Pc, or pressures that fall with temperature.</exception>
    public static VapourPressureFit Fit(VapourPressureForm form, IReadOnlyList<VapourPressurePoint> data)
    {
        ArgumentNullException.ThrowIfNull(form);
        ArgumentNullException.ThrowIfNull(data);
        var points = SortedByTemperature(data);
        int n = points.Length;
        int p = form.ParameterCount;
        if (n < Math.Max(p + 1, 1))
        {
            throw new InvalidInputException("data", n,
                $"the {form.Id} form has {p} parameters and needs at least {p + 1} points, got {n}");
        }

        foreach (var point in points)
        {
            Preconditions.Positive(point.Temperature, "temperature");
            Preconditions.Positive(point.Pressure, "pressure");
            if (!(point.Temperature < form.UpperLimit))
            {
                throw new InvalidInputException("temperature", point.Temperature,
                    $"the point at {Preconditions.Format(point.Temperature)} K is at or above the {form.Id} form's limit {Preconditions.Format(form.UpperLimit)} K (the critical temperature)");
            }

            if (!(point.Pressure < form.UpperPressureLimit))
            {
                throw new InvalidInputException("pressure", point.Pressure,
                    $"the point at {Preconditions.Format(point.Temperature)} K has pressure {Preconditions.Format(point.Pressure)} Pa, at or above the critical pressure {Preconditions.Format(form.UpperPressureLimit)} Pa of the {form.Id} form: a vapour pressure lies below Pc (is Pc in the right unit? a bare number is Pa)");
            }
        }

        RequireRisingPressure(points);

        for (int i = 1; i < n; i++)
        {
            if (points[i].Temperature == points[i - 1].Temperature)
            {
                throw new InvalidInputException("temperature", points[i].Temperature,
                    $"two points share the temperature {Preconditions.Format(points[i].Temperature)} K");
            }
        }

        bool absolute = points.All(d => d.StandardUncertainty is not null);
        double[] t = [.. points.Select(d => d.Temperature)];
        double[] lnP = [.. points.Select(d => Math.Log(d.Pressure))];
        // u(ln P) = u(P)/P to first order.
        double[] w = [.. points.Select(d => absolute
            ? 1 / Math.Pow(d.StandardUncertainty!.Value / d.Pressure, 2)
            : d.Weight ?? 1)];

        double[] parameters;
        int iterations = 0;
        string stop = "no parameters to fit";
        if (p > 0 && form.IsLinearInParameters)
        {
            // ln P affine in θ: the weighted linear least-squares solution is the minimum itself.
            parameters = form.StartingValues(t, lnP, w);
            stop = DirectLinearSolve;
        }
        else if (p > 0)
        {
            double[] start = form.StartingValues(t, lnP, w);
            (parameters, iterations, stop) = Minimise(form, start, t, lnP, w);
        }
        else
        {
            parameters = [];
        }

        double chi2 = ChiSquare(form, parameters, t, lnP, w);
        var covariance = Covariance(form, parameters, t, w, absolute ? 1 : (n > p ? chi2 / (n - p) : 0));
        int k = p + 1;
        double? aicc = n > k + 1 && chi2 > 0 ? n * Math.Log(chi2 / n) + 2 * k + 2.0 * k * (k + 1) / (n - k - 1) : null;
        return new VapourPressureFit
        {
            Form = form,
            Parameters = parameters,
            Covariance = covariance,
            Data = points,
            Weights = w,
            AbsoluteUncertainties = absolute,
            ChiSquare = chi2,
            Aicc = aicc,
            Iterations = iterations,
            StopReason = stop,
        };
    }

    /// <summary>Refuses data that cannot be vapour pressures of a fluid with critical point
    /// (<paramref name="criticalTemperature"/> K, <paramref name="criticalPressure"/> Pa), whichever
    /// form is fitted: every point must lie below both (a saturation line ends at the critical
    /// point). A null constant is not checked.</summary>
    /// <exception cref="InvalidInputException">A point at or above Tc or Pc, named with its T and P.</exception>
    public static void RequireBelowCriticalPoint(IReadOnlyList<VapourPressurePoint> data, double? criticalTemperature, double? criticalPressure)
    {
        ArgumentNullException.ThrowIfNull(data);
        foreach (var point in data)
        {
            if (criticalPressure is double pc && !(point.Pressure < pc))
            {
                throw new InvalidInputException("critical pressure", pc,
                    $"the critical pressure {Preconditions.Format(pc)} Pa is not above the data point at {Preconditions.Format(point.Temperature)} K, {Preconditions.Format(point.Pressure)} Pa: a vapour pressure lies below Pc (is Pc in the right unit? a bare number is Pa)");
            }

            if (criticalTemperature is double tc && !(point.Temperature < tc))
            {
                throw new InvalidInputException("critical temperature", tc,
                    $"the critical temperature {Preconditions.Format(tc)} K is not above the data point at {Preconditions.Format(point.Temperature)} K, {Preconditions.Format(point.Pressure)} Pa: a vapour pressure exists only below Tc");
            }
        }
    }

    /// <summary>Refuses data whose pressure falls with temperature: a vapour pressure rises
    /// monotonically along the saturation line (dP/dT = Δh/(T·Δv) &gt; 0, Clapeyron), so falling
    /// data are mislabelled columns or another quantity.</summary>
    /// <remarks>The test compares the two ends of the range (sorted by T), so a single noisy
    /// point does not trip it; a least-squares fit to such data would give a negative latent heat.</remarks>
    private static void RequireRisingPressure(VapourPressurePoint[] points)
    {
        if (points.Length < 2)
        {
            return;
        }

        var first = points[0];
        var last = points[^1];
        if (!(last.Pressure > first.Pressure))
        {
            throw new InvalidInputException("pressure", last.Pressure,
                $"the vapour pressure falls with temperature, from {Preconditions.Format(first.Pressure)} Pa at {Preconditions.Format(first.Temperature)} K to {Preconditions.Format(last.Pressure)} Pa at {Preconditions.Format(last.Temperature)} K: a saturation pressure rises with T (are the columns swapped?)");
        }
    }

    /// <summary>Fits every candidate form the data support (at least K + 2 points, K = p + 1, so
    /// that AICc is defined) and returns them best first by AICc.</summary>
    /// <exception cref="InvalidInputException">No candidate form has enough points.</exception>
    public static IReadOnlyList<VapourPressureFit> FitAll(IEnumerable<VapourPressureForm> candidates, IReadOnlyList<VapourPressurePoint> data)
    {
        ArgumentNullException.ThrowIfNull(candidates);
        ArgumentNullException.ThrowIfNull(data);
        var fits = candidates
            .Where(f => f.ParameterCount > 0 && data.Count >= f.ParameterCount + 3)
            .Select(f => Fit(f, data))
            .Where(f => f.Aicc is not null)
            .OrderBy(f => f.Aicc!.Value)
            .ToArray();
        return fits.Length > 0
            ? fits
            : throw new InvalidInputException("data", data.Count, $"{data.Count} points are too few to choose a form by AICc (the two-parameter form needs at least 5)");
    }

    /// <summary>Levenberg–Marquardt (MathNet.Numerics) from <paramref name="start"/>, keeping
    /// the start if the minimiser made χ² worse.</summary>
    /// <remarks>The objective is <see cref="WeightedLnPressureObjective"/>: MathNet's weighted
    /// least squares in ln P, with its sums accumulated point by point instead of through an n×n
    /// weight matrix and n×p Jacobians (see there why).</remarks>
    private static (double[] Parameters, int Iterations, string Stop) Minimise(VapourPressureForm form, double[] start, double[] t, double[] lnP, double[] w)
    {
        var objective = new WeightedLnPressureObjective(form, t, lnP, w);
        // Parameter scales from the start: the forms mix parameters of very different size
        // (Antoine's B ~ 4000 beside C ~ −40), and LM works in scaled steps.
        double[] scales = [.. start.Select(v => Math.Abs(v) > 0 ? Math.Abs(v) : 1)];
        var minimizer = new LevenbergMarquardtMinimizer(1e-3, 1e-15, 1e-15, 1e-15, 1000);
        var result = minimizer.FindMinimum(objective, start, null, null, scales, null);
        double[] parameters = [.. result.MinimizingPoint];
        int iterations = Math.Max(result.Iterations, 0);
        string stop = result.ReasonForExit.ToString();
        // Keep the start if LM made it worse (guards Antoine, whose start is a scan).
        if (ChiSquare(form, start, t, lnP, w) < ChiSquare(form, parameters, t, lnP, w))
        {
            parameters = start;
            stop += " (linearised start kept)";
        }

        return (parameters, iterations, stop);
    }

    /// <summary>The data in increasing temperature: a copy as given when already in order (a
    /// file read by the command line is), else a stable sort.</summary>
    private static VapourPressurePoint[] SortedByTemperature(IReadOnlyList<VapourPressurePoint> data)
    {
        var points = new VapourPressurePoint[data.Count];
        bool sorted = true;
        for (int i = 0; i < points.Length; i++)
        {
            points[i] = data[i] ?? throw new ArgumentNullException(nameof(data), $"point {i} is null");
            sorted &= i == 0 || !(points[i].Temperature < points[i - 1].Temperature);
        }

        return sorted ? points : [.. points.OrderBy(d => d.Temperature)];
    }

    private static double ChiSquare(VapourPressureForm form, IReadOnlyList<double> parameters, double[] t, double[] lnP, double[] w)
    {
        double sum = 0;
        for (int i = 0; i < t.Length; i++)
        {
            double r = lnP[i] - form.LnPressure(t[i], parameters);
            sum += w[i] * r * r;
        }

        return sum;
    }

    private static double[,] Covariance(VapourPressureForm form, IReadOnlyList<double> parameters, double[] t, double[] w, double scale)
    {
        int p = parameters.Count;
        var cov = new double[p, p];
        if (p == 0)
        {
            return cov;
        }

        // Accumulated in a plain array (the MathNet indexer costs more than the product), in the
        // same order as before.
        var jtwj = new double[p, p];
        var g = new double[p];
        for (int i = 0; i < t.Length; i++)
        {
            form.LnPressureGradient(t[i], parameters, g);
            for (int a = 0; a < p; a++)
            {
                for (int b = 0; b < p; b++)
                {
                    jtwj[a, b] += w[i] * g[a] * g[b];
                }
            }
        }

        // Equilibrate before inverting (the parameters differ by many orders of magnitude).
        var d = Vector<double>.Build.Dense(p, j => 1 / Math.Sqrt(jtwj[j, j]));
        var scaled = Matrix<double>.Build.Dense(p, p, (a, b) => jtwj[a, b] * d[a] * d[b]);
        var inverse = scaled.Inverse();
        for (int a = 0; a < p; a++)
        {
            // The LU inverse is symmetric only to round-off (off by 6e-11 relative for the
            // six-term form): average its two halves and mirror, so the covariance is exactly symmetric.
            for (int b = a; b < p; b++)
            {
                cov[a, b] = 0.5 * (inverse[a, b] + inverse[b, a]) * d[a] * d[b] * scale;
                cov[b, a] = cov[a, b];
            }
        }

        return cov;
    }
}
