using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Running;

/// <summary>
/// Derives <see cref="FaultMeasure"/>s from journal records as they are written. Recovery, by fault kind:
/// a power dip is recovered when a frame shows the probe melting at 90 % or more of the speed in the last frame
/// before the fault (a rule of thumb of ours: "back to nominal" within a typical telemetry noise band); a station
/// failure when the station reports recovered; a tilt fault when the tilt, having left 1 degree of vertical, is
/// back within it; a vehicle loss when that vehicle next docks (never if it is lost); a tether break never (no relays yet); a sensor fault does not
/// move the physical state, so it has no recovery, only detection.
/// </summary>
public sealed class FaultMeasures
{
    private const double RecoveredSpeedShare = 0.9;

    /// <summary>Within one degree of vertical counts as upright (a rule of thumb of ours).</summary>
    private const double UprightRad = Math.PI / 180;

    private readonly List<Open> _faults = [];
    private double _lastSpeedMPerS;

    public void Observe(JournalRecord record)
    {
        var t = record.Time.SecondsSinceEpoch;
        switch (record.Kind)
        {
            case FaultRecords.Injected:
                _faults.Add(new Open(Text(record, "fault"), Text(record, "kind"), t, _lastSpeedMPerS) { Target = Text(record, "target") });
                break;
            case RuleRecords.Fired:
                foreach (var f in _faults) f.DetectedS ??= t > f.StartS || t == f.StartS ? t : null;
                break;
            case CommandRecords.Executed:
                foreach (var f in _faults) f.ActionS ??= t >= f.StartS ? t : null;
                break;
            case ProbeRecords.Telemetry:
                var speed = Number(record, "velocity_m_s");
                var tilt = Math.Abs(Number(record, "tilt_rad"));
                foreach (var f in _faults.Where(f => f.Kind is "HeaterSegmentFailure" or "TiltKick" && f.RecoveredS is null && t > f.StartS))
                {
                    if (tilt > UprightRad) f.LeftUpright = true;
                    else if (f.LeftUpright) f.RecoveredS = t;
                }

                foreach (var f in _faults.Where(f => f.Kind is "PowerDip" or "CloggedNozzle" && f.RecoveredS is null && t > f.StartS))
                {
                    if (Text(record, "regime") == "Melting" && speed >= RecoveredSpeedShare * f.SpeedBeforeMPerS) f.RecoveredS = t;
                }

                _lastSpeedMPerS = speed;
                break;
            case VehicleRecords.Docked:
                foreach (var f in _faults.Where(f => f.Kind == "VehicleLoss" && f.RecoveredS is null && f.Target == record.Source.Name && t >= f.StartS)) f.RecoveredS = t;
                break;
            case RelayRecords.PathUp:
                foreach (var f in _faults.Where(f => f.Kind is "TetherBreak" or "SpoolJam" && f.RecoveredS is null && t >= f.StartS)) f.RecoveredS = t;
                break;
            case RelayRecords.Recovered:
                foreach (var f in _faults.Where(f => f.Kind == "RelayFailure" && f.RecoveredS is null && f.Name == Text(record, "fault"))) f.RecoveredS = t;
                break;
            case StationRecords.Recovered:
                foreach (var f in _faults.Where(f => f.Kind == "StationFailure" && f.RecoveredS is null)) f.RecoveredS = t;
                break;
            case StationRecords.UpsetRecovered:
                foreach (var f in _faults.Where(f => f.Kind == "StationUpset" && f.RecoveredS is null && t > f.StartS)) f.RecoveredS = t;
                break;
        }
    }

    public IReadOnlyList<FaultMeasure> Measures() =>
    [
        .. _faults.Select(f => new FaultMeasure(
            f.Name,
            f.Kind,
            f.StartS,
            f.DetectedS - f.StartS,
            f.ActionS - f.StartS,
            f.RecoveredS - f.StartS,
            f.Kind switch
            {
                "PowerDip" or "CloggedNozzle" => "descent back to 90 % of its pre-fault speed",
                "StationFailure" => "station relaying again",
                "StationUpset" => "station recovered from the reset",
                "TetherBreak" => "none: a broken fibre stays broken",
                "TetherBreak" or "SpoolJam" => "frames going home again by the relays (the fibre itself stays broken)",
                "RelayFailure" => "the relay working again",
                "HeaterSegmentFailure" or "TiltKick" => "tilt back within 1 deg of vertical after leaving it",
                "VehicleLoss" => "the vehicle back in its dock",
                _ => "none: a sensor fault leaves the physical state alone",
            })),
    ];

    private static string Text(JournalRecord record, string name) => record.Fields.First(f => f.Name == name).Text ?? "";

    private static double Number(JournalRecord record, string name) => record.Fields.First(f => f.Name == name).Number;

    private sealed class Open(string name, string kind, double startS, double speedBeforeMPerS)
    {
        public string Name { get; } = name;
        public string Kind { get; } = kind;
        public double StartS { get; } = startS;
        public double SpeedBeforeMPerS { get; } = speedBeforeMPerS;
        public double? DetectedS { get; set; }
        public double? ActionS { get; set; }
        public double? RecoveredS { get; set; }
        public bool LeftUpright { get; set; }
        public string Target { get; init; } = "";
    }
}
