namespace DescentOps.Reports.Html;

/// <summary>One line of the key figures: what it is and its value in operator units.</summary>
public sealed record SummaryFigure(string Label, string Value);
