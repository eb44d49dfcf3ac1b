using System.Globalization;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// One step's watch over the frames the ground receives after the step started: its wait and its check are each a
/// rule of the rule language in one fresh evaluator, so they have the rules' persistence, rates and evidence. The
/// wait ends on the frame at which the wait's rule fires (or on the first frame, for a step with only a check); the
/// check's verdict is whether its rule holds on that frame.
/// </summary>
public sealed class ProcedureWatch : IDisposable
{
    private readonly CompiledStep _step;
    private readonly RuleEvaluator _evaluator;
    private readonly List<RuleOutput> _outputs = [];
    private readonly Dictionary<string, TelemetrySample> _lastSeen = new(StringComparer.Ordinal);
    private readonly HashSet<string> _checkPoints;
    private bool _checkHolds;

    public ProcedureWatch(CompiledStep step)
    {
        _step = step;
        _checkPoints = new HashSet<string>(step.Expect?.Condition.Points ?? [], StringComparer.Ordinal); // listed once, read on every frame
        CompiledRule[] rules = [.. new[] { step.WaitFor, step.Expect }.OfType<CompiledRule>()];
        _evaluator = new RuleEvaluator(new CompiledRuleSet(null, rules, []), new RuleScheduler());
        _evaluator.Outputs.Subscribe(_outputs.Add);
    }

    /// <summary>Takes one frame's samples; returns whether the wait ended on it, the check's verdict and the evidence.</summary>
    public (bool Ended, bool CheckHeld, string Evidence) OnFrame(IReadOnlyList<TelemetrySample> samples)
    {
        foreach (var sample in samples) _lastSeen[sample.Point] = sample;
        _evaluator.Submit(samples);
        IReadOnlyList<TelemetrySample>? waitEvidence = null;
        foreach (var output in _outputs)
        {
            if (output is RuleFiring firing && firing.Rule == _step.WaitFor?.Name) waitEvidence = firing.Evidence;
            else if (output is RuleFiring check && check.Rule == _step.Expect?.Name) _checkHolds = true;
            else if (output is RuleEvent { Kind: RuleEventKind.Cleared } cleared && cleared.Rule == _step.Expect?.Name) _checkHolds = false;
        }

        _outputs.Clear();
        // Without a wait, the check is judged on the first frame that carries what it reads (not, say, on the station's
        // status alone, which the ground gives between frames).
        var ended = _step.WaitFor is null ? samples.Any(s => _checkPoints.Contains(s.Point)) : waitEvidence is not null;
        if (!ended) return (false, false, "");
        var held = _step.Expect is null || _checkHolds;
        IEnumerable<TelemetrySample> evidence = waitEvidence ?? [];
        // The check is judged on this frame: its evidence is the readings the ground has now, held or not.
        if (_step.Expect is { } expect) evidence = evidence.Concat(Seen(expect.Condition.Points));
        return (true, held, Format(evidence.Distinct()));
    }

    /// <summary>The latest reading of each point the wait (or the check) reads, for a late step's record.</summary>
    public string LastSeen() => Format(Seen((_step.WaitFor ?? _step.Expect)?.Condition.Points ?? []));

    private IEnumerable<TelemetrySample> Seen(IEnumerable<string> points) =>
        points.Select(p => _lastSeen.GetValueOrDefault(p)).OfType<TelemetrySample>();

    /// <summary>Readings as the rules' evidence is written: point=value@seconds (the sampling time).</summary>
    public static string Format(IEnumerable<TelemetrySample> samples) =>
        string.Join("; ", samples.Select(e => string.Create(CultureInfo.InvariantCulture, $"{e.Point}={e.Value}@{e.Time.SecondsSinceEpoch:R}s")));

    public void Dispose() => _evaluator.Dispose();
}
