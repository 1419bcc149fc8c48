using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Uncertainty;

namespace PhaseSlope.Cli.Commands;

/// <summary>Runs the chosen propagation for coexistence states (the core does the work; this
/// only picks the method and draws the progress bar of a long Monte Carlo run).</summary>
internal static class UncertaintyRun
{
    /// <summary>The uncertain inputs of the chosen model for a fluid: Tc, Pc and ω with the
    /// volume shift following them when it is the Péneloux correlation.</summary>
    public static CubicParameterization Parameters(ModelChoice model, Fluid fluid)
    {
        bool peneloux = string.Equals(model.VolumeShiftText.Trim(), "peneloux", StringComparison.OrdinalIgnoreCase);
        return peneloux
            ? new CubicParameterization(fluid, model.Kind, model.Alpha, VolumeShiftRule.Peneloux)
            : new CubicParameterization(fluid, model.Kind, model.Alpha, VolumeShiftRule.Fixed,
                CommonOptions.ParseShift(model.VolumeShiftText, model.Kind, fluid));
    }

    /// <summary>The summary written beside the values.</summary>
    public static UncertaintySummary Summary(UncertaintyChoice choice, CubicParameterization parameters)
        => new(choice, parameters.Inputs);

    /// <summary>Uncertainties of states solved at given temperatures (a curve or one state).</summary>
    public static IReadOnlyList<CoexistenceUncertainty> AtTemperatures(CliIo io, UncertaintyChoice choice, CubicParameterization parameters, IReadOnlyList<CoexistencePoint> points)
    {
        if (choice.Method == PropagationMethod.Linear)
        {
            return points.Select(p => LinearPropagation.Propagate(p, parameters, atFixedPressure: false)).ToArray();
        }

        using var bar = new ProgressBar(io, choice.Samples, "Monte Carlo");
        return MonteCarloPropagation.AtTemperatures(parameters, points.Select(p => p.Temperature).ToArray(), choice.Samples, choice.Seed, bar);
    }

    /// <summary>Uncertainties of a state solved at a given pressure.</summary>
    public static CoexistenceUncertainty AtPressure(CliIo io, UncertaintyChoice choice, CubicParameterization parameters, CoexistencePoint point)
    {
        if (choice.Method == PropagationMethod.Linear)
        {
            return LinearPropagation.Propagate(point, parameters, atFixedPressure: true);
        }

        using var bar = new ProgressBar(io, choice.Samples, "Monte Carlo");
        return MonteCarloPropagation.AtPressure(parameters, point.Pressure, choice.Samples, choice.Seed, bar);
    }
}
