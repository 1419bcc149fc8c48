using System.Globalization;
using System.Text;
using PhaseSlope.Cli.Output;

namespace PhaseSlope.Cli.Reporting;

/// <summary>One section of an <see cref="HtmlReport"/>; every text passed in is escaped.</summary>
internal sealed class ReportSection
{
    private readonly List<string> _parts = [];
    private int _figures;

    internal ReportSection(string id, string heading, int number)
    {
        Id = id;
        Heading = heading;
        Number = number;
    }

    /// <summary>The anchor.</summary>
    public string Id { get; }

    /// <summary>The heading.</summary>
    public string Heading { get; }

    private int Number { get; }

    /// <summary>A sub-heading.</summary>
    public ReportSection Subheading(string text)
    {
        _parts.Add($"<h3>{HtmlReport.Escape(text)}</h3>");
        return this;
    }

    /// <summary>A paragraph.</summary>
    public ReportSection Paragraph(string text)
    {
        _parts.Add($"<p>{HtmlReport.Text(text)}</p>");
        return this;
    }

    /// <summary>A list of facts, one line each (as a writer prints them).</summary>
    public ReportSection Facts(IEnumerable<string> lines)
    {
        var items = lines.Select(l => $"<li>{HtmlReport.Text(l)}</li>").ToArray();
        if (items.Length > 0)
        {
            _parts.Add($"<ul class=\"facts\">{string.Concat(items)}</ul>");
        }

        return this;
    }

    /// <summary>A writer's table with its caption: numeric columns right-aligned, every cell escaped.</summary>
    public ReportSection Table(TextTable table, string caption)
    {
        var html = new StringBuilder("<div class=\"wide\"><table>");
        html.Append(CultureInfo.InvariantCulture, $"<caption>{HtmlReport.Text(caption)}</caption><thead><tr>");
        foreach (string header in table.Headers)
        {
            html.Append(CultureInfo.InvariantCulture, $"<th scope=\"col\">{HtmlReport.Escape(header)}</th>");
        }

        html.Append("</tr></thead><tbody>");
        foreach (var row in table.Rows)
        {
            html.Append("<tr>");
            for (int c = 0; c < row.Count; c++)
            {
                html.Append(table.Numeric[c] ? "<td class=\"num\">" : "<td>").Append(HtmlReport.Text(row[c])).Append("</td>");
            }

            html.Append("</tr>");
        }

        html.Append("</tbody></table></div>");
        _parts.Add(html.ToString());
        return this;
    }

    /// <summary>A writer's text output, shown as it prints (fixed-width, escaped).</summary>
    public ReportSection Preformatted(string text)
    {
        _parts.Add($"<pre>{HtmlReport.Text(text.TrimEnd())}</pre>");
        return this;
    }

    /// <summary>An exported SVG figure inline, with its caption.</summary>
    public ReportSection Figure(string svg, string caption)
    {
        _figures++;
        string prefix = $"s{Number}f{_figures}";
        _parts.Add($"<figure>{HtmlReport.InlineSvg(svg, prefix, caption)}<figcaption>{HtmlReport.Text(caption)}</figcaption></figure>");
        return this;
    }

    /// <summary>A caution beside the content it concerns.</summary>
    public ReportSection Caution(string text)
    {
        _parts.Add($"<aside class=\"caution\" role=\"note\"><strong>Caution.</strong> {HtmlReport.Text(StripLabel(text))}</aside>");
        return this;
    }

    /// <summary>A note (how a number was obtained, what is missing and why).</summary>
    public ReportSection Note(string text)
    {
        _parts.Add($"<aside class=\"note\" role=\"note\">{HtmlReport.Text(text)}</aside>");
        return this;
    }

    internal void WriteTo(StringBuilder html)
    {
        html.Append(CultureInfo.InvariantCulture, $"<section id=\"{Id}\">\n<h2>{HtmlReport.Escape(Heading)}</h2>\n");
        foreach (string part in _parts)
        {
            html.Append(part).Append('\n');
        }

        html.Append("</section>\n");
    }

    /// <summary>"Caution: text" → "text" (the box carries the word).</summary>
    private static string StripLabel(string text)
        => text.StartsWith("Caution: ", StringComparison.OrdinalIgnoreCase) ? text["Caution: ".Length..] : text;
}
