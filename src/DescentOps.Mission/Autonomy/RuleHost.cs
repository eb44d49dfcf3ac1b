using DescentOps.Engine.Components;
using DescentOps.Engine.Journaling;
using DescentOps.Engine.Scheduling;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;
using DescentOps.Rules.Syntax;

namespace DescentOps.Mission.Autonomy;

/// <summary>
/// The rules of one placement (on board or on the ground) running inside a component: telemetry goes in, firings
/// come out as journal records and telecommands. The evaluator is stateful and cannot be rolled back, so a
/// component hosting it must abort the run on failure rather than restart.
/// </summary>
public sealed class RuleHost
{
    private readonly RuleEvaluator _evaluator;
    private readonly List<RuleOutput> _outputs = [];

    public RuleHost(CompiledRuleSet rules, Placement placement)
    {
        Placement = placement;
        var own = rules with { Rules = [.. rules.Rules.Where(r => r.Placement == placement)] };
        RuleCount = own.Rules.Count;
        _evaluator = new RuleEvaluator(own, new RuleScheduler());
        _evaluator.Outputs.Subscribe(_outputs.Add);
    }

    public Placement Placement { get; }

    public int RuleCount { get; }

    /// <summary>Evaluates a frame, then journals what the rules did and returns the commands they sent, in order.</summary>
    public IReadOnlyList<Telecommand> OnFrame(TelemetryFrame frame, ComponentContext context)
    {
        foreach (var sample in FrameSamples.Of(frame)) _evaluator.Submit(sample);
        return Drain(context);
    }

    /// <summary>Runs rule steps due by now (persistence ends, waits, escalations).</summary>
    public IReadOnlyList<Telecommand> OnWake(ComponentContext context)
    {
        _evaluator.AdvanceTo(context.Now);
        return Drain(context);
    }

    /// <summary>When the rules next need waking, if ever.</summary>
    public SimTime? NextDueTime => _evaluator.Scheduler.NextDueTime;

    private IReadOnlyList<Telecommand> Drain(ComponentContext context)
    {
        var commands = new List<Telecommand>();
        var where = Placement.ToString().ToLowerInvariant();
        foreach (var output in _outputs)
        {
            switch (output)
            {
                case RuleFiring firing:
                    context.Record("rule.fired", Severity(firing.Severity),
                        RecordField.Of("rule", firing.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("firing", firing.Firing),
                        RecordField.Of("evidence", string.Join("; ", firing.Evidence.Select(e => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"{e.Point}={e.Value}@{e.Time.SecondsSinceEpoch:R}s")))),
                        RecordField.Of("commands", string.Join("; ", firing.Commands)));
                    commands.AddRange(firing.Commands.Select(c => new Telecommand(c, firing.Rule, where, context.Now)));
                    break;
                case RuleEscalation escalation:
                    context.Record("rule.escalated", Engine.Journaling.Severity.Warning,
                        RecordField.Of("rule", escalation.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("level", escalation.Level),
                        RecordField.Of("commands", string.Join("; ", escalation.Commands)));
                    commands.AddRange(escalation.Commands.Select(c => new Telecommand(c, escalation.Rule, where, context.Now)));
                    break;
                case RuleContinuation continuation:
                    context.Record("rule.continued", Engine.Journaling.Severity.Info,
                        RecordField.Of("rule", continuation.Rule),
                        RecordField.Of("placement", where),
                        RecordField.Of("commands", string.Join("; ", continuation.Commands)));
                    commands.AddRange(continuation.Commands.Select(c => new Telecommand(c, continuation.Rule, where, context.Now)));
                    break;
                case RuleEvent ruleEvent:
                    context.Record("rule." + ruleEvent.Kind.ToString().ToLowerInvariant(), Engine.Journaling.Severity.Info,
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

    private static Severity Severity(RuleSeverity ruleSeverity) => ruleSeverity switch
    {
        RuleSeverity.High => Engine.Journaling.Severity.Alarm,
        RuleSeverity.Medium => Engine.Journaling.Severity.Warning,
        RuleSeverity.Low => Engine.Journaling.Severity.Notice,
        RuleSeverity.Info => Engine.Journaling.Severity.Info,
        _ => throw new ArgumentOutOfRangeException(nameof(ruleSeverity), ruleSeverity, "A rule severity without a journal severity."),
    };

    /// <summary>The component that executes a command's target (the probe for its head and wall too).</summary>
    public static ComponentId Executor(CommandAction command) =>
        command.Target.Name.StartsWith("probe", StringComparison.Ordinal) ? MissionIds.Probe : command.Target;
}
