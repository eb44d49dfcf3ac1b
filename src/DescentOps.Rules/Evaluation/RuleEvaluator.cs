using System.Reactive.Disposables;
using System.Reactive.Linq;
using System.Reactive.Subjects;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation;

/// <summary>
/// Runs a checked rule set over telemetry on a <see cref="RuleScheduler"/>. Feed samples in time order with
/// <see cref="Submit(IReadOnlyList{TelemetrySample})"/> (or attach an observable); advance the scheduler as simulated time passes so that
/// persistence periods, cooldowns, waits and escalations come due. Everything it decides appears on
/// <see cref="Outputs"/> in one deterministic order: the same inputs give the same outputs.
/// Do not submit samples from inside an output callback: the evaluator is in the middle of a step.
/// </summary>
public sealed class RuleEvaluator : IObserver<TelemetrySample>, IDisposable
{
    private readonly RuleScheduler _scheduler;
    private readonly Subject<RuleOutput> _outputs = new();
    private readonly List<RuleRuntime> _rules;
    private readonly Dictionary<string, RuleRuntime> _rulesByName = new(StringComparer.Ordinal);
    private readonly Dictionary<string, RuleRuntime[]> _rulesByPoint = new(StringComparer.Ordinal);
    private readonly Dictionary<string, bool> _pointIsNumeric = new(StringComparer.Ordinal);
    private readonly TelemetryHistory _history;
    private readonly ActuatorLocks _locks = new();

    public RuleEvaluator(CompiledRuleSet ruleSet, RuleScheduler scheduler)
    {
        _scheduler = scheduler;
        _rules = ruleSet.Rules.Select((rule, index) => new RuleRuntime(rule, index)).ToList();
        foreach (var runtime in _rules)
        {
            _rulesByName[runtime.Rule.Name] = runtime;
        }

        var retention = new Dictionary<string, long>(StringComparer.Ordinal);
        foreach (var condition in _rules.SelectMany(r => Leaves(r.Rule.Condition)))
        {
            switch (condition)
            {
                case StateCondition state:
                    _pointIsNumeric[state.Point] = false;
                    break;
                case RateCondition rate:
                    _pointIsNumeric[rate.Point] = true;
                    retention[rate.Point] = Math.Max(retention.GetValueOrDefault(rate.Point), rate.Window.Ticks);
                    break;
                case LimitCondition or StepCondition or DifferenceCondition:
                    foreach (var point in condition.Points) _pointIsNumeric[point] = true;
                    break;
            }
        }

        _history = new TelemetryHistory(retention);
        foreach (var point in _pointIsNumeric.Keys)
        {
            _rulesByPoint[point] = EvaluationOrder(_rules.Where(r => r.Rule.Condition.Points.Contains(point, StringComparer.Ordinal))).ToArray();
        }
    }

    public RuleScheduler Scheduler => _scheduler;

    public IObservable<RuleOutput> Outputs => _outputs.AsObservable();

    public IObservable<RuleFiring> Firings => _outputs.OfType<RuleFiring>();

    public IObservable<RuleEvent> Events => _outputs.OfType<RuleEvent>();

    public bool IsEnabled(string rule) => _rulesByName.TryGetValue(rule, out var runtime) && runtime.Enabled;

    public IDisposable Attach(IObservable<TelemetrySample> samples) => samples.Subscribe(this);

    /// <summary>
    /// Runs every step due up to <paramref name="time"/> and moves the clock there. A time in the past, or a call
    /// from inside a running step, changes nothing and returns false.
    /// </summary>
    public bool AdvanceTo(SimTime time)
    {
        if (_scheduler.IsEnabled || time < _scheduler.Clock)
        {
            return false;
        }

        _scheduler.AdvanceTo(time);
        return true;
    }

    /// <summary>
    /// Takes one sample: first runs whatever is due up to its time, then evaluates the rules that read its point,
    /// highest priority first. Samples of points no rule reads are ignored; late, non-finite or wrongly typed
    /// samples are refused with a <see cref="RuleEventKind.SampleRejected"/> event.
    /// </summary>
    public void Submit(TelemetrySample sample) => Submit([sample]);

    /// <summary>
    /// Takes samples in time order, one instant at a time: every sample of an instant (a frame's readings) is
    /// taken before any rule is evaluated, and then each rule that reads any of them is evaluated once, highest
    /// priority first, so no rule decides on a mix of this instant's readings and the last one's.
    /// </summary>
    public void Submit(IReadOnlyList<TelemetrySample> samples)
    {
        var triggered = new List<string>();
        for (var i = 0; i < samples.Count; i++)
        {
            var sample = samples[i];
            if (Take(sample) is { } point && !triggered.Contains(point, StringComparer.Ordinal))
            {
                triggered.Add(point);
            }

            var instantEnds = i == samples.Count - 1 || samples[i + 1] is not { } next || sample is null || next.Time != sample.Time;
            if (instantEnds && triggered.Count > 0)
            {
                EvaluateInstant(triggered);
                triggered = [];
            }
        }
    }

    /// <summary>Adds a sample to the history; the point it read when a rule reads it and it was valid, else null.</summary>
    private string? Take(TelemetrySample sample)
    {
        if (sample is null || sample.Point is null || sample.Value is null)
        {
            Emit(new RuleEvent(_scheduler.Clock, "", RuleEventKind.SampleRejected, "a sample with no point or no value"));
            return null;
        }

        if (sample.Time < _scheduler.Clock)
        {
            Emit(new RuleEvent(_scheduler.Clock, "", RuleEventKind.SampleRejected, $"{sample} is earlier than the evaluator's clock {_scheduler.Clock}"));
            return null;
        }

        if (sample.Time > _scheduler.Clock && !AdvanceTo(sample.Time))
        {
            Emit(new RuleEvent(_scheduler.Clock, "", RuleEventKind.SampleRejected, $"{sample} was submitted from inside a scheduled step"));
            return null;
        }

        if (!_pointIsNumeric.TryGetValue(sample.Point, out var numeric))
        {
            return null;
        }

        var problem = (numeric, sample.Value) switch
        {
            (true, NumericValue { ValueSi: var v }) when !double.IsFinite(v) => "is not a finite number",
            (true, not NumericValue) => "is not a number, but the point is numeric",
            (false, not DiscreteValue) => "is not a state, but the point is discrete",
            (false, DiscreteValue { State: null }) => "has no state",
            _ => null,
        };
        if (problem is not null)
        {
            Emit(new RuleEvent(sample.Time, "", RuleEventKind.SampleRejected, $"{sample} {problem}"));
            return null;
        }

        _history.Add(sample);
        return sample.Point;
    }

    private void EvaluateInstant(List<string> points)
    {
        var context = new EvaluationContext(_scheduler.Clock, points, _history);
        if (points.Count == 1)
        {
            foreach (var runtime in _rulesByPoint[points[0]])
            {
                Evaluate(runtime, context);
            }

            return;
        }

        foreach (var runtime in EvaluationOrder(points.SelectMany(p => _rulesByPoint[p]).Distinct()))
        {
            Evaluate(runtime, context);
        }
    }

    void IObserver<TelemetrySample>.OnNext(TelemetrySample value) => Submit(value);

    void IObserver<TelemetrySample>.OnError(Exception error)
    {
        // The telemetry source's failure is the mission's to journal; the rules keep their state.
    }

    void IObserver<TelemetrySample>.OnCompleted()
    {
    }

    public void Dispose()
    {
        foreach (var runtime in _rules)
        {
            CancelAll(runtime);
        }

        _outputs.OnCompleted();
        _outputs.Dispose();
    }

    private static IEnumerable<RuleRuntime> EvaluationOrder(IEnumerable<RuleRuntime> rules) =>
        rules.OrderByDescending(r => r.Rule.Priority).ThenBy(r => r.Index);

    private static IEnumerable<CompiledCondition> Leaves(CompiledCondition condition) => ConditionLeaf.Of(condition).Select(leaf => leaf.Check);

    private void Evaluate(RuleRuntime runtime, EvaluationContext context)
    {
        if (!runtime.Enabled)
        {
            return;
        }

        var now = context.Now;
        var result = runtime.Monitor.Evaluate(context);
        runtime.LastEvidence = result.Evidence;
        if (result.Holds)
        {
            if (!runtime.EpisodeActive)
            {
                runtime.EpisodeActive = true;
                runtime.FiredThisEpisode = false;
                runtime.HeldByCooldownThisEpisode = false;
            }

            if (!runtime.FiredThisEpisode)
            {
                if (CooldownEnd(runtime) is { } end && now < end)
                {
                    if (!runtime.HeldByCooldownThisEpisode)
                    {
                        runtime.HeldByCooldownThisEpisode = true;
                        Emit(new RuleEvent(now, runtime.Rule.Name, RuleEventKind.HeldByCooldown, $"condition holds; cooldown ends at {end}"));
                    }
                }
                else
                {
                    Fire(runtime, now, result.Evidence);
                }
            }
        }
        else if (runtime.EpisodeActive)
        {
            EndEpisode(runtime, now);
        }

        if (runtime.Enabled)
        {
            ScheduleWakeUp(runtime, now);
        }
    }

    private static SimTime? CooldownEnd(RuleRuntime runtime) =>
        runtime.LastFiringTime is { } last && runtime.Rule.Cooldown > SimDuration.Zero ? last + runtime.Rule.Cooldown : null;

    private void EndEpisode(RuleRuntime runtime, SimTime now)
    {
        var acted = runtime.FiredThisEpisode || runtime.HeldByCooldownThisEpisode;
        runtime.EpisodeActive = false;
        runtime.FiredThisEpisode = false;
        runtime.HeldByCooldownThisEpisode = false;
        if (acted)
        {
            Emit(new RuleEvent(now, runtime.Rule.Name, RuleEventKind.Cleared, "condition no longer holds"));
        }

        if (runtime.PendingEscalations.Count > 0)
        {
            var withdrawn = runtime.PendingEscalations.Count;
            DisposeAll(runtime.PendingEscalations);
            Emit(new RuleEvent(now, runtime.Rule.Name, RuleEventKind.EscalationWithdrawn, $"{withdrawn} escalation step(s) withdrawn"));
        }

        ReleaseActuators(runtime, now);
    }

    /// <summary>Keeps one pending wake-up per rule: the earliest instant its verdict can change with no new sample.</summary>
    private void ScheduleWakeUp(RuleRuntime runtime, SimTime now)
    {
        SimTime? due = runtime.Monitor.NextWakeUp();
        if (due is { } d && d <= now)
        {
            due = null;
        }

        if (runtime.EpisodeActive && !runtime.FiredThisEpisode && CooldownEnd(runtime) is { } end && end > now && (due is null || end < due))
        {
            due = end;
        }

        if (due == runtime.WakeUpTime)
        {
            return;
        }

        runtime.WakeUp?.Dispose();
        runtime.WakeUp = null;
        runtime.WakeUpTime = due;
        if (due is { } at)
        {
            runtime.WakeUp = _scheduler.ScheduleAbsolute(runtime, at, (_, rule) =>
            {
                rule.WakeUp = null;
                rule.WakeUpTime = null;
                Evaluate(rule, new EvaluationContext(_scheduler.Clock, [], _history));
                return Disposable.Empty;
            });
        }
    }

    private void Fire(RuleRuntime runtime, SimTime now, IReadOnlyList<TelemetrySample> evidence)
    {
        runtime.FiredThisEpisode = true;
        runtime.Firings++;
        runtime.LastFiringTime = now;
        var firing = runtime.Firings;

        for (var i = 0; i < runtime.Rule.Escalations.Count; i++)
        {
            var level = i + 1;
            var escalation = runtime.Rule.Escalations[i];
            var slot = new SingleAssignmentDisposable();
            runtime.PendingEscalations.Add(slot);
            slot.Disposable = _scheduler.ScheduleAbsolute(level, SaturatingAdd(now, escalation.After), (_, escalationLevel) =>
            {
                runtime.PendingEscalations.Remove(slot);
                Escalate(runtime, firing, escalationLevel);
                return Disposable.Empty;
            });
        }

        var pending = new List<RuleEvent>();
        var commands = RunSteps(runtime, runtime.Rule.Actions, 0, 0, firing, now, pending);
        Emit(new RuleFiring(now, runtime.Rule.Name, runtime.Rule.Severity, runtime.Rule.Placement, runtime.Rule.Priority, firing, evidence, commands));
        EmitAll(pending);
    }

    private void Escalate(RuleRuntime runtime, int firing, int level)
    {
        if (!runtime.Enabled || !runtime.EpisodeActive || runtime.Firings != firing)
        {
            return;
        }

        var now = _scheduler.Clock;
        var pending = new List<RuleEvent>();
        var commands = RunSteps(runtime, runtime.Rule.Escalations[level - 1].Actions, 0, level, firing, now, pending);
        Emit(new RuleEscalation(now, runtime.Rule.Name, firing, level, runtime.LastEvidence, commands));
        EmitAll(pending);
    }

    /// <summary>
    /// Runs a sequence from <paramref name="start"/> until its end, a wait (the rest is scheduled) or the rule
    /// being disabled. Returns the commands to send now; state changes go to <paramref name="pending"/> so that
    /// they are journaled after the output that caused them.
    /// </summary>
    private List<CommandAction> RunSteps(RuleRuntime runtime, IReadOnlyList<CompiledAction> steps, int start, int level, int firing, SimTime now, List<RuleEvent> pending)
    {
        var commands = new List<CommandAction>();
        for (var i = start; i < steps.Count && runtime.Enabled; i++)
        {
            switch (steps[i])
            {
                case SendAction send:
                    var target = send.Command.Target.Name;
                    switch (_locks.Claim(target, runtime, out var holder))
                    {
                        case ActuatorClaim.Granted:
                            commands.Add(send.Command);
                            break;
                        case ActuatorClaim.Taken:
                            commands.Add(send.Command);
                            pending.Add(new RuleEvent(now, runtime.Rule.Name, RuleEventKind.ActuatorTaken,
                                $"took '{target}' from '{holder!.Rule.Name}' (priority {holder.Rule.Priority} < {runtime.Rule.Priority})"));
                            break;
                        default:
                            pending.Add(new RuleEvent(now, runtime.Rule.Name, RuleEventKind.CommandBlocked,
                                $"{send.Command} not sent: '{target}' is held by '{holder!.Rule.Name}' (priority {holder.Rule.Priority})"));
                            break;
                    }

                    break;

                case WaitAction wait:
                    var resume = i + 1;
                    var slot = new SingleAssignmentDisposable();
                    runtime.PendingContinuations.Add(slot);
                    slot.Disposable = _scheduler.ScheduleAbsolute(resume, SaturatingAdd(now, wait.Duration), (_, next) =>
                    {
                        runtime.PendingContinuations.Remove(slot);
                        var later = new List<RuleEvent>();
                        var laterCommands = RunSteps(runtime, steps, next, level, firing, _scheduler.Clock, later);
                        Emit(new RuleContinuation(_scheduler.Clock, runtime.Rule.Name, firing, level, laterCommands));
                        EmitAll(later);
                        return Disposable.Empty;
                    });
                    return commands;

                case EnableAction enable:
                    SetEnabled(_rulesByName[enable.Rule], true, runtime, now, pending);
                    break;

                case DisableAction disable:
                    SetEnabled(_rulesByName[disable.Rule], false, runtime, now, pending);
                    break;

                case StartProcedureAction procedure:
                    // No actuator: starting a procedure is the ground's own act, reported among the firing's commands.
                    commands.Add(procedure.Command);
                    break;
            }
        }

        return commands;
    }

    private void SetEnabled(RuleRuntime target, bool enabled, RuleRuntime by, SimTime now, List<RuleEvent> pending)
    {
        if (target.Enabled == enabled)
        {
            return;
        }

        target.Monitor.Reset();
        target.EpisodeActive = false;
        target.FiredThisEpisode = false;
        target.HeldByCooldownThisEpisode = false;
        if (enabled)
        {
            target.Enabled = true;
            pending.Add(new RuleEvent(now, target.Rule.Name, RuleEventKind.Enabled, $"by '{by.Rule.Name}'"));
            return;
        }

        target.Enabled = false;
        CancelAll(target);
        pending.Add(new RuleEvent(now, target.Rule.Name, RuleEventKind.Disabled, $"by '{by.Rule.Name}'"));
        foreach (var actuator in _locks.ReleaseAll(target))
        {
            pending.Add(new RuleEvent(now, target.Rule.Name, RuleEventKind.ActuatorReleased, $"released '{actuator}'"));
        }
    }

    private void ReleaseActuators(RuleRuntime runtime, SimTime now)
    {
        foreach (var actuator in _locks.ReleaseAll(runtime))
        {
            Emit(new RuleEvent(now, runtime.Rule.Name, RuleEventKind.ActuatorReleased, $"released '{actuator}'"));
        }
    }

    private static void CancelAll(RuleRuntime runtime)
    {
        runtime.WakeUp?.Dispose();
        runtime.WakeUp = null;
        runtime.WakeUpTime = null;
        DisposeAll(runtime.PendingEscalations);
        DisposeAll(runtime.PendingContinuations);
    }

    private static void DisposeAll(List<IDisposable> handles)
    {
        var copy = handles.ToArray();
        handles.Clear();
        foreach (var handle in copy)
        {
            handle.Dispose();
        }
    }

    private static SimTime SaturatingAdd(SimTime time, SimDuration duration) =>
        time.Ticks > long.MaxValue - duration.Ticks ? SimTime.MaxValue : time + duration;

    private void Emit(RuleOutput output) => _outputs.OnNext(output);

    private void EmitAll(IEnumerable<RuleOutput> outputs)
    {
        foreach (var output in outputs)
        {
            Emit(output);
        }
    }
}
