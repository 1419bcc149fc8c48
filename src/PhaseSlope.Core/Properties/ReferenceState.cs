namespace PhaseSlope.Core.Properties;

/// <summary>The convention that fixes the zero of enthalpy and entropy. Differences (latent
/// heats, jumps, derivatives) never depend on it; absolute h, s, u, a and g do.</summary>
/// <remarks>
/// The trade's conventions:
/// <list type="bullet">
/// <item><see cref="IdealGas"/> (the default): h = 0 and s = 0 for the ideal gas at 298.15 K and 1 bar;</item>
/// <item><see cref="NormalBoilingPoint"/>: h = 0 and s = 0 for the saturated liquid at 101325 Pa;</item>
/// <item><see cref="Refrigeration"/>: h = 200 kJ/kg and s = 1 kJ/(kg·K) for the saturated liquid at 0 °C
/// (the International Institute of Refrigeration convention);</item>
/// <item><see cref="MinusForty"/>: h = 0 and s = 0 for the saturated liquid at −40 °C (the convention of
/// North American refrigeration tables);</item>
/// <item><see cref="Custom"/>: given h and s at a given single-phase state, or for the saturated
/// liquid at a given temperature.</item>
/// </list>
/// </remarks>
public sealed record ReferenceState
{
    private ReferenceState(string id, string description, ReferenceAnchor anchor, double? temperature, double? pressure, double enthalpy, double entropy, bool perMass)
    {
        Id = id;
        Description = description;
        Anchor = anchor;
        Temperature = temperature;
        Pressure = pressure;
        Enthalpy = enthalpy;
        Entropy = entropy;
        PerMass = perMass;
    }

    /// <summary>Ideal-gas temperature of the ideal-gas convention, K.</summary>
    public const double IdealGasTemperature = 298.15;

    /// <summary>Ideal-gas pressure of the ideal-gas convention, Pa (1 bar).</summary>
    public const double IdealGasPressure = 1e5;

    /// <summary>Short identifier used on the command line and in reports.</summary>
    public string Id { get; }

    /// <summary>Readable description.</summary>
    public string Description { get; }

    /// <summary>What kind of state anchors the convention.</summary>
    public ReferenceAnchor Anchor { get; }

    /// <summary>Anchor temperature in K; null for the normal boiling point, which the model solves for.</summary>
    public double? Temperature { get; }

    /// <summary>Anchor pressure in Pa for ideal-gas and single-phase anchors; null for saturated-liquid anchors
    /// other than the normal boiling point.</summary>
    public double? Pressure { get; }

    /// <summary>Enthalpy at the anchor: J/mol, or J/kg when <see cref="PerMass"/>.</summary>
    public double Enthalpy { get; }

    /// <summary>Entropy at the anchor: J/(mol·K), or J/(kg·K) when <see cref="PerMass"/>.</summary>
    public double Entropy { get; }

    /// <summary>True when <see cref="Enthalpy"/> and <see cref="Entropy"/> are per kilogram.</summary>
    public bool PerMass { get; }

    /// <summary>h = s = 0 for the ideal gas at 298.15 K and 1 bar (the default).</summary>
    public static ReferenceState IdealGas { get; } = new("ideal-gas", "ideal gas at 298.15 K and 1 bar: h = 0, s = 0",
        ReferenceAnchor.IdealGas, IdealGasTemperature, IdealGasPressure, 0, 0, false);

    /// <summary>h = s = 0 for the saturated liquid at the normal boiling point (101325 Pa).</summary>
    public static ReferenceState NormalBoilingPoint { get; } = new("nbp", "saturated liquid at the normal boiling point: h = 0, s = 0",
        ReferenceAnchor.SaturatedLiquid, null, Constants.StandardAtmosphere, 0, 0, false);

    /// <summary>h = 200 kJ/kg, s = 1 kJ/(kg·K) for the saturated liquid at 0 °C.</summary>
    public static ReferenceState Refrigeration { get; } = new("refrigeration", "saturated liquid at 0 degC: h = 200 kJ/kg, s = 1 kJ/(kg K)",
        ReferenceAnchor.SaturatedLiquid, 273.15, null, 200e3, 1e3, true);

    /// <summary>h = s = 0 for the saturated liquid at −40 °C.</summary>
    public static ReferenceState MinusForty { get; } = new("minus40", "saturated liquid at -40 degC: h = 0, s = 0",
        ReferenceAnchor.SaturatedLiquid, 233.15, null, 0, 0, false);

    /// <summary>The built-in conventions, default first.</summary>
    public static IReadOnlyList<ReferenceState> Conventions { get; } = [IdealGas, NormalBoilingPoint, Refrigeration, MinusForty];

    /// <summary>A user-defined reference: molar <paramref name="enthalpy"/> (J/mol) and
    /// <paramref name="entropy"/> (J/(mol·K)) at the stable single-phase state (T, P), or at the
    /// saturated liquid at T when <paramref name="pressure"/> is null.</summary>
    public static ReferenceState Custom(double temperature, double? pressure, double enthalpy, double entropy)
    {
        Preconditions.Positive(temperature, "reference temperature");
        if (pressure is double p)
        {
            Preconditions.Positive(p, "reference pressure");
        }

        Preconditions.Finite(enthalpy, "reference enthalpy");
        Preconditions.Finite(entropy, "reference entropy");
        string where = pressure is double pp
            ? $"state at {Preconditions.Format(temperature)} K and {Preconditions.Format(pp)} Pa"
            : $"saturated liquid at {Preconditions.Format(temperature)} K";
        return new ReferenceState("custom", $"{where}: h = {Preconditions.Format(enthalpy)} J/mol, s = {Preconditions.Format(entropy)} J/(mol K)",
            pressure is null ? ReferenceAnchor.SaturatedLiquid : ReferenceAnchor.SinglePhase, temperature, pressure, enthalpy, entropy, false);
    }

    /// <summary>Finds a built-in convention by <see cref="Id"/>, case-insensitively.</summary>
    public static bool TryFind(string id, out ReferenceState? reference)
    {
        reference = Conventions.FirstOrDefault(c => string.Equals(c.Id, id, StringComparison.OrdinalIgnoreCase));
        return reference is not null;
    }
}
