using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Equilibrium;

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
    public sealed record Column(string Key, string Title, DisplayQuantity? Quantity, Func<CoexistencePoint, double> Value, bool InCurveTable);

    /// <summary>Flat columns of a coexistence point, in output order.</summary>
    public static IReadOnlyList<Column> Flat { get; } =
    [
        new("temperature_K", "T", DisplayQuantity.Temperature, p => p.Temperature, true),
        new("pressure_Pa", "P", DisplayQuantity.Pressure, p => p.Pressure, true),
        new("liquid_density_mol_m3", "rho_L", DisplayQuantity.Density, p => p.Liquid.Density, true),
        new("vapour_density_mol_m3", "rho_V", DisplayQuantity.Density, p => p.Vapour.Density, true),
        new("liquid_molar_volume_m3_mol", "v_L", DisplayQuantity.MolarVolume, p => p.Liquid.MolarVolume, false),
        new("vapour_molar_volume_m3_mol", "v_V", DisplayQuantity.MolarVolume, p => p.Vapour.MolarVolume, false),
        new("liquid_compressibility_factor", "Z_L", null, p => p.Liquid.CompressibilityFactor, true),
        new("vapour_compressibility_factor", "Z_V", null, p => p.Vapour.CompressibilityFactor, true),
        new("enthalpy_of_vaporization_J_mol", "dH_vap", DisplayQuantity.MolarEnergy, p => p.EnthalpyOfVaporization, true),
        new("entropy_of_vaporization_J_molK", "dS_vap", DisplayQuantity.MolarEntropy, p => p.EntropyOfVaporization, true),
        new("internal_energy_change_J_mol", "dU_vap", DisplayQuantity.MolarEnergy, p => p.InternalEnergyChange, false),
        new("volume_change_m3_mol", "dV_vap", DisplayQuantity.MolarVolume, p => p.VolumeChange, false),
        new("slope_Pa_K", "dPsat/dT", DisplayQuantity.Slope, p => p.Slope, true),
    ];

    /// <summary>Table header of a column in a unit system.</summary>
    public static string Header(Column column, UnitSystem units)
        => column.Quantity is DisplayQuantity q ? $"{column.Title} [{UnitFormatter.Label(q, units)}]" : column.Title;

    /// <summary>Display value of a column in a unit system.</summary>
    public static double Display(Column column, CoexistencePoint point, UnitSystem units, double molarMass)
        => column.Quantity is DisplayQuantity q ? UnitFormatter.Convert(q, column.Value(point), units, molarMass) : column.Value(point);
}
