using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Holds when every operand holds; the evidence is all of theirs.</summary>
internal sealed class AllOfMonitor(IReadOnlyList<ConditionMonitor> operands) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var results = operands.Select(o => o.Evaluate(context)).ToArray();
        return new MonitorResult(results.All(r => r.Holds), EvidenceSet.Union(results.Select(r => r.Evidence)));
    }

    public override void Reset()
    {
        foreach (var operand in operands)
        {
            operand.Reset();
        }
    }

    public override SimTime? NextWakeUp() => Earliest(operands);
}
