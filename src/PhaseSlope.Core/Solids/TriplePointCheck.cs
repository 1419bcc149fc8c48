namespace PhaseSlope.Core.Solids;

/// <summary>The model's vapour pressure at the sourced triple-point temperature against the sourced
/// triple-point pressure: a check of the model at the low end of its liquid range.</summary>
/// <param name="Temperature">The sourced triple-point temperature, K.</param>
/// <param name="SourcedPressure">The sourced triple-point pressure, Pa.</param>
/// <param name="ModelPressure">The model's saturation pressure at that temperature, Pa.</param>
public sealed record TriplePointCheck(double Temperature, double SourcedPressure, double ModelPressure)
{
    /// <summary>ModelPressure / SourcedPressure − 1.</summary>
    public double RelativeDeviation => ModelPressure / SourcedPressure - 1;
}
