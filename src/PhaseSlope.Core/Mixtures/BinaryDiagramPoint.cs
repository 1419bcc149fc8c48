namespace PhaseSlope.Core.Mixtures;

/// <summary>One bubble point of a binary diagram: the liquid's and the incipient vapour's mole
/// fraction of the first component, with T and P.</summary>
/// <param name="LiquidFraction">x_1.</param>
/// <param name="VapourFraction">y_1.</param>
/// <param name="Temperature">T, K.</param>
/// <param name="Pressure">P, Pa.</param>
/// <param name="Point">The bubble point it came from (both phases and the solver's report).</param>
/// <param name="Clapeyron">The slope of the bubble line at this liquid composition
/// (<see cref="MixtureClapeyron.BubbleLine"/>), with its partial molar differences.</param>
public sealed record BinaryDiagramPoint(double LiquidFraction, double VapourFraction, double Temperature, double Pressure, MixtureSaturationPoint Point,
    MixtureClapeyron.Result Clapeyron)
{
    /// <summary>dP/dT of the bubble line at fixed liquid composition, Pa/K.</summary>
    public double BubbleSlope => Clapeyron.Slope;
}
