namespace PhaseSlope.Core.Models;

/// <summary>α = (T/Tc)^(−1/2): the temperature dependence of Redlich &amp; Kwong,
/// Chem. Rev. 44, 233 (1949).</summary>
public sealed class InverseRootAlpha : IAlphaFunction
{
    private readonly double _criticalTemperature;

    /// <summary>Creates the alpha function for a critical temperature in K.</summary>
    public InverseRootAlpha(double criticalTemperature)
    {
        Preconditions.Positive(criticalTemperature, "critical temperature");
        _criticalTemperature = criticalTemperature;
    }

    /// <inheritdoc />
    public string Description => "alpha = Tr^-0.5 (Redlich & Kwong, 1949)";

    /// <inheritdoc />
    public AlphaValue Evaluate(double temperature)
    {
        // α = (T/Tc)^-1/2, α' = −α/(2T), α'' = 3α/(4T²)
        double alpha = Math.Sqrt(_criticalTemperature / temperature);
        return new AlphaValue(alpha, -alpha / (2 * temperature), 3 * alpha / (4 * temperature * temperature));
    }

    /// <inheritdoc />
    public double ThirdDerivative(double temperature)
        => -15 * Math.Sqrt(_criticalTemperature / temperature) / (8 * temperature * temperature * temperature);
}
