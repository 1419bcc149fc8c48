using PhaseSlope.Core.Equilibrium;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Correlations;

/// <summary>Enthalpy of vaporization from a fitted vapour-pressure correlation through the
/// Clapeyron equation, ΔH = T·Δv·dP/dT = R·T²·ΔZ·d ln P/dT (<see cref="ClapeyronEquation"/>).</summary>
/// <remarks>u(ΔH) = R·T²·ΔZ·u(d ln P/dT), the delta method on the fit covariance; the
/// uncertainty of Δv itself (the volume model) is not included and is stated separately in
/// docs/validation.md.</remarks>
public sealed class LatentHeatEstimator
{
    /// <summary>Creates the estimator.</summary>
    /// <param name="fit">The fitted correlation.</param>
    /// <param name="volumeModel">Where Δv comes from.</param>
    /// <param name="solver">Coexistence solver of the named fluid (required for <see cref="VolumeChangeModel.EquationOfState"/>).</param>
    /// <param name="criticalTemperature">Tc in K (required for <see cref="VolumeChangeModel.Haggenmacher"/>).</param>
    /// <param name="criticalPressure">Pc in Pa (required for <see cref="VolumeChangeModel.Haggenmacher"/>).</param>
    public LatentHeatEstimator(VapourPressureFit fit, VolumeChangeModel volumeModel, CoexistenceSolver? solver = null, double? criticalTemperature = null, double? criticalPressure = null)
    {
        ArgumentNullException.ThrowIfNull(fit);
        Fit = fit;
        VolumeModel = volumeModel;
        Solver = solver;
        CriticalTemperature = criticalTemperature ?? solver?.CriticalTemperature;
        CriticalPressure = criticalPressure ?? solver?.CriticalPressure;
        if (volumeModel == VolumeChangeModel.EquationOfState && solver is null)
        {
            throw new InvalidInputException("volume model", double.NaN, "the eos volume model needs a fluid (its coexisting volumes come from the model)");
        }

        if (volumeModel == VolumeChangeModel.Haggenmacher && (CriticalTemperature is null || CriticalPressure is null))
        {
            throw new InvalidInputException("volume model", double.NaN, "the Haggenmacher volume model needs Tc and Pc");
        }
    }

    /// <summary>The fitted correlation.</summary>
    public VapourPressureFit Fit { get; }

    /// <summary>The volume model.</summary>
    public VolumeChangeModel VolumeModel { get; }

    /// <summary>The solver used for coexisting volumes, or null.</summary>
    public CoexistenceSolver? Solver { get; }

    /// <summary>Tc used, K, or null.</summary>
    public double? CriticalTemperature { get; }

    /// <summary>Pc used, Pa, or null.</summary>
    public double? CriticalPressure { get; }

    /// <summary>ΔH at T with its standard uncertainty.</summary>
    /// <exception cref="InvalidInputException">T not positive, at or above Tc, or outside the
    /// volume model's range.</exception>
    public LatentHeatPoint At(double temperature)
    {
        Preconditions.Positive(temperature, "temperature");
        if (CriticalTemperature is double tc && !(temperature < tc))
        {
            throw new InvalidInputException("temperature", temperature,
                $"temperature {Preconditions.Format(temperature)} K is at or above the critical temperature {Preconditions.Format(tc)} K: no latent heat");
        }

        if (!(temperature < Fit.Form.UpperLimit))
        {
            throw new InvalidInputException("temperature", temperature,
                $"temperature {Preconditions.Format(temperature)} K is outside the {Fit.Form.Id} form (defined below {Preconditions.Format(Fit.Form.UpperLimit)} K)");
        }

        double p = Fit.Pressure(temperature);
        double slope = Fit.Form.Slope(temperature, Fit.Parameters);
        double dz = VolumeModel switch
        {
            VolumeChangeModel.IdealGas => 1,
            // The model's compressibility change at T, applied at the data's pressure: Δv =
            // ΔZ_model·RT/P_fit. Taking the model's Δv itself would carry the model's own
            // vapour-pressure error into ΔH (Peng–Robinson's Psat of water is 20 % low at 0 °C).
            VolumeChangeModel.EquationOfState => Solver!.AtTemperature(temperature).CompressibilityChange,
            _ => Math.Sqrt(Math.Max(0, 1 - p / CriticalPressure!.Value / Math.Pow(temperature / CriticalTemperature!.Value, 3))),
        };
        return new LatentHeatPoint(temperature, p,
            ClapeyronEquation.EnthalpyOfVaporization(temperature, slope, dz),
            ClapeyronEquation.EnthalpyOfVaporization(temperature, Fit.SlopeStandardUncertainty(temperature), dz),
            dz, !Fit.InRange(temperature));
    }
}
