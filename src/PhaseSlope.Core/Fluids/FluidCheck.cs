using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Fluids;

/// <summary>Consistency checks of a fluid's data against a model, beyond the validation done
/// when the file is read.</summary>
/// <param name="Fluid">The fluid checked.</param>
/// <param name="Model">The model used (equation, alpha function, volume shift).</param>
/// <param name="PredictedBoilingPoint">The model's saturation temperature at 101325 Pa, K, or null
/// when it has none in the valid range (e.g. carbon dioxide).</param>
/// <param name="BoilingPointDeviation">(predicted − tabulated)/tabulated, or null.</param>
/// <param name="SolvesToCriticalPoint">Whether coexistence converges at the lowest valid
/// temperature, at 0.7·Tc and at Tc·(1 − 1e-8).</param>
/// <param name="Failure">Why it does not solve, or null.</param>
public sealed record FluidCheck(Fluid Fluid, ModelIdentity Model, double? PredictedBoilingPoint, double? BoilingPointDeviation, bool SolvesToCriticalPoint, string? Failure)
{
    /// <summary>Largest |ΔTb/Tb| counted as consistent: Peng–Robinson and Soave–Redlich–Kwong with
    /// a correct ω reproduce the normal boiling point of normal fluids to a few tenths of a percent
    /// (the acentric factor is defined from the vapour pressure at T/Tc = 0.7), and of polar,
    /// associating fluids such as water to about 0.5 %; a larger miss points to a data error
    /// (see docs/validation.md for the measured deviations).</summary>
    public const double BoilingPointTolerance = 0.01;

    /// <summary>True when the tabulated boiling point, if any, agrees within the tolerance.</summary>
    public bool BoilingPointConsistent => BoilingPointDeviation is not double d || Math.Abs(d) <= BoilingPointTolerance;

    /// <summary>Runs the checks with the published model <paramref name="kind"/> and its own alpha
    /// function, unshifted.</summary>
    public static FluidCheck Run(Fluid fluid, CubicModelKind kind = CubicModelKind.PengRobinson)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        return Run(fluid, CubicModel.For(kind, fluid));
    }

    /// <summary>Runs the checks with <paramref name="model"/> (any alpha function and volume
    /// shift), which must be built from <paramref name="fluid"/>'s constants.</summary>
    /// <remarks>A volume shift moves densities only, so it leaves the boiling point and
    /// convergence unchanged and shows in <see cref="Model"/>; an alpha function changes both.</remarks>
    public static FluidCheck Run(Fluid fluid, IResidualModel model)
    {
        ArgumentNullException.ThrowIfNull(fluid);
        ArgumentNullException.ThrowIfNull(model);
        var solver = new CoexistenceSolver(model, fluid);
        double tc = solver.CriticalTemperature;
        string? failure = null;
        foreach (double t in new[] { solver.MinimumTemperature, Math.Max(0.7 * tc, solver.MinimumTemperature), tc * (1 - 1e-8) })
        {
            if (!solver.TryAtTemperature(t, out _))
            {
                failure = $"coexistence does not converge at {Preconditions.Format(t)} K";
                break;
            }
        }

        double? predicted = null;
        double? deviation = null;
        if (fluid.NormalBoilingPoint is { } tb)
        {
            try
            {
                predicted = solver.AtPressure(Constants.StandardAtmosphere).Temperature;
                deviation = (predicted - tb.Value) / tb.Value;
            }
            catch (InvalidInputException)
            {
                // 1 atm lies outside the model's coexistence range for this fluid: nothing to compare.
            }
        }

        return new FluidCheck(fluid, solver.Model.Identity, predicted, deviation, failure is null, failure);
    }
}
