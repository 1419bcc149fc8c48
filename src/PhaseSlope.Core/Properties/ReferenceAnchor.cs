namespace PhaseSlope.Core.Properties;

/// <summary>The kind of state a reference convention is anchored at.</summary>
public enum ReferenceAnchor
{
    /// <summary>The ideal gas at a temperature and pressure.</summary>
    IdealGas,

    /// <summary>The saturated liquid, at a temperature or (normal boiling point) a pressure.</summary>
    SaturatedLiquid,

    /// <summary>A single-phase state of the model at a temperature and pressure.</summary>
    SinglePhase,
}
