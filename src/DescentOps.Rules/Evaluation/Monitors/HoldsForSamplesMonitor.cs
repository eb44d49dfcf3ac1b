using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation.Monitors;

/// <summary>
/// Persistence by count: the operand must hold on that many consecutive sampling instants of its own points. An
/// instant counts once however many of the operand's points are sampled at it (a frame carries them all at one
/// time), and its verdict is the operand's after the last of them: the evaluator takes a frame whole, and should
/// an instant's samples still come in separate calls, the newest instant stays provisional and each further
/// sample at it replaces its verdict until a later instant comes.
/// Evaluations caused by other points or by wake-ups do not count, or a busy neighbour would shorten the count.
/// </summary>
internal sealed class HoldsForSamplesMonitor(ConditionMonitor operand, int count, IEnumerable<string> points) : ConditionMonitor
{
    private readonly HashSet<string> _points = new(points, StringComparer.Ordinal);

    /// <summary>The evidence of the settled instants of the current run, newest last, at most count − 1 of them.</summary>
    private readonly Queue<IReadOnlyList<TelemetrySample>> _evidence = new();

    /// <summary>Consecutive settled instants (before the provisional one) on which the operand held.</summary>
    private int _settled;

    private SimTime? _instant;
    private bool _instantHolds;
    private IReadOnlyList<TelemetrySample> _instantEvidence = [];

    public override MonitorResult Evaluate(EvaluationContext context)
    {
        var result = operand.Evaluate(context);
        if (context.TriggerPoints.Any(_points.Contains))
        {
            if (_instant is { } previous && previous != context.Now)
            {
                Settle();
            }

            _instant = context.Now;
            _instantHolds = result.Holds;
            _instantEvidence = result.Evidence;
        }

        var consecutive = _instantHolds ? Math.Min(_settled + 1, count) : 0;
        return result.Holds && consecutive >= count
            ? new MonitorResult(true, EvidenceSet.Union([.. _evidence, _instantEvidence]))
            : new MonitorResult(false, result.Evidence);
    }

    private void Settle()
    {
        if (!_instantHolds)
        {
            _settled = 0;
            _evidence.Clear();
            return;
        }

        _settled = Math.Min(_settled + 1, count);
        _evidence.Enqueue(_instantEvidence);
        while (_evidence.Count > count - 1)
        {
            _evidence.Dequeue();
        }
    }

    public override void Reset()
    {
        _settled = 0;
        _evidence.Clear();
        _instant = null;
        _instantHolds = false;
        _instantEvidence = [];
        operand.Reset();
    }

    public override SimTime? NextWakeUp() => operand.NextWakeUp();
}
