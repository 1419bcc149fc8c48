using PhaseSlope.Core.Errors;

namespace PhaseSlope.Core.Properties;

/// <summary>Any first partial derivative (∂X/∂Y)_Z of the molar state functions T, P, V, U,
/// H, S, A, G at a state, exactly, through Jacobians in the natural variables (T, V) of the
/// Helmholtz energy.</summary>
/// <remarks>
/// (∂X/∂Y)_Z = ∂(X, Z)/∂(Y, Z) = (X_T·Z_V − X_V·Z_T)/(Y_T·Z_V − Y_V·Z_T), where X_T = (∂X/∂T)_V
/// and X_V = (∂X/∂V)_T come from <see cref="ThermodynamicState.Partials"/>. This one formula is
/// the change-of-constraint rule (∂X/∂Y)_Z = (∂X/∂Y)_W + (∂X/∂W)_Y·(∂W/∂Y)_Z with W = V, and it
/// contains the cyclic rule and the Maxwell relations as special cases.
/// <para>Without the fluid's ideal-gas heat capacity cp°, cv and the absolute entropy s are
/// unknown. Every (∂X/∂T)_V is linear in them (<see cref="ThermodynamicState.SplitPartials"/>) and
/// no (∂X/∂V)_T contains them, so the numerator N and the denominator D of the Jacobian ratio are
/// linear in (cv, s): N = n0 + n1·cv + n2·s, D = d0 + d1·cv + d2·s. The derivative does not need
/// cp° exactly when N/D is the same for every (cv, s), that is when the coefficient vectors
/// (n0, n1, n2) and (d0, d1, d2) are parallel; then it is n·d/(d·d). So (∂U/∂V)_T = T·P_T − P,
/// (∂H/∂S)_P = T and (∂H/∂P)_S = V are computed, while (∂T/∂P)_S, (∂H/∂T)_P = cp and
/// (∂G/∂T)_P = −s are refused (<see cref="NeedsIdealGas"/>). The decision is computed from the
/// expression, not looked up in a list.</para>
/// </remarks>
public static class PartialDerivatives
{
    /// <summary>Relative size below which the Jacobian ∂(Y, Z)/∂(T, V) counts as zero.</summary>
    private const double SingularJacobian = 1e-13;

    /// <summary>Relative size of the cross products n_i·d_j − n_j·d_i below which the coefficient
    /// vectors of N and D count as parallel (the derivative then does not depend on cv or s).</summary>
    /// <remarks>For the exact identities ((∂H/∂S)_P = T, (∂H/∂P)_S = V) the coefficients are formed
    /// with a few roundings each, one of them a cancellation such as P_T − T·P_T/T, so the cross
    /// products come out near 1e-16 relative; 1e-10 leaves six orders of margin for that. A
    /// derivative that does depend on cv or s has exactly zero coefficients on one side or cross
    /// products far larger: the weakest dependence measured (WithoutIdealGasTests' states, all 448
    /// derivatives) is (∂P/∂G)_A of liquid water at 400 K and 1 MPa, whose value moves by 2.8e-8
    /// relative when cv and s change by tens of percent, against at most 1.7e-13 (rounding) for
    /// every derivative computed without cp°.</remarks>
    private const double Parallel = 1e-10;

    /// <summary>(∂<paramref name="of"/>/∂<paramref name="by"/>) at constant <paramref name="hold"/>, SI molar units.</summary>
    /// <exception cref="InvalidInputException">Y = Z, or the derivative is undefined at the state
    /// (the Jacobian ∂(Y, Z)/∂(T, V) vanishes there, as at a spinodal or the critical point for
    /// derivatives at constant T taken with respect to P).</exception>
    public static double Of(ThermodynamicState state, StateVariable of, StateVariable by, StateVariable hold)
    {
        ArgumentNullException.ThrowIfNull(state);
        if (by == hold)
        {
            throw new InvalidInputException("hold", double.NaN,
                $"(d{of}/d{by}) at constant {hold} is undefined: the variable held constant must differ from the one varied");
        }

        if (state.IsochoricHeatCapacity is null || state.Entropy is null)
        {
            return WithoutIdealGas(state, of, by, hold);
        }

        var x = state.Partials(of);
        var y = state.Partials(by);
        var z = state.Partials(hold);
        double numerator = x.DT * z.DV - x.DV * z.DT;
        double denominator = y.DT * z.DV - y.DV * z.DT;
        // The rounding error of a partial is set by the size of the terms it is computed from, not
        // by its value: at the critical point P_V is a cancellation of terms of order RT/V² and
        // comes out as rounding noise, which the products of the partials alone cannot reveal.
        // Each partial is therefore padded by its natural magnitude before forming the scale.
        var ry = NaturalMagnitude(state, by);
        var rz = NaturalMagnitude(state, hold);
        double scale = (Math.Abs(y.DT) + ry.DT) * (Math.Abs(z.DV) + rz.DV) + (Math.Abs(y.DV) + ry.DV) * (Math.Abs(z.DT) + rz.DT);
        if (!(Math.Abs(denominator) > SingularJacobian * scale))
        {
            throw new InvalidInputException("by", double.NaN,
                $"(d{of}/d{by}) at constant {hold} is undefined at this state: {by} cannot vary while {hold} is held (the Jacobian d({by},{hold})/d(T,V) vanishes)");
        }

        return numerator / denominator;
    }

    /// <summary>Whether (∂<paramref name="of"/>/∂<paramref name="by"/>) at constant
    /// <paramref name="hold"/> needs cv or the absolute entropy, and so the fluid's ideal-gas heat
    /// capacity cp° (see the remarks on <see cref="PartialDerivatives"/>).</summary>
    public static bool NeedsIdealGas(ThermodynamicState state, StateVariable of, StateVariable by, StateVariable hold)
    {
        ArgumentNullException.ThrowIfNull(state);
        var (n, d) = Coefficients(state, of, by, hold);
        return Depends(n) || Depends(d) ? !AreParallel(n, d) : false;
    }

    /// <summary>The coefficients (n0, n1·R, n2·R) and (d0, d1·R, d2·R) of N and D in (cv, s); the
    /// factor R makes the three of like size.</summary>
    private static ((double, double, double) N, (double, double, double) D) Coefficients(ThermodynamicState state, StateVariable of, StateVariable by, StateVariable hold)
    {
        const double r = Constants.GasConstant;
        var x = state.SplitPartials(of);
        var y = state.SplitPartials(by);
        var z = state.SplitPartials(hold);
        (double, double, double) Jacobian((double DT, double DTPerCv, double DTPerEntropy, double DV) a)
            => (a.DT * z.DV - a.DV * z.DT, r * (a.DTPerCv * z.DV - a.DV * z.DTPerCv), r * (a.DTPerEntropy * z.DV - a.DV * z.DTPerEntropy));
        return (Jacobian(x), Jacobian(y));
    }

    private static bool Depends((double C0, double C1, double C2) c) => c.C1 != 0 || c.C2 != 0;

    private static bool AreParallel((double, double, double) n, (double, double, double) d)
    {
        double[] a = [n.Item1, n.Item2, n.Item3];
        double[] b = [d.Item1, d.Item2, d.Item3];
        for (int i = 0; i < 3; i++)
        {
            for (int j = i + 1; j < 3; j++)
            {
                double cross = a[i] * b[j] - a[j] * b[i];
                double size = Math.Abs(a[i] * b[j]) + Math.Abs(a[j] * b[i]);
                if (Math.Abs(cross) > Parallel * size)
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>The derivative at a state without cp°: computed when it does not depend on cv or s.</summary>
    private static double WithoutIdealGas(ThermodynamicState state, StateVariable of, StateVariable by, StateVariable hold)
    {
        var (n, d) = Coefficients(state, of, by, hold);
        double dd = d.Item1 * d.Item1 + d.Item2 * d.Item2 + d.Item3 * d.Item3;
        if (Depends(n) || Depends(d))
        {
            if (!AreParallel(n, d) || dd == 0)
            {
                throw new InvalidInputException("of", double.NaN,
                    $"(d{of}/d{by}) at constant {hold} needs the isochoric heat capacity cv or the absolute entropy, and so the ideal-gas heat capacity cp°: {state.IdealGasUnavailableReason}");
            }
        }

        // The same singular-Jacobian guard as with cp°, with the unknown parts padded by their
        // natural size R (they are multiplied by structural zeros when D does not contain them).
        const double r = Constants.GasConstant;
        var ys = state.SplitPartials(by);
        var zs = state.SplitPartials(hold);
        var ry = NaturalMagnitude(state, by);
        var rz = NaturalMagnitude(state, hold);
        double yt = Math.Abs(ys.DT) + r * (Math.Abs(ys.DTPerCv) + Math.Abs(ys.DTPerEntropy));
        double zt = Math.Abs(zs.DT) + r * (Math.Abs(zs.DTPerCv) + Math.Abs(zs.DTPerEntropy));
        double scale = (yt + ry.DT) * (Math.Abs(zs.DV) + rz.DV) + (Math.Abs(ys.DV) + ry.DV) * (zt + rz.DT);
        if (!(Math.Sqrt(dd) > SingularJacobian * scale))
        {
            throw new InvalidInputException("by", double.NaN,
                $"(d{of}/d{by}) at constant {hold} is undefined at this state: {by} cannot vary while {hold} is held (the Jacobian d({by},{hold})/d(T,V) vanishes)");
        }

        return Depends(n) || Depends(d)
            ? (n.Item1 * d.Item1 + n.Item2 * d.Item2 + n.Item3 * d.Item3) / dd
            : n.Item1 / d.Item1;
    }

    /// <summary>Natural magnitudes of (∂X/∂T)_V and (∂X/∂V)_T, the sizes of the terms each partial
    /// is computed from: P ~ RT/V, energies ~ RT, S ~ R; 0 for T and V, whose partials are exact.</summary>
    private static (double DT, double DV) NaturalMagnitude(ThermodynamicState state, StateVariable variable)
    {
        const double r = Constants.GasConstant;
        double t = state.Temperature;
        double v = state.MolarVolume;
        return variable switch
        {
            StateVariable.T or StateVariable.V => (0, 0),
            StateVariable.P => (r / v, r * t / (v * v)),
            StateVariable.S => (r / t, r / v),
            _ => (r, r * t / v),
        };
    }

    /// <summary>The SI unit of (∂X/∂Y)_Z on a molar basis, simplified: "Pa/K", "Pa" for
    /// (∂U/∂V)_T, "J/(mol K)" for (∂H/∂T)_P, "1" for a ratio of like quantities.</summary>
    public static string Unit(StateVariable of, StateVariable by)
    {
        var x = Dimension(of);
        var y = Dimension(by);
        return Format(x.Pa - y.Pa, x.M3 - y.M3, x.Mol - y.Mol, x.K - y.K);
    }

    /// <summary>The SI unit of a state variable on a molar basis.</summary>
    public static string UnitOf(StateVariable variable)
    {
        var d = Dimension(variable);
        return Format(d.Pa, d.M3, d.Mol, d.K);
    }

    /// <summary>Exponents of Pa, m³, mol and K (J = Pa·m³).</summary>
    private static (int Pa, int M3, int Mol, int K) Dimension(StateVariable variable) => variable switch
    {
        StateVariable.T => (0, 0, 0, 1),
        StateVariable.P => (1, 0, 0, 0),
        StateVariable.V => (0, 1, -1, 0),
        StateVariable.S => (1, 1, -1, -1),
        _ => (1, 1, -1, 0),
    };

    private static string Format(int pa, int m3, int mol, int k)
    {
        // Pa·m³ pairs print as J.
        int joule = pa > 0 && m3 > 0 ? Math.Min(pa, m3) : pa < 0 && m3 < 0 ? -Math.Min(-pa, -m3) : 0;
        pa -= joule;
        m3 -= joule;
        var top = new List<string>();
        var bottom = new List<string>();
        void Add(string symbol, int power)
        {
            if (power == 0)
            {
                return;
            }

            var side = power > 0 ? top : bottom;
            int p = Math.Abs(power);
            side.Add(p == 1 ? symbol : $"{symbol}^{p}");
        }

        Add("J", joule);
        Add("Pa", pa);
        Add("m3", m3);
        Add("mol", mol);
        Add("K", k);
        string numerator = top.Count == 0 ? "1" : string.Join(" ", top);
        return bottom.Count switch
        {
            0 => numerator,
            1 => $"{numerator}/{bottom[0]}",
            _ => $"{numerator}/({string.Join(" ", bottom)})",
        };
    }
}
