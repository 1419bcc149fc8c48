namespace PhaseSlope.Core.Models;

/// <summary>The critical point of a model: where the two coexisting phases become one.</summary>
/// <param name="Temperature">Tc in K.</param>
/// <param name="Pressure">Pc in Pa.</param>
/// <param name="Density">ρc in mol/m³ (the model's own, which for a cubic differs from the
/// measured critical density).</param>
public readonly record struct ModelCriticalPoint(double Temperature, double Pressure, double Density);
