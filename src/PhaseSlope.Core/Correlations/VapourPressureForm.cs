namespace PhaseSlope.Core.Correlations;

/// <summary>A vapour-pressure correlation form: ln(P/Pa) as a function of T (K) and a parameter
/// vector, with analytic first and second temperature derivatives and analytic parameter
/// gradients (for the least-squares Jacobian and the delta-method uncertainty of dP/dT).</summary>
/// <remarks>One small class per published form. Parameters are always in the form's stated SI
/// convention (natural logarithm, P in Pa, T in K); other conventions are converted at the edge.</remarks>
public abstract class VapourPressureForm
{
    /// <summary>Short identifier used on the command line and in reports (e.g. "antoine").</summary>
    public abstract string Id { get; }

    /// <summary>The equation as text, with its published source.</summary>
    public abstract string Description { get; }

    /// <summary>Names of the parameters, in order.</summary>
    public abstract IReadOnlyList<string> ParameterNames { get; }

    /// <summary>Number of parameters fitted to data (0 for predictive forms).</summary>
    public int ParameterCount => ParameterNames.Count;

    /// <summary>Highest temperature at which the form is defined (Tc for forms in τ = 1 − T/Tc), K.</summary>
    public virtual double UpperLimit => double.PositiveInfinity;

    /// <summary>ln(P/Pa) at T.</summary>
    public abstract double LnPressure(double temperature, IReadOnlyList<double> parameters);

    /// <summary>d ln P/dT at T, 1/K.</summary>
    public abstract double Slope(double temperature, IReadOnlyList<double> parameters);

    /// <summary>d² ln P/dT² at T, 1/K².</summary>
    public abstract double Curvature(double temperature, IReadOnlyList<double> parameters);

    /// <summary>∂ ln P/∂θ_j at T, written into <paramref name="gradient"/>.</summary>
    public abstract void LnPressureGradient(double temperature, IReadOnlyList<double> parameters, Span<double> gradient);

    /// <summary>∂(d ln P/dT)/∂θ_j at T, written into <paramref name="gradient"/>.</summary>
    public abstract void SlopeGradient(double temperature, IReadOnlyList<double> parameters, Span<double> gradient);

    /// <summary>Starting values for a fit to (T, ln P) with weights, from a linearised fit.</summary>
    public abstract double[] StartingValues(IReadOnlyList<double> temperatures, IReadOnlyList<double> lnPressures, IReadOnlyList<double> weights);

    /// <summary>Weighted linear least squares of ln P on the given basis functions of T; the
    /// linear forms' exact solution and the other forms' starting point.</summary>
    protected static double[] LinearFit(IReadOnlyList<double> temperatures, IReadOnlyList<double> values, IReadOnlyList<double> weights, params Func<double, double>[] basis)
    {
        int n = temperatures.Count;
        int m = basis.Length;
        var a = MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.Dense(n, m);
        var y = MathNet.Numerics.LinearAlgebra.Vector<double>.Build.Dense(n);
        for (int i = 0; i < n; i++)
        {
            double w = Math.Sqrt(weights[i]);
            for (int j = 0; j < m; j++)
            {
                a[i, j] = w * basis[j](temperatures[i]);
            }

            y[i] = w * values[i];
        }

        // Columns scaled to unit norm, then QR: the bases differ by many orders of magnitude
        // (T⁶ beside 1), and equilibration keeps the solve accurate.
        var scale = new double[m];
        for (int j = 0; j < m; j++)
        {
            scale[j] = a.Column(j).L2Norm();
            if (scale[j] > 0)
            {
                a.SetColumn(j, a.Column(j) / scale[j]);
            }
        }

        var x = a.QR().Solve(y);
        return [.. x.Select((v, j) => scale[j] > 0 ? v / scale[j] : v)];
    }
}
