using System.Globalization;
using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using PhaseSlope.Cli.Output;

namespace PhaseSlope.Cli.Reporting;

/// <summary>One self-contained HTML page: a title, sections in order, each holding paragraphs,
/// tables, preformatted writer output, inline SVG figures and cautions. Every text is
/// HTML-escaped here; the page has no script and names no resource outside itself (the style
/// sheet is inline, figures are inline SVG), so it opens offline and prints as it shows.</summary>
/// <remarks>A new kind of content (for example the solid lines of a fluid) is one more
/// <see cref="Section"/> call by whoever builds the report; nothing here needs to change.</remarks>
internal sealed partial class HtmlReport
{
    /// <summary>The marking of a recalled value; shown highlighted wherever a text carries it.</summary>
    public const string FromMemory = "from memory";

    private readonly string _title;
    private readonly List<string> _preamble = [];
    private readonly List<ReportSection> _sections = [];

    /// <summary>Creates a report titled <paramref name="title"/>.</summary>
    public HtmlReport(string title) => _title = title;

    /// <summary>A line under the title (what the report is of and how it was made).</summary>
    public void Lead(string text) => _preamble.Add($"<p class=\"lead\">{Text(text)}</p>");

    /// <summary>Appends a section with an anchor <paramref name="id"/> (listed in the contents).</summary>
    public ReportSection Section(string id, string heading)
    {
        var section = new ReportSection(id, heading, _sections.Count + 1);
        _sections.Add(section);
        return section;
    }

    /// <summary>The whole page.</summary>
    public string Render()
    {
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        html.Append("<meta name=\"color-scheme\" content=\"light dark\">\n");
        html.Append("<meta name=\"generator\" content=\"phaseslope report\">\n");
        html.Append(CultureInfo.InvariantCulture, $"<title>{Escape(_title)}</title>\n<style>\n{Style}</style>\n</head>\n<body>\n<header>\n<h1>{Escape(_title)}</h1>\n");
        foreach (string line in _preamble)
        {
            html.Append(line).Append('\n');
        }

        html.Append("</header>\n<nav aria-label=\"contents\"><h2>Contents</h2><ol>\n");
        foreach (var section in _sections)
        {
            html.Append(CultureInfo.InvariantCulture, $"<li><a href=\"#{section.Id}\">{Escape(section.Heading)}</a></li>\n");
        }

        html.Append("</ol></nav>\n<main>\n");
        foreach (var section in _sections)
        {
            section.WriteTo(html);
        }

        html.Append("</main>\n</body>\n</html>\n");
        return html.ToString();
    }

    /// <summary>HTML-escapes <paramref name="text"/> (&amp;, &lt;, &gt;, quotes).</summary>
    public static string Escape(string text) => WebUtility.HtmlEncode(text);

    /// <summary>Escapes <paramref name="text"/> and highlights each "from memory" marking in it.</summary>
    public static string Text(string text)
        => MemoryMarking().Replace(Escape(text), m => $"<mark class=\"memory\">{m.Value}</mark>");

    [GeneratedRegex("from memory", RegexOptions.IgnoreCase)]
    private static partial Regex MemoryMarking();

    /// <summary>The SVG text of an exported figure made fit to sit inside the page: the XML
    /// declaration dropped, a viewBox added so that it scales to the column, and every id (and
    /// each reference to one) prefixed with <paramref name="prefix"/> so that two figures'
    /// clip paths never share a name.</summary>
    public static string InlineSvg(string svg, string prefix, string label)
    {
        string body = XmlDeclaration().Replace(svg, "").Trim();
        var size = SvgSize().Match(body);
        if (!size.Success)
        {
            throw new InvalidOperationException("an exported figure has no width and height");
        }

        string open = $"<svg role=\"img\" aria-label=\"{Escape(label)}\" viewBox=\"0 0 {size.Groups[1].Value} {size.Groups[2].Value}\" ";
        body = open + body[(body.IndexOf("<svg ", StringComparison.Ordinal) + 5)..];
        body = IdAttribute().Replace(body, m => $"id=\"{prefix}-{m.Groups[1].Value}\"");
        return LocalReference().Replace(body, m => $"url(#{prefix}-{m.Groups[1].Value})");
    }

    [GeneratedRegex(@"<\?xml[^>]*\?>")]
    private static partial Regex XmlDeclaration();

    [GeneratedRegex(@"<svg\b[^>]*?\bwidth=""([0-9.]+)""[^>]*?\bheight=""([0-9.]+)""")]
    private static partial Regex SvgSize();

    [GeneratedRegex(@"\bid=""([^""]+)""")]
    private static partial Regex IdAttribute();

    [GeneratedRegex(@"url\(#([^)]+)\)")]
    private static partial Regex LocalReference();

    /// <summary>The style sheet: readable type, light and dark colour schemes (prefers-color-scheme),
    /// and print rules (black on white whatever the screen scheme, no page break inside a table
    /// row, a figure or a caution).</summary>
    private const string Style = """
        :root { color-scheme: light dark; --fg: #1a1a1a; --bg: #ffffff; --muted: #4a4a4a; --rule: #b8b8b8; --head: #eef1f4;
          --caution-bg: #fff3d1; --caution-fg: #4d3300; --caution-rule: #b07800; --memory-bg: #e7dcf5; --memory-fg: #3c1470;
          --note-bg: #e8f1fb; --note-fg: #0d2f57; --link: #0b4f9c; }
        @media (prefers-color-scheme: dark) {
          :root { --fg: #e6e6e6; --bg: #15171a; --muted: #b4b4b4; --rule: #5a5f66; --head: #252a30;
            --caution-bg: #3a2c07; --caution-fg: #ffe2a0; --caution-rule: #e0a526; --memory-bg: #3b2a57; --memory-fg: #ecdcff;
            --note-bg: #16283d; --note-fg: #cfe3fa; --link: #8cc2ff; }
        }
        html { background: var(--bg); color: var(--fg); }
        body { font: 15px/1.45 system-ui, -apple-system, "Segoe UI", Roboto, "Helvetica Neue", Arial, sans-serif; margin: 0 auto; max-width: 80rem; padding: 1rem 1.5rem 3rem; }
        h1 { font-size: 1.7rem; margin: 0.4rem 0; } h2 { font-size: 1.3rem; border-bottom: 1px solid var(--rule); padding-bottom: 0.2rem; margin-top: 2rem; }
        h3 { font-size: 1.05rem; margin: 1.2rem 0 0.4rem; }
        a { color: var(--link); }
        .lead { color: var(--muted); margin: 0.2rem 0; }
        nav ol { columns: 2; margin: 0.3rem 0; } nav h2 { font-size: 1rem; border: none; margin: 1rem 0 0; }
        table { border-collapse: collapse; margin: 0.5rem 0 1rem; font-size: 0.85rem; }
        th, td { border: 1px solid var(--rule); padding: 0.15rem 0.45rem; vertical-align: top; }
        th { background: var(--head); text-align: left; }
        td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
        .wide { overflow-x: auto; }
        pre { font: 0.78rem/1.35 ui-monospace, "DejaVu Sans Mono", Menlo, Consolas, monospace; background: var(--head); border: 1px solid var(--rule); padding: 0.5rem 0.7rem; overflow-x: auto; white-space: pre; }
        ul.facts { padding-left: 1.2rem; } ul.facts li { margin: 0.15rem 0; }
        figure { margin: 1rem 0; break-inside: avoid; page-break-inside: avoid; }
        figure svg { display: block; width: 100%; max-width: 56rem; height: auto; background: #ffffff; border: 1px solid var(--rule); }
        figcaption { color: var(--muted); font-size: 0.85rem; margin-top: 0.3rem; }
        .caution { background: var(--caution-bg); color: var(--caution-fg); border-left: 4px solid var(--caution-rule); padding: 0.4rem 0.7rem; margin: 0.6rem 0; break-inside: avoid; page-break-inside: avoid; }
        .caution strong { font-weight: 700; }
        .note { background: var(--note-bg); color: var(--note-fg); padding: 0.4rem 0.7rem; margin: 0.6rem 0; break-inside: avoid; page-break-inside: avoid; }
        mark.memory { background: var(--memory-bg); color: var(--memory-fg); padding: 0 0.2rem; border-radius: 2px; font-weight: 600; }
        @media print {
          :root { --fg: #000000; --bg: #ffffff; --muted: #333333; --rule: #888888; --head: #f0f0f0;
            --caution-bg: #ffffff; --caution-fg: #000000; --caution-rule: #000000; --memory-bg: #ffffff; --memory-fg: #000000;
            --note-bg: #ffffff; --note-fg: #000000; --link: #000000; }
          html, body { background: #ffffff; color: #000000; }
          body { font-size: 10pt; max-width: none; padding: 0; }
          nav { display: none; }
          h2, h3 { break-after: avoid; page-break-after: avoid; }
          tr, pre { break-inside: avoid; page-break-inside: avoid; }
          pre, .wide { overflow: visible; white-space: pre-wrap; }
          .caution { border: 1px solid #000000; border-left: 4px solid #000000; }
          .note { border: 1px solid #888888; }
          mark.memory { border: 1px solid #000000; }
          figure svg { max-width: 100%; }
        }

        """;
}
