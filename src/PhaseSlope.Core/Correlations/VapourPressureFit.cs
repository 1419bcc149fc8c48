namespace PhaseSlope.Core.Correlations;

/// <summary>A vapour-pressure correlation fitted to data (or a predictive form evaluated against
/// them): parameters, their covariance, the fit statistics and the residuals.</summary>
/// <remarks>The fit is weighted least squares in ln P. With per-point standard uncertainties the
/// covariance is (JᵀWJ)⁻¹ (absolute); otherwise it is scaled by the reduced χ² (relative
/// weights, the scatter estimates the uncertainty). Uncertainties of derived quantities follow by
/// the delta method, u²(f) = gᵀΣg with g = ∂f/∂θ.</remarks>
public sealed record VapourPressureFit
{
    /// <summary>The form.</summary>
    public required VapourPressureForm Form { get; init; }

    /// <summary>Fitted parameters in the form's convention.</summary>
    public required IReadOnlyList<double> Parameters { get; init; }

    /// <summary>Covariance matrix of the parameters (p×p).</summary>
    public required double[,] Covariance { get; init; }

    /// <summary>Whether <see cref="Covariance"/> is usable: every entry finite and every variance
    /// non-negative. It is not when the data cannot separate the parameters to double precision
    /// (for example temperatures a few nanokelvin apart); the parameters are still the least-squares
    /// solution, but their standard errors, and every uncertainty derived from them, are undefined.</summary>
    public bool CovarianceDefined
    {
        get
        {
            for (int i = 0; i < Parameters.Count; i++)
            {
                if (!(Covariance[i, i] >= 0))
                {
                    return false;
                }

                for (int j = 0; j < Parameters.Count; j++)
                {
                    if (!double.IsFinite(Covariance[i, j]))
                    {
                        return false;
                    }
                }
            }

            return true;
        }
    }

    /// <summary>Standard errors √Σ_jj (NaN when <see cref="CovarianceDefined"/> is false).</summary>
    public IReadOnlyList<double> StandardErrors => [.. Enumerable.Range(0, Parameters.Count).Select(j => Math.Sqrt(Covariance[j, j]))];

    /// <summary>The data the fit used, sorted by temperature.</summary>
    public required IReadOnlyList<VapourPressurePoint> Data { get; init; }

    /// <summary>Weights in ln P used per point.</summary>
    public required IReadOnlyList<double> Weights { get; init; }

    /// <summary>True when every point carried a standard uncertainty (absolute covariance).</summary>
    public required bool AbsoluteUncertainties { get; init; }

    /// <summary>Weighted sum of squared ln P residuals.</summary>
    public required double ChiSquare { get; init; }

    /// <summary>Corrected Akaike information criterion, n·ln(χ²/n) + 2K + 2K(K + 1)/(n − K − 1)
    /// with K = p + 1 (the parameters and the scatter); null when n ≤ K + 1.</summary>
    public required double? Aicc { get; init; }

    /// <summary>Iterations of the Levenberg–Marquardt minimiser (0 for predictive forms and for
    /// forms linear in their parameters, which are solved directly).</summary>
    public required int Iterations { get; init; }

    /// <summary>Why the minimiser stopped, <see cref="VapourPressureFitter.DirectLinearSolve"/> for a
    /// form solved by linear least squares, or "no parameters to fit".</summary>
    public required string StopReason { get; init; }

    /// <summary>Degrees of freedom n − p.</summary>
    public int DegreesOfFreedom => Data.Count - Parameters.Count;

    /// <summary>χ²/(n − p), or null without degrees of freedom.</summary>
    public double? ReducedChiSquare => DegreesOfFreedom > 0 ? ChiSquare / DegreesOfFreedom : null;

    /// <summary>Lowest data temperature, K.</summary>
    public double MinimumTemperature => Data[0].Temperature;

    /// <summary>Highest data temperature, K.</summary>
    public double MaximumTemperature => Data[^1].Temperature;

    /// <summary>True when T lies within the data range.</summary>
    public bool InRange(double temperature) => temperature >= MinimumTemperature && temperature <= MaximumTemperature;

    /// <summary>ln(P/Pa) at T.</summary>
    public double LnPressure(double temperature) => Form.LnPressure(temperature, Parameters);

    /// <summary>P at T, Pa.</summary>
    public double Pressure(double temperature) => Math.Exp(LnPressure(temperature));

    /// <summary>dP/dT at T, Pa/K.</summary>
    public double PressureSlope(double temperature) => Pressure(temperature) * Form.Slope(temperature, Parameters);

    /// <summary>Standard uncertainty of d ln P/dT at T, 1/K (delta method).</summary>
    public double SlopeStandardUncertainty(double temperature)
    {
        int p = Parameters.Count;
        Span<double> g = stackalloc double[Math.Max(p, 1)];
        Form.SlopeGradient(temperature, Parameters, g);
        return Math.Sqrt(Quadratic(g));
    }

    /// <summary>Standard uncertainty of ln P at T (delta method).</summary>
    public double LnPressureStandardUncertainty(double temperature)
    {
        int p = Parameters.Count;
        Span<double> g = stackalloc double[Math.Max(p, 1)];
        Form.LnPressureGradient(temperature, Parameters, g);
        return Math.Sqrt(Quadratic(g));
    }

    /// <summary>Residual ln P_data − ln P_fit per point.</summary>
    /// <remarks>Computed anew, for every point, on each access: take it once before a loop.</remarks>
    public IReadOnlyList<double> Residuals => [.. Data.Select(d => Math.Log(d.Pressure) - LnPressure(d.Temperature))];

    /// <summary>Deviation 100·(P_fit − P_data)/P_data per point, %.</summary>
    /// <remarks>Computed anew, for every point, on each access: take it once before a loop.</remarks>
    public IReadOnlyList<double> DeviationsPercent => [.. Data.Select(d => 100 * (Pressure(d.Temperature) / d.Pressure - 1))];

    /// <summary>Average absolute deviation in P, %.</summary>
    public double AadPercent => DeviationsPercent.Average(Math.Abs);

    /// <summary>Largest absolute deviation in P, %.</summary>
    public double MaximumDeviationPercent => DeviationsPercent.Max(Math.Abs);

    private double Quadratic(ReadOnlySpan<double> g)
    {
        double sum = 0;
        for (int i = 0; i < Parameters.Count; i++)
        {
            for (int j = 0; j < Parameters.Count; j++)
            {
                sum += g[i] * Covariance[i, j] * g[j];
            }
        }

        return Math.Max(sum, 0);
    }
}
