using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Running;

/// <summary>
/// The figures that say what a run cost besides its outcome, from the journal records: time the probe was not
/// descending (stopped by a command or a shed head, or frozen in, from its regime changes), its longest such stretch
/// and the part of it frozen in, the most frames held at once in the link's buffers, vehicles lost, and each rule's
/// firings. (Time blind is <see cref="GroundBlindness"/>'s.)
/// </summary>
public sealed class RunFigures
{
    private readonly Dictionary<string, int> _firings = new(StringComparer.Ordinal);
    private double? _stoppedSinceS;
    private double? _frozenSinceS;

    public double TimeStoppedS { get; private set; }
    public double LongestStopS { get; private set; }
    public double TimeFrozenS { get; private set; }
    public long FramesHeldMax { get; private set; }
    public int VehiclesLost { get; private set; }

    public IReadOnlyDictionary<string, int> RuleFirings => _firings;

    public void Observe(JournalRecord record)
    {
        var t = record.Time.SecondsSinceEpoch;
        switch (record.Kind)
        {
            case ProbeRecords.Regime:
                var to = Text(record, "to");
                var stoppedNow = to is "Stopped" or "FrozenIn";
                if (stoppedNow && _stoppedSinceS is null) _stoppedSinceS = t;
                if (!stoppedNow && _stoppedSinceS is not null) EndStop(t);
                var frozenNow = to == "FrozenIn";
                if (frozenNow && _frozenSinceS is null) _frozenSinceS = t;
                if (!frozenNow && _frozenSinceS is { } frozenSince)
                {
                    TimeFrozenS += t - frozenSince;
                    _frozenSinceS = null;
                }

                break;
            case VehicleRecords.Lost:
                VehiclesLost++;
                break;
            case RuleRecords.Fired:
                var rule = Text(record, "rule");
                _firings[rule] = _firings.GetValueOrDefault(rule) + 1;
                break;
            default:
                if (record.Kind.StartsWith("relay.", StringComparison.Ordinal) || record.Kind.StartsWith("tether.", StringComparison.Ordinal) || record.Kind == DataRecords.Lost)
                {
                    foreach (var field in record.Fields)
                    {
                        if (field.Name == "frames_held") FramesHeldMax = Math.Max(FramesHeldMax, field.Integer);
                    }
                }

                break;
        }
    }

    /// <summary>Closes the books at the end of the run: a stop or a freeze still open counts up to the end.</summary>
    public void Finish(double endS)
    {
        if (_stoppedSinceS is not null) EndStop(endS);
        if (_frozenSinceS is { } frozenSince)
        {
            TimeFrozenS += endS - frozenSince;
            _frozenSinceS = null;
        }
    }

    private void EndStop(double endS)
    {
        var length = endS - _stoppedSinceS!.Value;
        TimeStoppedS += length;
        LongestStopS = Math.Max(LongestStopS, length);
        _stoppedSinceS = null;
    }

    private static string Text(JournalRecord record, string name)
    {
        foreach (var field in record.Fields)
        {
            if (field.Name == name) return field.Text ?? "";
        }

        return "";
    }
}
