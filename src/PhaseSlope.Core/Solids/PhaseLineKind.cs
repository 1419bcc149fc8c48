namespace PhaseSlope.Core.Solids;

/// <summary>The three two-phase lines of a pure fluid's P–T diagram.</summary>
public enum PhaseLineKind
{
    /// <summary>Liquid–vapour, from the triple point to the critical point.</summary>
    Vaporization,

    /// <summary>Solid–vapour, below the triple point.</summary>
    Sublimation,

    /// <summary>Solid–liquid, from the triple point to high pressure.</summary>
    Melting,
}
