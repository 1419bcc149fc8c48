using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Tests.Fluids;

namespace PhaseSlope.Validation.Sections;

internal static class IdealGas
{
    public static void Write(Page page)
    {
        page.Heading(2, "Ideal-gas heat capacities at 298.15 K");
        page.Paragraph("""
            cp° from each catalog correlation against tabulated values (all recalled, "from memory"): JANAF
            Thermochemical Tables (Chase, 4th ed., 1998) or the CRC Handbook, as named in the test's
            `StandardHeatCapacities` table, which this page reads. Test: `Fluids/IdealGasCatalogTests`, with 0.3 %
            for the ideal part of a reference equation, 1 % for a handbook polynomial and 5 % for a Joback
            estimate (the reasons are in the test).
            """);
        var rows = new List<string[]>();
        foreach (object[] row in IdealGasCatalogTests.StandardHeatCapacities)
        {
            string name = (string)row[0];
            double reference = (double)row[1], tolerance = (double)row[2];
            string source = (string)row[3];
            var cp = FluidCatalog.Embedded.Find(name).IdealGasHeatCapacity!;
            double value = cp.HeatCapacity(298.15);
            rows.Add([
                name, Correlation(cp.Source), Fmt.F(value, 3),
                reference.ToString(System.Globalization.CultureInfo.InvariantCulture) + (source.StartsWith("Chase", StringComparison.Ordinal) ? " (JANAF)" : " (CRC)"),
                Fmt.Pct(value / reference - 1, 2), "±" + Fmt.PctAbs(tolerance, tolerance < 1e-3 ? 2 : 1),
            ]);
        }

        page.Table(["fluid", "correlation", "cp° [J/(mol·K)]", "reference", "difference", "tolerance"], rows, 2, 3, 4, 5);
    }

    /// <summary>The correlation's authors and year, from the start of its source text: the comma-separated
    /// author segments (a segment with "&amp;" or "et al." still names authors) and the first "(yyyy)".</summary>
    private static string Correlation(string source)
    {
        if (source.StartsWith("estimated by the Joback", StringComparison.Ordinal))
        {
            return "Joback estimate";
        }

        if (char.IsLower(source[0]))
        {
            // A description of the method rather than a publication: its first clause.
            int end = source.IndexOfAny([':', ',', '(']);
            return (end > 0 ? source[..end] : source).Trim();
        }

        var segments = source.Split(", ");
        string authors = segments[0];
        for (int i = 1; i < segments.Length && (segments[i].Contains(" & ", StringComparison.Ordinal) || segments[i].Contains("et al.", StringComparison.Ordinal)); i++)
        {
            authors += ", " + segments[i];
        }

        var year = System.Text.RegularExpressions.Regex.Match(source, @"\((1[89]|20)\d\d\)");
        string text = year.Success && !authors.Contains(year.Value, StringComparison.Ordinal) ? authors + " " + year.Value : authors;
        return text.Length > 60 ? text[..60] + "…" : text;
    }
}
