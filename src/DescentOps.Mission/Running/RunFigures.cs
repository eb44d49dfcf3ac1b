using DescentOps.Engine.Journaling;

namespace DescentOps.Mission.Running;

/// <summary>
/// The figures that say what a run cost besides its outcome, from the journal records: time the probe stood still
/// (stopped or frozen in, after it first moved and before the ocean) and its longest stop, time held frozen, time the
/// ground was blind (every gap between frames arriving home longer than three telemetry intervals counts whole, and so
/// does such a gap at the end of the run), the most frames held at once in the link's buffers, vehicles lost, and each
/// rule's firings.
/// </summary>
public sealed class RunFigures(double telemetryIntervalS)
{
    private readonly double _blindAfterS = 3 * telemetryIntervalS;
    private readonly Dictionary<string, int> _firings = new(StringComparer.Ordinal);
    private double? _lastFrameS;
    private string _lastRegime = "";
    private bool _moved;
    private double _currentStopS;
    private double? _lastGroundS;
    private double? _firstFrameS;

    public double TimeStoppedS { get; private set; }
    public double LongestStopS { get; private set; }
    public double TimeFrozenS { get; private set; }
    public double TimeBlindS { get; private set; }
    public long FramesHeldMax { get; private set; }
    public int VehiclesLost { get; private set; }

    public IReadOnlyDictionary<string, int> RuleFirings => _firings;

    public void Observe(JournalRecord record)
    {
        var t = record.Time.SecondsSinceEpoch;
        switch (record.Kind)
        {
            case "probe.telemetry":
                if (_lastFrameS is { } previous && _moved && _lastRegime is "Stopped" or "FrozenIn")
                {
                    var dt = t - previous;
                    TimeStoppedS += dt;
                    if (_lastRegime == "FrozenIn") TimeFrozenS += dt;
                    _currentStopS += dt;
                    LongestStopS = Math.Max(LongestStopS, _currentStopS);
                }
                else
                {
                    _currentStopS = 0;
                }

                _lastFrameS = t;
                _lastRegime = Text(record, "regime");
                _moved |= Number(record, "depth_m") > 0;
                _firstFrameS ??= t;
                break;
            case "ground.telemetry":
                if (_lastGroundS is { } last && t - last > _blindAfterS) TimeBlindS += t - last;
                _lastGroundS = t;
                break;
            case "vehicle.lost":
                VehiclesLost++;
                break;
            case "rule.fired":
                var rule = Text(record, "rule");
                _firings[rule] = _firings.GetValueOrDefault(rule) + 1;
                break;
            default:
                if (record.Kind.StartsWith("relay.", StringComparison.Ordinal) || record.Kind.StartsWith("tether.", StringComparison.Ordinal) || record.Kind == "data.lost")
                {
                    foreach (var field in record.Fields)
                    {
                        if (field.Name == "frames_held") FramesHeldMax = Math.Max(FramesHeldMax, field.Integer);
                    }
                }

                break;
        }
    }

    /// <summary>
    /// Closes the books at the end of the run: a blind stretch still open counts, and a ground that never heard a frame
    /// was blind from the first frame on. Gaps are counted from the first frame home, so the light time is not blindness.
    /// </summary>
    public void Finish(double endS)
    {
        if (_lastGroundS is { } last && endS - last > _blindAfterS) TimeBlindS += endS - last;
        else if (_lastGroundS is null && _firstFrameS is { } first && endS - first > _blindAfterS) TimeBlindS += endS - first;
        _lastGroundS = endS;
    }

    private static string Text(JournalRecord record, string name)
    {
        foreach (var field in record.Fields)
        {
            if (field.Name == name) return field.Text ?? "";
        }

        return "";
    }

    private static double Number(JournalRecord record, string name)
    {
        foreach (var field in record.Fields)
        {
            if (field.Name == name) return field.Number;
        }

        return 0;
    }
}
