using DescentOps.Records;

namespace DescentOps.Reports.Plotting;

/// <summary>Pulls the points of a <see cref="SeriesDefinition"/> out of a log's events.</summary>
public static class SeriesExtractor
{
    /// <summary>The lines for one definition: one, or one per source in order of first appearance.</summary>
    public static IReadOnlyList<PlotSeries> Extract(RunLog log, SeriesDefinition definition)
    {
        ArgumentNullException.ThrowIfNull(log);
        return log.Series(definition);
    }

    /// <summary>A field's value as a double, for numbers and integers alike.</summary>
    public static bool TryValue(IReadOnlyList<RecordField> data, string field, out double value)
    {
        ArgumentNullException.ThrowIfNull(data);
        foreach (var f in data)
        {
            if (!string.Equals(f.Name, field, StringComparison.Ordinal)) continue;
            switch (f.Kind)
            {
                case RecordFieldKind.Number: value = f.Number; return true;
                case RecordFieldKind.Integer: value = f.Integer; return true;
            }
        }

        value = 0;
        return false;
    }
}
