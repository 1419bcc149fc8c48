namespace PhaseSlope.Core.Properties;

/// <summary>What kind of single-phase state a root is.</summary>
public enum PhaseLabel
{
    /// <summary>The dense root below Tc.</summary>
    Liquid,

    /// <summary>The dilute root below Tc.</summary>
    Vapour,

    /// <summary>At or above the model's Tc, where one fluid phase exists.</summary>
    Supercritical,
}
