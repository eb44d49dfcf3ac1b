using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Scheduling;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// The rules of one placement (on board or on the ground) running inside a component: telemetry goes in, firings
/// come out as journal records and telecommands. The evaluator is stateful; its state is named by
/// <see cref="Version"/>, the number of inputs it has consumed, which the hosting component keeps in its immutable
/// state. <see cref="RestoreTo"/> brings the evaluator back to any earlier version by replaying the inputs up to it
/// into a fresh evaluator, so a component that rolls back a failed handling can restart from its last state.
/// </summary>
public sealed class RuleHost
{
    private readonly CompiledRuleSet _initial;
    private readonly List<RuleOutput> _outputs = [];

    /// <summary>
    /// Every input consumed, in order: a frame's or the on-board sampler's samples, a wake-up at an instant (samples
    /// null), or an uplinked rule set loaded at an instant (Load set).
    /// </summary>
    private readonly List<(IReadOnlyList<TelemetrySample>? Samples, SimTime Time, CompiledRuleSet? Load)> _inputs = [];
    private CompiledRuleSet _own;
    private RuleEvaluator _evaluator;

    public RuleHost(CompiledRuleSet rules, Placement placement)
    {
        Placement = placement;
        _initial = Own(rules);
        _own = _initial;
        _evaluator = NewEvaluator();
    }

    private CompiledRuleSet Own(CompiledRuleSet rules) => rules with { Rules = [.. rules.Rules.Where(r => r.Placement == Placement)] };

    /// <summary>How many inputs the evaluator has consumed: the rules' part of the hosting component's state.</summary>
    public int Version => _inputs.Count;

    /// <summary>
    /// Brings the evaluator back to <paramref name="version"/> (a no-op when it is there already): a fresh evaluator
    /// consumes the inputs up to it again, and what they produced, already journaled when first consumed, is dropped.
    /// </summary>
    public void RestoreTo(int version)
    {
        if (version == _inputs.Count) return;
        if (version > _inputs.Count || version < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(version), version, $"the rules have consumed {_inputs.Count} inputs");
        }

        _inputs.RemoveRange(version, _inputs.Count - version);
        _evaluator.Dispose();
        _own = _initial;
        _evaluator = NewEvaluator();
        foreach (var (samples, time, load) in _inputs) Consume(samples, time, load);
        _outputs.Clear();
    }

    private RuleEvaluator NewEvaluator()
    {
        var evaluator = new RuleEvaluator(_own, new RuleScheduler());
        evaluator.Outputs.Subscribe(_outputs.Add);
        return evaluator;
    }

    private void Consume(IReadOnlyList<TelemetrySample>? samples, SimTime time, CompiledRuleSet? load = null)
    {
        if (load is not null)
        {
            // The new set starts afresh, as a newly loaded table would: no history, persistence, waits or held actuators.
            // Its clock starts where the old one stood, in the samples' time: on the ground frames arrive a downlink
            // after they were sampled, so a clock moved to the ground's own time would refuse the frames still on their way.
            var clock = _evaluator.Scheduler.Clock;
            _evaluator.Dispose();
            _own = Own(load);
            _evaluator = NewEvaluator();
            _evaluator.AdvanceTo(clock < time ? clock : time);
            return;
        }

        if (samples is null)
        {
            _evaluator.AdvanceTo(time);
            return;
        }

        _evaluator.Submit(samples);
    }

    public Placement Placement { get; }

    /// <summary>How many rules of this placement are in force.</summary>
    public int RuleCount => _own.Rules.Count;

    /// <summary>Replaces the rules in force with this placement's part of an uplinked set, from now on; returns how many that is.</summary>
    public int Load(CompiledRuleSet rules, ComponentContext context)
    {
        _inputs.Add((null, context.Now, rules));
        Consume(null, context.Now, rules);
        _outputs.Clear();
        return RuleCount;
    }

    /// <summary>Evaluates a frame, then journals what the rules did and returns the commands they sent, in order.</summary>
    public IReadOnlyList<Telecommand> OnFrame(TelemetryFrame frame, ComponentContext context) =>
        OnSamples([.. FrameSamples.Of(frame)], context);

    /// <summary>Evaluates samples taken at one instant (a frame's, or the on-board sampler's), then journals as <see cref="OnFrame"/>.</summary>
    public IReadOnlyList<Telecommand> OnSamples(IReadOnlyList<TelemetrySample> samples, ComponentContext context)
    {
        _inputs.Add((samples, context.Now, null));
        Consume(samples, context.Now);
        return Drain(context);
    }

    /// <summary>Runs rule steps due by now (persistence ends, waits, escalations).</summary>
    public IReadOnlyList<Telecommand> OnWake(ComponentContext context)
    {
        _inputs.Add((null, context.Now, null));
        Consume(null, context.Now);
        return Drain(context);
    }

    /// <summary>When the rules next need waking, if ever.</summary>
    public SimTime? NextDueTime => _evaluator.Scheduler.NextDueTime;

    private List<Telecommand> Drain(ComponentContext context)
    {
        var commands = new List<Telecommand>();
        var where = Placement.ToString().ToLowerInvariant();
        foreach (var output in _outputs)
        {
            switch (output)
            {
                case RuleFiring firing:
                    context.Record(RuleRecords.Fired, Severity(firing.Severity),
                        RecordField.Of("rule", firing.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("firing", firing.Firing),
                        RecordField.Of("evidence", string.Join("; ", firing.Evidence.Select(e => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{e.Point}={e.Value}@{e.Time.SecondsSinceEpoch:R}s{(e.Origin is null ? "" : $" ({e.Origin})")}")))),
                        RecordField.Of("commands", string.Join("; ", firing.Commands)));
                    commands.AddRange(firing.Commands.Select(c => new Telecommand(c, firing.Rule, where, context.Now)));
                    break;
                case RuleEscalation escalation:
                    context.Record(RuleRecords.Escalated, Records.Severity.Warning,
                        RecordField.Of("rule", escalation.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("level", escalation.Level),
                        RecordField.Of("commands", string.Join("; ", escalation.Commands)));
                    commands.AddRange(escalation.Commands.Select(c => new Telecommand(c, escalation.Rule, where, context.Now)));
                    break;
                case RuleContinuation continuation:
                    context.Record(RuleRecords.Continued, Records.Severity.Info,
                        RecordField.Of("rule", continuation.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("commands", string.Join("; ", continuation.Commands)));
                    commands.AddRange(continuation.Commands.Select(c => new Telecommand(c, continuation.Rule, where, context.Now)));
                    break;
                case RuleEvent ruleEvent:
                    context.Record(KindOf(ruleEvent.Kind), Records.Severity.Info,
                        RecordField.Of("rule", ruleEvent.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("detail", ruleEvent.Detail));
                    break;
            }
        }

        _outputs.Clear();
        return commands;
    }

    /// <summary>Keeps one pending wake-up timer matching the evaluator's next due step.</summary>
    public EventHandle? Rearm(EventHandle? pending, ComponentContext context, object wakeMessage)
    {
        if (pending is { } handle) context.Cancel(handle);
        if (NextDueTime is not { } due || due <= context.Now) return null;
        return context.ScheduleSelf(due - context.Now, wakeMessage, MissionPriority.Command);
    }

    /// <summary>The record kind of a rule event, in the journal's snake_case style.</summary>
    public static string KindOf(RuleEventKind kind) => kind switch
    {
        RuleEventKind.Cleared => RuleRecords.Cleared,
        RuleEventKind.HeldByCooldown => RuleRecords.HeldByCooldown,
        RuleEventKind.Enabled => RuleRecords.Enabled,
        RuleEventKind.Disabled => RuleRecords.Disabled,
        RuleEventKind.EscalationWithdrawn => RuleRecords.EscalationWithdrawn,
        RuleEventKind.ActuatorTaken => RuleRecords.ActuatorTaken,
        RuleEventKind.ActuatorReleased => RuleRecords.ActuatorReleased,
        RuleEventKind.CommandBlocked => RuleRecords.CommandBlocked,
        RuleEventKind.SampleRejected => RuleRecords.SampleRejected,
        _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, "a rule event kind without a record kind"),
    };

    private static Severity Severity(RuleSeverity ruleSeverity) => ruleSeverity switch
    {
        RuleSeverity.High => Records.Severity.Alarm,
        RuleSeverity.Medium => Records.Severity.Warning,
        RuleSeverity.Low => Records.Severity.Notice,
        RuleSeverity.Info => Records.Severity.Info,
        _ => throw new ArgumentOutOfRangeException(nameof(ruleSeverity), ruleSeverity, "A rule severity without a journal severity."),
    };

    /// <summary>The component that executes a command's target (the probe for its head and wall too).</summary>
    public static ComponentId Executor(CommandAction command) =>
        command.Target.Name.StartsWith("probe", StringComparison.Ordinal) ? MissionIds.Probe : command.Target;
}
