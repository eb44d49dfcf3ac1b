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
    private readonly FaultMeasures _faultMeasures;
    private readonly RunFigures _figures = new();
    private readonly GroundBlindness _blind = new();

    public MissionSummarySink(IJournalSink next)
        : this(next, new FaultMeasures())
    {
    }

    public MissionSummarySink(IJournalSink next, FaultMeasures faultMeasures)
    {
        _next = next;
        _faultMeasures = faultMeasures;
    }

    public void Write(JournalRecord record)
    {
        _next.Write(record);
        _faultMeasures.Observe(record);
        _figures.Observe(record);
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

    public MissionSummary Summarize(RunResult result)
    {
        _figures.Finish(result.FinalTime.SecondsSinceEpoch);
        return new MissionSummary(
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
            TimeStoppedS = _figures.TimeStoppedS,
            LongestStopS = _figures.LongestStopS,
            TimeFrozenS = _figures.TimeFrozenS,
            TimeBlindS = _blind.TotalS(),
            FramesHeldMax = _figures.FramesHeldMax,
            VehiclesLost = _figures.VehiclesLost,
            RuleFirings = new Dictionary<string, int>(_figures.RuleFirings, StringComparer.Ordinal),
        };
    }

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
