using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Reports.Plotting;

/// <summary>The faults and regime changes of a run, to be laid over a plot against time.</summary>
public sealed record FaultTimeline(IReadOnlyList<FaultSpan> Faults, IReadOnlyList<RegimeMark> Regimes)
{
    private const double SecondsPerDay = 86_400;

    public bool IsEmpty => Faults.Count == 0 && Regimes.Count == 0;

    public static FaultTimeline Of(RunLog log)
    {
        ArgumentNullException.ThrowIfNull(log);
        var faults = new List<FaultSpan>();
        var open = new Dictionary<string, (int Index, double PlannedEndDay)>(StringComparer.Ordinal);
        var regimes = new List<RegimeMark>();
        var lastDay = log.Events.Count > 0 ? log.Events[^1].TimeSeconds / SecondsPerDay : 0;
        foreach (var e in log.Events)
        {
            var day = e.TimeSeconds / SecondsPerDay;
            switch (e.Kind)
            {
                case FaultRecords.Injected:
                {
                    var name = Text(e.Data, "fault") ?? "fault";
                    var planned = SeriesExtractor.TryValue(e.Data, "duration_s", out var duration) && double.IsFinite(duration)
                        ? day + duration / SecondsPerDay
                        : double.NaN;
                    open[name] = (faults.Count, planned);
                    faults.Add(new FaultSpan(name, day, double.NaN, Cleared: false));
                    break;
                }

                case FaultRecords.Cleared:
                {
                    var name = Text(e.Data, "fault") ?? "fault";
                    if (open.Remove(name, out var at)) faults[at.Index] = faults[at.Index] with { EndDay = day, Cleared = true };
                    break;
                }

                case ProbeRecords.Regime:
                    regimes.Add(new RegimeMark(day, Text(e.Data, "from") ?? "?", Text(e.Data, "to") ?? "?"));
                    break;
            }
        }

        // A fault still open at the end of the log (a truncated run, or one that outlived it) is drawn to its
        // planned end when that is inside the log, else to the last event: it was active that long at least.
        foreach (var (index, planned) in open.Values)
        {
            var end = double.IsNaN(planned) ? lastDay : Math.Min(planned, Math.Max(lastDay, faults[index].StartDay));
            faults[index] = faults[index] with { EndDay = end };
        }

        return new FaultTimeline(faults, regimes);
    }

    private static string? Text(IReadOnlyList<RecordField> data, string name)
    {
        foreach (var f in data)
        {
            if (f.Kind == RecordFieldKind.Text && string.Equals(f.Name, name, StringComparison.Ordinal)) return f.Text;
        }

        return null;
    }
}
