namespace DescentOps.Reports.Plotting;

/// <summary>
/// Splits a line where its points stop for much longer than usual (a dead station, a link down, a broken fibre):
/// a straight line across such a gap would draw values nobody saw. A gap is longer than
/// <see cref="GapFactor"/> times the mean spacing of the line's points (the mean, not the median: frames released
/// from a queue arrive seconds apart in bursts, which would make every ordinary interval look like a gap).
/// </summary>
public static class BlindGaps
{
    public const double GapFactor = 5;

    /// <summary>The (from, to) times of every gap in a line, in its own time unit.</summary>
    public static IReadOnlyList<(double From, double To)> Find(IReadOnlyList<double> times)
    {
        ArgumentNullException.ThrowIfNull(times);
        if (times.Count < 3) return [];
        var mean = (times[^1] - times[0]) / (times.Count - 1);
        if (mean <= 0) return [];
        var gaps = new List<(double, double)>();
        for (var i = 0; i + 1 < times.Count; i++)
        {
            if (times[i + 1] - times[i] > GapFactor * mean) gaps.Add((times[i], times[i + 1]));
        }

        return gaps;
    }

    /// <summary>Cuts a (thinned) line into the pieces between gaps; thinning keeps real points, so the gap edges survive.</summary>
    public static IReadOnlyList<PlotSeries> Split(PlotSeries line, IReadOnlyList<(double From, double To)> gaps)
    {
        ArgumentNullException.ThrowIfNull(line);
        ArgumentNullException.ThrowIfNull(gaps);
        if (gaps.Count == 0 || line.Count == 0) return [line];
        var pieces = new List<PlotSeries>();
        var start = 0;
        var g = 0;
        for (var i = 1; i < line.Count; i++)
        {
            while (g < gaps.Count && gaps[g].To <= line.Days[i - 1]) g++;
            if (g < gaps.Count && line.Days[i - 1] <= gaps[g].From && line.Days[i] >= gaps[g].To)
            {
                pieces.Add(line with { Days = line.Days[start..i], Values = line.Values[start..i] });
                start = i;
            }
        }

        pieces.Add(line with { Days = line.Days[start..], Values = line.Values[start..] });
        return pieces;
    }
}
