namespace PhaseSlope.Core.Mixtures;

/// <summary>The temperature glide of a blend at one pressure: dew temperature minus bubble
/// temperature, the span over which it boils (or condenses) at that pressure.</summary>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Bubble">The bubble point at P.</param>
/// <param name="Dew">The dew point at P.</param>
public sealed record MixtureGlide(double Pressure, MixtureSaturationPoint Bubble, MixtureSaturationPoint Dew)
{
    /// <summary>T_dew − T_bubble, K (a temperature difference).</summary>
    public double Glide => Dew.Temperature - Bubble.Temperature;
}
