namespace DescentOps.Reports.Plotting;

/// <summary>Points of one line, ready to draw: days since the epoch against scaled values.</summary>
public sealed record PlotSeries(string Label, double[] Days, double[] Values)
{
    public int Count => Days.Length;
}
