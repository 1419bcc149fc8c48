namespace PhaseSlope.Core.Mixtures;

/// <summary>The kind of a binary azeotrope.</summary>
public enum AzeotropeKind
{
    /// <summary>Positive deviation from Raoult's law: a maximum of pressure at fixed T, a minimum
    /// of temperature at fixed P (a minimum-boiling azeotrope, as ethanol–water).</summary>
    MaximumPressure,

    /// <summary>Negative deviation: a minimum of pressure at fixed T, a maximum of temperature at
    /// fixed P (a maximum-boiling azeotrope, as acetone–chloroform).</summary>
    MinimumPressure,
}
