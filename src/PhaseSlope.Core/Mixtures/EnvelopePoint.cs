namespace PhaseSlope.Core.Mixtures;

/// <summary>One converged point of a phase envelope: the feed in equilibrium with an
/// infinitesimal amount of a second (incipient) phase.</summary>
/// <param name="Temperature">Temperature in K.</param>
/// <param name="Pressure">Pressure in Pa.</param>
/// <param name="Branch">Bubble (feed liquid) or dew (feed vapour) side.</param>
/// <param name="IncipientComposition">Mole fractions of the incipient phase, in component order
/// (sums to 1 within the Newton tolerance).</param>
/// <param name="Iterations">Newton iterations the point took from its predicted start.</param>
public sealed record EnvelopePoint(double Temperature, double Pressure, EnvelopeBranch Branch, IReadOnlyList<double> IncipientComposition, int Iterations);
