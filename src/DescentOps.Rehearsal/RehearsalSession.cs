using System.Globalization;
using System.Text.Json;
using System.Text.Json.Nodes;
using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Catalogue;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// One rehearsal: the mission on the stepped kernel, paced by a <see cref="PaceClock"/>, with the console's inputs
/// checked as they are offered, queued, and handed to the simulation at the next tick just after the instant reached.
/// Pure and thread-safe: the web layer offers inputs from its request threads and calls <see cref="Tick"/> with the wall
/// time from its own clock; nothing here reads a clock.
/// </summary>
public sealed class RehearsalSession
{
    private const int MaxNoteLength = 500;

    private readonly object _gate = new();
    private readonly SessionSetup _setup;
    private readonly SteppedKernel _kernel;
    private readonly PreparedRun _prepared;
    private readonly MissionSummarySink _summary;
    private readonly SessionView _view;
    private readonly TelemetryCatalogue _catalogue;
    private readonly List<OperatorInput> _queued = [];
    private readonly HashSet<string> _faultNames = [];
    private readonly SimTime _until;
    private PaceClock? _clock;
    private long _nextNumber;
    private bool _endQueued;

    public RehearsalSession(SessionSetup setup)
    {
        _setup = setup;
        Scenario = setup.Scenario;
        _catalogue = MissionCatalogue.For(setup.Scenario);
        Limits = RuleLimit.Of(MissionRules.Compile(setup.Scenario), _catalogue);
        _view = new SessionView(Feed, Limits);
        _prepared = PreparedRun.For(setup.Scenario, setup.Manifest.Seed);
        _summary = _prepared.SummarySink(new Tee(setup.Journal, _view));
        _until = SimTime.FromSecondsSinceEpoch(setup.Manifest.UntilSeconds);
        var additions = RehearsalLog.Additions(setup.Scenario, setup.PriorInputs);
        _kernel = new SteppedKernel(new KernelSetup([.. MissionAssembly.Components(_prepared.Scenario, _prepared.Rules), .. additions.Components], setup.Manifest.Seed, _until, _summary)
        {
            Inputs = additions.Inputs,
        });
        _kernel.Delivered = _view.Delivered;
        _nextNumber = 1 + setup.PriorInputs.Select(i => ((OperatorInput)i.Payload).Number).DefaultIfEmpty(0).Max();
        foreach (var prior in setup.PriorInputs.Select(i => (OperatorInput)i.Payload).Where(i => i.Kind == OperatorInputKind.Fault))
        {
            if (JsonNode.Parse(prior.Body)?["name"]?.GetValue<string>() is { } name) _faultNames.Add(name);
        }
    }

    public Scenario Scenario { get; }

    private SessionFeed Feed { get; } = new();

    public IReadOnlyList<RuleLimit> Limits { get; }

    public RunManifest Manifest => _setup.Manifest;

    /// <summary>Set once the run has ended and its log is complete.</summary>
    public MissionSummary? Result { get; private set; }

    /// <summary>The simulated time the session has reached (every event up to it handled).</summary>
    public double NowS { get; private set; }

    public double Pace => _clock?.Pace ?? _setup.Pace;

    public bool Paused => _clock?.Paused ?? _setup.StartPaused;

    public bool Ended => Result is not null;

    /// <summary>
    /// Re-runs to the starting instant as fast as it goes (a continued run), then starts the clock at
    /// <paramref name="wallS"/>. Call once, before the first tick.
    /// </summary>
    public void Start(double wallS)
    {
        lock (_gate)
        {
            if (_clock is not null) throw new InvalidOperationException("The session has started already.");
            var from = _setup.FromAtS is { } at ? SimTime.FromSecondsSinceEpoch(at) : SimTime.Epoch;
            _kernel.RunUntil(from);
            NowS = from.SecondsSinceEpoch;
            _clock = new PaceClock(NowS, _setup.Pace, _setup.StartPaused, wallS);
            FinishIfOver();
        }
    }

    /// <summary>Moves the simulation to where the clock says it is at <paramref name="wallS"/> and hands over the queued inputs.</summary>
    public void Tick(double wallS)
    {
        lock (_gate)
        {
            if (_clock is null || Ended) return;
            var target = SimTime.Min(SimTime.FromSecondsSinceEpoch(_clock.SimAt(wallS)), _until);
            if (target < _kernel.Now) target = _kernel.Now;
            _kernel.RunUntil(target, _setup.MaxRoundsPerTick);
            if (_kernel.HasRoundBy(target))
            {
                // Fell behind: the pace is not reachable; carry on from where the simulation is.
                target = _kernel.Now;
                _clock.Rebase(target.SecondsSinceEpoch, wallS);
            }

            NowS = target.SecondsSinceEpoch;
            HandOver(target, wallS);
            FinishIfOver();
        }
    }

    /// <summary>What is new in the feed for a view since <paramref name="cursor"/>; returns the next cursor.</summary>
    public long ReadFeed(long cursor, bool supervisor, int max, List<string> into)
    {
        lock (_gate)
        {
            return Feed.Since(cursor, supervisor, max, into);
        }
    }

    /// <summary>A fault to inject (its scenario fields), or <c>{"clear": NAME}</c> to end an active fault now.</summary>
    public InputResult OfferFault(JsonObject body) => body.ContainsKey("clear") ? OfferClear(body) : Offer(() =>
    {
        var json = body.ToJsonString();
        var fault = FaultEntry.Parse(json, Scenario, NowS, _faultNames, out var error);
        if (fault is null) return InputResult.Bad(error);
        _faultNames.Add(fault.Name);
        return Queue(OperatorInputKind.Fault, json);
    });

    private InputResult OfferClear(JsonObject body) => Offer(() =>
    {
        if (body.Count != 1) return InputResult.Bad("clear: give only the name of the fault to clear");
        if (!TryText(body, "clear", 200, out var name, out var error)) return InputResult.Bad(error);
        if (!_view.ActiveFaults.Contains(name)) return InputResult.Bad($"name: no active fault is named '{name}'");
        return Queue(OperatorInputKind.Clear, new JsonObject { ["name"] = name }.ToJsonString());
    });

    public InputResult OfferCommand(JsonObject body) => Offer(() =>
    {
        if (!TryText(body, "text", CommandEntry.MaxLength, out var text, out var error)) return InputResult.Bad(error);
        if (CommandEntry.Check(text, _catalogue, out var located) is null) return InputResult.Refused(located);
        return Queue(OperatorInputKind.Command, new JsonObject { ["text"] = text }.ToJsonString());
    });

    /// <summary>A person's answer to a procedure's step: <c>{"procedure", "step", "answer": "confirm"|"skip", "by"}</c>.</summary>
    public InputResult OfferStep(JsonObject body) => Offer(() =>
        StepAnswer.Check(body, Scenario, out var canonical) is { } error ? InputResult.Bad(error) : Queue(OperatorInputKind.Step, canonical));

    public InputResult OfferPace(JsonObject body) => Offer(() =>
    {
        var canonical = new JsonObject();
        if (body.ContainsKey("pace"))
        {
            if (body["pace"] is not JsonValue v || !v.TryGetValue<double>(out var pace) || !PaceClock.IsValidPace(pace))
            {
                return InputResult.Bad(string.Create(CultureInfo.InvariantCulture, $"pace: a number of simulated seconds per second, above 0 and at most {PaceClock.MaxPace:R}"));
            }

            canonical["pace"] = pace;
        }

        if (body.ContainsKey("paused"))
        {
            if (body["paused"] is not JsonValue p || p.GetValueKind() is not (JsonValueKind.True or JsonValueKind.False))
            {
                return InputResult.Bad("paused: true or false");
            }

            canonical["paused"] = p.GetValue<bool>();
        }

        if (canonical.Count == 0) return InputResult.Bad("pace: give 'pace' (simulated seconds per second) or 'paused' (true or false)");
        if (body.Select(p => p.Key).FirstOrDefault(k => k is not ("pace" or "paused")) is { } stray) return InputResult.Bad($"{stray}: not a field of a pace change");
        return Queue(OperatorInputKind.Pace, canonical.ToJsonString());
    });

    public InputResult OfferMark(JsonObject body) => Offer(() =>
    {
        if (!TryText(body, "note", MaxNoteLength, out var note, out var error)) return InputResult.Bad(error);
        return Queue(OperatorInputKind.Mark, new JsonObject { ["note"] = note }.ToJsonString());
    });

    /// <summary>Ends the session at the next tick, paused or not; the log is complete once <see cref="Ended"/>.</summary>
    public InputResult End() => Offer(() =>
    {
        if (_endQueued) return InputResult.Accepted(0);
        _endQueued = true;
        return Queue(OperatorInputKind.End, "{}");
    });

    /// <summary>The state of the session as the API's <c>GET /api/session</c> gives it.</summary>
    public JsonObject Describe(bool supervisor)
    {
        lock (_gate)
        {
            var o = new JsonObject
            {
                ["scenario"] = Scenario.Name,
                ["t_s"] = NowS,
                ["pace"] = Pace,
                ["paused"] = Paused,
                ["ended"] = Ended,
                ["outcome"] = Result is { } r ? $"{r.Outcome.Kind}: {r.Outcome.Reason}" : _kernel.Outcome is { } o2 ? $"{o2.Kind}: {o2.Reason}" : "running",
                ["until_s"] = _until.SecondsSinceEpoch,
                ["uplink_s"] = Scenario.Body.DistanceToGroundM / Mission.Station.StationComponent.SpeedOfLightMPerS,
                ["commands"] = new JsonArray([.. CommandWords()]),
                ["limits"] = new JsonArray([.. Limits.Select(l => (JsonNode)new JsonObject { ["rule"] = l.Rule, ["placement"] = l.Placement, ["check"] = l.Describe() })]),
            };
            if (supervisor)
            {
                o["fault_kinds"] = FaultCatalogue.Json();
                o["scheduled_faults"] = new JsonArray([.. Scenario.Faults.Select(Scheduled)]);
                o["active_faults"] = new JsonArray([.. _view.ActiveFaults.Select(n => (JsonNode)n)]);
                o["vehicles"] = new JsonArray([.. Scenario.Vehicles.Select(v => (JsonNode)v.Name)]);
                o["points"] = new JsonArray([.. FaultCatalogue.SensorPoints.Where(p => _catalogue.FindPoint(p) is not null).Select(p => (JsonNode)p)]);
                o["depth_m"] = _view.TrueState.TryGetValue("depth_m", out var depth) ? depth : 0;
                o["regime"] = _view.TrueRegime;
            }

            return o;
        }
    }

    private IEnumerable<JsonNode> CommandWords()
    {
        string[] targets = [MissionCatalogue.Head, MissionCatalogue.Wall, MissionCatalogue.Bus, Mission.MissionIds.Probe.Name, .. Scenario.Vehicles.Select(v => Mission.MissionIds.Vehicle(v.Name).Name)];
        foreach (var target in targets.Where(_catalogue.HasTarget))
        {
            foreach (var command in _catalogue.CommandsOf(target)) yield return $"send {target} {command}";
        }
    }

    private static JsonNode Scheduled(FaultModel f) => new JsonObject
    {
        ["name"] = f.Name,
        ["kind"] = FaultCatalogue.Word(f.Kind),
        ["starts"] = f.Start switch
        {
            FaultStart.AtTime time => string.Create(CultureInfo.InvariantCulture, $"at {time.AtS / 86400:0.###} d"),
            FaultStart.AtDepth depth => string.Create(CultureInfo.InvariantCulture, $"at {depth.DepthM:0.#} m"),
            FaultStart.OnCondition condition => "when " + condition.When,
            FaultStart.AtRandom random => string.Create(CultureInfo.InvariantCulture, $"at random, every {random.MeanIntervalS / 86400:0.###} d on average"),
            _ => throw new System.Diagnostics.UnreachableException($"Fault start {f.Start.GetType().Name} has no wording."),
        },
        ["duration_s"] = f.DurationS,
    };

    private InputResult Offer(Func<InputResult> offer)
    {
        lock (_gate)
        {
            return Ended || _endQueued && _queued.Count == 0 && _kernel.Outcome is not null ? InputResult.Ended() : offer();
        }
    }

    private InputResult Queue(OperatorInputKind kind, string body)
    {
        var input = new OperatorInput(_nextNumber++, kind, body);
        _queued.Add(input);
        return InputResult.Accepted(input.Number);
    }

    /// <summary>Queued inputs go in just after the instant reached; an end is run to at once, paused or not.</summary>
    private void HandOver(SimTime reached, double wallS)
    {
        if (_queued.Count == 0 || _kernel.Outcome is not null) return;
        var at = reached > _kernel.Now ? reached : _kernel.Now + new SimDuration(1);
        foreach (var input in _queued)
        {
            _kernel.Inject(new ExternalInput(at, OperatorDeskComponent.DeskId, input));
            if (input.Kind == OperatorInputKind.Pace) ApplyPace(input.Body, wallS);
            if (input.Kind == OperatorInputKind.Mark) _view.Note("mark", at.SecondsSinceEpoch, JsonNode.Parse(input.Body)?["note"]?.GetValue<string>() ?? "");
        }

        var ends = _queued.Any(i => i.Kind == OperatorInputKind.End);
        _queued.Clear();
        if (ends)
        {
            _kernel.RunUntil(at);
            NowS = at.SecondsSinceEpoch;
        }
    }

    private void ApplyPace(string body, double wallS)
    {
        var change = JsonNode.Parse(body)!.AsObject();
        if (change["pace"] is JsonValue pace) _clock!.SetPace(pace.GetValue<double>(), wallS);
        if (change["paused"] is JsonValue paused)
        {
            if (paused.GetValue<bool>()) _clock!.Pause(wallS);
            else _clock!.Resume(wallS);
        }
    }

    private void FinishIfOver()
    {
        if (_kernel.Outcome is null || Result is not null) return;
        var result = _kernel.Result();
        var summary = _prepared.Complete(_summary.Summarize(result));
        _setup.Journal.Complete(new RunSummary(summary.Outcome.Kind.ToString(), summary.Outcome.Reason, summary.FinalTimeS, summary.ToFields()));
        NowS = summary.FinalTimeS;
        Result = summary;
        _view.Note("ended", summary.FinalTimeS, $"{summary.Outcome.Kind}: {summary.Outcome.Reason}");
    }

    private static bool TryText(JsonObject body, string field, int maxLength, out string text, out string error)
    {
        text = "";
        error = "";
        if (body[field] is not JsonValue value || value.GetValueKind() != JsonValueKind.String)
        {
            error = $"{field}: a text is required";
            return false;
        }

        text = value.GetValue<string>();
        if (text.Length > maxLength)
        {
            error = string.Create(CultureInfo.InvariantCulture, $"{field}: at most {maxLength} characters");
            return false;
        }

        return true;
    }

    /// <summary>Every record to the journal first, then to the views.</summary>
    private sealed class Tee(DescentOps.Records.IJournalSink first, DescentOps.Records.IJournalSink second) : DescentOps.Records.IJournalSink
    {
        public void Write(DescentOps.Records.JournalRecord record)
        {
            first.Write(record);
            second.Write(record);
        }
    }
}
