namespace DescentOps.Reports.Plotting;

/// <summary>One plot of the report: what it shows and how its axes read.</summary>
/// <param name="Id">Stable identifier, used as the figure's HTML id (<c>plot-{Id}</c>) and by tests.</param>
/// <param name="Title">The plot's title.</param>
/// <param name="YLabel">The vertical axis label, with its unit.</param>
/// <param name="Series">The lines drawn; a plot none of whose series has data is skipped with a note.</param>
/// <param name="InvertY">Draw larger values lower (depth grows downward, as the probe moves).</param>
/// <param name="MarkTimeline">Overlay the fault spans and regime changes, so cause and effect line up.</param>
public sealed record PlotDefinition(
    string Id,
    string Title,
    string YLabel,
    IReadOnlyList<SeriesDefinition> Series,
    bool InvertY = false,
    bool MarkTimeline = false);
