namespace PhaseSlope.Core.Properties;

/// <summary>The state functions whose partial derivatives the engine forms, all molar.</summary>
public enum StateVariable
{
    /// <summary>Temperature T, K.</summary>
    T,

    /// <summary>Pressure P, Pa.</summary>
    P,

    /// <summary>Molar volume V, m³/mol.</summary>
    V,

    /// <summary>Molar internal energy U, J/mol.</summary>
    U,

    /// <summary>Molar enthalpy H, J/mol.</summary>
    H,

    /// <summary>Molar entropy S, J/(mol·K).</summary>
    S,

    /// <summary>Molar Helmholtz energy A, J/mol.</summary>
    A,

    /// <summary>Molar Gibbs energy G, J/mol.</summary>
    G,
}
