namespace PhaseSlope.Core.Correlations;

/// <summary>Where the volume change Δv in ΔH = T·Δv·dP/dT comes from.</summary>
public enum VolumeChangeModel
{
    /// <summary>Ideal-gas vapour, liquid volume neglected: Δv = RT/P, the Clausius–Clapeyron
    /// estimate; it overestimates ΔH by the factor 1/ΔZ.</summary>
    IdealGas,

    /// <summary>Coexisting volumes from a cubic equation of state for the named fluid, used through
    /// the model's compressibility change ΔZ = Z_V − Z_L at T (so Δv = ΔZ·RT/P at the fitted P).</summary>
    EquationOfState,

    /// <summary>The corresponding-states relation ΔZ = √(1 − Pr/Tr³) of Haggenmacher, J. Am.
    /// Chem. Soc. 68, 1633 (1946), from Tc and Pc alone.</summary>
    Haggenmacher,
}
