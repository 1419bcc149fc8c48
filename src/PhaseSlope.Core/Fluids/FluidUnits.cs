using PhaseSlope.Core.Units;

namespace PhaseSlope.Core.Fluids;

/// <summary>The units a fluid file may use: a chosen subset of the one unit table
/// (<see cref="UnitTable"/>), which alone holds the conversions. Spellings are case-sensitive
/// ("MPa" is not "mPa").</summary>
/// <remarks>The subset is deliberately narrower than the table: temperatures in kelvin only (a
/// Celsius value is easy to misread as kelvin, and the file's range checks read the number before
/// conversion), pressures in the SI multiples and the bar. A critical density may also be written
/// as a mass density (divided by the molar mass) or a molar volume (its reciprocal); an enthalpy of
/// fusion or a solid's heat capacity per kilogram is multiplied by the molar mass.</remarks>
internal static class FluidUnits
{
    private static readonly Dictionary<Dimension, Unit[]> Subset = new()
    {
        [Dimension.Temperature] = Units("K"),
        [Dimension.Pressure] = Units("Pa", "kPa", "MPa", "bar"),
        [Dimension.MolarMass] = Units("g/mol", "kg/mol"),
        [Dimension.AmountDensity] = Units("mol/m3", "mol/L", "mol/dm3", "kg/m3"),
        [Dimension.MolarVolume] = Units("m3/mol", "L/mol", "dm3/mol", "cm3/mol"),
        [Dimension.MolarEnergy] = Units("J/mol", "kJ/mol", "J/kg", "kJ/kg"),
        [Dimension.MolarEntropy] = Units("J/(mol·K)", "J/(kg·K)", "kJ/(kg·K)"),
    };

    /// <summary>Unit spellings allowed for a field of the given dimension (with the table's
    /// aliases, such as m³ for m3); empty for a field without a unit.</summary>
    internal static string[] Allowed(Dimension dimension) =>
        Subset.TryGetValue(dimension, out Unit[]? units) ? [.. units.SelectMany(unit => unit.Spellings)] : [];

    /// <summary>The unit with this exact spelling.</summary>
    internal static Unit Get(string symbol) => UnitTable.Get(symbol);

    private static Unit[] Units(params string[] symbols) => [.. symbols.Select(UnitTable.Get)];
}
