using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Running;

/// <summary>
/// Passes every record on to the journal and keeps the running figures the summary needs, so the summary
/// says nothing the log does not.
/// </summary>
public sealed class MissionSummarySink : IJournalSink
{
    private readonly IJournalSink _next;
    private double? _breakthroughS;
    private double _depthM;
    private double _energyJ;
    private int _faults;
    private long _framesSent;
    private long _framesReceived;
    private long _framesLost;
    private int _profiles;
    private readonly FaultMeasures _faultMeasures = new();
    private readonly GroundBlindness _blind = new();
    private double _timeStoppedS;
    private double? _stoppedSinceS;

    public MissionSummarySink(IJournalSink next) => _next = next;

    public void Write(JournalRecord record)
    {
        _next.Write(record);
        _faultMeasures.Observe(record);
        switch (record.Kind)
        {
            case ProbeRecords.Telemetry:
                _framesSent++;
                _blind.FrameSent(record.Time.SecondsSinceEpoch);
                _depthM = Field(record, "depth_m");
                _energyJ = Field(record, "energy_used_j");
                break;
            case ProbeRecords.Breakthrough:
                _breakthroughS = record.Time.SecondsSinceEpoch;
                _depthM = Field(record, "depth_m");
                _energyJ = Field(record, "energy_used_j");
                break;
            case ProbeRecords.MissionComplete:
                _energyJ = Field(record, "energy_used_j");
                break;
            case GroundRecords.Telemetry:
                _framesReceived++;
                _blind.FrameReceived(record.Time.SecondsSinceEpoch, Field(record, "latency_s"));
                break;
            case "probe.regime":
                var stoppedNow = IsStopped(Text(record, "to"));
                if (stoppedNow && _stoppedSinceS is null) _stoppedSinceS = record.Time.SecondsSinceEpoch;
                if (!stoppedNow && _stoppedSinceS is { } since)
                {
                    _timeStoppedS += record.Time.SecondsSinceEpoch - since;
                    _stoppedSinceS = null;
                }

                break;
            case DataRecords.Lost when Text(record, "kind") == "telemetry":
            case StationRecords.FrameLost:
                _framesLost++;
                break;
            case StationRecords.DataLost when Text(record, "data") == "telemetry":
                _framesLost += record.Fields.First(f => f.Name == "count").Integer;
                break;
            case FaultRecords.Injected:
                _faults++;
                break;
            case VehicleRecords.Profile:
                _profiles++;
                break;
        }
    }

    /// <summary>The probe is not descending: stopped by a command or a shed head, or frozen in.</summary>
    private static bool IsStopped(string? regime) => regime is "Stopped" or "FrozenIn";

    public MissionSummary Summarize(RunResult result) => new(
        result.Outcome,
        result.FinalTime.SecondsSinceEpoch,
        _breakthroughS,
        _depthM,
        _energyJ,
        _faults,
        _framesSent,
        _framesReceived,
        _framesLost,
        _profiles,
        result.EventsDelivered,
        result.RecordsWritten,
        result.ComponentFailures,
        _faultMeasures.Measures())
    {
        TimeStoppedS = _timeStoppedS + (_stoppedSinceS is { } since ? result.FinalTime.SecondsSinceEpoch - since : 0),
        TimeBlindS = _blind.TotalS(),
    };

    private static string? Text(JournalRecord record, string name) => record.Fields.Where(f => f.Name == name).Select(f => f.Text).FirstOrDefault();

    private static double Field(JournalRecord record, string name)
    {
        foreach (var field in record.Fields)
        {
            if (field.Name == name) return field.Number;
        }

        throw new InvalidOperationException($"Record {record.Kind} has no field '{name}'.");
    }
}
