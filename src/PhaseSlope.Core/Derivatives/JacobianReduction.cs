using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Derivatives;

/// <summary>Reduces any first derivative (∂X/∂Y)_Z of T, P, V, U, H, S, A, G to the measurable
/// quantities T, P, v, s, α, κ_T and c_p, symbolically, by the Jacobian form of the
/// change-of-constraint rule in the variables (T, P).</summary>
/// <remarks>
/// (∂X/∂Y)_Z = ∂(X, Z)/∂(Y, Z) = (X_T·Z_P − X_P·Z_T)/(Y_T·Z_P − Y_P·Z_T), with X_T = (∂X/∂T)_P and
/// X_P = (∂X/∂P)_T. The eight pairs follow from dG = −s dT + v dP and the definitions of α, κ_T
/// and c_p (molar quantities):
/// <list type="table">
/// <item><term>T</term><description>(1, 0)</description></item>
/// <item><term>P</term><description>(0, 1)</description></item>
/// <item><term>V</term><description>(v·α, −v·κ_T)</description></item>
/// <item><term>S</term><description>(c_p/T, −v·α) (the second is a Maxwell relation)</description></item>
/// <item><term>H = G + Ts</term><description>(c_p, v − T·v·α)</description></item>
/// <item><term>U = H − Pv</term><description>(c_p − P·v·α, P·v·κ_T − T·v·α)</description></item>
/// <item><term>G</term><description>(−s, v)</description></item>
/// <item><term>A = G − Pv</term><description>(−s − P·v·α, P·v·κ_T)</description></item>
/// </list>
/// The ratio is formed exactly in integer-coefficient polynomials and brought to the canonical
/// form of <see cref="MeasurableExpression"/>: the expression is derived, not looked up.
/// </remarks>
public static class JacobianReduction
{
    private static readonly Polynomial T = Polynomial.Of(MeasurableQuantity.Temperature);
    private static readonly Polynomial P = Polynomial.Of(MeasurableQuantity.Pressure);
    private static readonly Polynomial V = Polynomial.Of(MeasurableQuantity.Volume);
    private static readonly Polynomial S = Polynomial.Of(MeasurableQuantity.Entropy);
    private static readonly Polynomial Alpha = Polynomial.Of(MeasurableQuantity.Expansivity);
    private static readonly Polynomial Kappa = Polynomial.Of(MeasurableQuantity.Compressibility);
    private static readonly Polynomial Cp = Polynomial.Of(MeasurableQuantity.HeatCapacity);
    private static readonly Polynomial One = Polynomial.Constant(1);
    private static readonly Polynomial Zero = Polynomial.Zero;

    /// <summary>(∂<paramref name="of"/>/∂<paramref name="by"/>) at constant <paramref name="hold"/>
    /// in the measurable quantities.</summary>
    /// <exception cref="InvalidInputException">Y = Z (the derivative is undefined).</exception>
    public static MeasurableExpression Reduce(StateVariable of, StateVariable by, StateVariable hold)
    {
        if (by == hold)
        {
            throw new InvalidInputException("hold", double.NaN,
                $"(d{of}/d{by}) at constant {hold} is undefined: the variable held constant must differ from the one varied");
        }

        var x = Partials(of);
        var y = Partials(by);
        var z = Partials(hold);
        return MeasurableExpression.Of(Jacobian(x, z), Jacobian(y, z));
    }

    /// <summary>M·w², the molar mass times the square of the speed of sound, in the measurable
    /// quantities (J/mol): w² = (∂P/∂ρ_mass)_S = −(v²/M)·(∂P/∂v)_S, with (∂P/∂v)_S reduced by
    /// <see cref="Reduce"/>; the result is v·c_p/(κ_T·c_p − T·v·α²) = v/κ_S.</summary>
    public static MeasurableExpression MolarMassTimesSoundSpeedSquared()
    {
        var slope = Reduce(StateVariable.P, StateVariable.V, StateVariable.S);
        return MeasurableExpression.Of(-(V * V) * slope.Numerator, slope.Denominator);
    }

    private static readonly Lazy<IReadOnlyList<Polynomial>> Factors = new(BuildFactors);

    /// <summary>The polynomial factors a reduced ratio can share between its numerator and its
    /// denominator: every Jacobian ∂(A, B)/∂(T, P) of two state variables, made primitive (monomial
    /// and integer content removed). N = ∂(X, Z)/∂(T, P) and D = ∂(Y, Z)/∂(T, P) are built from the
    /// same partials, so what they share is one of these (for example (∂V/∂S)_U, where both carry
    /// ∂(V, S)/∂(T, P)·…); <see cref="MeasurableExpression"/> divides both sides by any that
    /// divides both exactly. Computed from the partials below, not listed by hand.</summary>
    internal static IReadOnlyList<Polynomial> CandidateFactors => Factors.Value;

    private static IReadOnlyList<Polynomial> BuildFactors()
    {
        var variables = Enum.GetValues<StateVariable>();
        var factors = new List<Polynomial>();
        for (int i = 0; i < variables.Length; i++)
        {
            for (int j = i + 1; j < variables.Length; j++)
            {
                var jacobian = Jacobian(Partials(variables[i]), Partials(variables[j]));
                if (jacobian.IsZero)
                {
                    continue;
                }

                jacobian = jacobian.Over(jacobian.MonomialContent());
                jacobian = jacobian.Over(jacobian.IntegerContent());
                if (!jacobian.IsMonomial)
                {
                    factors.Add(jacobian);
                }
            }
        }

        return factors;
    }

    /// <summary>∂(A, B)/∂(T, P) = A_T·B_P − A_P·B_T.</summary>
    private static Polynomial Jacobian((Polynomial DT, Polynomial DP) a, (Polynomial DT, Polynomial DP) b)
        => a.DT * b.DP - a.DP * b.DT;

    /// <summary>((∂X/∂T)_P, (∂X/∂P)_T) in the measurable quantities, as Laurent polynomials
    /// (c_p/T carries T to the power −1).</summary>
    private static (Polynomial DT, Polynomial DP) Partials(StateVariable variable) => variable switch
    {
        StateVariable.T => (One, Zero),
        StateVariable.P => (Zero, One),
        StateVariable.V => (V * Alpha, -(V * Kappa)),
        StateVariable.S => (Cp.Over(Monomial.Of(MeasurableQuantity.Temperature)), -(V * Alpha)),
        StateVariable.H => (Cp, V - T * V * Alpha),
        StateVariable.U => (Cp - P * V * Alpha, P * V * Kappa - T * V * Alpha),
        StateVariable.G => (-S, V),
        StateVariable.A => (-S - P * V * Alpha, P * V * Kappa),
        _ => throw new ArgumentOutOfRangeException(nameof(variable), variable, "not a state variable"),
    };
}
