using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Running;

/// <summary>
/// The running figures of a set of records: every record of a run (the mission's summary) or those of one lander.
/// Whether the probe ever froze in and whether the station is dead at the end are kept beside the summary's figures.
/// </summary>
public sealed class SummaryTally
{
    public double? BreakthroughS { get; private set; }
    public double DepthM { get; private set; }
    public double EnergyJ { get; private set; }
    public int FaultsInjected { get; private set; }
    public long FramesSent { get; private set; }
    public long FramesReceived { get; private set; }
    public long FramesLost { get; private set; }
    public int VehicleProfiles { get; private set; }

    /// <summary>The probe entered the frozen-in regime at least once.</summary>
    public bool FrozeIn { get; private set; }

    /// <summary>The station failed and had not recovered when the records ended.</summary>
    public bool StationDead { get; private set; }

    public RunFigures Figures { get; } = new();
    public GroundBlindness Blind { get; } = new();

    public void Observe(JournalRecord record)
    {
        Figures.Observe(record);
        switch (record.Kind)
        {
            case ProbeRecords.Telemetry:
                FramesSent++;
                Blind.FrameSent(record.Time.SecondsSinceEpoch);
                DepthM = Field(record, "depth_m");
                EnergyJ = Field(record, "energy_used_j");
                break;
            case ProbeRecords.Breakthrough:
                BreakthroughS = record.Time.SecondsSinceEpoch;
                DepthM = Field(record, "depth_m");
                EnergyJ = Field(record, "energy_used_j");
                break;
            case ProbeRecords.MissionComplete:
                EnergyJ = Field(record, "energy_used_j");
                break;
            case ProbeRecords.Regime when Text(record, "to") == "FrozenIn":
                FrozeIn = true;
                break;
            case StationRecords.Failed:
                StationDead = true;
                break;
            case StationRecords.Recovered:
                StationDead = false;
                break;
            case GroundRecords.Telemetry:
                FramesReceived++;
                Blind.FrameReceived(record.Time.SecondsSinceEpoch, Field(record, "latency_s"));
                break;
            case DataRecords.Lost when Text(record, "kind") == "telemetry":
            case StationRecords.FrameLost:
                FramesLost++;
                break;
            case StationRecords.DataLost when Text(record, "data") == "telemetry":
                FramesLost += record.Fields.First(f => f.Name == "count").Integer;
                break;
            case FaultRecords.Injected:
                FaultsInjected++;
                break;
            case VehicleRecords.Profile:
                VehicleProfiles++;
                break;
        }
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
