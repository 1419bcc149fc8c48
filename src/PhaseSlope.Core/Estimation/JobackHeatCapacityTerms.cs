namespace PhaseSlope.Core.Estimation;

/// <summary>The ideal-gas heat-capacity contributions of one Joback group; the molecule's
/// cp° = (Σa − 37.93) + (Σb + 0.210)T + (Σc − 3.91e-4)T² + (Σd + 2.06e-7)T³ in J/(mol·K).</summary>
/// <param name="A">a, J/(mol·K).</param>
/// <param name="B">b, J/(mol·K²).</param>
/// <param name="C">c, J/(mol·K³).</param>
/// <param name="D">d, J/(mol·K⁴).</param>
public readonly record struct JobackHeatCapacityTerms(double A, double B, double C, double D);
