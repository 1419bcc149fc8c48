namespace PhaseSlope.Core.Cycles;

/// <summary>A state of a pure fluid on an isobar, single-phase or two-phase (then at the
/// saturation temperature, with its vapour quality and the lever-rule mixture values).</summary>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Enthalpy">h, J/mol, on the property model's reference.</param>
/// <param name="Entropy">s, J/(mol·K), on the property model's reference.</param>
/// <param name="Density">ρ, mol/m³ (of the mixture inside the dome: 1/ρ = (1 − x)/ρL + x/ρV).</param>
/// <param name="Quality">Vapour mass (= molar) fraction x inside the dome, 0 ≤ x ≤ 1; null for a
/// single phase.</param>
public readonly record struct IsobaricPoint(double Temperature, double Pressure, double Enthalpy, double Entropy, double Density, double? Quality);
