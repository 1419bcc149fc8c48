namespace PhaseSlope.Core.Models;

/// <summary>α = 1: the original van der Waals attraction, independent of temperature.</summary>
public sealed class ConstantAlpha : IAlphaFunction
{
    /// <inheritdoc />
    public string Description => "alpha = 1 (van der Waals, 1873)";

    /// <inheritdoc />
    public AlphaValue Evaluate(double temperature) => new(1, 0, 0);

    /// <inheritdoc />
    public double ThirdDerivative(double temperature) => 0;
}
