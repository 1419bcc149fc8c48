using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Equilibrium;

/// <summary>Liquid–vapour coexistence of one pure-fluid model: equal temperature, pressure and
/// Gibbs energy (fugacity) between a liquid and a vapour root.</summary>
/// <remarks>
/// <para>Valid from <see cref="MinimumTemperature"/> (the fluid's triple point where it is known,
/// not below 0.1·Tc; 0.3·Tc where it is not; see <see cref="LowestValidTemperature"/>) up to, not
/// including, Tc; a solver built for a fluid (<see cref="CoexistenceSolver(IResidualModel, Fluid, CoexistenceOptions?)"/>)
/// also refuses pressures below the fluid's sourced triple-point pressure. Every route is a Newton iteration on the logarithms of the
/// two densities (and, at given pressure, the temperature), two model evaluations per step,
/// started as close to the answer as is known:</para>
/// <list type="bullet">
/// <item>from a neighbouring solved point (<see cref="CoexistenceCurve"/> extrapolates through the
/// last few points in √(Tc − T); <see cref="AtTemperature(double, CoexistencePoint?)"/> takes one
/// point and its exact slopes), which costs 4 evaluations on a finely traced curve;</item>
/// <item>from the density roots at an ancillary vapour pressure (corresponding states with the
/// model's own acentric factor, found once per solver), about 10–20 evaluations;</item>
/// <item>above 0.97·Tc from the classical critical scaling ρ = ρc ± A·(Tc − T)^½, A from the
/// model's derivatives at its critical point (found once per solver).</item>
/// </list>
/// <para>If a Newton start fails, a bracketing iteration on ln P with the density roots at each
/// trial pressure (<see cref="CoexistenceMethod.PressureIteration"/>) finds a start that cannot.
/// Near Tc the phases' pressure difference shrinks as (Tc − T)^(3/2) and is lost in rounding;
/// there the Newton corrections stop shrinking before the tolerance and the point is returned
/// with <see cref="StopReason.RoundingLimit"/> and its stated density uncertainty, never
/// labelled converged. The solver sees the model only through <see cref="IResidualModel"/>.</para>
/// </remarks>
public sealed partial class CoexistenceSolver
{
    private const double R = Constants.GasConstant;

    /// <summary>At and above this reduced temperature a cold start uses the critical scaling.</summary>
    private const double CriticalScalingReducedTemperature = 0.97;

    /// <summary>Relative size of the Newton correction (in each density, and in T at given P)
    /// below which a point is converged: three orders above double rounding, so that it is
    /// reached wherever the equations are well conditioned, and small enough that every
    /// returned property is within about 1e-12 of the exact solution of the model.</summary>
    private const double StepTolerance = 1e-13;

    /// <summary>Where the Newton corrections stop shrinking at the rounding floor of the
    /// equations (estimated from the size of the terms each is summed from) before
    /// <see cref="StepTolerance"/>, a floor at or below this relative size still counts as
    /// converged: it is the accuracy the model's double-precision evaluation allows (about
    /// 1e-16/(1 − T/Tc) relative, i.e. up to ~5e-10 at 1e-4 below Tc, where the critical series
    /// takes over), and it is stated in the report as the density uncertainty.</summary>
    private const double RoundingFloorTolerance = 1e-9;

    /// <summary>Relative density uncertainty above which a point that stopped at the rounding
    /// floor is not returned but reported as a failure.</summary>
    private const double LargestAcceptedUncertainty = 1e-6;

    private readonly ModelCriticalPoint _critical;
    private readonly double _densityBound;
    private double? _acentricFactor;
    private double? _scalingAmplitude;
    private double? _criticalIsochoreSlope;

    /// <summary>Creates a solver for a pure-fluid model with its lowest valid temperature.</summary>
    /// <param name="model">The model (one component).</param>
    /// <param name="minimumTemperature">Lowest temperature accepted, in K, below Tc.</param>
    /// <param name="options">Tolerances; <see cref="CoexistenceOptions.Default"/> when null.</param>
    public CoexistenceSolver(IResidualModel model, double minimumTemperature, CoexistenceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        if (model.ComponentCount != 1)
        {
            throw new InvalidInputException("model", model.ComponentCount,
                $"pure-fluid coexistence needs a one-component model, got {model.ComponentCount} components");
        }

        Preconditions.Positive(minimumTemperature, "minimum temperature");
        _critical = model.CriticalPoint(Composition.Pure);
        _densityBound = model.DensityBound(Composition.Pure);
        if (!(minimumTemperature < _critical.Temperature))
        {
            throw new InvalidInputException("minimum temperature", minimumTemperature,
                $"minimum temperature {Preconditions.Format(minimumTemperature)} K is not below the critical temperature {Preconditions.Format(_critical.Temperature)} K");
        }

        Model = model;
        MinimumTemperature = minimumTemperature;
        Options = options ?? CoexistenceOptions.Default;
    }

    /// <summary>Creates a solver for a model of <paramref name="fluid"/>, valid from
    /// <see cref="LowestValidTemperature(Fluid)"/>, which knows the fluid's triple point
    /// (<see cref="TriplePoint"/>): a temperature below it is refused as solid, and so is a
    /// pressure below the sourced triple-point pressure.</summary>
    /// <param name="model">The model (one component) of the fluid.</param>
    /// <param name="fluid">The fluid, for its triple point.</param>
    /// <param name="options">Tolerances; <see cref="CoexistenceOptions.Default"/> when null.</param>
    public CoexistenceSolver(IResidualModel model, Fluid fluid, CoexistenceOptions? options = null)
        : this(model, LowestValidTemperature(fluid), options)
    {
        var triple = TriplePointLimit.Of(fluid);
        // Only a triple point that is the lower end itself bounds the pressure: below the
        // documented floor (LowestReducedTemperature) the solver stops above it.
        TriplePoint = triple is not null && triple.Temperature >= MinimumTemperature * (1 - BoundaryRoundingTolerance) ? triple : null;
    }

    /// <summary>A solver for a catalog fluid and a model, valid from
    /// <see cref="LowestValidTemperature(Fluid)"/>.</summary>
    public static CoexistenceSolver For(Fluid fluid, CubicModelKind kind, CoexistenceOptions? options = null)
        => new(CubicModel.For(kind, fluid), fluid, options);

    /// <summary>The lowest reduced temperature T/Tc solved where the fluid gives no triple point:
    /// a conventional lower end of the cubic models' vapour-pressure range (their alpha functions
    /// are fitted from about 0.3·Tc up; the acentric factor itself is defined at 0.7·Tc).</summary>
    public const double UnknownTriplePointReducedTemperature = 0.3;

    /// <summary>The floor under a known triple point, as T/Tc: the solver is not taken below it
    /// even where a fluid's triple point lies lower.</summary>
    /// <remarks>Measured (Peng–Robinson and Soave–Redlich–Kwong, default alpha, at given T and
    /// back at the pressure found): propane, 1-butene, n-decane, methanol, ethanol, isohexane,
    /// water and hydrogen all solve down to 0.08·Tc, where Psat is 1e-33 to 1e-68 Pa; at 0.06·Tc
    /// the fluids with ω ≥ 0.5 (n-decane, methanol, ethanol) no longer converge. 0.1·Tc keeps a
    /// margin below which no catalog fluid has its triple point (the lowest is 1-butene at
    /// 0.209·Tc) and above the measured failures.</remarks>
    public const double LowestReducedTemperature = 0.1;

    /// <summary>The lowest temperature the toolkit solves for a fluid: its triple point where the
    /// fluid gives one (below it the liquid is not the stable condensed phase), held at or above
    /// <see cref="LowestReducedTemperature"/>·Tc; <see cref="UnknownTriplePointReducedTemperature"/>·Tc
    /// where it gives none.</summary>
    /// <remarks>Every catalog fluid with a triple point solves there with Peng–Robinson and
    /// Soave–Redlich–Kwong (default, Twu and the catalog's Mathias–Copeman alpha): checked by
    /// <c>TriplePointRangeTests</c>.</remarks>
    public static double LowestValidTemperature(Fluid fluid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        double tc = fluid.CriticalTemperature.Value;
        return fluid.TriplePointTemperature?.Value is double t
            ? Math.Max(t, LowestReducedTemperature * tc)
            : UnknownTriplePointReducedTemperature * tc;
    }

    /// <summary>The fluid's triple point when this solver was built for a fluid that gives one and
    /// its lowest temperature is that triple point; otherwise null.</summary>
    public TriplePointLimit? TriplePoint { get; }

    /// <summary>The model.</summary>
    public IResidualModel Model { get; }

    /// <summary>The model's critical temperature, K.</summary>
    public double CriticalTemperature => _critical.Temperature;

    /// <summary>The model's critical pressure, Pa.</summary>
    public double CriticalPressure => _critical.Pressure;

    /// <summary>The model's critical density, mol/m³.</summary>
    public double CriticalDensity => _critical.Density;

    /// <summary>Lowest accepted temperature in K.</summary>
    public double MinimumTemperature { get; }

    /// <summary>Tolerances and iteration caps.</summary>
    public CoexistenceOptions Options { get; }

    /// <summary>The critical state of the model: T = Tc, both phases at the model's critical
    /// density, no jumps, and the slope of the critical isochore.</summary>
    public CoexistencePoint CriticalPoint()
    {
        var state = PhaseState.Evaluate(Model, _critical.Temperature, _critical.Density);
        return new CoexistencePoint
        {
            Model = Model.Identity,
            Temperature = _critical.Temperature,
            Pressure = state.Pressure,
            Liquid = state,
            Vapour = state,
            Report = new SolverReport(CoexistenceMethod.CriticalState, 0, 0, StopReason.CriticalPoint, 1),
        };
    }

    /// <summary>Counts the model evaluations of one solve (a solve may nest another).</summary>
    private sealed class Work
    {
        public int Evaluations;
    }

    private HelmholtzDerivatives Evaluate(Work work, double temperature, double density)
    {
        work.Evaluations++;
        return Model.Residual(temperature, density, Composition.Pure);
    }

    /// <summary>The point from the derivatives already evaluated at the two densities, at the
    /// pressure <paramref name="pressure"/> (known exactly to the caller).</summary>
    private CoexistencePoint Build(in HelmholtzDerivatives liquidDerivatives, in HelmholtzDerivatives vapourDerivatives, double pressure,
        CoexistenceMethod method, int iterations, StopReason stop, Work work, CoexistenceStart start, double uncertainty)
    {
        var liquid = PhaseState.From(liquidDerivatives, pressure);
        var vapour = PhaseState.From(vapourDerivatives, pressure);
        double residual = Math.Abs(liquid.LnFugacityCoefficient - vapour.LnFugacityCoefficient);
        return new CoexistencePoint
        {
            Model = Model.Identity,
            Temperature = liquidDerivatives.Temperature,
            Pressure = pressure,
            Liquid = liquid,
            Vapour = vapour,
            Report = new SolverReport(method, iterations, residual, stop, work.Evaluations, start, uncertainty),
        };
    }

    /// <summary>Converged when the density uncertainty is at or below <see cref="RoundingFloorTolerance"/>;
    /// within 1 % of Tc, where rounding limits what the iteration can resolve, a larger one up to
    /// <see cref="LargestAcceptedUncertainty"/> is returned as <see cref="StopReason.RoundingLimit"/>;
    /// anything else is a failure.</summary>
    private bool Classify(double uncertainty, double temperature, out StopReason stop)
    {
        stop = uncertainty <= RoundingFloorTolerance ? StopReason.Converged : StopReason.RoundingLimit;
        return uncertainty <= RoundingFloorTolerance
               || (uncertainty <= LargestAcceptedUncertainty && 1 - temperature / CriticalTemperature < 1e-2);
    }

    private static bool TrySolve(Func<CoexistencePoint> solve, out CoexistencePoint? point)
    {
        try
        {
            point = solve();
            return true;
        }
        catch (PhaseSlopeException)
        {
            point = null;
            return false;
        }
    }

    private bool Acceptable(CoexistencePoint point)
        => point.Report.FugacityResidual <= Options.FugacityTolerance
           && point.Liquid.Density > point.Vapour.Density
           && point.Liquid.PressureDensityDerivative > 0
           && point.Vapour.PressureDensityDerivative > 0;
}
