using System.Globalization;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Core.Derivatives;

/// <summary>Values of the measurable quantities at one state, each with an optional standard
/// uncertainty: measured by a user, or taken from a model's state.</summary>
public sealed class MeasuredValues
{
    private readonly double?[] _values = new double?[MeasurableQuantities.All.Count];
    private readonly double?[] _uncertainties = new double?[MeasurableQuantities.All.Count];

    /// <summary>Sets a quantity's value (SI) and, optionally, its standard uncertainty (SI, ≥ 0).</summary>
    /// <exception cref="InvalidInputException">A value or uncertainty that is not finite, a negative
    /// uncertainty, or a non-positive T, P, v, κ_T or c_p.</exception>
    public MeasuredValues Set(MeasurableQuantity quantity, double value, double? uncertainty = null)
    {
        string name = MeasurableQuantities.Symbol(quantity);
        if (!double.IsFinite(value))
        {
            throw new InvalidInputException(name, value, $"{name} must be a finite number");
        }

        bool positive = quantity is not (MeasurableQuantity.Entropy or MeasurableQuantity.Expansivity);
        if (positive && !(value > 0))
        {
            throw new InvalidInputException(name, value, string.Create(CultureInfo.InvariantCulture,
                $"{name} = {value:G6} {MeasurableQuantities.Unit(quantity)} must be positive"));
        }

        if (uncertainty is double u && !(u >= 0 && double.IsFinite(u)))
        {
            throw new InvalidInputException(name, u, $"the uncertainty of {name} must be a finite number >= 0");
        }

        _values[(int)quantity] = value;
        _uncertainties[(int)quantity] = uncertainty;
        return this;
    }

    /// <summary>The value of a quantity, or null when not given.</summary>
    public double? Value(MeasurableQuantity quantity) => _values[(int)quantity];

    /// <summary>The standard uncertainty of a quantity, or null when not given.</summary>
    public double? Uncertainty(MeasurableQuantity quantity) => _uncertainties[(int)quantity];

    /// <summary>The model's T, P, v, α, κ_T, c_p and (when the fluid has cp°) s at a single-phase state.</summary>
    /// <exception cref="InvalidInputException">The state is mechanically unstable (α, κ_T undefined).</exception>
    public static MeasuredValues FromState(ThermodynamicState state)
    {
        ArgumentNullException.ThrowIfNull(state);
        var values = new MeasuredValues()
            .Set(MeasurableQuantity.Temperature, state.Temperature)
            .Set(MeasurableQuantity.Pressure, state.Pressure)
            .Set(MeasurableQuantity.Volume, state.MolarVolume);
        if (state.IsobaricExpansivity is double alpha && state.IsothermalCompressibility is double kappa)
        {
            values.Set(MeasurableQuantity.Expansivity, alpha).Set(MeasurableQuantity.Compressibility, kappa);
        }

        if (state.IsobaricHeatCapacity is double cp)
        {
            values.Set(MeasurableQuantity.HeatCapacity, cp);
        }

        if (state.Entropy is double s)
        {
            values.Set(MeasurableQuantity.Entropy, s);
        }

        return values;
    }

    /// <summary>The expression's value and its first-order propagated standard uncertainty,
    /// u² = Σ (∂f/∂x_i · u_i)² over the quantities given with an uncertainty (the inputs taken as
    /// uncorrelated).</summary>
    /// <exception cref="InvalidInputException">The expression needs a quantity that was not given
    /// (named, with what it is).</exception>
    public (double Value, double? Uncertainty) Evaluate(MeasurableExpression expression)
    {
        ArgumentNullException.ThrowIfNull(expression);
        var missing = expression.Quantities.Where(q => _values[(int)q] is null).ToList();
        if (missing.Count > 0)
        {
            throw new InvalidInputException(MeasurableQuantities.Symbol(missing[0]), double.NaN,
                $"{expression.Text} needs {string.Join(", ", missing.Select(Describe))}, which {(missing.Count == 1 ? "was" : "were")} not given");
        }

        Span<double> values = stackalloc double[_values.Length];
        for (int i = 0; i < values.Length; i++)
        {
            values[i] = _values[i] ?? 0; // quantities the expression does not use
        }

        double value = expression.Evaluate(values);
        double? variance = null;
        foreach (var quantity in expression.Quantities)
        {
            if (_uncertainties[(int)quantity] is double u)
            {
                double part = expression.Sensitivity(quantity, values) * u;
                variance = (variance ?? 0) + part * part;
            }
        }

        return (value, variance is double v ? Math.Sqrt(v) : null);
    }

    /// <summary>What a quantity is, for messages: "the absolute molar entropy s (J/(mol K))".</summary>
    public static string Describe(MeasurableQuantity quantity) => quantity switch
    {
        MeasurableQuantity.Temperature => "the temperature T (K)",
        MeasurableQuantity.Pressure => "the pressure P (Pa)",
        MeasurableQuantity.Volume => "the molar volume v (m3/mol)",
        MeasurableQuantity.Entropy => "the absolute molar entropy s (J/(mol K)), on a stated reference",
        MeasurableQuantity.Expansivity => "the isobaric expansivity alpha (1/K)",
        MeasurableQuantity.Compressibility => "the isothermal compressibility kappa_T (1/Pa)",
        _ => "the molar isobaric heat capacity cp (J/(mol K))",
    };
}
