using System.Globalization;

namespace PhaseSlope.Core.Models;

/// <summary>The alpha function of Mathias &amp; Copeman, Fluid Phase Equilib. 13, 91 (1983):
/// for T ≤ Tc, α = [1 + c1·x + c2·x² + c3·x³]² with x = 1 − √Tr; above Tc the Soave form
/// [1 + c1·x]², as in the paper.</summary>
/// <remarks>
/// With s = √Tr, g = 1 + c1x + c2x² + c3x³, g' = dg/dx and g'' = d²g/dx²:
/// dα/dT = −g'·g/(s·Tc) and d²α/dT² = [g'·(g + s·g') + g·g''·s]/(2·Tc²·s³), where
/// g + s·g' = 1 + c1 + x(2c2 + x(3c3 − c2 − 2c3·x)) is expanded so that with c2 = c3 = 0 every
/// operation is the one <see cref="SoaveAlpha"/> performs and the two agree bit for bit.
/// α and dα/dT are continuous at Tc (1 and −c1/Tc). d²α/dT² is not: at Tc it is
/// [c1(1 + c1) + 2c2]/(2Tc²) from below and c1(1 + c1)/(2Tc²) from above, a jump of c2/Tc²
/// that the paper's choice of the Soave form above Tc implies. At T = Tc exactly the value
/// from below is returned.
/// </remarks>
public sealed class MathiasCopemanAlpha : IAlphaFunction
{
    private readonly double _criticalTemperature;

    /// <summary>Creates the alpha function from c1, c2, c3 and the critical temperature in K.</summary>
    /// <param name="c1">c1 (dimensionless).</param>
    /// <param name="c2">c2 (dimensionless).</param>
    /// <param name="c3">c3 (dimensionless).</param>
    /// <param name="criticalTemperature">Tc in K.</param>
    /// <param name="source">Where the constants come from, for <see cref="Description"/>.</param>
    public MathiasCopemanAlpha(double c1, double c2, double c3, double criticalTemperature, string source)
    {
        Preconditions.Finite(c1, "Mathias-Copeman c1");
        Preconditions.Finite(c2, "Mathias-Copeman c2");
        Preconditions.Finite(c3, "Mathias-Copeman c3");
        Preconditions.Positive(criticalTemperature, "critical temperature");
        C1 = c1;
        C2 = c2;
        C3 = c3;
        _criticalTemperature = criticalTemperature;
        var c = CultureInfo.InvariantCulture;
        Description = $"alpha = [1 + c1 x + c2 x^2 + c3 x^3]^2, x = 1 - sqrt(Tr) (Mathias & Copeman 1983), c1 = {c1.ToString("R", c)}, c2 = {c2.ToString("R", c)}, c3 = {c3.ToString("R", c)} ({source})";
    }

    /// <summary>c1.</summary>
    public double C1 { get; }

    /// <summary>c2 (used only for T ≤ Tc).</summary>
    public double C2 { get; }

    /// <summary>c3 (used only for T ≤ Tc).</summary>
    public double C3 { get; }

    /// <inheritdoc />
    public string Description { get; }

    /// <inheritdoc />
    public AlphaValue Evaluate(double temperature)
    {
        double tc = _criticalTemperature;
        bool subcritical = temperature <= tc;
        double c1 = C1;
        double c2 = subcritical ? C2 : 0;
        double c3 = subcritical ? C3 : 0;
        double s = Math.Sqrt(temperature / tc);
        double x = 1 - s;
        double g = 1 + x * (c1 + x * (c2 + x * c3));
        double gx = c1 + x * (2 * c2 + 3 * c3 * x);
        double gxx = 2 * c2 + 6 * c3 * x;
        double h = 1 + c1 + x * (2 * c2 + x * (3 * c3 - c2 - 2 * c3 * x));   // g + s·g'
        double second = (gx * h + g * gxx * s) / (2 * tc * tc * s * s * s);
        return new AlphaValue(g * g, -gx * g / (s * tc), second);
    }

    /// <inheritdoc />
    /// <remarks>α = g(x)², x = 1 − √Tr with x′ = −1/(2√(T·Tc)), x″ = −x′/(2T), x‴ = 3x′/(4T²):
    /// g′ = g_x·x′, g″ = g_xx·x′² + g_x·x″, g‴ = g_xxx·x′³ + 3g_xx·x′x″ + g_x·x‴ and
    /// α‴ = 2(3g′g″ + g·g‴). Above Tc only c1 acts, as in <see cref="Evaluate"/>.</remarks>
    public double ThirdDerivative(double temperature)
    {
        double tc = _criticalTemperature;
        bool subcritical = temperature <= tc;
        double c1 = C1, c2 = subcritical ? C2 : 0, c3 = subcritical ? C3 : 0;
        var (x, x1, x2, x3) = RootTerm.At(temperature, tc);
        double g = 1 + x * (c1 + x * (c2 + x * c3));
        double gx = c1 + x * (2 * c2 + 3 * c3 * x);
        double gxx = 2 * c2 + 6 * c3 * x;
        double gxxx = 6 * c3;
        double g1 = gx * x1, g2 = gxx * x1 * x1 + gx * x2, g3 = gxxx * x1 * x1 * x1 + 3 * gxx * x1 * x2 + gx * x3;
        return 2 * (3 * g1 * g2 + g * g3);
    }
}
