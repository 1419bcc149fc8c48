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
/// are, and so are the members of an object named <c>*mole_fractions</c> (keyed by component
/// name, dimensionless). A temperature difference must be named in <c>differences</c>, by the name of an object
/// holding such temperatures (<c>standard_uncertainty</c>) or by its own member name (a
/// superheat <c>T - Tsat</c>): it stays in K, since 1 K is 1 degC as a difference; any other
/// <c>_K</c> key is an absolute temperature and gets the Celsius offset. Where a converted key
/// equals another key of the row (<c>density_mol_m3</c> in engineering units is
/// <c>density_kg_m3</c>, which the JSON also carries), the two hold the same quantity and one
/// column is written, the first.</para>
/// <para>A pure fluid has one molar mass; a mixture's phases each have their own (Σ x_i M_i of
/// the phase's composition), so the mixture writers give a molar mass per field
/// (<see cref="WriteByPhase"/>).</para>
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

    /// <summary>Renders the rows (see <see cref="Write(TextWriter, IEnumerable{IReadOnlyList{FlatField}}, UnitSystem, double?, IReadOnlySet{string}?)"/>).</summary>
    /// <remarks>Rows of one table usually share their keys: the header is first taken from the
    /// first row and the rows written in one pass; only if a later row has a key the first lacks
    /// is the text discarded and written in two passes (the union of the keys first).</remarks>
    public static string Write(IEnumerable<IReadOnlyList<FlatField>> rows, UnitSystem units, double? molarMass, IReadOnlySet<string>? differences = null)
        => WriteByPhase(rows, units, One(molarMass), differences);

    /// <summary>Renders the rows, each field's mass-based unit with the molar mass
    /// <paramref name="molarMassOf"/> gives for it (a mixture's liquid, vapour and feed each have
    /// their own, Σ x_i M_i of their own composition).</summary>
    /// <param name="rows">Flattened rows.</param>
    /// <param name="units">SI: the JSON keys and digits. Engineering: converted as described.</param>
    /// <param name="molarMassOf">The molar mass in kg/mol of the phase a numeric field with a unit
    /// suffix describes (asked only in engineering units; NaN where none applies, which a
    /// mass-based field then refuses as a bug).</param>
    /// <param name="differences">As in <see cref="Write(TextWriter, IEnumerable{IReadOnlyList{FlatField}}, UnitSystem, double?, IReadOnlySet{string}?)"/>.</param>
    public static string WriteByPhase(IEnumerable<IReadOnlyList<FlatField>> rows, UnitSystem units, Func<FlatField, double> molarMassOf, IReadOnlySet<string>? differences = null)
    {
        var columns = new Columns(units, differences);
        using (var text = new StringWriter(CultureInfo.InvariantCulture))
        {
            var first = rows.Take(1).ToArray();
            if (TryWrite(text, rows, columns, columns.Header(first), molarMassOf))
            {
                return text.ToString();
            }
        }

        using var again = new StringWriter(CultureInfo.InvariantCulture);
        TryWrite(again, rows, columns, columns.Header(rows), molarMassOf);
        return again.ToString();
    }

    /// <summary>One molar mass for every field (a pure fluid), NaN when there is none.</summary>
    private static Func<FlatField, double> One(double? molarMass)
    {
        double m = molarMass ?? double.NaN;
        return _ => m;
    }

    /// <summary>Writes the rows as CSV to <paramref name="output"/> (left open).</summary>
    /// <param name="output">Where the text goes.</param>
    /// <param name="rows">Flattened rows. Enumerated twice: once for the header (the union of the
    /// rows' keys), once for the cells, so a long table is never held as fields; a lazy source
    /// flattens each row twice.</param>
    /// <param name="units">SI: the JSON keys and digits. Engineering: converted as described.</param>
    /// <param name="molarMass">Molar mass in kg/mol for the mass-based units (unused in SI).</param>
    /// <param name="differences">Names of objects whose temperatures are differences, and of members
    /// that are temperature differences.</param>
    public static void Write(TextWriter output, IEnumerable<IReadOnlyList<FlatField>> rows, UnitSystem units, double? molarMass, IReadOnlySet<string>? differences = null)
    {
        var columns = new Columns(units, differences);
        TryWrite(output, rows, columns, columns.Header(rows), One(molarMass));
    }

    /// <summary>The column of each key (its header and unit suffix), computed once per key.</summary>
    private sealed class Columns(UnitSystem units, IReadOnlySet<string>? differences)
    {
        private readonly Dictionary<string, (string Header, Suffix? Suffix)> _byKey = new(StringComparer.Ordinal);

        public (string Header, Suffix? Suffix) Of(FlatField field)
        {
            if (!_byKey.TryGetValue(field.Key, out var column))
            {
                var suffix = Find(field, units, differences);
                column = (suffix is null ? field.Key : field.Key[..^suffix.Text.Length] + KeyUnit(suffix, units), suffix);
                _byKey.Add(field.Key, column);
            }

            return column;
        }

        public UnitSystem Units => units;

        /// <summary>The headers of the rows' keys, in the order they first appear, with their index.</summary>
        public (List<string> Names, Dictionary<string, int> Index) Header(IEnumerable<IReadOnlyList<FlatField>> rows)
        {
            var names = new List<string>();
            var index = new Dictionary<string, int>(StringComparer.Ordinal);
            foreach (var field in rows.SelectMany(row => row))
            {
                string name = Of(field).Header;
                if (index.TryAdd(name, names.Count))
                {
                    names.Add(name);
                }
            }

            return (names, index);
        }
    }

    /// <summary>Writes the header and the rows; false (with part of the text written) when a row
    /// has a key that is not in the header.</summary>
    private static bool TryWrite(TextWriter output, IEnumerable<IReadOnlyList<FlatField>> rows, Columns columns, (List<string> Names, Dictionary<string, int> Index) header,
        Func<FlatField, double> molarMassOf)
    {
        bool complete = true;
        IEnumerable<IReadOnlyList<string>> Cells()
        {
            foreach (var row in rows)
            {
                var cells = new string?[header.Names.Count];
                foreach (var field in row)
                {
                    var (name, suffix) = columns.Of(field);
                    if (!header.Index.TryGetValue(name, out int i))
                    {
                        complete = false;
                        yield break;
                    }

                    // Where two keys name one column (a molar density converted to kg/m3 beside the
                    // JSON's own density_kg_m3), the first is written.
                    cells[i] ??= suffix is null || field.Kind != JsonValueKind.Number
                        ? field.Text
                        // Every quantity but the temperature (never per kelvin, never a difference
                        // here) is a pure factor, so a slope per kelvin converts as its quantity does.
                        : NumberText.RoundTrip(UnitFormatter.Convert(suffix.Quantity, double.Parse(field.Text, NumberStyles.Float, CultureInfo.InvariantCulture), columns.Units, molarMassOf(field)));
                }

                yield return [.. cells.Select(c => c ?? "")];
            }
        }

        CsvText.Write(output, header.Names, Cells());
        return complete;
    }

    /// <summary>The unit suffix of a field to convert, or null to write it as it is (SI output,
    /// no unit suffix, or a temperature difference).</summary>
    private static Suffix? Find(FlatField field, UnitSystem units, IReadOnlySet<string>? differences)
    {
        if (units == UnitSystem.Si)
        {
            return null;
        }

        // A mole fraction is named by its component (liquid_mole_fractions_NAME), not by a unit:
        // whatever the name ends in, it stays as it is.
        if (field.Parents.Count > 0 && field.Parents[^1].EndsWith("mole_fractions", StringComparison.Ordinal))
        {
            return null;
        }

        var suffix = Suffixes.FirstOrDefault(s => field.Key.EndsWith(s.Text, StringComparison.Ordinal));
        return suffix is null || (suffix.Quantity == DisplayQuantity.Temperature && IsDifference(field, differences)) ? null : suffix;
    }

    private static bool IsDifference(FlatField field, IReadOnlySet<string>? differences)
        => differences is not null && (field.Parents.Any(differences.Contains)
            || differences.Any(name => field.Key == name || field.Key.EndsWith("_" + name, StringComparison.Ordinal)));

    /// <summary>"_" and the display unit's symbol as a key: '/' becomes '_', brackets and the
    /// middle dot go (kJ/(kg·K) is kJ_kgK); per kelvin appends K, or 2 after a K.</summary>
    private static string KeyUnit(Suffix suffix, UnitSystem units)
    {
        string text = "_" + UnitFormatter.Label(suffix.Quantity, units).Replace('/', '_').Replace("(", "", StringComparison.Ordinal)
            .Replace(")", "", StringComparison.Ordinal).Replace("·", "", StringComparison.Ordinal);
        return suffix.PerKelvin ? text + (text.EndsWith('K') ? "2" : "K") : text;
    }
}
