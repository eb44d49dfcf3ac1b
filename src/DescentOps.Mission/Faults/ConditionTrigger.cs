using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Faults;

/// <summary>
/// One fault's <c>when</c> trigger at run time: the compiled condition evaluated over the probe's true state, frame by
/// frame and at the end of a persistence period between frames. It reports its firing once, with the evidence.
/// The evaluator is stateful and cannot be rolled back, so the injector that holds it aborts the run on failure.
/// </summary>
[System.Diagnostics.CodeAnalysis.SuppressMessage("Design", "CA1001:Types that own disposable fields should be disposable",
    Justification = "The evaluator holds only in-memory subscriptions; the trigger lives as long as its run and components have no end-of-run hook to dispose it in.")]
public sealed class ConditionTrigger
{
    private readonly RuleEvaluator _evaluator;
    private readonly List<RuleFiring> _firings = [];

    public ConditionTrigger(int faultIndex, CompiledRuleSet rules)
    {
        FaultIndex = faultIndex;
        _evaluator = new RuleEvaluator(rules, new RuleScheduler());
        _evaluator.Firings.Subscribe(_firings.Add);
    }

    public int FaultIndex { get; }

    public bool HasFired { get; private set; }

    /// <summary>When the condition next needs waking (a persistence period ending), if ever.</summary>
    public SimTime? NextDueTime => HasFired ? null : _evaluator.Scheduler.NextDueTime;

    /// <summary>Evaluates one frame of true readings; the firing, if this frame completed the condition.</summary>
    public RuleFiring? OnFrame(TelemetryFrame truth)
    {
        if (HasFired) return null;
        _evaluator.Submit([.. FrameSamples.Of(truth)]);
        return Take();
    }

    /// <summary>Runs steps due by <paramref name="now"/>; the firing, if a persistence period ended.</summary>
    public RuleFiring? OnWake(SimTime now)
    {
        if (HasFired) return null;
        _evaluator.AdvanceTo(now);
        return Take();
    }

    private RuleFiring? Take()
    {
        if (_firings.Count == 0) return null;
        HasFired = true;
        var first = _firings[0];
        _firings.Clear();
        return first;
    }
}
