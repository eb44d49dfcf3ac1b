using DescentOps.Records;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Running;

/// <summary>
/// Derives <see cref="FaultMeasure"/>s from journal records as they are written.
/// <para>Detection is the first firing, at or after the fault began, of a rule whose condition reads a point the fault
/// affects (<see cref="AffectedPoints"/>), or of a rule the fault names in <c>detected_by</c>; a rule about something
/// else firing by chance is not a detection. The first action is the first command executed from such a rule.</para>
/// <para>Recovery is a sustained return: the good state must hold for <see cref="RecoveryHoldS"/> (or until the probe
/// reaches the ocean) and is dated from when it began. A power dip is recovered when the probe melts at 90 % or more of
/// the speed in the last frame before the fault (a rule of thumb of ours: "back to nominal" within a typical telemetry
/// noise band); a tilt fault when the tilt, having left 1 degree of vertical, is back within it. A station failure,
/// upset or relay failure recovers when the component reports itself working, a spool jam when frames go home by the
/// relays again, a vehicle loss when that vehicle next docks. A broken fibre never recovers. A sensor fault does not move
/// the physical state, so it has no recovery, only detection.</para>
/// </summary>
public sealed class FaultMeasures
{
    /// <summary>How long a recovered state must hold: 6 h, a rule of thumb of ours (several frames and longer than the usual transient).</summary>
    public const double RecoveryHoldS = 6 * 3600;

    private const double RecoveredSpeedShare = 0.9;

    /// <summary>Within one degree of vertical counts as upright (a rule of thumb of ours).</summary>
    private const double UprightRad = Math.PI / 180;

    private readonly List<Open> _faults = [];

    /// <summary>The rule that started each running procedure: its steps' commands act for that rule.</summary>
    private readonly Dictionary<string, string> _procedureStartedBy = new(StringComparer.Ordinal);
    private readonly IReadOnlyDictionary<string, IReadOnlyList<string>> _rulePoints;
    private readonly IReadOnlyDictionary<string, IReadOnlyList<string>> _detectedBy;
    private double _lastSpeedMPerS;

    /// <param name="rulePoints">Every rule's name and the points its condition reads.</param>
    /// <param name="detectedBy">Per fault name, the rules named as meant to detect it.</param>
    public FaultMeasures(IReadOnlyDictionary<string, IReadOnlyList<string>> rulePoints, IReadOnlyDictionary<string, IReadOnlyList<string>> detectedBy)
    {
        _rulePoints = rulePoints;
        _detectedBy = detectedBy;
    }

    public FaultMeasures()
        : this(new Dictionary<string, IReadOnlyList<string>>(), new Dictionary<string, IReadOnlyList<string>>())
    {
    }

    /// <summary>The telemetry points a fault of this kind changes, as the rules and the ground see them.</summary>
    public static IReadOnlyList<string> AffectedPoints(string kind, string point) => kind switch
    {
        "PowerDip" => ["probe.velocity", "probe.depth", "probe.head_power", "probe.wall_power", "probe.regime", "probe.bus_power_available", "probe.battery_soc"],
        "CloggedNozzle" => ["probe.velocity", "probe.depth", "probe.jet_power", "probe.regime"],
        "HeaterSegmentFailure" => ["probe.tilt", "probe.head_power"],
        "TiltKick" => ["probe.tilt"],
        "SensorStuck" or "SensorBias" or "SensorDropout" or "SensorNoise" => [point],
        "TetherBreak" or "SpoolJam" or "RelayFailure" => ["probe.buffer_fill"],
        _ => [],
    };

    /// <summary>
    /// The rule a command acts for: its origin, or, for a procedure's step ("procedure NAME, step STEP"), the rule that
    /// started the procedure, so a procedure a detecting rule started is that rule's action.
    /// </summary>
    private string ActingRule(string origin)
    {
        const string Prefix = "procedure ";
        if (!origin.StartsWith(Prefix, StringComparison.Ordinal)) return origin;
        var comma = origin.IndexOf(',', StringComparison.Ordinal);
        var procedure = comma < 0 ? origin[Prefix.Length..] : origin[Prefix.Length..comma];
        return _procedureStartedBy.GetValueOrDefault(procedure, origin);
    }

    public void Observe(JournalRecord record)
    {
        var t = record.Time.SecondsSinceEpoch;
        switch (record.Kind)
        {
            case FaultRecords.Injected:
                var name = Text(record, "fault");
                var kind = Text(record, "kind");
                var affected = AffectedPoints(kind, Text(record, "point"));
                var named = _detectedBy.GetValueOrDefault(name) ?? [];
                var relevant = _rulePoints.Where(r => named.Contains(r.Key) || r.Value.Any(affected.Contains)).Select(r => r.Key).ToHashSet(StringComparer.Ordinal);
                foreach (var rule in named) relevant.Add(rule);
                _faults.Add(new Open(name, kind, t, _lastSpeedMPerS, relevant) { Target = Text(record, "target") });
                break;
            case RuleRecords.Fired:
                var firing = Text(record, "rule");
                foreach (var f in _faults) if (f.DetectedS is null && t >= f.StartS && f.Rules.Contains(firing)) f.DetectedS = t;
                break;
            case ProcedureRecords.Started:
                _procedureStartedBy[Text(record, "procedure")] = Text(record, "by");
                break;
            case CommandRecords.Executed:
                var origin = ActingRule(Text(record, "origin"));
                foreach (var f in _faults) if (f.ActionS is null && t >= f.StartS && f.Rules.Contains(origin)) f.ActionS = t;
                break;
            case ProbeRecords.Telemetry:
                var speed = Number(record, "velocity_m_s");
                var tilt = Math.Abs(Number(record, "tilt_rad"));
                var regime = Text(record, "regime");
                foreach (var f in _faults)
                {
                    if (f.RecoveredS is not null || t <= f.StartS) continue;
                    if (f.Kind is "HeaterSegmentFailure" or "TiltKick")
                    {
                        if (tilt > UprightRad) f.LeftUpright = true;
                        if (f.LeftUpright) f.Sustain(t, tilt <= UprightRad, regime == "AtOcean");
                    }
                    else if (f.Kind is "PowerDip" or "CloggedNozzle")
                    {
                        f.Sustain(t, regime == "AtOcean" || (regime == "Melting" && speed >= RecoveredSpeedShare * f.SpeedBeforeMPerS), regime == "AtOcean");
                    }
                }

                _lastSpeedMPerS = speed;
                break;
            case VehicleRecords.Docked:
                foreach (var f in _faults.Where(f => f.Kind == "VehicleLoss" && f.RecoveredS is null && f.Target == record.Source.Name && t >= f.StartS)) f.RecoveredS = t;
                break;
            case RelayRecords.PathUp:
                foreach (var f in _faults.Where(f => f.Kind == "SpoolJam" && f.RecoveredS is null && t >= f.StartS)) f.RecoveredS = t;
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
                "PowerDip" or "CloggedNozzle" => "descent back to 90 % of its pre-fault speed, held 6 h",
                "StationFailure" => "station relaying again",
                "StationUpset" => "station recovered from the reset",
                "TetherBreak" => "none: a broken fibre stays broken",
                "SpoolJam" => "frames going home again by the relays (the fibre itself stays jammed)",
                "RelayFailure" => "the relay working again",
                "HeaterSegmentFailure" or "TiltKick" => "tilt back within 1 deg of vertical after leaving it, held 6 h",
                "VehicleLoss" => "the vehicle back in its dock",
                _ => "none: a sensor fault leaves the physical state alone",
            })
        {
            HasRecoveryMeasure = !f.Kind.StartsWith("Sensor", StringComparison.Ordinal),
        }),
    ];

    private static string Text(JournalRecord record, string name)
    {
        foreach (var field in record.Fields)
        {
            if (field.Name == name) return field.Text ?? "";
        }

        return "";
    }

    private static double Number(JournalRecord record, string name) => record.Fields.First(f => f.Name == name).Number;

    private sealed class Open(string name, string kind, double startS, double speedBeforeMPerS, HashSet<string> rules)
    {
        public string Name { get; } = name;
        public string Kind { get; } = kind;
        public double StartS { get; } = startS;
        public double SpeedBeforeMPerS { get; } = speedBeforeMPerS;
        public HashSet<string> Rules { get; } = rules;
        public double? DetectedS { get; set; }
        public double? ActionS { get; set; }
        public double? RecoveredS { get; set; }
        public bool LeftUpright { get; set; }
        public string Target { get; init; } = "";
        private double? GoodSinceS { get; set; }

        /// <summary>A good state counts once it has held <see cref="RecoveryHoldS"/>, or when the descent ends in the ocean while it holds.</summary>
        public void Sustain(double t, bool good, bool descentOver)
        {
            if (!good)
            {
                GoodSinceS = null;
                return;
            }

            GoodSinceS ??= t;
            if (t - GoodSinceS.Value >= RecoveryHoldS || descentOver) RecoveredS = GoodSinceS;
        }
    }
}
