namespace PhaseSlope.Core.Models;

/// <summary>x = 1 − √(T/Tc), the variable of the Soave and Mathias–Copeman alpha functions, and its
/// temperature derivatives: x′ = −1/(2√(T·Tc)), x″ = −x′/(2T), x‴ = 3x′/(4T²).</summary>
/// <param name="X">x.</param>
/// <param name="X1">dx/dT, 1/K.</param>
/// <param name="X2">d²x/dT², 1/K².</param>
/// <param name="X3">d³x/dT³, 1/K³.</param>
internal readonly record struct RootTerm(double X, double X1, double X2, double X3)
{
    /// <summary>The terms at T for a critical temperature Tc (both in K).</summary>
    public static RootTerm At(double temperature, double criticalTemperature)
    {
        double s = Math.Sqrt(temperature / criticalTemperature);
        double x1 = -1 / (2 * s * criticalTemperature);
        return new RootTerm(1 - s, x1, -x1 / (2 * temperature), 3 * x1 / (4 * temperature * temperature));
    }
}
