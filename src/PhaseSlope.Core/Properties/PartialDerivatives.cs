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
        double scale = Math.Abs(y.DT * z.DV) + Math.Abs(y.DV * z.DT);
        if (!(Math.Abs(denominator) > SingularJacobian * scale))
        {
            throw new InvalidInputException("by", double.NaN,
                $"(d{of}/d{by}) at constant {hold} is undefined at this state: {by} cannot vary while {hold} is held (the Jacobian d({by},{hold})/d(T,V) vanishes)");
        }

        return numerator / denominator;
    }

    /// <summary>The SI unit of (∂X/∂Y)_Z on a molar basis, e.g. "Pa/K" or "(J/mol)/Pa".</summary>
    public static string Unit(StateVariable of, StateVariable by)
    {
        string top = UnitOf(of);
        string bottom = UnitOf(by);
        if (top == bottom)
        {
            return "1";
        }

        return $"{Wrap(top)}/{Wrap(bottom)}";

        static string Wrap(string unit) => unit.Contains('/', StringComparison.Ordinal) ? $"({unit})" : unit;
    }

    /// <summary>The SI unit of a state variable on a molar basis.</summary>
    public static string UnitOf(StateVariable variable) => variable switch
    {
        StateVariable.T => "K",
        StateVariable.P => "Pa",
        StateVariable.V => "m3/mol",
        StateVariable.S => "J/(mol K)",
        _ => "J/mol",
    };
}
