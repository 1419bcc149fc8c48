using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Output;

/// <summary>The one list of coexistence quantities that the CSV, JSON and table writers share,
/// so a quantity is named and computed in one place.</summary>
internal static class CoexistenceColumns
{
    /// <summary>A quantity of a coexistence point.</summary>
    /// <param name="Key">SI key, used as JSON key and CSV header.</param>
    /// <param name="Title">Short title for tables (the unit is appended).</param>
    /// <param name="Quantity">Display quantity for unit conversion, or null when dimensionless.</param>
    /// <param name="Value">The SI value.</param>
    /// <param name="InCurveTable">Whether the people-facing curve table shows it.</param>
    /// <param name="Caloric">Whether it needs the fluid's ideal-gas heat capacity.</param>
    public sealed record Column(string Key, string Title, DisplayQuantity? Quantity, Func<CoexistenceRow, double?> Value, bool InCurveTable, bool Caloric = false);

    /// <summary>Flat columns of a coexistence point, in output order.</summary>
    public static IReadOnlyList<Column> Flat { get; } =
    [
        new("temperature_K", "T", DisplayQuantity.Temperature, r => r.Point.Temperature, true),
        new("pressure_Pa", "P", DisplayQuantity.Pressure, r => r.Point.Pressure, true),
        new("liquid_density_mol_m3", "rho_L", DisplayQuantity.Density, r => r.Point.Liquid.Density, true),
        new("vapour_density_mol_m3", "rho_V", DisplayQuantity.Density, r => r.Point.Vapour.Density, true),
        new("liquid_molar_volume_m3_mol", "v_L", DisplayQuantity.MolarVolume, r => r.Point.Liquid.MolarVolume, false),
        new("vapour_molar_volume_m3_mol", "v_V", DisplayQuantity.MolarVolume, r => r.Point.Vapour.MolarVolume, false),
        new("liquid_compressibility_factor", "Z_L", null, r => r.Point.Liquid.CompressibilityFactor, false),
        new("vapour_compressibility_factor", "Z_V", null, r => r.Point.Vapour.CompressibilityFactor, false),
        new("enthalpy_of_vaporization_J_mol", "dH_vap", DisplayQuantity.MolarEnergy, r => r.Point.EnthalpyOfVaporization, true),
        new("entropy_of_vaporization_J_molK", "dS_vap", DisplayQuantity.MolarEntropy, r => r.Point.EntropyOfVaporization, false),
        new("internal_energy_change_J_mol", "dU_vap", DisplayQuantity.MolarEnergy, r => r.Point.InternalEnergyChange, false),
        new("volume_change_m3_mol", "dV_vap", DisplayQuantity.MolarVolume, r => r.Point.VolumeChange, false),
        new("slope_Pa_K", "dPsat/dT", DisplayQuantity.Slope, r => r.Point.Slope, true),
        new("liquid_enthalpy_J_mol", "h_L", DisplayQuantity.MolarEnergy, r => r.Full?.Liquid.State.Enthalpy, true, Caloric: true),
        new("vapour_enthalpy_J_mol", "h_V", DisplayQuantity.MolarEnergy, r => r.Full?.Vapour.State.Enthalpy, true, Caloric: true),
        new("liquid_entropy_J_molK", "s_L", DisplayQuantity.MolarEntropy, r => r.Full?.Liquid.State.Entropy, true, Caloric: true),
        new("vapour_entropy_J_molK", "s_V", DisplayQuantity.MolarEntropy, r => r.Full?.Vapour.State.Entropy, true, Caloric: true),
    ];

    /// <summary>The columns that have values for these rows (the caloric ones need an ideal-gas
    /// heat capacity).</summary>
    public static IReadOnlyList<Column> For(IReadOnlyList<CoexistenceRow> rows)
        => rows.All(r => r.Full is not null) ? Flat : Flat.Where(c => !c.Caloric).ToArray();

    /// <summary>Table header of a column in a unit system.</summary>
    public static string Header(Column column, UnitSystem units)
        => column.Quantity is DisplayQuantity q ? $"{column.Title} [{UnitFormatter.Label(q, units)}]" : column.Title;

    /// <summary>Display value of a column in a unit system.</summary>
    public static double Display(Column column, CoexistenceRow row, UnitSystem units, double molarMass)
    {
        double value = column.Value(row) ?? throw new InvalidOperationException($"internal error: {column.Key} has no value");
        return column.Quantity is DisplayQuantity q ? UnitFormatter.Convert(q, value, units, molarMass) : value;
    }
}
