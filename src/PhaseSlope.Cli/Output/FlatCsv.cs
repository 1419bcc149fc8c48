using System.Globalization;
using System.Text.Json;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Output;

/// <summary>Writes flattened rows (<see cref="JsonFlattener"/>) as CSV: one column per key, in the
/// order the keys first appear, an empty cell where a row lacks a key or its value is null; in SI
/// the headers are the JSON keys and the cells the JSON's own digits; in engineering units each
/// quantity is converted and its header names the unit.</summary>
/// <remarks>
/// <para>Every SI key ends in its unit (<c>_K</c>, <c>_Pa</c>, <c>_J_molK</c>, …); that suffix
/// names the quantity, and <see cref="UnitFormatter"/> gives its engineering unit, whose symbol from
/// the unit table becomes the new suffix (<c>temperature_degC</c>, <c>pressure_bar</c>,
/// <c>enthalpy_kJ_kg</c>, <c>entropy_kJ_kgK</c>). A slope per kelvin keeps that convention:
/// <c>_mol_m3K</c> becomes <c>_kg_m3K</c>, <c>_J_molK2</c> becomes <c>_kJ_kgK2</c> (a
/// temperature difference of 1 K is 1 degC). Keys without a unit suffix (dimensionless numbers,
/// counts, text) and keys already mass-based (<c>_kg_m3</c>, <c>_kg_mol</c>) are written as they
/// are. Temperatures inside an object named in <c>differences</c> (standard uncertainties) are
/// temperature differences and stay in K. Where a converted key equals another key of the row
/// (<c>density_mol_m3</c> in engineering units is <c>density_kg_m3</c>, which the JSON also
/// carries), the two hold the same quantity and one column is written, the first.</para>
/// </remarks>
internal static class FlatCsv
{
    /// <summary>An SI key suffix, the quantity it measures, and whether it is per kelvin.</summary>
    private sealed record Suffix(string Text, DisplayQuantity Quantity, bool PerKelvin = false);

    // Longest first, so _K_Pa is not read as _Pa, nor _Pa_K and _1_K as _K.
    private static readonly Suffix[] Suffixes =
    [
        new("_mol_m3K", DisplayQuantity.Density, PerKelvin: true),
        new("_J_molK2", DisplayQuantity.MolarEntropy, PerKelvin: true),
        new("_mol_m3", DisplayQuantity.Density),
        new("_m3_mol", DisplayQuantity.MolarVolume),
        new("_J_molK", DisplayQuantity.MolarEntropy),
        new("_J_mol", DisplayQuantity.MolarEnergy),
        new("_Pa_K", DisplayQuantity.Slope),
        new("_K_Pa", DisplayQuantity.JouleThomson),
        new("_1_Pa", DisplayQuantity.Compressibility),
        new("_1_K", DisplayQuantity.Expansivity),
        new("_m_s", DisplayQuantity.Speed),
        new("_Pa", DisplayQuantity.Pressure),
        new("_K", DisplayQuantity.Temperature),
    ];

    /// <summary>Renders the rows.</summary>
    /// <param name="rows">Flattened rows.</param>
    /// <param name="units">SI: the JSON keys and digits. Engineering: converted as described.</param>
    /// <param name="molarMass">Molar mass in kg/mol for the mass-based units (unused in SI).</param>
    /// <param name="differences">Names of objects whose temperatures are differences.</param>
    public static string Write(IReadOnlyList<IReadOnlyList<FlatField>> rows, UnitSystem units, double? molarMass, IReadOnlySet<string>? differences = null)
    {
        var converted = rows.Select(row => Convert(row, units, molarMass ?? double.NaN, differences)).ToArray();
        var header = new List<string>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var row in converted)
        {
            foreach (var (key, _) in row)
            {
                if (seen.Add(key))
                {
                    header.Add(key);
                }
            }
        }

        return CsvText.Write(header, converted.Select(row =>
        {
            var cells = new Dictionary<string, string>(StringComparer.Ordinal);
            foreach (var (key, text) in row)
            {
                cells.TryAdd(key, text);
            }

            return (IReadOnlyList<string>)[.. header.Select(h => cells.TryGetValue(h, out string? text) ? text : "")];
        }));
    }

    /// <summary>The CSV header of one field in a unit system (see the remarks of the class).</summary>
    public static string Header(FlatField field, UnitSystem units, IReadOnlySet<string>? differences = null)
        => Find(field, units, differences) is { } s ? field.Key[..^s.Text.Length] + KeyUnit(s, units) : field.Key;

    private static IEnumerable<(string Key, string Text)> Convert(IReadOnlyList<FlatField> row, UnitSystem units, double molarMass, IReadOnlySet<string>? differences)
    {
        foreach (var field in row)
        {
            if (Find(field, units, differences) is not { } suffix || field.Kind != JsonValueKind.Number)
            {
                yield return (Header(field, units, differences), field.Text);
                continue;
            }

            double si = double.Parse(field.Text, NumberStyles.Float, CultureInfo.InvariantCulture);
            // Every quantity but the temperature (never per kelvin, never a difference here) is a pure
            // factor, so a slope per kelvin or a difference converts as its quantity does.
            yield return (Header(field, units, differences), NumberText.RoundTrip(UnitFormatter.Convert(suffix.Quantity, si, units, molarMass)));
        }
    }

    /// <summary>The unit suffix of a field to convert, or null to write it as it is (SI output,
    /// no unit suffix, or a temperature difference).</summary>
    private static Suffix? Find(FlatField field, UnitSystem units, IReadOnlySet<string>? differences)
    {
        if (units == UnitSystem.Si)
        {
            return null;
        }

        var suffix = Suffixes.FirstOrDefault(s => field.Key.EndsWith(s.Text, StringComparison.Ordinal));
        return suffix is null || (suffix.Quantity == DisplayQuantity.Temperature && IsDifference(field, differences)) ? null : suffix;
    }

    private static bool IsDifference(FlatField field, IReadOnlySet<string>? differences)
        => differences is not null && field.Parents.Any(differences.Contains);

    /// <summary>"_" and the display unit's symbol as a key: '/' becomes '_', brackets and the
    /// middle dot go (kJ/(kg·K) is kJ_kgK); per kelvin appends K, or 2 after a K.</summary>
    private static string KeyUnit(Suffix suffix, UnitSystem units)
    {
        string text = "_" + UnitFormatter.Label(suffix.Quantity, units).Replace('/', '_').Replace("(", "", StringComparison.Ordinal)
            .Replace(")", "", StringComparison.Ordinal).Replace("·", "", StringComparison.Ordinal);
        return suffix.PerKelvin ? text + (text.EndsWith('K') ? "2" : "K") : text;
    }
}
