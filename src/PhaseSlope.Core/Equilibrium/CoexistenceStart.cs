namespace PhaseSlope.Core.Equilibrium;

/// <summary>Where a coexistence iteration started.</summary>
public enum CoexistenceStart
{
    /// <summary>No iteration (the critical state).</summary>
    None,

    /// <summary>Extrapolated from neighbouring solved points (a traced curve, or a point given as a start).</summary>
    Neighbour,

    /// <summary>The density roots at a vapour pressure estimated by the corresponding-states
    /// relation log10(P/Pc) = (7/3)(1 + ω)(1 − Tc/T) with the model's own acentric factor.</summary>
    Ancillary,

    /// <summary>The classical critical scaling ρ = ρc ± A·(Tc − T)^½ with A from the model's
    /// derivatives at its critical point.</summary>
    CriticalScaling,

    /// <summary>A bracketing iteration on ln P with the density roots at each trial pressure,
    /// used when a Newton start failed.</summary>
    Bracketing,
}
