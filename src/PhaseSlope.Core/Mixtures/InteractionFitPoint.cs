namespace PhaseSlope.Core.Mixtures;

/// <summary>A data point of a k_ij fit with the model's bubble point at the fitted k_ij.</summary>
/// <param name="Data">The measured point.</param>
/// <param name="Pressure">The model's bubble pressure at the point's T and x_1, Pa (where the bubble point at T does not converge, the first-order estimate from the bubble point at the measured P and the bubble line's slope: see <see cref="InteractionFit"/>).</param>
/// <param name="VapourFraction">The model's y_1 there.</param>
public sealed record InteractionFitPoint(BinaryVlePoint Data, double Pressure, double VapourFraction)
{
    /// <summary>(P_model − P_data)/P_data.</summary>
    public double RelativePressureDeviation => (Pressure - Data.Pressure) / Data.Pressure;

    /// <summary>y_1,model − y_1,data, or null where y_1 was not measured.</summary>
    public double? VapourDeviation => Data.VapourFraction is double y ? VapourFraction - y : null;
}
