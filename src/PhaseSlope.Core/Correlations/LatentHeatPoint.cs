namespace PhaseSlope.Core.Correlations;

/// <summary>An enthalpy of vaporization derived from vapour-pressure data by the Clapeyron equation.</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">The fitted saturation pressure at T, Pa.</param>
/// <param name="EnthalpyOfVaporization">ΔH = T·Δv·dP/dT, J/mol.</param>
/// <param name="StandardUncertainty">u(ΔH), J/mol: from the fit covariance alone for a point of
/// <see cref="LatentHeatEstimator.At"/>; the fit, Tc and Pc and the volume model combined for a
/// point of <see cref="LatentHeatBand"/>.</param>
/// <param name="CompressibilityChange">ΔZ = P·Δv/(RT) used.</param>
/// <param name="Extrapolated">True when T lies outside the data's temperature range.</param>
public sealed record LatentHeatPoint(double Temperature, double Pressure, double EnthalpyOfVaporization, double StandardUncertainty, double CompressibilityChange, bool Extrapolated)
{
    /// <summary>A named finding when ΔH is implausible though positive (see
    /// <see cref="LatentHeatEstimator.MaximumEntropyOfVaporization"/>), else null.</summary>
    public string? Finding { get; init; }

    /// <summary>The share of the fit covariance in the band (delta method), J/mol; NaN when the
    /// covariance is undefined. Equal to <see cref="StandardUncertainty"/> for a point straight
    /// from <see cref="LatentHeatEstimator.At"/>.</summary>
    public double FitUncertainty { get; init; } = double.NaN;

    /// <summary>The share of the uncertainty of Tc and Pc, J/mol (0 when neither the form nor the
    /// volume model uses them, or when none was propagated).</summary>
    public double CriticalPointUncertainty { get; init; }

    /// <summary>The share of the volume model, J/mol, or null when it cannot be sized (the
    /// ideal-gas route without Tc and Pc).</summary>
    public double? VolumeModelUncertainty { get; init; }

    /// <summary>True when this point lies outside the data and its band was widened to the band
    /// at the nearest end of the data (a fit knows no more beyond its data than at their edge).</summary>
    public bool BandHeldAtDataEnd { get; init; }
}
