namespace PhaseSlope.Core.Derivatives;

/// <summary>The quantities every first derivative of T, P, V, U, H, S, A, G reduces to: the state
/// (T, P, v and, where needed, the absolute entropy s) and the three measurable response functions
/// α = (1/v)(∂v/∂T)_P, κ_T = −(1/v)(∂v/∂P)_T and c_p = (∂h/∂T)_P (molar).</summary>
public enum MeasurableQuantity
{
    /// <summary>Temperature T, K.</summary>
    Temperature,

    /// <summary>Pressure P, Pa.</summary>
    Pressure,

    /// <summary>Molar volume v, m³/mol.</summary>
    Volume,

    /// <summary>Absolute molar entropy s, J/(mol·K): needed only by derivatives of A and G.</summary>
    Entropy,

    /// <summary>Isobaric expansivity α, 1/K.</summary>
    Expansivity,

    /// <summary>Isothermal compressibility κ_T, 1/Pa.</summary>
    Compressibility,

    /// <summary>Molar isobaric heat capacity c_p, J/(mol·K).</summary>
    HeatCapacity,
}

/// <summary>Names and units of the measurable quantities in the expression notation.</summary>
public static class MeasurableQuantities
{
    /// <summary>All quantities, in the order symbols are written within a term.</summary>
    public static IReadOnlyList<MeasurableQuantity> All { get; } = Enum.GetValues<MeasurableQuantity>();

    /// <summary>The quantity's symbol in the plain-text notation (docs/derivatives.md): T, P, v, s,
    /// alpha, kappa_T, cp.</summary>
    public static string Symbol(MeasurableQuantity quantity) => quantity switch
    {
        MeasurableQuantity.Temperature => "T",
        MeasurableQuantity.Pressure => "P",
        MeasurableQuantity.Volume => "v",
        MeasurableQuantity.Entropy => "s",
        MeasurableQuantity.Expansivity => "alpha",
        MeasurableQuantity.Compressibility => "kappa_T",
        _ => "cp",
    };

    /// <summary>The SI unit of the quantity (molar basis).</summary>
    public static string Unit(MeasurableQuantity quantity) => quantity switch
    {
        MeasurableQuantity.Temperature => "K",
        MeasurableQuantity.Pressure => "Pa",
        MeasurableQuantity.Volume => "m3/mol",
        MeasurableQuantity.Entropy or MeasurableQuantity.HeatCapacity => "J/(mol K)",
        MeasurableQuantity.Expansivity => "1/K",
        _ => "1/Pa",
    };

    /// <summary>The quantity written <paramref name="symbol"/>, or null.</summary>
    public static MeasurableQuantity? FromSymbol(string symbol)
    {
        foreach (var quantity in All)
        {
            if (Symbol(quantity) == symbol)
            {
                return quantity;
            }
        }

        return null;
    }
}
