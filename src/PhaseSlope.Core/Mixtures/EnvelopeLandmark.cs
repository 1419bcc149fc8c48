namespace PhaseSlope.Core.Mixtures;

/// <summary>A located point of a phase envelope (critical point, cricondenbar, cricondentherm).</summary>
/// <param name="Temperature">Temperature in K.</param>
/// <param name="Pressure">Pressure in Pa.</param>
/// <param name="Branch">The branch it lies on (for the critical point, where the branches meet:
/// <see cref="EnvelopeBranch.Bubble"/> by convention).</param>
public readonly record struct EnvelopeLandmark(double Temperature, double Pressure, EnvelopeBranch Branch);
