using System.Text.Json;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Properties;

namespace PhaseSlope.Cli.Output;

/// <summary>The one list of single-phase properties that the state JSON, the state table and
/// the per-phase objects of coexistence JSON share.</summary>
internal static class StateColumns
{
    /// <summary>A property of a state: SI key, title, display quantity (null: dimensionless), SI value
    /// (null where undefined, e.g. cp at the critical point, or unavailable without cp°).</summary>
    public sealed record Column(string Key, string Title, DisplayQuantity? Quantity, Func<ThermodynamicState, double?> Value);

    /// <summary>The table text of a property that needs the ideal-gas heat capacity the fluid does
    /// not give; the table explains it in a note (<see cref="IdealGasNote"/>).</summary>
    public const string Unavailable = "n/a";

    /// <summary>All properties in output order.</summary>
    public static IReadOnlyList<Column> All { get; } =
    [
        new("temperature_K", "temperature", DisplayQuantity.Temperature, s => s.Temperature),
        new("pressure_Pa", "pressure", DisplayQuantity.Pressure, s => s.Pressure),
        new("density_mol_m3", "density", DisplayQuantity.Density, s => s.Density),
        new("molar_volume_m3_mol", "molar volume", DisplayQuantity.MolarVolume, s => s.MolarVolume),
        new("compressibility_factor", "compressibility factor", null, s => s.CompressibilityFactor),
        new("internal_energy_J_mol", "internal energy u", DisplayQuantity.MolarEnergy, s => s.InternalEnergy),
        new("enthalpy_J_mol", "enthalpy h", DisplayQuantity.MolarEnergy, s => s.Enthalpy),
        new("entropy_J_molK", "entropy s", DisplayQuantity.MolarEntropy, s => s.Entropy),
        new("helmholtz_energy_J_mol", "Helmholtz energy a", DisplayQuantity.MolarEnergy, s => s.HelmholtzEnergy),
        new("gibbs_energy_J_mol", "Gibbs energy g", DisplayQuantity.MolarEnergy, s => s.GibbsEnergy),
        new("isobaric_heat_capacity_J_molK", "isobaric heat capacity cp", DisplayQuantity.MolarEntropy, s => s.IsobaricHeatCapacity),
        new("isochoric_heat_capacity_J_molK", "isochoric heat capacity cv", DisplayQuantity.MolarEntropy, s => s.IsochoricHeatCapacity),
        new("heat_capacity_difference_J_molK", "cp - cv", DisplayQuantity.MolarEntropy, s => s.HeatCapacityDifference),
        new("ideal_gas_heat_capacity_J_molK", "ideal-gas heat capacity cp0", DisplayQuantity.MolarEntropy, s => s.IdealGasHeatCapacity),
        new("heat_capacity_ratio", "heat capacity ratio cp/cv", null, s => s.HeatCapacityRatio),
        new("isentropic_exponent", "isentropic exponent -(v/P)(dP/dv)_s", null, s => s.IsentropicExponent),
        new("speed_of_sound_m_s", "speed of sound", DisplayQuantity.Speed, s => s.SpeedOfSound),
        new("isobaric_expansivity_1_K", "isobaric expansivity", DisplayQuantity.Expansivity, s => s.IsobaricExpansivity),
        new("isothermal_compressibility_1_Pa", "isothermal compressibility", DisplayQuantity.Compressibility, s => s.IsothermalCompressibility),
        new("isentropic_compressibility_1_Pa", "isentropic compressibility", DisplayQuantity.Compressibility, s => s.IsentropicCompressibility),
        new("joule_thomson_coefficient_K_Pa", "Joule-Thomson coefficient", DisplayQuantity.JouleThomson, s => s.JouleThomsonCoefficient),
        new("internal_pressure_Pa", "internal pressure (dU/dV)_T", DisplayQuantity.Pressure, s => s.InternalPressure),
        new("ln_fugacity_coefficient", "ln fugacity coefficient", null, s => s.LnFugacityCoefficient),
        new("residual_enthalpy_J_mol", "residual enthalpy", DisplayQuantity.MolarEnergy, s => s.ResidualEnthalpy),
        new("residual_entropy_J_molK", "residual entropy", DisplayQuantity.MolarEntropy, s => s.ResidualEntropy),
    ];

    /// <summary>Writes every property as a JSON member (null where undefined), skipping the keys in
    /// <paramref name="skip"/>.</summary>
    public static void WriteMembers(Utf8JsonWriter json, ThermodynamicState state, IReadOnlySet<string>? skip = null)
    {
        foreach (var column in All)
        {
            if (skip?.Contains(column.Key) == true)
            {
                continue;
            }

            json.WriteNumberOrNull(column.Key, column.Value(state));
        }

        json.WriteNumberOrNull("density_kg_m3", state.Density * state.MolarMass);
        json.WriteBoolean("ideal_gas_extrapolated", state.IdealGasExtrapolated);
    }

    /// <summary>The value of a column for a two-phase mixture: T, P, ρ, v, Z and the lever-rule
    /// u, h, s with a = u − Ts and g = h − Ts; null for the properties a mixture does not have
    /// as one phase (heat capacities, sound speed, compressibilities, …).</summary>
    public static double? MixtureValue(string key, FluidState state) => key switch
    {
        "temperature_K" => state.Temperature,
        "pressure_Pa" => state.Pressure,
        "density_mol_m3" => state.Density,
        "molar_volume_m3_mol" => state.MolarVolume,
        "compressibility_factor" => state.Pressure / (state.Density * Core.Constants.GasConstant * state.Temperature),
        "internal_energy_J_mol" => state.InternalEnergy,
        "enthalpy_J_mol" => state.Enthalpy,
        "entropy_J_molK" => state.Entropy,
        "helmholtz_energy_J_mol" => state.HelmholtzEnergy,
        "gibbs_energy_J_mol" => state.GibbsEnergy,
        _ => null,
    };

    /// <summary>Writes every property of a two-phase mixture as a JSON member, with the same keys
    /// as a single phase (<see cref="MixtureValue"/>; null where a mixture has none).</summary>
    public static void WriteMixture(Utf8JsonWriter json, FluidState state)
    {
        foreach (var column in All)
        {
            json.WriteNumberOrNull(column.Key, MixtureValue(column.Key, state));
        }

        json.WriteNumberOrNull("density_kg_m3", state.Density * state.MolarMass);
        json.WriteBoolean("ideal_gas_extrapolated", state.Liquid!.IdealGasExtrapolated);
    }

    /// <summary>Display text of a value of a column in a unit system.</summary>
    public static string Display(Column column, double value, double? molarMass, UnitSystem units)
        => NumberText.Table(column.Quantity is DisplayQuantity q ? UnitFormatter.Convert(q, value, units, molarMass ?? double.NaN) : value);

    /// <summary>Unit label of a column in a unit system ("-" when dimensionless).</summary>
    public static string Unit(Column column, UnitSystem units)
        => column.Quantity is DisplayQuantity q ? UnitFormatter.Label(q, units) : "-";

    /// <summary>Display text of a column ("undefined" where the property is; <see cref="Unavailable"/>
    /// where it needs the cp° or the molar mass the fluid does not give); <paramref name="scale"/>
    /// is the scale of <see cref="NumberText.Table(double, double)"/> (0: none).</summary>
    public static string Display(Column column, ThermodynamicState state, UnitSystem units, double scale = 0)
    {
        if (column.Value(state) is not double value || !double.IsFinite(value))
        {
            return NeedsMissingData(column, state) ? Unavailable : "undefined";
        }

        return NumberText.Table(Shown(column, state, units) ?? value, scale);
    }

    /// <summary>The value of a column in display units, or null where it is undefined.</summary>
    public static double? Shown(Column column, ThermodynamicState state, UnitSystem units)
    {
        if (column.Value(state) is not double value || !double.IsFinite(value))
        {
            return null;
        }

        return column.Quantity is DisplayQuantity q ? UnitFormatter.Convert(q, value, units, state.MolarMass ?? double.NaN) : value;
    }

    /// <summary>Whether a null property is null because the fluid lacks cp° or the molar mass,
    /// computed rather than listed: it would have a value if the state had them. The state is
    /// completed with placeholder values (cp° = 4R, M = 1 kg/mol) only to ask that; the
    /// placeholders are never shown.</summary>
    public static bool NeedsMissingData(Column column, ThermodynamicState state)
    {
        if (state.IdealGasUnavailableReason is null && state.MolarMass is not null)
        {
            return false;
        }

        double placeholderCv = 3 * Core.Constants.GasConstant;
        var completed = state with
        {
            IsochoricHeatCapacity = state.IsochoricHeatCapacity ?? placeholderCv,
            IdealGasHeatCapacity = state.IdealGasHeatCapacity ?? 4 * Core.Constants.GasConstant,
            InternalEnergy = state.InternalEnergy ?? 0,
            Enthalpy = state.Enthalpy ?? 0,
            Entropy = state.Entropy ?? 0,
            MolarMass = state.MolarMass ?? 1,
        };
        return column.Value(completed) is double v && double.IsFinite(v);
    }

    /// <summary>The note under a table in which some property is <see cref="Unavailable"/>.</summary>
    public static string? IdealGasNote(ThermodynamicState state)
    {
        var notes = new List<string>();
        if (state.IdealGasUnavailableReason is string reason)
        {
            notes.Add($"{Unavailable}: {reason}");
        }

        if (state.MolarMass is null)
        {
            notes.Add($"{Unavailable}: the speed of sound and mass-based values need the molar mass, which the fluid does not give");
        }

        return notes.Count == 0 ? null : string.Join(Environment.NewLine, notes.Select(n => $"note: {n}"));
    }
}
