using System.Net;
using System.Text.RegularExpressions;

namespace PhaseSlope.Cli.Tests.Reporting;

/// <summary>Reads a report page the way a reviewer's checklist does: what it would fetch from
/// outside itself, its sections, and the cells of a table.</summary>
internal static partial class ReportHtml
{
    /// <summary>Every reference the page makes to something outside itself: an attribute that
    /// loads or links a resource (src, href, xlink:href, srcset, poster, action, data, formaction,
    /// background) or a CSS url() whose target is neither a '#' fragment nor a data: URI, and any
    /// element that can only load from outside (script, link, iframe, object, embed, base) or a
    /// CSS @import. The xmlns attributes of the inline SVG are namespace names, not resources.</summary>
    public static IReadOnlyList<string> ExternalReferences(string html)
    {
        // Only markup can load anything: the tags themselves and the style sheets (text is
        // escaped, so a '<' in it is never a tag).
        string[] tags = [.. Tag().Matches(html).Select(m => m.Value)];
        string[] styles = [.. StyleBlock().Matches(html).Select(m => m.Groups[1].Value)];
        var found = new List<string>();
        foreach (Match m in tags.SelectMany(t => ResourceAttribute().Matches(t)))
        {
            string target = WebUtility.HtmlDecode(m.Groups["v"].Value).Trim();
            if (!IsInternal(target))
            {
                found.Add(m.Value);
            }
        }

        foreach (Match m in tags.Concat(styles).SelectMany(t => CssUrl().Matches(t)))
        {
            string target = WebUtility.HtmlDecode(m.Groups["v"].Value).Trim().Trim('"', '\'');
            if (!IsInternal(target))
            {
                found.Add(m.Value);
            }
        }

        found.AddRange(tags.Where(t => LoadingElement().IsMatch(t)));
        found.AddRange(styles.Where(s => Import().IsMatch(s)).Select(_ => "@import"));
        return found;
    }

    [GeneratedRegex(@"<[a-zA-Z][^>]*>")]
    private static partial Regex Tag();

    [GeneratedRegex(@"<style\b[^>]*>(.*?)</style>", RegexOptions.Singleline | RegexOptions.IgnoreCase)]
    private static partial Regex StyleBlock();

    private static bool IsInternal(string target)
        => target.StartsWith('#') || target.StartsWith("data:", StringComparison.OrdinalIgnoreCase);

    [GeneratedRegex(@"\s(?:src|href|xlink:href|srcset|poster|action|data|formaction|background)\s*=\s*(?:""(?<v>[^""]*)""|'(?<v>[^']*)'|(?<v>[^\s>]+))", RegexOptions.IgnoreCase)]
    private static partial Regex ResourceAttribute();

    [GeneratedRegex(@"url\(\s*(?<v>[^)]*)\)", RegexOptions.IgnoreCase)]
    private static partial Regex CssUrl();

    [GeneratedRegex(@"^<(?:script|link|iframe|object|embed|base|frame|img|audio|video|source)\b[^>]*>", RegexOptions.IgnoreCase)]
    private static partial Regex LoadingElement();

    [GeneratedRegex(@"@import\b", RegexOptions.IgnoreCase)]
    private static partial Regex Import();

    /// <summary>The HTML of the section with anchor <paramref name="id"/>.</summary>
    public static string Section(string html, string id)
    {
        var m = Regex.Match(html, $"<section id=\"{Regex.Escape(id)}\">(.*?)</section>", RegexOptions.Singleline);
        Assert.True(m.Success, $"the report has no section '{id}'");
        return m.Groups[1].Value;
    }

    /// <summary>The body rows of the first table in <paramref name="html"/>, cells decoded.</summary>
    public static List<string[]> FirstTableRows(string html)
    {
        var body = Regex.Match(html, "<tbody>(.*?)</tbody>", RegexOptions.Singleline);
        Assert.True(body.Success, "no table");
        return [.. Regex.Matches(body.Groups[1].Value, "<tr>(.*?)</tr>", RegexOptions.Singleline)
            .Select(r => Regex.Matches(r.Groups[1].Value, "<td[^>]*>(.*?)</td>", RegexOptions.Singleline)
                .Select(c => WebUtility.HtmlDecode(Regex.Replace(c.Groups[1].Value, "<[^>]+>", ""))).ToArray())];
    }

    /// <summary>The text of the preformatted blocks of <paramref name="html"/>, decoded (marks removed).</summary>
    public static string PreformattedText(string html)
        => string.Join("\n", Regex.Matches(html, "<pre>(.*?)</pre>", RegexOptions.Singleline)
            .Select(m => WebUtility.HtmlDecode(Regex.Replace(m.Groups[1].Value, "<[^>]+>", ""))));
}
