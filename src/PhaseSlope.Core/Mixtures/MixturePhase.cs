namespace PhaseSlope.Core.Mixtures;

/// <summary>One phase of a mixture result at the result's temperature and pressure.</summary>
/// <param name="MoleFractions">The phase's mole fractions, in component order.</param>
/// <param name="Density">Molar density, mol/m³.</param>
/// <param name="CompressibilityFactor">Z = P/(ρRT).</param>
/// <param name="Enthalpy">Molar enthalpy, J/mol (ideal gas at 298.15 K and 1 bar: h = 0 for each
/// pure component), or null when a component has no cp° (<see cref="MixtureProperties.UnavailableReason"/>).</param>
/// <param name="Entropy">Molar entropy, J/(mol·K), on the same convention (s = 0 for each pure
/// ideal-gas component at 298.15 K and 1 bar; the ideal entropy of mixing included), or null.</param>
public sealed record MixturePhase(IReadOnlyList<double> MoleFractions, double Density, double CompressibilityFactor, double? Enthalpy, double? Entropy);
