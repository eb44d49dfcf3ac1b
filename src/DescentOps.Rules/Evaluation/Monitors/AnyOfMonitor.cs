using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Holds when an operand holds; the evidence is that of the operands that hold.</summary>
internal sealed class AnyOfMonitor(IReadOnlyList<ConditionMonitor> operands) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var results = operands.Select(o => o.Evaluate(context)).ToArray();
        var holding = results.Where(r => r.Holds).ToArray();
        return holding.Length > 0
            ? new MonitorResult(true, EvidenceSet.Union(holding.Select(r => r.Evidence)))
            : new MonitorResult(false, EvidenceSet.Union(results.Select(r => r.Evidence)));
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
