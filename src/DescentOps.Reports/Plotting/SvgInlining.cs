using System.Text.RegularExpressions;

namespace DescentOps.Reports.Plotting;

/// <summary>
/// Makes a stand-alone SVG document fit inside an HTML page next to others: the XML declaration goes (it is
/// only allowed at the start of a document), and every id and reference to one gets a per-plot prefix, since
/// Skia numbers its clip paths from the same start in every plot and the page would clip one plot by another's.
/// </summary>
public static partial class SvgInlining
{
    public static string Inline(string svgDocument, string idPrefix)
    {
        ArgumentNullException.ThrowIfNull(svgDocument);
        var svg = svgDocument;
        var start = svg.IndexOf("<svg", StringComparison.Ordinal);
        if (start < 0) throw new InvalidOperationException("The plot renderer returned no <svg> element.");
        svg = svg[start..];
        svg = IdAttribute().Replace(svg, m => $"{m.Groups[1].Value}=\"{idPrefix}{m.Groups[2].Value}\"");
        svg = UrlReference().Replace(svg, m => $"url(#{idPrefix}{m.Groups[1].Value})");
        svg = HrefReference().Replace(svg, m => $"{m.Groups[1].Value}=\"#{idPrefix}{m.Groups[2].Value}\"");
        return svg.TrimEnd();
    }

    [GeneratedRegex(@"\b(id)=""([^""]+)""", RegexOptions.CultureInvariant)]
    private static partial Regex IdAttribute();

    [GeneratedRegex(@"url\(#([^)]+)\)", RegexOptions.CultureInvariant)]
    private static partial Regex UrlReference();

    [GeneratedRegex(@"\b(href|xlink:href)=""#([^""]+)""", RegexOptions.CultureInvariant)]
    private static partial Regex HrefReference();
}
