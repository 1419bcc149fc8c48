namespace PhaseSlope.Core.Mixtures;

/// <summary>Wilson's K-value estimate, the usual start of mixture equilibrium calculations:
/// ln K_i = ln(Pc_i/P) + 5.373(1 + ω_i)(1 − Tc_i/T) (Wilson, "A modified Redlich–Kwong equation
/// of state, application to general physical data calculations", AIChE 65th National Meeting,
/// Cleveland, 1968; the form quoted by Michelsen &amp; Mollerup, Thermodynamic Models, 2nd ed.
/// (2007), ch. 10).</summary>
public static class WilsonKValues
{
    /// <summary>The constant 5.373 of Wilson's correlation (ln 10 · 7/3, which makes ω the acentric
    /// factor at T/Tc = 0.7).</summary>
    public const double Slope = 5.373;

    /// <summary>ln K_i at (T, P) from each component's critical temperature, critical pressure and
    /// acentric factor.</summary>
    public static void LnK(double temperature, double pressure, ReadOnlySpan<double> criticalTemperatures,
        ReadOnlySpan<double> criticalPressures, ReadOnlySpan<double> acentricFactors, Span<double> lnK)
    {
        Preconditions.Positive(temperature, "temperature");
        Preconditions.Positive(pressure, "pressure");
        for (int i = 0; i < lnK.Length; i++)
        {
            lnK[i] = Math.Log(criticalPressures[i] / pressure) + Slope * (1 + acentricFactors[i]) * (1 - criticalTemperatures[i] / temperature);
        }
    }
}
