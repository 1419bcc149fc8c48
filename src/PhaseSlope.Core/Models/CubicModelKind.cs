namespace PhaseSlope.Core.Models;

/// <summary>The cubic models the toolkit builds from a fluid's critical constants and acentric factor.</summary>
public enum CubicModelKind
{
    /// <summary>Peng–Robinson (1976) with its 1976 κ(ω) correlation.</summary>
    PengRobinson,

    /// <summary>Peng–Robinson with the 1978 κ(ω) correlation used for ω &gt; 0.491.</summary>
    PengRobinson1978,

    /// <summary>Soave–Redlich–Kwong (1972).</summary>
    SoaveRedlichKwong,

    /// <summary>Redlich–Kwong (1949).</summary>
    RedlichKwong,

    /// <summary>van der Waals (1873).</summary>
    VanDerWaals,
}
