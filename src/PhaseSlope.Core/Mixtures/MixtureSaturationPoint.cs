namespace PhaseSlope.Core.Mixtures;

/// <summary>A bubble or dew point of a mixture.</summary>
/// <param name="Kind">Bubble or dew.</param>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Liquid">The liquid phase: the feed at a bubble point, the incipient liquid at a dew point.</param>
/// <param name="Vapour">The vapour phase: the incipient vapour at a bubble point, the feed at a dew point.</param>
/// <param name="Report">Iterations and model evaluations.</param>
public sealed record MixtureSaturationPoint(MixtureSaturationKind Kind, double Temperature, double Pressure, MixturePhase Liquid, MixturePhase Vapour, MixtureSolverReport Report)
{
    /// <summary>K_i = y_i/x_i.</summary>
    public IReadOnlyList<double> KValues => Vapour.MoleFractions.Select((y, i) => y / Liquid.MoleFractions[i]).ToArray();
}
