namespace PhaseSlope.Core.Equilibrium;

/// <summary>The route a coexistence calculation took.</summary>
public enum CoexistenceMethod
{
    /// <summary>Newton iteration on ln P for equal fugacity, the liquid and vapour roots found
    /// at each trial pressure inside the spinodal window (used away from Tc).</summary>
    PressureIteration,

    /// <summary>Newton iteration on the two coexisting densities for equal pressure and equal
    /// Gibbs energy, started from the spinodal densities extrapolated by the classical √3 ratio
    /// (used near Tc, where the spinodal pressure window is too narrow to resolve in P).</summary>
    DensityIteration,

    /// <summary>Newton iteration on T for Psat(T) equal to a given pressure, each step a full
    /// coexistence calculation at T.</summary>
    TemperatureIteration,

    /// <summary>The critical state of the model, evaluated directly.</summary>
    CriticalState,
}
