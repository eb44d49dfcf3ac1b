using ScottPlot;
using SkiaSharp;

namespace DescentOps.Reports.Plotting;

/// <summary>
/// Hands ScottPlot the typefaces shipped inside this assembly. Without it ScottPlot asks the system, and on a
/// machine without fonts every title, label and tick disappears from the output with no error at all.
/// </summary>
internal sealed class EmbeddedFontResolver : IFontResolver
{
    private readonly SKTypeface _regular;
    private readonly SKTypeface _bold;

    public EmbeddedFontResolver(string family, SKTypeface regular, SKTypeface bold)
    {
        Family = family;
        _regular = regular;
        _bold = bold;
    }

    public string Family { get; }

    public SKTypeface? CreateTypeface(string fontName, bool bold, bool italic) =>
        string.Equals(fontName, Family, StringComparison.OrdinalIgnoreCase) ? (bold ? _bold : _regular) : null;

    // Titles ask for weight 600 or so; anything from semi-bold up gets the bold face, the rest the regular one.
    public SKTypeface? CreateTypeface(string fontName, FontWeight weight, FontSlant slant, FontSpacing width) =>
        CreateTypeface(fontName, weight >= FontWeight.SemiBold, slant != FontSlant.Upright);
}
