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
/// </remarks>
public static class PartialDerivatives
{
    /// <summary>Relative size below which the Jacobian ∂(Y, Z)/∂(T, V) counts as zero.</summary>
    private const double SingularJacobian = 1e-13;

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
