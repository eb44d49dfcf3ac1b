using DescentOps.Primitives.Time;
using DescentOps.Rules.Compiled;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// The live counterpart of a compiled condition: persistence nodes carry state between evaluations. Every node
/// is evaluated on every evaluation (no short-circuit) so that persistence below an 'and' or 'or' never misses one.
/// </summary>
internal abstract class ConditionMonitor
{
    public abstract MonitorResult Evaluate(EvaluationContext context);

    /// <summary>Forgets persistence state, as when a rule is disabled or enabled.</summary>
    public virtual void Reset()
    {
    }

    /// <summary>The earliest instant at which the result may change with no new sample (a persistence period ending).</summary>
    public virtual SimTime? NextWakeUp() => null;

    public static ConditionMonitor Build(CompiledCondition condition) => condition switch
    {
        LimitCondition limit => new LimitMonitor(limit),
        StateCondition state => new StateMonitor(state),
        RateCondition rate => new RateMonitor(rate),
        StepCondition step => new StepMonitor(step),
        DifferenceCondition difference => new DifferenceMonitor(difference),
        AllOfCondition all => new AllOfMonitor(all.Operands.Select(Build).ToArray()),
        AnyOfCondition any => new AnyOfMonitor(any.Operands.Select(Build).ToArray()),
        NotCondition not => new NotMonitor(Build(not.Operand)),
        HoldsForDurationCondition duration => new HoldsForDurationMonitor(Build(duration.Operand), duration.Duration),
        HoldsForSamplesCondition samples => new HoldsForSamplesMonitor(Build(samples.Operand), samples.Count, samples.Points),
        TimeSinceCondition since => new TimeSinceMonitor(Build(since.Event), since.Comparison, since.Duration),
        LatchedCondition latched => new LatchedMonitor(Build(latched.Operand)),
        _ => throw new ArgumentOutOfRangeException(nameof(condition), condition, "no monitor for this condition"),
    };

    protected static SimTime? Earliest(IEnumerable<ConditionMonitor> monitors)
    {
        SimTime? earliest = null;
        foreach (var monitor in monitors)
        {
            if (monitor.NextWakeUp() is { } wake && (earliest is null || wake < earliest.Value))
            {
                earliest = wake;
            }
        }

        return earliest;
    }
}
