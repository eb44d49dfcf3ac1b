using System.Globalization;
using DescentOps.Mission.Running;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Output;

/// <summary>What <c>descentops run</c> prints when a run ends: the summary as a table, or as one JSON object.</summary>
public static class RunSummaryOutput
{
    /// <summary>The <c>--json</c> answer: one object with the run's identity, figures and faults.</summary>
    public static void WriteJson(TextWriter output, Scenario scenario, long seed, double untilS, MissionSummary s, TimeSpan wall, string path) => JsonOutput.Write(output, w =>
    {
        w.WriteString("scenario", scenario.Name);
        w.WriteString("source", scenario.SourceName);
        w.WriteNumber("seed", seed);
        w.Number("until_s", untilS);
        w.WriteString("outcome", s.Outcome.Kind.ToString());
        w.WriteString("reason", s.Outcome.Reason);
        w.Number("simulated_time_s", s.FinalTimeS);
        w.Number("breakthrough_time_s", s.BreakthroughTimeS);
        w.Number("final_depth_m", s.FinalDepthM);
        w.Number("shell_thickness_m", scenario.Shell.ThicknessM);
        w.Number("energy_used_j", s.EnergyUsedJ);
        w.WriteNumber("faults_injected", s.FaultsInjected);
        w.WriteNumber("frames_sent", s.FramesSent);
        w.WriteNumber("frames_received_on_ground", s.FramesReceivedOnGround);
        w.WriteNumber("frames_lost", s.FramesLost);
        w.WriteNumber("vehicle_profiles", s.VehicleProfiles);
        w.WriteNumber("component_failures", s.ComponentFailures);
        w.WriteNumber("events_delivered", s.EventsDelivered);
        w.WriteNumber("records_written", s.RecordsWritten);
        w.Number("wall_time_s", wall.TotalSeconds);
        w.WriteString("log", path);
        w.WriteStartArray("faults");
        foreach (var f in s.Faults)
        {
            w.WriteStartObject();
            w.WriteString("fault", f.Fault);
            w.WriteString("kind", f.Kind);
            w.Number("start_s", f.StartS);
            w.Number("detected_after_s", f.DetectedAfterS);
            w.Number("first_action_after_s", f.FirstActionAfterS);
            w.Number("recovered_after_s", f.RecoveredAfterS);
            w.WriteString("recovery", f.Recovery.ToString());
            w.WriteEndObject();
        }

        w.WriteEndArray();
    });

    /// <summary>The table a person reads: one figure a line, then the criteria and the faults.</summary>
    public static void WriteText(TextWriter output, Scenario scenario, MissionSummary s, TimeSpan wall, string path)
    {
        ArgumentNullException.ThrowIfNull(output);
        var c = CultureInfo.InvariantCulture;
        var rows = new (string, string)[]
        {
            ("outcome", $"{s.Outcome.Kind}: {s.Outcome.Reason}"),
            ("simulated time", Days(s.FinalTimeS)),
            ("time to breakthrough", s.BreakthroughTimeS is { } b ? Days(b) : "not reached"),
            ("final depth", string.Create(c, $"{s.FinalDepthM:F1} m of {scenario.Shell.ThicknessM:F0} m")),
            ("energy used", string.Create(c, $"{s.EnergyUsedJ / 3.6e9:F2} MWh ({s.EnergyUsedJ:F0} J)")),
            ("faults injected", s.FaultsInjected.ToString(c)),
            ("telemetry frames", string.Create(c, $"{s.FramesSent} sent = {s.FramesReceivedOnGround} received on ground + {s.FramesLost} lost + {s.FramesHeldOrInFlight} held or in flight at the end")),
            ("time stopped", string.Create(c, $"{Hours(s.TimeStoppedS)} (longest {Hours(s.LongestStopS)}, frozen in {Hours(s.TimeFrozenS)})")),
            ("time blind", Hours(s.TimeBlindS) + " (the ground saw nothing of the probe)"),
            ("most frames held", s.FramesHeldMax.ToString(c)),
            ("vehicles lost", s.VehiclesLost.ToString(c)),
            ("vehicle profiles", s.VehicleProfiles.ToString(c)),
            ("component failures", s.ComponentFailures.ToString(c)),
            ("events", string.Create(c, $"{s.EventsDelivered} delivered, {s.RecordsWritten} logged")),
            ("wall time", string.Create(c, $"{wall.TotalSeconds:F2} s")),
            ("speed-up", string.Create(c, $"{s.FinalTimeS / Math.Max(wall.TotalSeconds, 1e-6):F0} x real time")),
            ("event log", path),
        };
        foreach (var (label, value) in rows) output.WriteLine($"  {label,-22}{value}");
        foreach (var criterion in s.Criteria)
        {
            output.WriteLine(string.Create(c, $"  criterion {criterion.Name,-13}{(criterion.Passed ? "met" : "NOT met")}: {criterion.Requirement} (measured {(criterion.Value is { } v ? v.ToString("G6", c) : "none")})"));
        }

        if (s.Criteria.Count > 0) output.WriteLine($"  {"success",-22}{(s.Success ? "yes" : "no")}");
        foreach (var f in s.Faults)
        {
            output.WriteLine(string.Create(c, $"  fault {f.Fault} ({f.Kind}, at {f.StartS / 86400:F3} d): detected {After(f.DetectedAfterS)}, first action {After(f.FirstActionAfterS)}, recovered {After(f.RecoveredAfterS)} [{f.Recovery}]"));
        }
    }

    private static string After(double? seconds) =>
        seconds is { } s ? string.Create(CultureInfo.InvariantCulture, $"after {s / 3600:F2} h") : "never";

    private static string Hours(double seconds) =>
        string.Create(CultureInfo.InvariantCulture, $"{seconds / 3600:F2} h");

    private static string Days(double seconds) =>
        string.Create(CultureInfo.InvariantCulture, $"{seconds / 86400:F3} d ({seconds:F0} s)");
}
