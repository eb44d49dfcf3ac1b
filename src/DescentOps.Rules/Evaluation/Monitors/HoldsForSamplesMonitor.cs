namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Persistence by count: the operand must hold on that many consecutive samples of its own points. Evaluations
/// caused by other points or by wake-ups do not count, or a busy neighbour would shorten the count.
/// </summary>
internal sealed class HoldsForSamplesMonitor(ConditionMonitor operand, int count, IEnumerable<string> points) : ConditionMonitor
{
    private readonly HashSet<string> _points = new(points, StringComparer.Ordinal);
    private readonly Queue<IReadOnlyList<TelemetrySample>> _evidence = new();
    private int _consecutive;

    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var result = operand.Evaluate(context);
        if (context.TriggerPoint is { } trigger && _points.Contains(trigger))
        {
            if (result.Holds)
            {
                _consecutive = Math.Min(_consecutive + 1, count);
                _evidence.Enqueue(result.Evidence);
                while (_evidence.Count > count)
                {
                    _evidence.Dequeue();
                }
            }
            else
            {
                _consecutive = 0;
                _evidence.Clear();
            }
        }

        var holds = result.Holds && _consecutive >= count;
        return holds ? new MonitorResult(true, EvidenceSet.Union(_evidence)) : new MonitorResult(false, result.Evidence);
    }

    public override void Reset()
    {
        _consecutive = 0;
        _evidence.Clear();
        operand.Reset();
    }

    public override Primitives.Time.SimTime? NextWakeUp() => operand.NextWakeUp();
}
