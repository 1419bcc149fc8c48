namespace PhaseSlope.Core.Correlations;

/// <summary>An enthalpy of vaporization derived from vapour-pressure data by the Clapeyron equation.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">The fitted saturation pressure at T, Pa.</param>
/// <param name="EnthalpyOfVaporization">ΔH = T·Δv·dP/dT, J/mol.</param>
/// <param name="StandardUncertainty">u(ΔH) from the fit covariance by the delta method, J/mol
/// (the volume model is taken as exact).</param>
/// <param name="CompressibilityChange">ΔZ = P·Δv/(RT) used.</param>
/// <param name="Extrapolated">True when T lies outside the data's temperature range.</param>
public sealed record LatentHeatPoint(double Temperature, double Pressure, double EnthalpyOfVaporization, double StandardUncertainty, double CompressibilityChange, bool Extrapolated)
{
    /// <summary>A named finding when ΔH is implausible though positive (see
    /// <see cref="LatentHeatEstimator.MaximumEntropyOfVaporization"/>), else null.</summary>
    public string? Finding { get; init; }
}
