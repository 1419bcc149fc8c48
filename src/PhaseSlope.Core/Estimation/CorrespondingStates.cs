using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Estimation;

/// <summary>Corresponding-states vapour-pressure relations in reduced form, ln(Psat/Pc) as a
/// function of Tr = T/Tc and ω, and the acentric factor recovered from one vapour pressure.</summary>
/// <remarks>Coefficients as printed in Poling, Prausnitz &amp; O'Connell, The Properties of Gases
/// and Liquids, 5th ed. (2001), section 7-4 (from memory). Both relations are meant for
/// 0.3 ≲ Tr ≤ 1 and normal (non-associating) fluids; they reproduce vapour pressures of such
/// fluids to a few percent.</remarks>
public static class CorrespondingStates
{
    // The constants of both relations are written here only; CorrespondingStatesForm takes its
    // derivatives from LeeKeslerTerm and AmbroseWaltonSeries.
    // Lee–Kesler, AIChE J. 21, 510 (1975): f_k = c0 + c1/Tr + c2 ln Tr + c3 Tr⁶ (coefficients as
    // printed in the book named in the remarks, from memory).
    private static readonly double[] LeeKesler0 = [5.92714, -6.09648, -1.28862, 0.169347];
    private static readonly double[] LeeKesler1 = [15.2518, -15.6875, -13.4721, 0.43577];

    // Ambrose–Walton, Pure Appl. Chem. 61, 1395 (1989): f_k = (Σ c_i τ^(e_i))/Tr, τ = 1 − Tr
    // (coefficients as printed in the same book, from memory).
    private static readonly double[] AmbroseWaltonExponents = [1, 1.5, 2.5, 5];
    private static readonly double[][] AmbroseWaltonCoefficients =
    [
        [-5.97616, 1.29874, -0.60394, -1.06841],
        [-5.03365, 1.11505, -5.41217, -7.46628],
        [-0.64771, 2.41539, -4.26979, 3.25259],
    ];

    /// <summary>Lee–Kesler: f0 = 5.92714 − 6.09648/Tr − 1.28862 ln Tr + 0.169347 Tr⁶,
    /// f1 = 15.2518 − 15.6875/Tr − 13.4721 ln Tr + 0.43577 Tr⁶; ln Pr = f0 + ω f1.</summary>
    public static (double F0, double F1) LeeKeslerTerms(double reducedTemperature)
        => (LeeKeslerTerm(0, reducedTemperature).Value, LeeKeslerTerm(1, reducedTemperature).Value);

    /// <summary>The Lee–Kesler term f_k (k = 0 or 1) with its first two Tr-derivatives:
    /// f′ = −c1/Tr² + c2/Tr + 6c3 Tr⁵, f″ = 2c1/Tr³ − c2/Tr² + 30c3 Tr⁴.</summary>
    internal static (double Value, double First, double Second) LeeKeslerTerm(int k, double reducedTemperature)
    {
        double[] c = k == 0 ? LeeKesler0 : LeeKesler1;
        double tr = reducedTemperature;
        double value = c[0] + c[1] / tr + c[2] * Math.Log(tr) + c[3] * Math.Pow(tr, 6);
        double first = -c[1] / (tr * tr) + c[2] / tr + 6 * c[3] * Math.Pow(tr, 5);
        double second = 2 * c[1] / (tr * tr * tr) - c[2] / (tr * tr) + 30 * c[3] * Math.Pow(tr, 4);
        return (value, first, second);
    }

    /// <summary>Ambrose–Walton with τ = 1 − Tr:
    /// f0 = (−5.97616τ + 1.29874τ^1.5 − 0.60394τ^2.5 − 1.06841τ⁵)/Tr,
    /// f1 = (−5.03365τ + 1.11505τ^1.5 − 5.41217τ^2.5 − 7.46628τ⁵)/Tr,
    /// f2 = (−0.64771τ + 2.41539τ^1.5 − 4.26979τ^2.5 + 3.25259τ⁵)/Tr; ln Pr = f0 + ω f1 + ω² f2.</summary>
    public static (double F0, double F1, double F2) AmbroseWaltonTerms(double reducedTemperature)
    {
        double tr = reducedTemperature;
        double tau = 1 - tr;
        return (AmbroseWaltonSeries(0, tau).Value / tr, AmbroseWaltonSeries(1, tau).Value / tr, AmbroseWaltonSeries(2, tau).Value / tr);
    }

    /// <summary>The Ambrose–Walton sum g_k(τ) = Σ c_i τ^(e_i) (k = 0, 1, 2; f_k = g_k/Tr) with
    /// its first two τ-derivatives; τ &gt; 0.</summary>
    internal static (double Value, double First, double Second) AmbroseWaltonSeries(int k, double tau)
    {
        double[] c = AmbroseWaltonCoefficients[k];
        double[] e = AmbroseWaltonExponents;
        double g = 0, g1 = 0, g2 = 0;
        for (int i = 0; i < e.Length; i++)
        {
            g += c[i] * Math.Pow(tau, e[i]);
            g1 += c[i] * e[i] * Math.Pow(tau, e[i] - 1);
            g2 += c[i] * e[i] * (e[i] - 1) * Math.Pow(tau, e[i] - 2);
        }

        return (g, g1, g2);
    }

    /// <summary>Lowest reduced temperature of the vapour-pressure point for the relations other
    /// than the definition.</summary>
    /// <remarks>The Lee–Kesler and Ambrose–Walton relations were fitted to vapour pressures of
    /// normal fluids down to about T/Tc = 0.3 (from memory), and Edmister's relation is the
    /// straight line in ln P against 1/T through the critical point and the point at T/Tc = 0.7,
    /// trusted near the normal boiling point (common practice); below 0.3 all three extrapolate
    /// far beyond their data.</remarks>
    public const double LowestReducedTemperature = 0.3;

    /// <summary>The acentric factor from Tc (K), Pc (Pa) and one vapour pressure (T in K, P in Pa).</summary>
    /// <exception cref="InvalidInputException">A non-positive or non-finite input, T not below Tc,
    /// P not below Pc, (for <see cref="AcentricFactorMethod.Definition"/>) T/Tc not 0.7, T/Tc
    /// below <see cref="LowestReducedTemperature"/> for the other methods, or a result outside the
    /// catalog's accepted range −0.5 … 2.</exception>
    public static double AcentricFactor(AcentricFactorMethod method, double criticalTemperature, double criticalPressure, double temperature, double pressure)
    {
        double omega = AcentricFactorUnchecked(method, criticalTemperature, criticalPressure, temperature, pressure);
        if (!(omega >= Fluids.FluidFileParser.AcentricFactorLowest && omega <= Fluids.FluidFileParser.AcentricFactorHighest))
        {
            throw new InvalidInputException("acentric factor", omega,
                $"the {MethodName(method)} estimate of the acentric factor from {Preconditions.Format(pressure)} Pa at {Preconditions.Format(temperature)} K is {Preconditions.Format(omega)}, outside the accepted range {Preconditions.Format(Fluids.FluidFileParser.AcentricFactorLowest)} to {Preconditions.Format(Fluids.FluidFileParser.AcentricFactorHighest)}: check the vapour-pressure point, Tc and Pc");
        }

        return omega;
    }

    private static string MethodName(AcentricFactorMethod method) => method switch
    {
        AcentricFactorMethod.Definition => "definition",
        AcentricFactorMethod.Edmister => "Edmister",
        AcentricFactorMethod.LeeKesler => "Lee-Kesler",
        _ => "Ambrose-Walton",
    };

    private static double AcentricFactorUnchecked(AcentricFactorMethod method, double criticalTemperature, double criticalPressure, double temperature, double pressure)
    {
        Preconditions.Positive(criticalTemperature, "critical temperature");
        Preconditions.Positive(criticalPressure, "critical pressure");
        Preconditions.Positive(temperature, "vapour-pressure temperature");
        Preconditions.Positive(pressure, "vapour pressure");
        double tr = temperature / criticalTemperature;
        double pr = pressure / criticalPressure;
        if (!(tr < 1))
        {
            throw new InvalidInputException("vapour-pressure temperature", temperature,
                $"the vapour-pressure point at {Preconditions.Format(temperature)} K is not below the critical temperature {Preconditions.Format(criticalTemperature)} K");
        }

        if (!(pr < 1))
        {
            throw new InvalidInputException("vapour pressure", pressure,
                $"the vapour pressure {Preconditions.Format(pressure)} Pa is not below the critical pressure {Preconditions.Format(criticalPressure)} Pa");
        }

        if (method != AcentricFactorMethod.Definition && tr < LowestReducedTemperature)
        {
            throw new InvalidInputException("vapour-pressure temperature", temperature,
                $"the {MethodName(method)} relation for the acentric factor holds for T/Tc from {Preconditions.Format(LowestReducedTemperature)} to 1; the vapour-pressure point at {Preconditions.Format(temperature)} K is at T/Tc = {Preconditions.Format(tr)}: give a point between {Preconditions.Format(LowestReducedTemperature * criticalTemperature)} K and {Preconditions.Format(criticalTemperature)} K");
        }

        switch (method)
        {
            case AcentricFactorMethod.Definition:
                // The definition needs the point at Tr = 0.7; allow the rounding of a typed value.
                if (Math.Abs(tr - 0.7) > 5e-4)
                {
                    throw new InvalidInputException("vapour-pressure temperature", temperature,
                        $"the definition of the acentric factor needs the vapour pressure at T/Tc = 0.7 ({Preconditions.Format(0.7 * criticalTemperature)} K), got T/Tc = {Preconditions.Format(tr)}; use edmister, lee-kesler or ambrose-walton for another temperature");
                }

                return -1 - Math.Log10(pr);
            case AcentricFactorMethod.Edmister:
                return 3.0 / 7.0 * tr / (1 - tr) * Math.Log10(1 / pr) - 1;
            case AcentricFactorMethod.LeeKesler:
            {
                var (f0, f1) = LeeKeslerTerms(tr);
                return (Math.Log(pr) - f0) / f1;
            }

            default:
            {
                // ω² f2 + ω f1 + (f0 − ln Pr) = 0; the physical root is the one continuous with
                // the linear (Lee–Kesler-like) solution for small f2.
                var (f0, f1, f2) = AmbroseWaltonTerms(tr);
                double c = f0 - Math.Log(pr);
                double disc = f1 * f1 - 4 * f2 * c;
                if (!(disc >= 0))
                {
                    throw new InvalidInputException("vapour pressure", pressure,
                        $"the Ambrose-Walton relation has no real acentric factor for P/Pc = {Preconditions.Format(pr)} at T/Tc = {Preconditions.Format(tr)}");
                }

                // Numerically stable root of the pair: ω = 2c/(−f1 − sign(f1)·√disc).
                double q = -0.5 * (f1 + Math.Sign(f1) * Math.Sqrt(disc));
                return c / q;
            }
        }
    }
}
