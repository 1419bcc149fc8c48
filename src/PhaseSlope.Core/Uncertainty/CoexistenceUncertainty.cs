namespace PhaseSlope.Core.Uncertainty;

/// <summary>How an uncertainty was propagated.</summary>
public enum PropagationMethod
{
    /// <summary>First order: u² = J·Σ·Jᵀ with the exact sensitivities J.</summary>
    Linear,

    /// <summary>Sampling the inputs and solving again for every sample.</summary>
    MonteCarlo,
}

/// <summary>Standard uncertainties of one coexistence state caused by the uncertain inputs; every
/// value null (with <see cref="Reason"/>) where the propagation does not apply.</summary>
/// <param name="Method">How it was propagated.</param>
/// <param name="Temperature">u(T), K (0 when T was given).</param>
/// <param name="Pressure">u(Psat), Pa (0 when P was given).</param>
/// <param name="EnthalpyOfVaporization">u(Δh), J/mol.</param>
/// <param name="LiquidDensity">u(ρL), mol/m³.</param>
/// <param name="VapourDensity">u(ρV), mol/m³.</param>
/// <param name="Reason">Why the values are null, or null when they are given.</param>
public sealed record CoexistenceUncertainty(
    PropagationMethod Method,
    double? Temperature,
    double? Pressure,
    double? EnthalpyOfVaporization,
    double? LiquidDensity,
    double? VapourDensity,
    string? Reason)
{
    /// <summary>A state where the propagation does not apply.</summary>
    public static CoexistenceUncertainty Undefined(PropagationMethod method, string reason)
        => new(method, null, null, null, null, null, reason);
}

/// <summary>The sensitivities of one coexistence state to each input (one entry per input, in the
/// order of <see cref="CubicParameterization.Inputs"/>).</summary>
/// <param name="Temperature">∂T/∂p (zero at fixed T).</param>
/// <param name="Pressure">∂Psat/∂p (zero at fixed P).</param>
/// <param name="EnthalpyOfVaporization">∂Δh/∂p.</param>
/// <param name="LiquidDensity">∂ρL/∂p.</param>
/// <param name="VapourDensity">∂ρV/∂p.</param>
public sealed record CoexistenceSensitivity(
    double[] Temperature,
    double[] Pressure,
    double[] EnthalpyOfVaporization,
    double[] LiquidDensity,
    double[] VapourDensity);
