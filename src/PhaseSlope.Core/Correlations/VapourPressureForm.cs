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

    /// <summary>Highest pressure the form can describe (Pc for forms in ln(P/Pc)), Pa; a
    /// saturation pressure at or above it is not a vapour pressure of this form.</summary>
    public virtual double UpperPressureLimit => double.PositiveInfinity;

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

    /// <summary>True when ln P is affine in the parameters, ln P = c(T) + Σ θ_j·φ_j(T): then
    /// <see cref="StartingValues"/> returns the exact weighted least-squares solution, which the
    /// fitter uses as it is, without iterating.</summary>
    public virtual bool IsLinearInParameters => false;

    /// <summary>Whether the form is written in Tc and Pc (Wagner and corresponding-states forms),
    /// so that their uncertainty moves the fitted curve.</summary>
    public virtual bool UsesCriticalPoint => false;

    /// <summary>The same form with another Tc and Pc (itself for a form that uses neither); used
    /// to propagate the uncertainty of the critical point into a fit.</summary>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="criticalPressure">Pc in Pa.</param>
    public virtual VapourPressureForm WithCriticalPoint(double criticalTemperature, double criticalPressure) => this;

    /// <summary>Starting values for a fit to (T, ln P) with weights, from a linearised fit; for a
    /// form that is <see cref="IsLinearInParameters"/>, the weighted least-squares solution itself.</summary>
    public abstract double[] StartingValues(IReadOnlyList<double> temperatures, IReadOnlyList<double> lnPressures, IReadOnlyList<double> weights);

    /// <summary>Weighted linear least squares of ln P on the given basis functions of T; the
    /// linear forms' exact solution and the other forms' starting point.</summary>
    /// <remarks>Rows are scaled by √w_i and columns to unit norm, then solved by the thin
    /// (n×m) Householder QR of MathNet.Numerics: memory and time linear in the number of points.
    /// The full QR would build an n×n Q (8 GB at 32 000 points) and is never needed for a
    /// least-squares solve.</remarks>
    protected static double[] LinearFit(IReadOnlyList<double> temperatures, IReadOnlyList<double> values, IReadOnlyList<double> weights, params Func<double, double>[] basis)
    {
        int n = temperatures.Count;
        int m = basis.Length;
        // Column-major, as MathNet's provider takes a matrix.
        var a = new double[n * m];
        var y = new double[n];
        for (int i = 0; i < n; i++)
        {
            double w = Math.Sqrt(weights[i]);
            double t = temperatures[i];
            for (int j = 0; j < m; j++)
            {
                a[j * n + i] = w * basis[j](t);
            }

            y[i] = w * values[i];
        }

        // Columns scaled to unit norm, then QR: the bases differ by many orders of magnitude
        // (T⁶ beside 1), and equilibration keeps the solve accurate. The norm is accumulated with
        // MathNet's overflow-safe hypotenuse, in order, as its Vector.L2Norm does.
        var scale = new double[m];
        for (int j = 0; j < m; j++)
        {
            var column = a.AsSpan(j * n, n);
            double norm = 0;
            foreach (double v in column)
            {
                norm = MathNet.Numerics.SpecialFunctions.Hypotenuse(norm, v);
            }

            scale[j] = norm;
            if (norm > 0)
            {
                for (int i = 0; i < column.Length; i++)
                {
                    column[i] /= norm;
                }
            }
        }

        // The thin QR of MathNet's provider, in place: Matrix.QR(QRMethod.Thin) would first clone
        // the n×m matrix (48 MB at a million points and six parameters) and then do exactly this.
        var provider = MathNet.Numerics.Providers.LinearAlgebra.LinearAlgebraControl.Provider;
        var r = new double[m * m];
        var tau = new double[m];
        provider.ThinQRFactor(a, n, m, r, tau);
        var x = new double[m];
        provider.QRSolveFactored(a, r, n, m, tau, y, 1, x, MathNet.Numerics.LinearAlgebra.Factorization.QRMethod.Thin);
        var result = new double[m];
        for (int j = 0; j < m; j++)
        {
            result[j] = scale[j] > 0 ? x[j] / scale[j] : x[j];
        }

        return result;
    }
}
