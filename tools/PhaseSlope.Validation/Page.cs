using System.Globalization;
using System.Text;

namespace PhaseSlope.Validation;

/// <summary>The Markdown page being written: headings, paragraphs and tables, with '\n' line ends
/// whatever the platform, so the file is byte-identical everywhere.</summary>
internal sealed class Page
{
    private readonly StringBuilder _text = new();

    public void Heading(int level, string title) => Block(new string('#', level) + " " + title);

    public void Paragraph(string text) => Block(text);

    /// <summary>A list item per entry.</summary>
    public void Bullets(IEnumerable<string> items) => Block(string.Join("\n", items.Select(i => "- " + i)));

    /// <summary>A table; <paramref name="right"/> marks the columns aligned right (numbers).</summary>
    public void Table(string[] header, IEnumerable<string[]> rows, params int[] right)
    {
        var lines = new List<string>
        {
            "| " + string.Join(" | ", header) + " |",
            "| " + string.Join(" | ", header.Select((_, i) => right.Contains(i) ? "---:" : "---")) + " |",
        };
        foreach (var row in rows)
        {
            if (row.Length != header.Length)
            {
                throw new InvalidOperationException($"table row has {row.Length} cells, header {header.Length}: {string.Join(" | ", row)}");
            }

            // A '|' inside a cell would end it: escape every one not escaped already.
            lines.Add("| " + string.Join(" | ", row.Select(cell => System.Text.RegularExpressions.Regex.Replace(cell, @"(?<!\\)\|", @"\|"))) + " |");
        }

        Block(string.Join("\n", lines));
    }

    private void Block(string text)
    {
        if (_text.Length > 0)
        {
            _text.Append('\n');
        }

        // Raw string literals carry the source file's line ends: the page always has '\n'.
        _text.Append(text.Replace("\r\n", "\n").TrimEnd()).Append('\n');
    }

    public override string ToString() => _text.ToString();
}

/// <summary>Number formatting for the page: invariant culture, and only as many digits as the
/// computation behind them is converged to, so the page is the same on every machine.</summary>
internal static class Fmt
{
    private static readonly CultureInfo Inv = CultureInfo.InvariantCulture;

    /// <summary>Fixed decimals.</summary>
    public static string F(double x, int decimals)
    {
        WarnNearBoundary(x, decimals);
        return Clean(x.ToString("F" + decimals, Inv)).Replace("-", "−");
    }

    /// <summary>A value within 1e-4 of a unit in its last printed digit from a rounding boundary could
    /// print differently on another machine: say so on stderr (the page is still written), so the
    /// section can print one digit less.</summary>
    private static void WarnNearBoundary(double x, int decimals)
    {
        double scaled = Math.Abs(x) * Math.Pow(10, decimals);
        double fraction = scaled - Math.Floor(scaled);
        if (Math.Abs(fraction - 0.5) < 1e-4 && scaled < 1e12)
        {
            Console.Error.WriteLine($"warning: {x.ToString("R", Inv)} printed with {decimals} decimals lies next to a rounding boundary");
        }
    }

    /// <summary>A signed percentage with fixed decimals ("+0.37 %"; a rounded zero is "0.00 %").</summary>
    public static string Pct(double fraction, int decimals)
    {
        WarnNearBoundary(100 * fraction, decimals);
        string s = Clean((100 * fraction).ToString("F" + decimals, Inv));
        return (s.StartsWith('-') || IsZero(s) ? s : "+" + s).Replace("-", "−") + " %";
    }

    /// <summary>An unsigned percentage with fixed decimals.</summary>
    public static string PctAbs(double fraction, int decimals) => Clean((100 * fraction).ToString("F" + decimals, Inv)) + " %";

    /// <summary>A signed number with fixed decimals.</summary>
    public static string Signed(double x, int decimals)
    {
        WarnNearBoundary(x, decimals);
        string s = Clean(x.ToString("F" + decimals, Inv));
        return (s.StartsWith('-') || IsZero(s) ? s : "+" + s).Replace("-", "−");
    }

    /// <summary>A quantity near the rounding floor (a residual, a relative error), shown as the
    /// power of ten above it ("below 1e-13"): its digits change with the machine, its decade
    /// hardly ever; a value that is exactly zero is "0".</summary>
    /// <remarks>A value that the generator finds within 2 % of a step is reported on stderr; give such a
    /// row a <paramref name="floor"/> (about 1.5 times the step below it) so that its bound does not
    /// move with the last bits of a platform's math library.</remarks>
    public static string Below(double x, double floor = 0)
        => x == 0 && floor == 0 ? "0" : "below " + Ceiling(Math.Max(Math.Abs(x), floor), warn: Math.Abs(x) >= floor);

    /// <summary>The next of 1·10^k, 3·10^k above |x| ("3e-13"): a bound whose steps are wide
    /// enough that the last digits of a rounding-level quantity do not move it.</summary>
    public static string Ceiling(double x, bool warn = true)
    {
        x = Math.Abs(x);
        int k = (int)Math.Floor(Math.Log10(x));
        double unit = Math.Pow(10, k);
        double r = x / unit;
        if (warn && (r < 1.02 || Math.Abs(r - 3) < 0.06 || r > 9.8))
        {
            Console.Error.WriteLine($"warning: {x.ToString("R", Inv)} lies within 2 % of a 1e{k}/3e{k} step of its bound");
        }

        return x < 3 * unit ? "3e" + k.ToString(Inv) : "1e" + (k + 1).ToString(Inv);
    }

    /// <summary>An upper bound as a power of ten ("1e-12"), the number itself.</summary>
    public static string Decade(double x)
    {
        int exponent = (int)Math.Floor(Math.Log10(Math.Abs(x)) + 1e-9) + 1;
        return "1e" + exponent.ToString(Inv);
    }

    /// <summary>Two significant digits in exponent form ("3.1e-9").</summary>
    public static string E2(double x)
    {
        string s = x.ToString("0.0e+0", Inv).Replace("e+", "e");
        return s;
    }

    /// <summary>A model's name as the page writes it.</summary>
    public static string Model(PhaseSlope.Core.Models.CubicModelKind kind) => kind switch
    {
        PhaseSlope.Core.Models.CubicModelKind.PengRobinson => "Peng–Robinson",
        PhaseSlope.Core.Models.CubicModelKind.PengRobinson1978 => "Peng–Robinson 1978",
        PhaseSlope.Core.Models.CubicModelKind.SoaveRedlichKwong => "Soave–Redlich–Kwong",
        PhaseSlope.Core.Models.CubicModelKind.RedlichKwong => "Redlich–Kwong",
        PhaseSlope.Core.Models.CubicModelKind.VanDerWaals => "van der Waals",
        _ => kind.ToString(),
    };

    /// <summary>An integer with thin grouping ("7 130").</summary>
    public static string N(int n) => n.ToString("#,0", Inv).Replace(",", " ");

    private static bool IsZero(string s) => s.TrimStart('-').All(c => c == '0' || c == '.');

    private static string Clean(string s) => IsZero(s) ? s.TrimStart('-') : s;
}
