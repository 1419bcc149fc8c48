using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Tuning;
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
        // A tuned fluid's fitted alpha parameters carry their covariance from the fit: they are
        // uncertain inputs beside Tc, Pc and ω.
        var alpha = CubicModel.EffectiveAlpha(model.Kind, fluid, model.Alpha);
        var set = alpha == AlphaForm.Default ? null : CubicModel.FindParameters(fluid, model.Kind, alpha);
        var hook = set is { Covariance: { } covariance }
            ? TunableAlpha.Uncertainty(set, covariance, fluid.CriticalTemperature.Value)
            : null;
        bool peneloux = string.Equals(model.VolumeShiftText.Trim(), "peneloux", StringComparison.OrdinalIgnoreCase);
        return peneloux
            ? new CubicParameterization(fluid, model.Kind, alpha, VolumeShiftRule.Peneloux, alphaParameters: hook)
            : new CubicParameterization(fluid, model.Kind, alpha, VolumeShiftRule.Fixed,
                CommonOptions.ParseShift(model.VolumeShiftText, model.Kind, fluid), hook);
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
