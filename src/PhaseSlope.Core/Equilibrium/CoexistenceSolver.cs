using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Equilibrium;

/// <summary>Liquid–vapour coexistence of one model: equal temperature, pressure and Gibbs
/// energy (fugacity) between a liquid and a vapour root.</summary>
/// <remarks>
/// Valid from <see cref="MinimumTemperature"/> (0.3·Tc, or the triple point when known and
/// higher) up to, not including, Tc. Away from Tc the solver iterates on ln P
/// (<see cref="CoexistenceMethod.PressureIteration"/>), which stays well conditioned for dense
/// liquids with tiny vapour pressures. Near Tc the spinodal pressure window shrinks as
/// (1 − T/Tc)^(3/2) and cannot be resolved in P, so it iterates on the two densities
/// (<see cref="CoexistenceMethod.DensityIteration"/>) from a start outside the spinodals, which
/// cannot fall onto the trivial solution ρL = ρV. Either route falls back on the other.
/// </remarks>
public sealed partial class CoexistenceSolver
{
    private const double R = Constants.GasConstant;

    /// <summary>Above this reduced temperature the density iteration is tried first.</summary>
    private const double DensityRouteReducedTemperature = 0.97;

    /// <summary>Creates a solver for a model with its lowest valid temperature.</summary>
    /// <param name="model">The cubic model.</param>
    /// <param name="minimumTemperature">Lowest temperature accepted, in K, below Tc.</param>
    /// <param name="options">Tolerances; <see cref="CoexistenceOptions.Default"/> when null.</param>
    public CoexistenceSolver(CubicModel model, double minimumTemperature, CoexistenceOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(model);
        Preconditions.Positive(minimumTemperature, "minimum temperature");
        if (!(minimumTemperature < model.CriticalTemperature))
        {
            throw new InvalidInputException("minimum temperature", minimumTemperature,
                $"minimum temperature {Preconditions.Format(minimumTemperature)} K is not below the critical temperature {Preconditions.Format(model.CriticalTemperature)} K");
        }

        Model = model;
        MinimumTemperature = minimumTemperature;
        Options = options ?? CoexistenceOptions.Default;
    }

    /// <summary>A solver for a catalog fluid and a model, valid from
    /// <see cref="LowestValidTemperature(Fluid)"/>.</summary>
    public static CoexistenceSolver For(Fluid fluid, CubicModelKind kind, CoexistenceOptions? options = null)
        => new(CubicModel.For(kind, fluid), LowestValidTemperature(fluid), options);

    /// <summary>The lowest temperature the toolkit solves for a fluid: 0.3·Tc, or the triple
    /// point when it is known and higher (below it the liquid is not the stable condensed phase).</summary>
    public static double LowestValidTemperature(Fluid fluid)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        double floor = 0.3 * fluid.CriticalTemperature.Value;
        double? triple = fluid.TriplePointTemperature?.Value;
        return triple is double t && t > floor ? t : floor;
    }

    /// <summary>The model.</summary>
    public CubicModel Model { get; }

    /// <summary>Lowest accepted temperature in K.</summary>
    public double MinimumTemperature { get; }

    /// <summary>Tolerances and iteration caps.</summary>
    public CoexistenceOptions Options { get; }

    /// <summary>The critical state of the model: T = Tc, both phases at the model's critical
    /// density, no jumps, and the slope of the critical isochore.</summary>
    public CoexistencePoint CriticalPoint()
    {
        double tc = Model.CriticalTemperature;
        var state = PhaseState.Evaluate(Model, tc, Model.CriticalDensity);
        return new CoexistencePoint
        {
            Model = Model.Kind,
            Temperature = tc,
            Pressure = state.Pressure,
            Liquid = state,
            Vapour = state,
            Report = new SolverReport(CoexistenceMethod.CriticalState, 0, 0, StopReason.CriticalPoint),
        };
    }

    private CoexistencePoint Build(double temperature, double pressure, double rhoL, double rhoV, CoexistenceMethod method, int iterations)
    {
        var liquid = PhaseState.EvaluateAtPressure(Model, temperature, rhoL, pressure);
        var vapour = PhaseState.EvaluateAtPressure(Model, temperature, rhoV, pressure);
        double residual = Math.Abs(liquid.LnFugacityCoefficient - vapour.LnFugacityCoefficient);
        return new CoexistencePoint
        {
            Model = Model.Kind,
            Temperature = temperature,
            Pressure = pressure,
            Liquid = liquid,
            Vapour = vapour,
            Report = new SolverReport(method, iterations, residual, StopReason.Converged),
        };
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
