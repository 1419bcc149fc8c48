namespace PhaseSlope.Core.Properties;

/// <summary>A property that, with one other, fixes the equilibrium state of a pure fluid (see
/// <see cref="PropertyModel.Flash"/>). Molar SI units: K, Pa, mol/m³, J/mol, J/(mol·K); the
/// quality is the vapour mole fraction (equal to the mass fraction for a pure fluid).</summary>
public enum StateProperty
{
    /// <summary>Temperature, K.</summary>
    Temperature,

    /// <summary>Pressure, Pa.</summary>
    Pressure,

    /// <summary>Molar density, mol/m³ (of the two-phase mixture inside the dome).</summary>
    Density,

    /// <summary>Molar enthalpy on the engine's reference convention, J/mol.</summary>
    Enthalpy,

    /// <summary>Molar entropy on the engine's reference convention, J/(mol·K).</summary>
    Entropy,

    /// <summary>Molar internal energy on the engine's reference convention, J/mol.</summary>
    InternalEnergy,

    /// <summary>Vapour quality: the vapour fraction of a liquid–vapour mixture, 0 to 1.</summary>
    Quality,
}
