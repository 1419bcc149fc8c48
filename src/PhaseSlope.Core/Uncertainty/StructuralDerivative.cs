namespace PhaseSlope.Core.Uncertainty;

/// <summary>The derivatives of a cubic model's structural constants at one temperature with
/// respect to one uncertain input: the co-volume b, the attraction g = a·α(T), its temperature
/// derivative g_T = a·dα/dT and the volume shift c.</summary>
/// <param name="Covolume">∂b/∂p, m³/mol per unit of p.</param>
/// <param name="Attraction">∂(a·α)/∂p at fixed T.</param>
/// <param name="AttractionSlope">∂(a·dα/dT)/∂p at fixed T.</param>
/// <param name="VolumeShift">∂c/∂p.</param>
/// <param name="AttractionCurvature">∂(a·d²α/dT²)/∂p at fixed T (for cv and cp); NaN where the
/// input's alpha sensitivity gives none.</param>
public readonly record struct StructuralDerivative(double Covolume, double Attraction, double AttractionSlope, double VolumeShift, double AttractionCurvature = double.NaN);
