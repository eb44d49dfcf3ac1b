namespace DescentOps.Reports.Plotting;

/// <summary>
/// Places text labels along the time axis in rows so that none overlaps another: each label goes in the first row
/// whose last label ends before it starts; a label that fits in no row is left out (its line is still drawn).
/// </summary>
public static class LabelRows
{
    /// <summary>Average advance of a DejaVu Sans character at 11 px, rounded up (about 0.6 em).</summary>
    public const double CharWidthPx = 7;

    /// <param name="positionsPx">Each label's centre, in pixels along the axis, in any order.</param>
    /// <param name="texts">The labels, as many as positions.</param>
    /// <param name="rows">How many rows there are.</param>
    /// <returns>Each label's row, or -1 for a label left out.</returns>
    public static int[] Assign(IReadOnlyList<double> positionsPx, IReadOnlyList<string> texts, int rows)
    {
        ArgumentNullException.ThrowIfNull(positionsPx);
        ArgumentNullException.ThrowIfNull(texts);
        var result = new int[positionsPx.Count];
        var rowEnds = Enumerable.Repeat(double.NegativeInfinity, rows).ToArray();
        foreach (var i in Enumerable.Range(0, positionsPx.Count).OrderBy(i => positionsPx[i]))
        {
            var half = (texts[i].Length * CharWidthPx / 2) + 4;
            var start = positionsPx[i] - half;
            result[i] = -1;
            for (var r = 0; r < rows; r++)
            {
                if (rowEnds[r] > start) continue;
                result[i] = r;
                rowEnds[r] = positionsPx[i] + half;
                break;
            }
        }

        return result;
    }
}
