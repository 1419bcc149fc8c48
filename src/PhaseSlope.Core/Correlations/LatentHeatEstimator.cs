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
    /// <exception cref="InvalidInputException">A data point lies at or above the given (or the
    /// model's) Pc or Tc.</exception>
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

        // Whatever the form, a measured vapour pressure lies below Pc and Tc: data beyond them
        // mean a wrong critical constant (a unit-less Pc read as Pa) or data of another kind.
        VapourPressureFitter.RequireBelowCriticalPoint(fit.Data, CriticalTemperature, CriticalPressure);
    }

    /// <summary>Upper bound on a plausible entropy of vaporization ΔH/T, J/(mol·K), above which
    /// a point carries a finding.</summary>
    /// <remarks>Common practice (Trouton's rule and its corrections): ΔS_vap at the normal boiling
    /// point is about 85–110 J/(mol·K) for most liquids, up to about 110–125 for hydrogen-bonded
    /// ones; ΔH/T grows towards the triple point, roughly doubling at T/Tc ≈ 0.3 for associating
    /// liquids. The bound is deliberately generous, about 3.5 times the normal-boiling-point
    /// value, so that it flags only results that are wrong by a large factor.</remarks>
    public const double MaximumEntropyOfVaporization = 350;

    /// <summary>The finding for a latent heat whose ΔH/T exceeds
    /// <see cref="MaximumEntropyOfVaporization"/> (a Trouton-type magnitude bound, common
    /// practice), or null when it does not; the one place the bound is applied (the estimator's
    /// points and the audit's latent-heat check both call it).</summary>
    /// <param name="temperature">T in K.</param>
    /// <param name="enthalpy">ΔH in J/mol.</param>
    public static string? ImplausibilityFinding(double temperature, double enthalpy)
    {
        double entropy = enthalpy / temperature;
        return entropy > MaximumEntropyOfVaporization
            ? $"implausible latent heat: dH/T = {Preconditions.Format(entropy)} J/(mol K) at {Preconditions.Format(temperature)} K exceeds {Preconditions.Format(MaximumEntropyOfVaporization)} J/(mol K) (common practice: about 85-110 at the normal boiling point)"
            : null;
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
    /// volume model's range; the fitted vapour pressure falls with T there (ΔH ≤ 0).</exception>
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
        if (!(slope > 0))
        {
            throw new InvalidInputException("temperature", temperature,
                $"the fitted vapour pressure does not rise with temperature at {Preconditions.Format(temperature)} K (d ln P/dT = {Preconditions.Format(slope)} 1/K): the Clapeyron equation gives no positive latent heat there");
        }

        double dz = VolumeModel switch
        {
            VolumeChangeModel.IdealGas => 1,
            // The model's compressibility change at T, applied at the data's pressure: Δv =
            // ΔZ_model·RT/P_fit. Taking the model's Δv itself would carry the model's own
            // vapour-pressure error into ΔH (Peng–Robinson's Psat of water is 20 % low at 0 °C).
            VolumeChangeModel.EquationOfState => Solver!.AtTemperature(temperature).CompressibilityChange,
            _ => HaggenmacherCompressibilityChange(temperature, p),
        };
        double enthalpy = ClapeyronEquation.EnthalpyOfVaporization(temperature, slope, dz);
        string? finding = ImplausibilityFinding(temperature, enthalpy);
        double fitUncertainty = ClapeyronEquation.EnthalpyOfVaporization(temperature, Fit.SlopeStandardUncertainty(temperature), dz);
        return new LatentHeatPoint(temperature, p, enthalpy, fitUncertainty, dz, !Fit.InRange(temperature))
        {
            Finding = finding,
            FitUncertainty = fitUncertainty,
            VolumeModelUncertainty = VolumeModelRelativeUncertainty(temperature, p, dz) * enthalpy,
        };
    }

    /// <summary>The relative standard uncertainty of ΔZ from the volume model, or null when it
    /// cannot be sized.</summary>
    /// <remarks>Sized on the water validation in docs/validation.md (IAPWS-generated data against
    /// steam-table enthalpies, one fluid; that the error grows as ΔZ falls from 1 is common
    /// practice): the cubic's ΔZ (eos) was within 0.13 % at ΔZ ≈ 1 and within 2.5 % down to
    /// ΔZ ≈ 0.66, so u = min(0.025, 0.5·(1 − ΔZ)) + 0.001; Haggenmacher's within 0.1 % and
    /// 0.94 %, so u = min(0.01, 0.25·(1 − ΔZ)) + 0.001. The ideal-gas route's error is its
    /// bias: it overestimates by 1/ΔZ, so it is high by 1 − ΔZ of its own value, sized with Haggenmacher's ΔZ when Tc and Pc are known, else not sized.</remarks>
    internal double? VolumeModelRelativeUncertainty(double temperature, double pressure, double dz)
    {
        switch (VolumeModel)
        {
            case VolumeChangeModel.EquationOfState:
                return Math.Min(0.025, 0.5 * (1 - dz)) + 0.001;
            case VolumeChangeModel.Haggenmacher:
                return Math.Min(0.01, 0.25 * (1 - dz)) + 0.001;
            default:
                if (CriticalTemperature is double tc && CriticalPressure is double pc)
                {
                    double radicand = 1 - pressure / pc / Math.Pow(temperature / tc, 3);
                    return radicand > 0 ? 1 - Math.Sqrt(radicand) : null;
                }

                return null;
        }
    }

    /// <summary>ΔZ = √(1 − Pr/Tr³) (Haggenmacher 1946) at T and the fitted P.</summary>
    /// <exception cref="InvalidInputException">1 − Pr/Tr³ ≤ 0: the relation has no real value, the
    /// fitted pressure lies beyond where the relation holds for this Tc and Pc.</exception>
    private double HaggenmacherCompressibilityChange(double temperature, double pressure)
    {
        double pc = CriticalPressure!.Value;
        double tc = CriticalTemperature!.Value;
        double radicand = 1 - pressure / pc / Math.Pow(temperature / tc, 3);
        if (!(radicand > 0))
        {
            throw new InvalidInputException("critical pressure", pc,
                $"the Haggenmacher relation dZ = sqrt(1 - Pr/Tr^3) is undefined at {Preconditions.Format(temperature)} K, {Preconditions.Format(pressure)} Pa with Tc = {Preconditions.Format(tc)} K and Pc = {Preconditions.Format(pc)} Pa (Pr/Tr^3 = {Preconditions.Format(1 - radicand)} >= 1): check Tc and Pc");
        }

        return Math.Sqrt(radicand);
    }
}
