using DescentOps.Records;
using DescentOps.Journal;
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
        return log.Timeline;
    }

    /// <summary>Builds the timeline from events as they stream past.</summary>
    public sealed class Builder
    {
        private readonly List<FaultSpan> _faults = [];
        private readonly Dictionary<string, (int Index, double PlannedEndDay)> _open = new(StringComparer.Ordinal);
        private readonly List<RegimeMark> _regimes = [];

        public void Add(EventEntry e)
        {
            ArgumentNullException.ThrowIfNull(e);
            var day = e.TimeSeconds / SecondsPerDay;
            switch (e.Kind)
            {
                case FaultRecords.Injected:
                {
                    var name = Text(e.Data, "fault") ?? "fault";
                    var planned = SeriesExtractor.TryValue(e.Data, "duration_s", out var duration) && double.IsFinite(duration)
                        ? day + duration / SecondsPerDay
                        : double.NaN;
                    _open[name] = (_faults.Count, planned);
                    _faults.Add(new FaultSpan(name, day, double.NaN, Cleared: false));
                    break;
                }

                case FaultRecords.Cleared:
                {
                    var name = Text(e.Data, "fault") ?? "fault";
                    if (_open.Remove(name, out var at)) _faults[at.Index] = _faults[at.Index] with { EndDay = day, Cleared = true };
                    break;
                }

                case ProbeRecords.Regime:
                    _regimes.Add(new RegimeMark(day, Text(e.Data, "from") ?? "?", Text(e.Data, "to") ?? "?"));
                    break;
            }
        }

        /// <summary>
        /// A fault still open at the end of the log (a truncated run, or one that outlived it) is drawn to its
        /// planned end when that is inside the log, else to the last event: it was active that long at least.
        /// </summary>
        public FaultTimeline Build(double lastDay)
        {
            var faults = _faults.ToList();
            foreach (var (index, planned) in _open.Values)
            {
                var end = double.IsNaN(planned) ? lastDay : Math.Min(planned, Math.Max(lastDay, faults[index].StartDay));
                faults[index] = faults[index] with { EndDay = end };
            }

            return new FaultTimeline(faults, _regimes.ToList());
        }
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
