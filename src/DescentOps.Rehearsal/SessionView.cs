using System.Collections.Immutable;
using System.Globalization;
using System.Text;
using System.Text.Json;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Mission;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Rehearsal;

/// <summary>
/// Turns what the run journals, and the frames that reach the ground, into the two views. The supervisor sees every
/// event as it happens and the probe's true state. The team sees the frames as the ground receives them (late, with
/// gaps, with what lying sensors report) and learns of the rest as the ground would: at once for what happens on the
/// ground (its rules, its commands going out), and for anything further away (on board, in the link, at the station)
/// when a frame sampled at or after it arrives. Faults and the console's own inputs are never shown to the team.
/// </summary>
public sealed class SessionView : IJournalSink
{
    private readonly SessionFeed _feed;
    private readonly IReadOnlyList<RuleLimit> _limits;
    /// <summary>The fields of a procedure record the team's page shows, when the record has them.</summary>
    private static readonly string[] ProcedureFields = ["command", "evidence", "by", "next", "outcome", "reason"];

    private readonly List<(SimTime At, string Json)> _unlearned = [];

    public SessionView(SessionFeed feed, IReadOnlyList<RuleLimit> limits)
    {
        _feed = feed;
        _limits = limits;
    }

    /// <summary>The faults active now, by name.</summary>
    public ImmutableSortedSet<string> ActiveFaults { get; private set; } = [];

    /// <summary>The probe's true state in its last frame.</summary>
    public IReadOnlyDictionary<string, double> TrueState { get; private set; } = new Dictionary<string, double>();

    public string TrueRegime { get; private set; } = "";

    public void Write(JournalRecord record)
    {
        var t = record.Time.SecondsSinceEpoch;
        switch (record.Kind)
        {
            case "probe.telemetry":
                var values = record.Fields.Where(f => f.Kind is RecordFieldKind.Number or RecordFieldKind.Integer)
                    .ToDictionary(f => f.Name, f => f.Kind == RecordFieldKind.Number ? f.Number : f.Integer);
                TrueState = values;
                TrueRegime = record.Fields.FirstOrDefault(f => f.Name == "regime").Text ?? "";
                _feed.Add(false, Json(w =>
                {
                    w.WriteString("type", "truth");
                    w.WriteNumber("t", t);
                    w.WriteString("regime", TrueRegime);
                    WriteValues(w, values);
                }));
                return;
            case "fault.injected":
                ActiveFaults = ActiveFaults.Add(Text(record, "fault"));
                break;
            case "fault.cleared":
                ActiveFaults = ActiveFaults.Remove(Text(record, "fault"));
                break;
        }

        if (record.Severity >= Severity.Notice || record.Kind.StartsWith("fault.", StringComparison.Ordinal))
        {
            _feed.Add(false, EventJson(record, t, "truth-event"));
        }

        if (ProcedureStatus(record) is { } procedureStatus)
        {
            // The team's own procedures, learned at once (the ground runs them): step, status, evidence, deadline.
            Tell(record, Json(w =>
            {
                w.WriteString("type", "procedure");
                w.WriteNumber("at", t);
                w.WriteString("procedure", Text(record, "procedure"));
                w.WriteString("step", Text(record, "step"));
                w.WriteString("status", procedureStatus);
                w.WriteBoolean("awaiting", record.Kind == ProcedureRecords.StepAwaitsAnswer);
                foreach (var name in ProcedureFields)
                {
                    if (record.Fields.Any(f => f.Name == name)) w.WriteString(name, Text(record, name));
                }

                if (record.Fields.FirstOrDefault(f => f.Name == "late_at_s") is { Name: not null } late) w.WriteNumber("late_at", late.Number);
            }));
        }

        if (CommandStatus(record) is { } status)
        {
            var number = Text(record, "origin")["console-".Length..];
            var json = Json(w =>
            {
                w.WriteString("type", "command");
                w.WriteString("number", number);
                w.WriteString("status", status);
                w.WriteNumber("at", t);
                w.WriteString("command", Text(record, "command"));
            });
            Tell(record, json);
        }

        if (record.Severity < Severity.Notice || record.Kind.StartsWith("fault.", StringComparison.Ordinal) || record.Kind.StartsWith("operator.", StringComparison.Ordinal))
        {
            return;
        }

        Tell(record, EventJson(record, t, "event"));
    }

    /// <summary>An event delivered to a component: a frame reaching the ground is the team's telemetry.</summary>
    public void Delivered(SimTime now, ComponentId target, object payload)
    {
        if (target != MissionIds.Ground || payload is not TelemetryFrame frame) return;
        var readings = frame.Readings.ToDictionary(r => r.Point, r => r.Value);
        _feed.Add(true, Json(w =>
        {
            w.WriteString("type", "frame");
            w.WriteNumber("t", now.SecondsSinceEpoch);
            w.WriteNumber("sampled", frame.SampledAt.SecondsSinceEpoch);
            w.WriteNumber("frame", frame.Sequence);
            w.WriteString("regime", frame.Regime);
            WriteValues(w, readings);
            w.WriteStartArray("limits");
            foreach (var limit in _limits)
            {
                w.WriteStartObject();
                w.WriteString("rule", limit.Rule);
                w.WriteString("placement", limit.Placement);
                w.WriteString("check", limit.Describe());
                if (limit.Crossed(readings) is { } crossed) w.WriteBoolean("crossed", crossed);
                else w.WriteNull("crossed");
                w.WriteEndObject();
            }

            w.WriteEndArray();
        }));

        // Everything that happened out there up to the frame's sampling is known now.
        var learned = _unlearned.Where(u => u.At <= frame.SampledAt).ToList();
        _unlearned.RemoveAll(u => u.At <= frame.SampledAt);
        foreach (var (at, json) in learned) _feed.Add(true, json.Insert(json.Length - 1, string.Create(CultureInfo.InvariantCulture, $",\"learned\":{now.SecondsSinceEpoch:R}")));
    }

    /// <summary>A mark or any other note for the supervisor alone.</summary>
    public void Note(string type, double t, string text) => _feed.Add(false, Json(w =>
    {
        w.WriteString("type", type);
        w.WriteNumber("t", t);
        w.WriteString("text", text);
    }));

    private void Tell(JournalRecord record, string json)
    {
        if (record.Source == MissionIds.Ground || record.Source == OperatorDeskComponent.DeskId)
        {
            _feed.Add(true, json.Insert(json.Length - 1, string.Create(CultureInfo.InvariantCulture, $",\"learned\":{record.Time.SecondsSinceEpoch:R}")));
        }
        else
        {
            _unlearned.Add((record.Time, json));
        }
    }

    /// <summary>What a procedure record says of its step, in the console's words; null for other records.</summary>
    private static string? ProcedureStatus(JournalRecord record) => record.Kind switch
    {
        ProcedureRecords.Started => "started",
        ProcedureRecords.StepStarted => "running",
        ProcedureRecords.StepAwaitsAnswer => "waiting for confirmation",
        ProcedureRecords.StepConfirmed => "confirmed",
        ProcedureRecords.StepSkipped => "skipped",
        ProcedureRecords.StepPassed => "passed",
        ProcedureRecords.StepFailed => "failed",
        ProcedureRecords.StepLate => "late",
        ProcedureRecords.AnswerIgnored => "answer ignored",
        ProcedureRecords.Finished => "finished",
        _ => null,
    };

    private static string? CommandStatus(JournalRecord record)
    {
        var origin = record.Fields.FirstOrDefault(f => f.Name == "origin").Text;
        if (origin is null || !origin.StartsWith("console-", StringComparison.Ordinal)) return null;
        return record.Kind switch
        {
            "command.sent" => "on its way to the station",
            "station.command_queued" => "queued at the station",
            "station.command_released" => "on its way from the station",
            "command.executed" => "executed",
            "command.lost" or "data.lost" => "lost",
            _ => null,
        };
    }

    private static string EventJson(JournalRecord record, double t, string type) => Json(w =>
    {
        w.WriteString("type", type);
        w.WriteNumber("at", t);
        w.WriteString("source", record.Source.Name);
        w.WriteString("kind", record.Kind);
        w.WriteString("severity", record.Severity.ToString().ToLowerInvariant());
        w.WriteString("text", string.Join(", ", record.Fields.Select(f => f.ToString())));
    });

    private static void WriteValues(Utf8JsonWriter w, IReadOnlyDictionary<string, double> values)
    {
        w.WriteStartObject("values");
        foreach (var (name, value) in values)
        {
            if (double.IsFinite(value)) w.WriteNumber(name, value);
            else w.WriteNull(name);
        }

        w.WriteEndObject();
    }

    private static string Text(JournalRecord record, string name) => record.Fields.FirstOrDefault(f => f.Name == name).Text ?? "";

    private static string Json(Action<Utf8JsonWriter> body)
    {
        using var stream = new MemoryStream();
        using (var writer = new Utf8JsonWriter(stream))
        {
            writer.WriteStartObject();
            body(writer);
            writer.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray());
    }
}
