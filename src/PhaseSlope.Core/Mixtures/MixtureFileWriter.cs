using System.Globalization;

namespace PhaseSlope.Core.Mixtures;

/// <summary>Writes a mixture in the mixture-file format <see cref="MixtureFile"/> reads
/// (docs/mixture-files.md): format, name, remarks, basis (mole), one component line per
/// component, one kij line per given interaction parameter with its source.</summary>
/// <remarks>Numbers are written round-trip with the invariant culture, so the file reads back to
/// the same doubles. Components are written by their fluid's name: a component read from a fluid
/// file is written by its name, which reads back only if that name is in the catalog.</remarks>
public static class MixtureFileWriter
{
    /// <summary>Writes <paramref name="mixture"/>.</summary>
    /// <param name="writer">The text.</param>
    /// <param name="mixture">The mixture (mole fractions; its given k_ij are written, the published table's are not).</param>
    /// <param name="name">The name line, or null for none.</param>
    /// <param name="remarks">Remarks lines (one line each; line breaks are replaced by spaces).</param>
    public static void Write(TextWriter writer, Mixture mixture, string? name, IEnumerable<string> remarks)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentNullException.ThrowIfNull(mixture);
        ArgumentNullException.ThrowIfNull(remarks);
        writer.WriteLine($"format     {MixtureFile.FormatTag} {MixtureFile.FormatVersion.ToString(CultureInfo.InvariantCulture)}");
        if (!string.IsNullOrWhiteSpace(name))
        {
            writer.WriteLine($"name       {OneLine(name)}");
        }

        // The reader takes one remarks line; several are joined.
        var text = string.Join(" ", remarks.Select(OneLine).Where(r => r.Length > 0));
        if (text.Length > 0)
        {
            writer.WriteLine($"remarks    {text}");
        }

        writer.WriteLine("basis      mole");
        for (int i = 0; i < mixture.Count; i++)
        {
            writer.WriteLine($"component  {mixture.Components[i].Name} = {Number(mixture.MoleFractions[i])}");
        }

        foreach (var given in mixture.GivenInteractions)
        {
            writer.WriteLine($"kij        {mixture.Components[given.First].Name}, {mixture.Components[given.Second].Name} = {Number(given.Value)} | {OneLine(given.Source)}");
        }
    }

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static string OneLine(string text) => text.ReplaceLineEndings(" ").Trim();
}
