using MathNet.Numerics.LinearAlgebra;
using MathNet.Numerics.Optimization;

namespace PhaseSlope.Core.Correlations;

/// <summary>The weighted least-squares objective in ln P for MathNet's Levenberg–Marquardt
/// minimiser, kept in memory independent of the number of points.</summary>
/// <remarks>
/// <para>With residuals r_i = (ln P_i − f(T_i; θ))·√w_i and Jacobian rows J_i = √w_i·∂f/∂θ it
/// gives the minimiser what MathNet's own <c>NonlinearObjectiveFunction</c> does: the value
/// Σ r_i², the gradient −Jᵀr and the Gauss–Newton Hessian JᵀJ, each sum taken over i in order
/// with the same operations as MathNet's managed provider, so the minimiser's iterates are the
/// same to the last bit.</para>
/// <para>Why not MathNet's own objective: given a weight vector it builds a dense n×n weight
/// matrix (8 MB at 1 000 points, out of memory near 50 000); without one it still stores the n×p
/// Jacobian and makes two n×p transposes at every evaluation, about 100 MB of short-lived arrays
/// per iteration at 1 000 000 points and a resident peak above 1 GB. Here the sums are
/// accumulated point by point: memory O(p²) beyond the data.</para>
/// </remarks>
internal sealed class WeightedLnPressureObjective : IObjectiveModel
{
    private readonly VapourPressureForm _form;
    private readonly double[] _temperatures;
    private readonly double[] _lnPressures;
    private readonly double[] _weights;
    private readonly double[] _roots;
    private List<bool>? _isFixed;
    private Vector<double>? _point;
    private bool _hasValue;
    private double _value;
    private Vector<double>? _gradient;
    private Matrix<double>? _hessian;

    /// <summary>Creates the objective over sorted data; the arrays are kept, not copied.</summary>
    public WeightedLnPressureObjective(VapourPressureForm form, double[] temperatures, double[] lnPressures, double[] weights)
    {
        _form = form;
        _temperatures = temperatures;
        _lnPressures = lnPressures;
        _weights = weights;
        _roots = new double[weights.Length];
        for (int i = 0; i < weights.Length; i++)
        {
            _roots[i] = Math.Sqrt(weights[i]);
        }
    }

    private WeightedLnPressureObjective(WeightedLnPressureObjective other)
    {
        _form = other._form;
        _temperatures = other._temperatures;
        _lnPressures = other._lnPressures;
        _weights = other._weights;
        _roots = other._roots;
    }

    /// <summary>ln P_i (a view of the data, not a copy).</summary>
    public Vector<double> ObservedY => Vector<double>.Build.Dense(_lnPressures);

    /// <summary>The weights as a diagonal (not dense) matrix.</summary>
    public Matrix<double> Weights => Matrix<double>.Build.Diagonal(_weights);

    /// <summary>f(T_i; θ) at the current point, computed when asked (n values).</summary>
    public Vector<double> ModelValues
    {
        get
        {
            double[] theta = [.. Point];
            return Vector<double>.Build.Dense(_temperatures.Length, i => _form.LnPressure(_temperatures[i], theta));
        }
    }

    /// <summary>The current parameters.</summary>
    public Vector<double> Point => _point ?? throw new InvalidOperationException("no parameters set");

    /// <summary>Σ r_i².</summary>
    public double Value
    {
        get
        {
            if (!_hasValue)
            {
                EvaluateFunction();
                _hasValue = true;
            }

            return _value;
        }
    }

    /// <summary>−Jᵀr.</summary>
    public Vector<double> Gradient
    {
        get
        {
            if (_gradient is null)
            {
                EvaluateJacobian();
            }

            return _gradient!;
        }
    }

    /// <summary>JᵀJ.</summary>
    public Matrix<double> Hessian
    {
        get
        {
            if (_hessian is null)
            {
                EvaluateJacobian();
            }

            return _hessian!;
        }
    }

    /// <summary>Evaluations of the residuals.</summary>
    public int FunctionEvaluations { get; set; }

    /// <summary>Evaluations of the Jacobian.</summary>
    public int JacobianEvaluations { get; set; }

    /// <summary>n − p, plus the fixed parameters.</summary>
    public int DegreeOfFreedom => _temperatures.Length - (_point?.Count ?? 0) + (_isFixed?.Count(f => f) ?? 0);

    /// <summary>True.</summary>
    public bool IsGradientSupported => true;

    /// <summary>True.</summary>
    public bool IsHessianSupported => true;

    /// <summary>A fresh objective over the same data.</summary>
    public IObjectiveModel CreateNew() => new WeightedLnPressureObjective(this);

    /// <summary>A copy with the same data, point and evaluated values.</summary>
    public IObjectiveModel Fork() => new WeightedLnPressureObjective(this)
    {
        _isFixed = _isFixed,
        _point = _point,
        _hasValue = _hasValue,
        _value = _value,
        _gradient = _gradient,
        _hessian = _hessian,
        FunctionEvaluations = FunctionEvaluations,
        JacobianEvaluations = JacobianEvaluations,
    };

    /// <summary>Sets the start and which parameters are fixed.</summary>
    public void SetParameters(Vector<double> initialGuess, List<bool>? isFixed = null)
    {
        ArgumentNullException.ThrowIfNull(initialGuess);
        if (isFixed is not null && isFixed.Count != initialGuess.Count)
        {
            throw new ArgumentException("one fixed flag per parameter is needed", nameof(isFixed));
        }

        _point = initialGuess;
        _isFixed = isFixed;
        Invalidate();
    }

    /// <summary>Moves to new parameters; values are computed when asked.</summary>
    public void EvaluateAt(Vector<double> parameters)
    {
        ArgumentNullException.ThrowIfNull(parameters);
        if (parameters.Any(p => !double.IsFinite(p)))
        {
            throw new ArgumentException("The parameters must be finite.", nameof(parameters));
        }

        _point = parameters;
        Invalidate();
    }

    /// <summary>The objective as a function of the parameters.</summary>
    public IObjectiveFunction ToObjectiveFunction() => ObjectiveFunction.GradientHessian(point =>
    {
        EvaluateAt(point);
        return (Value, Gradient, Hessian);
    });

    private void Invalidate()
    {
        _hasValue = false;
        _gradient = null;
        _hessian = null;
    }

    private double Residual(int i, double[] theta)
        => (_lnPressures[i] - _form.LnPressure(_temperatures[i], theta)) * _roots[i];

    private void EvaluateFunction()
    {
        double[] theta = [.. Point];
        double sum = 0;
        for (int i = 0; i < _temperatures.Length; i++)
        {
            double r = Residual(i, theta);
            sum += r * r;
        }

        FunctionEvaluations++;
        _value = sum;
    }

    private void EvaluateJacobian()
    {
        double[] theta = [.. Point];
        int p = theta.Length;
        var row = new double[p];
        var jtr = new double[p]; // Σ −J_ij·r_i
        var jtj = new double[p, p];
        for (int i = 0; i < _temperatures.Length; i++)
        {
            _form.LnPressureGradient(_temperatures[i], theta, row);
            for (int j = 0; j < p; j++)
            {
                row[j] = _isFixed is not null && _isFixed[j] ? 0.0 : row[j] * _roots[i];
            }

            double r = Residual(i, theta);
            for (int j = 0; j < p; j++)
            {
                jtr[j] += -row[j] * r;
                for (int k = 0; k < p; k++)
                {
                    jtj[j, k] += row[j] * row[k];
                }
            }
        }

        JacobianEvaluations++;
        // MathNet forms (−Jᵀ)·r and JᵀJ as 0 + 1·Σ over i: the same here, signs of zero included.
        _gradient = Vector<double>.Build.Dense(p, j => 0.0 + 1.0 * jtr[j]);
        _hessian = Matrix<double>.Build.Dense(p, p, (j, k) => 0.0 + 1.0 * jtj[j, k]);
    }
}
