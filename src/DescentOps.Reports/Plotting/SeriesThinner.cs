namespace DescentOps.Reports.Plotting;

/// <summary>
/// Reduces a long line to a bounded number of points for drawing, keeping each bucket's lowest and highest
/// value in the order they occur. Averaging or striding would shave off a short power dip or a spike, the very
/// things a post-mortem is read for; min and max keep them at any zoom the page offers.
/// </summary>
public static class SeriesThinner
{
    /// <summary>A few times the pixel width of a plot: finer detail than this cannot be seen.</summary>
    public const int DefaultMaxPoints = 2_000;

    public static PlotSeries Thin(PlotSeries series, int maxPoints = DefaultMaxPoints)
    {
        ArgumentNullException.ThrowIfNull(series);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxPoints, 4);
        var n = series.Count;
        if (n <= maxPoints) return series;

        var buckets = maxPoints / 2;
        var days = new List<double>(maxPoints);
        var values = new List<double>(maxPoints);
        for (var b = 0; b < buckets; b++)
        {
            var start = (int)((long)b * n / buckets);
            var end = (int)((long)(b + 1) * n / buckets);
            if (start >= end) continue;
            int low = start, high = start;
            for (var i = start + 1; i < end; i++)
            {
                if (series.Values[i] < series.Values[low]) low = i;
                if (series.Values[i] > series.Values[high]) high = i;
            }

            var first = Math.Min(low, high);
            var second = Math.Max(low, high);
            days.Add(series.Days[first]);
            values.Add(series.Values[first]);
            if (second != first)
            {
                days.Add(series.Days[second]);
                values.Add(series.Values[second]);
            }
        }

        // The line must still reach the log's last point, or a truncated run would look shorter than it is.
        if (days[^1] != series.Days[n - 1])
        {
            days.Add(series.Days[n - 1]);
            values.Add(series.Values[n - 1]);
        }

        return series with { Days = [.. days], Values = [.. values] };
    }
}
