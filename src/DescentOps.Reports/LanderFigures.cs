using DescentOps.Journal;
using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Reports;

/// <summary>
/// One lander's figures in a run with landers, gathered from its records as they stream past: how deep its probe got
/// and when it broke through, what its team heard of it and when last, and the frames lost on its way home.
/// </summary>
public sealed class LanderFigures(string name)
{
    public string Name { get; } = name;

    public double? FinalDepthM { get; private set; }

    public string? FinalRegime { get; private set; }

    public double? BreakthroughTimeS { get; private set; }

    public long FramesSent { get; private set; }

    public long FramesOnGround { get; private set; }

    public double? LastHeardS { get; private set; }

    public long FramesLost { get; private set; }

    public long FaultsInjected { get; private set; }

    public bool StationFailed { get; private set; }

    internal void Add(EventEntry e)
    {
        switch (e.Kind)
        {
            case ProbeRecords.Telemetry:
                FramesSent++;
                FinalDepthM = Number(e, "depth_m") ?? FinalDepthM;
                FinalRegime = Text(e, "regime") ?? FinalRegime;
                break;
            case ProbeRecords.Breakthrough:
                BreakthroughTimeS ??= e.TimeSeconds;
                break;
            case GroundRecords.Telemetry:
                FramesOnGround++;
                LastHeardS = e.TimeSeconds;
                break;
            case StationRecords.DataLost when Text(e, "data") == "telemetry":
                FramesLost += (long)(Number(e, "count") ?? 1);
                break;
            case StationRecords.FrameLost:
                FramesLost++;
                break;
            case DataRecords.Lost when Text(e, "kind") == "telemetry":
                FramesLost++;
                break;
            case FaultRecords.Injected:
                FaultsInjected++;
                break;
            case StationRecords.Failed:
                StationFailed = true;
                break;
        }
    }

    private static double? Number(EventEntry e, string name)
    {
        foreach (var f in e.Data)
        {
            if (f.Name != name) continue;
            return f.Kind switch { RecordFieldKind.Number => f.Number, RecordFieldKind.Integer => f.Integer, _ => null };
        }

        return null;
    }

    private static string? Text(EventEntry e, string name)
    {
        foreach (var f in e.Data)
        {
            if (f.Name == name && f.Kind == RecordFieldKind.Text) return f.Text;
        }

        return null;
    }
}
