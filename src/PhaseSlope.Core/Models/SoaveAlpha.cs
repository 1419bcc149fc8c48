namespace PhaseSlope.Core.Models;

/// <summary>α = [1 + m(1 − √(T/Tc))]², the form introduced by Soave, Chem. Eng. Sci. 27, 1197
/// (1972), with the slope m given by an acentric-factor correlation of the chosen model.</summary>
public sealed class SoaveAlpha : IAlphaFunction
{
    private readonly double _criticalTemperature;

    /// <summary>Creates the alpha function from its slope m and the critical temperature in K.</summary>
    public SoaveAlpha(double slope, double criticalTemperature, string correlation)
    {
        Preconditions.Finite(slope, "alpha slope m");
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Slope = slope;
        _criticalTemperature = criticalTemperature;
        Description = $"alpha = [1 + m(1 - sqrt(Tr))]^2, m = {slope.ToString("R", System.Globalization.CultureInfo.InvariantCulture)} ({correlation})";
    }

    /// <summary>Whether m is the fluid's own (tuned or published for the fluid) rather than the
    /// model's κ(ω) correlation; reports then name the alpha function.</summary>
    public bool FluidSpecific { get; init; }

    /// <summary>The slope m (κ in the Peng–Robinson papers).</summary>
    public double Slope { get; }

    /// <inheritdoc />
    public string Description { get; }

    /// <summary>Soave (1972): m = 0.480 + 1.574ω − 0.176ω² (coefficients from memory of the paper).</summary>
    public static double SoaveSlope(double acentricFactor)
        => 0.480 + acentricFactor * (1.574 - 0.176 * acentricFactor);

    /// <summary>Peng &amp; Robinson, Ind. Eng. Chem. Fundam. 15, 59 (1976):
    /// κ = 0.37464 + 1.54226ω − 0.26992ω² (coefficients from memory of the paper).</summary>
    public static double PengRobinson1976Slope(double acentricFactor)
        => 0.37464 + acentricFactor * (1.54226 - 0.26992 * acentricFactor);

    /// <summary>Robinson &amp; Peng, GPA Research Report RR-28 (1978): for ω &gt; 0.491,
    /// κ = 0.379642 + 1.48503ω − 0.164423ω² + 0.016666ω³; below that the 1976 correlation
    /// (coefficients from memory of the report).</summary>
    public static double PengRobinson1978Slope(double acentricFactor)
        => acentricFactor > 0.491
            ? 0.379642 + acentricFactor * (1.48503 + acentricFactor * (-0.164423 + 0.016666 * acentricFactor))
            : PengRobinson1976Slope(acentricFactor);

    /// <inheritdoc />
    public AlphaValue Evaluate(double temperature)
    {
        // s = √(T/Tc), g = 1 + m(1 − s): α = g², α' = −m·g/(s·Tc), α'' = m(1 + m)/(2·Tc²·s³)
        double m = Slope;
        double s = Math.Sqrt(temperature / _criticalTemperature);
        double g = 1 + m * (1 - s);
        double tc = _criticalTemperature;
        return new AlphaValue(g * g, -m * g / (s * tc), m * (1 + m) / (2 * tc * tc * s * s * s));
    }

    /// <inheritdoc />
    /// <remarks>α″ ∝ s⁻³ = (T/Tc)^(−3/2), so α‴ = −(3/2)·α″/T.</remarks>
    public double ThirdDerivative(double temperature) => -1.5 * Evaluate(temperature).SecondDerivative / temperature;
}
