using PhaseSlope.Core.Correlations;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tuning;

/// <summary>The vapour pressure of a cubic model as a function of its alpha parameters: ln Psat(T; θ)
/// by the coexistence solver, so that the weighted least-squares fitter of the correlations
/// tunes a model exactly as it fits a correlation (same weights, statistics and covariance).</summary>
/// <remarks>
/// <para>The parameter gradient is exact. At coexistence g_L = g_V at the same T and P; a change
/// of θ at fixed T moves P by dP/dθ = (∂a_L/∂θ − ∂a_V/∂θ)/(v_V − v_L), with ∂a/∂θ at fixed T and
/// v (the envelope theorem: ∂g/∂θ at fixed T, P equals ∂a/∂θ at fixed T, v). In a cubic model
/// a_r is linear in the value of α, ∂a_r/∂α = −(a/b)·f(bρ)
/// (<see cref="CubicModel.ResidualHelmholtzPerAlpha"/>), so
/// ∂ln P/∂θ_j = ∂α/∂θ_j·(A(ρ_L) − A(ρ_V))/(P·(v_V − v_L)).</para>
/// <para>d ln P/dT is exact (Clapeyron with the model's Δh and Δv). The second temperature
/// derivative and the parameter gradient of the slope, which only the delta-method band of a
/// latent heat uses, are central differences of those exact values (steps below).</para>
/// <para>Points are solved once per parameter vector: the last vector's points are kept, and a
/// new temperature starts from the nearest solved neighbour, so a sweep over sorted data costs
/// about four model evaluations per point, as a traced curve does.</para>
/// </remarks>
public sealed class TunedVapourPressureForm : VapourPressureForm
{
    private readonly CubicModelKind _kind;
    private readonly TunableAlpha _family;
    private readonly double _criticalTemperature;
    private readonly double _criticalPressure;
    private readonly double _minimumTemperature;
    private readonly double[] _start;
    private readonly Dictionary<double, CoexistencePoint> _points = [];
    private double[]? _parameters;
    private CubicModel? _model;
    private CoexistenceSolver? _solver;
    private CoexistencePoint? _last;

    /// <summary>Creates the form for a model and alpha family.</summary>
    /// <param name="kind">The cubic model (one that accepts an alpha choice).</param>
    /// <param name="family">The alpha family tuned.</param>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="criticalPressure">Pc in Pa.</param>
    /// <param name="minimumTemperature">The lowest temperature solved, K.</param>
    /// <param name="start">The starting parameters.</param>
    public TunedVapourPressureForm(CubicModelKind kind, TunableAlpha family, double criticalTemperature, double criticalPressure, double minimumTemperature, double[] start)
    {
        ArgumentNullException.ThrowIfNull(family);
        ArgumentNullException.ThrowIfNull(start);
        if (!kind.Entry().AcceptsAlphaChoice)
        {
            throw new InvalidInputException("model", double.NaN, $"alpha parameters can be tuned for the Peng-Robinson and Soave-Redlich-Kwong models only, not {kind.Title()}");
        }

        _kind = kind;
        _family = family;
        _criticalTemperature = criticalTemperature;
        _criticalPressure = criticalPressure;
        _minimumTemperature = minimumTemperature;
        _start = start;
    }

    /// <inheritdoc />
    public override string Id => $"{_kind.Id()}-{CubicModel.AlphaName(_family.Form).ToLowerInvariant()}";

    /// <inheritdoc />
    public override string Description => $"ln Psat of {_kind.Title()} with the {CubicModel.AlphaName(_family.Form)} alpha function, parameters {string.Join(", ", ParameterNames)} tuned";

    /// <inheritdoc />
    public override IReadOnlyList<string> ParameterNames => _family.ParameterNames;

    /// <inheritdoc />
    public override double UpperLimit => _criticalTemperature;

    /// <inheritdoc />
    public override double UpperPressureLimit => _criticalPressure;

    /// <summary>The model with parameters <paramref name="parameters"/>.</summary>
    public CubicModel Model(IReadOnlyList<double> parameters, string source)
        => new(_kind, _kind.Entry().Form, _family.Create(parameters, _criticalTemperature, source), _criticalTemperature, _criticalPressure);

    /// <summary>The coexistence state of the model with <paramref name="parameters"/> at T.</summary>
    /// <exception cref="InvalidInputException">The model has no coexistence there (parameters far
    /// from any physical alpha function).</exception>
    public CoexistencePoint Point(double temperature, IReadOnlyList<double> parameters)
    {
        if (_parameters is null || !parameters.SequenceEqual(_parameters))
        {
            _parameters = [.. parameters];
            _model = Model(parameters, "trial");
            _solver = new CoexistenceSolver(_model, _minimumTemperature);
            _points.Clear();
            _last = null;
        }

        if (_points.TryGetValue(temperature, out var known))
        {
            return known;
        }

        CoexistencePoint point;
        try
        {
            point = _solver!.AtTemperature(temperature, _last);
        }
        catch (ConvergenceException ex)
        {
            throw new InvalidInputException("alpha parameters", temperature,
                $"the {CubicModel.AlphaName(_family.Form)} parameters {string.Join(", ", parameters.Select(Preconditions.Format))} give no liquid-vapour coexistence at {Preconditions.Format(temperature)} K ({ex.Message})");
        }

        _points[temperature] = point;
        _last = point;
        return point;
    }

    /// <inheritdoc />
    public override double LnPressure(double temperature, IReadOnlyList<double> parameters)
        => Math.Log(Point(temperature, parameters).Pressure);

    /// <inheritdoc />
    public override double Slope(double temperature, IReadOnlyList<double> parameters)
    {
        var point = Point(temperature, parameters);
        return point.Slope / point.Pressure;
    }

    /// <inheritdoc />
    /// <remarks>Central difference of the exact slope with step h = 1e-4·T (kept below (Tc − T)/4):
    /// truncation ~h²·|d⁴ln P/dT⁴|/6, about 1e-8 relative for a vapour pressure away from Tc,
    /// rounding ~1e-16/1e-4 relative to the slope.</remarks>
    public override double Curvature(double temperature, IReadOnlyList<double> parameters)
    {
        double h = Math.Min(1e-4 * temperature, (_criticalTemperature - temperature) / 4);
        double up = Slope(temperature + h, parameters);
        double down = Slope(temperature - h, parameters);
        return (up - down) / (2 * h);
    }

    /// <inheritdoc />
    public override void LnPressureGradient(double temperature, IReadOnlyList<double> parameters, Span<double> gradient)
    {
        var point = Point(temperature, parameters);
        var model = _model!;
        double factor = (model.ResidualHelmholtzPerAlpha(point.Liquid.Density) - model.ResidualHelmholtzPerAlpha(point.Vapour.Density))
            / (point.Pressure * point.VolumeChange);
        _family.Gradient(temperature, _criticalTemperature, parameters, gradient);
        for (int j = 0; j < gradient.Length; j++)
        {
            gradient[j] *= factor;
        }
    }

    /// <inheritdoc />
    /// <remarks>Central differences of the exact slope in each parameter, step 1e-6·max(|θ_j|, 0.1):
    /// truncation ~1e-12 relative, rounding ~1e-16/1e-6 = 1e-10 relative; enough for a standard
    /// uncertainty quoted to two digits.</remarks>
    public override void SlopeGradient(double temperature, IReadOnlyList<double> parameters, Span<double> gradient)
    {
        double[] shifted = [.. parameters];
        for (int j = 0; j < shifted.Length; j++)
        {
            double h = 1e-6 * Math.Max(Math.Abs(parameters[j]), 0.1);
            shifted[j] = parameters[j] + h;
            double up = Slope(temperature, shifted);
            shifted[j] = parameters[j] - h;
            double down = Slope(temperature, shifted);
            shifted[j] = parameters[j];
            gradient[j] = (up - down) / (2 * h);
        }
    }

    /// <inheritdoc />
    public override double[] StartingValues(IReadOnlyList<double> temperatures, IReadOnlyList<double> lnPressures, IReadOnlyList<double> weights)
        => [.. _start];
}
