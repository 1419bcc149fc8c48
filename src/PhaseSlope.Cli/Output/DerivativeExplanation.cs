using PhaseSlope.Core.Derivatives;
using PhaseSlope.Core.Models;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Output;

/// <summary>One quantity of an explanation: its symbol, what it is, its value (null when the
/// state does not give it, with the reason), its standard uncertainty (measured values) and unit.</summary>
internal sealed record DerivativeTerm(string Symbol, string Description, double? Value, double? Uncertainty, string Unit, string? UnavailableReason);

/// <summary>A derivative written in measurable quantities and evaluated term by term: the
/// canonical text (docs/derivatives.md), the quantities and the value through the expression.</summary>
/// <param name="Text">The plain-text expression.</param>
/// <param name="Terms">Each quantity it uses.</param>
/// <param name="Value">Its value through the expression, or null when a quantity is unavailable.</param>
/// <param name="Origin">How the expression was obtained, for the reader.</param>
internal sealed record DerivativeExplanation(string Text, IReadOnlyList<DerivativeTerm> Terms, double? Value, string Origin)
{
    /// <summary>The measurable quantities the state does not give (c_p and s without the fluid's
    /// c_p°), each with the reason, whether or not this expression uses them.</summary>
    public IReadOnlyList<DerivativeTerm> Unavailable { get; init; } = [];

    /// <summary>The origin of a first derivative's expression.</summary>
    public const string Reduced = "derived by the Jacobian reduction in (T, P) and brought to canonical form (docs/derivatives.md)";

    /// <summary>A first derivative through its reduced expression, with the model's own values.</summary>
    public static DerivativeExplanation FromState(ThermodynamicState state, MeasurableExpression expression)
    {
        var values = MeasuredValues.FromState(state);
        var terms = expression.Quantities.Select(q => Term(q, values.Value(q), null, values.Value(q) is null ? ReasonUnavailable(state, q) : null)).ToList();
        double? value = terms.All(t => t.Value is not null) ? values.Evaluate(expression).Value : null;
        if (value is double through && !double.IsFinite(through))
        {
            // A vanishing denominator at this state (the Jacobian route refuses it first).
            value = null;
        }

        var unavailable = MeasurableQuantities.All.Where(q => values.Value(q) is null).Select(q => Term(q, null, null, ReasonUnavailable(state, q))).ToList();
        return new(expression.Text, terms, value, Reduced) { Unavailable = unavailable };
    }

    /// <summary>(∂c_p/∂P)_T = −T·v·(α² + (∂α/∂T)_P) with the model's values.</summary>
    public static DerivativeExplanation CpByPressure(IResidualModel model, ThermodynamicState state)
    {
        double alpha = state.IsobaricExpansivity ?? double.NaN;
        double slope = SecondDerivatives.ExpansivityByTemperature(model, state);
        double value = -state.Temperature * state.MolarVolume * (alpha * alpha + slope);
        return new("-T*v*(alpha^2 + dalpha_dT)",
            [
                Term(MeasurableQuantity.Temperature, state.Temperature, null, null),
                Term(MeasurableQuantity.Volume, state.MolarVolume, null, null),
                Term(MeasurableQuantity.Expansivity, alpha, null, null),
                new("dalpha_dT", "(dalpha/dT)_P, the temperature slope of the expansivity", slope, null, "1/K^2", null),
            ],
            value, "from (dcp/dP)_T = -T*(d2v/dT2)_P (a Maxwell relation), exact from the model's Helmholtz derivatives");
    }

    /// <summary>(∂c_v/∂V)_T = T·(∂²P/∂T²)_V with the model's values.</summary>
    public static DerivativeExplanation CvByVolume(IResidualModel model, ThermodynamicState state)
    {
        double curvature = SecondDerivatives.PressureByTemperatureSquared(model, state);
        return new("T*d2P_dT2",
            [
                Term(MeasurableQuantity.Temperature, state.Temperature, null, null),
                new("d2P_dT2", "(d2P/dT2)_V, the curvature of an isochore", curvature, null, "Pa/K^2", null),
            ],
            state.Temperature * curvature, "from (dcv/dV)_T = T*(d2P/dT2)_V (a Maxwell relation), exact from the model's Helmholtz derivatives");
    }

    /// <summary>A term of a measurable quantity.</summary>
    public static DerivativeTerm Term(MeasurableQuantity quantity, double? value, double? uncertainty, string? reason)
        => new(MeasurableQuantities.Symbol(quantity), MeasuredValues.Describe(quantity), value, uncertainty, MeasurableQuantities.Unit(quantity), reason);

    private static string ReasonUnavailable(ThermodynamicState state, MeasurableQuantity quantity) => quantity switch
    {
        MeasurableQuantity.Entropy or MeasurableQuantity.HeatCapacity when state.IdealGasUnavailableReason is string reason => reason,
        MeasurableQuantity.Expansivity or MeasurableQuantity.Compressibility => state.UndefinedReason ?? "undefined at this state (mechanically unstable)",
        _ => state.UndefinedReason ?? "undefined at this state",
    };

    /// <summary>The plain text in a readable Unicode form for tables: T·α/κT − P.</summary>
    public static string Readable(string text)
    {
        var s = new System.Text.StringBuilder(text
            .Replace("dalpha_dT", "(∂α/∂T)_P", StringComparison.Ordinal)
            .Replace("d2P_dT2", "(∂²P/∂T²)_V", StringComparison.Ordinal)
            .Replace("kappa_T", "κT", StringComparison.Ordinal)
            .Replace("alpha", "α", StringComparison.Ordinal)
            .Replace("*", "·", StringComparison.Ordinal)
            .Replace(" - ", " − ", StringComparison.Ordinal));
        if (s.Length > 0 && s[0] == '-')
        {
            s[0] = '−';
        }

        string result = s.ToString().Replace("(-", "(−", StringComparison.Ordinal);
        return System.Text.RegularExpressions.Regex.Replace(result, @"\^([0-9]+)",
            m => string.Concat(m.Groups[1].Value.Select(c => "⁰¹²³⁴⁵⁶⁷⁸⁹"[c - '0'])));
    }
}
