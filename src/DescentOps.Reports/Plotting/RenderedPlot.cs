namespace DescentOps.Reports.Plotting;

/// <summary>A plot drawn as inline SVG, or skipped with the reason.</summary>
/// <param name="Definition">What was asked for.</param>
/// <param name="Svg">The SVG element, ready to be placed in an XHTML document; null when skipped.</param>
/// <param name="Note">Why the plot was skipped, or what it leaves out (e.g. thinned points); null when nothing to say.</param>
public sealed record RenderedPlot(PlotDefinition Definition, string? Svg, string? Note)
{
    public bool Skipped => Svg is null;
}
