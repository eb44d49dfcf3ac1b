using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>Holds when every operand holds; the evidence is all of theirs.</summary>
internal sealed class AllOfMonitor(IReadOnlyList<ConditionMonitor> operands) : ConditionMonitor
{
    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var holds = true;
        var evidence = new IReadOnlyList<TelemetrySample>[operands.Count];
        for (var i = 0; i < operands.Count; i++)
        {
            var result = operands[i].Evaluate(context);
            holds &= result.Holds;
            evidence[i] = result.Evidence;
        }

        return new MonitorResult(holds, EvidenceSet.Union(evidence));
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
