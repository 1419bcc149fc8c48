namespace PhaseSlope.Core.Mixtures;

/// <summary>A critical point of a mixture of fixed composition, by the Heidemann–Khalil criteria.</summary>
/// <param name="Temperature">Temperature in K.</param>
/// <param name="Pressure">Pressure in Pa.</param>
/// <param name="Density">Molar density in mol/m³.</param>
/// <param name="QuadraticResidual">The smallest eigenvalue of the scaled Hessian at the solution
/// (zero at a critical point; dimensionless, per mole).</param>
/// <param name="CubicResidual">The cubic form at the solution (zero at a critical point; per mole²).</param>
public readonly record struct MixtureCriticalPoint(double Temperature, double Pressure, double Density, double QuadraticResidual, double CubicResidual);
