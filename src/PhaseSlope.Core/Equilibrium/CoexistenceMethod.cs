namespace PhaseSlope.Core.Equilibrium;

/// <summary>The route a coexistence calculation took.</summary>
public enum CoexistenceMethod
{
    /// <summary>Newton iteration on ln P for equal fugacity with the liquid and vapour density
    /// roots at each trial pressure, safeguarded by bisection: the robust fallback, also used to
    /// find the model's own acentric factor for the ancillary start.</summary>
    PressureIteration,

    /// <summary>Newton iteration on the logarithms of the two coexisting densities at the given
    /// temperature for equal pressure and equal Gibbs energy (two model evaluations per step).</summary>
    DensityIteration,

    /// <summary>Newton iteration on the temperature and the two densities for a given pressure:
    /// both phases at that pressure with equal Gibbs energy (two model evaluations per step).</summary>
    TemperatureIteration,

    /// <summary>Within 1e-4 of Tc: both phases evaluated at densities from the model's critical
    /// series, fitted once per solver to Newton solutions between 1e-4 and 1e-3 below Tc, where
    /// rounding no longer hides the pressure difference between the phases.</summary>
    CriticalSeries,

    /// <summary>The critical state of the model, evaluated directly.</summary>
    CriticalState,
}
