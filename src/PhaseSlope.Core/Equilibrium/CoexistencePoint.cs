using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Equilibrium;

/// <summary>A liquid–vapour coexistence state of a pure fluid: both phases, the jumps across
/// the line and its Clapeyron slope.</summary>
/// <remarks>
/// Δh = h_V − h_L is the difference of residual enthalpies (the ideal-gas parts cancel at equal T).
/// At equilibrium Δg = 0, so Δs = Δh/T; Δu = Δh − P·Δv; the Clapeyron equation gives
/// dPsat/dT = Δh/(T·Δv). At the critical point Δh and Δv vanish together and the slope is the
/// limit, which for a classical (analytic) model equals the critical isochore's (∂P/∂T)_ρ.
/// Units: K, Pa, J/mol, J/(mol·K), m³/mol, Pa/K, K/Pa.
/// </remarks>
public sealed record CoexistencePoint
{
    /// <summary>Which model produced the point: equation, alpha function, volume shift.</summary>
    public required ModelIdentity Model { get; init; }

    /// <summary>Saturation temperature in K.</summary>
    public required double Temperature { get; init; }

    /// <summary>Saturation pressure in Pa.</summary>
    public required double Pressure { get; init; }

    /// <summary>The saturated liquid.</summary>
    public required PhaseState Liquid { get; init; }

    /// <summary>The saturated vapour.</summary>
    public required PhaseState Vapour { get; init; }

    /// <summary>How the point was obtained.</summary>
    public required SolverReport Report { get; init; }

    /// <summary>True for the critical state, where the two phases are one.</summary>
    public bool IsCritical => Report.StopReason == StopReason.CriticalPoint;

    /// <summary>Enthalpy of vaporization h_V − h_L in J/mol.</summary>
    public double EnthalpyOfVaporization => Vapour.ResidualEnthalpy - Liquid.ResidualEnthalpy;

    /// <summary>Entropy of vaporization Δh/T in J/(mol·K).</summary>
    public double EntropyOfVaporization => EnthalpyOfVaporization / Temperature;

    /// <summary>Volume change v_V − v_L in m³/mol.</summary>
    public double VolumeChange => Vapour.MolarVolume - Liquid.MolarVolume;

    /// <summary>Internal-energy change u_V − u_L = Δh − P·Δv in J/mol.</summary>
    public double InternalEnergyChange => EnthalpyOfVaporization - Pressure * VolumeChange;

    /// <summary>Compressibility-factor change Z_V − Z_L.</summary>
    public double CompressibilityChange => Vapour.CompressibilityFactor - Liquid.CompressibilityFactor;

    /// <summary>Clapeyron slope dPsat/dT = Δh/(T·Δv) in Pa/K.</summary>
    public double Slope => IsCritical ? Vapour.PressureTemperatureDerivative : EnthalpyOfVaporization / (Temperature * VolumeChange);

    /// <summary>dTsat/dP = 1/(dPsat/dT) in K/Pa.</summary>
    public double InverseSlope => 1 / Slope;
}
