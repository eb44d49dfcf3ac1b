using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Engine.Running;

/// <summary>
/// The deterministic heart shared by both kernels: it hands out one instant's events grouped by target and
/// commits what came back in the total event order, whatever order the handlers finished in. Time advances
/// only through <see cref="TryBeginRound"/>, and only after the previous round was committed.
/// </summary>
internal sealed class KernelCore
{
    private static readonly ComponentId KernelId = new("kernel");

    private readonly FutureEventList _events = new();
    private readonly KernelSetup _setup;
    private readonly HashSet<ComponentId> _known;
    private readonly List<SimEvent> _round = [];
    private readonly List<EventResult> _results = [];
    private readonly Dictionary<ComponentId, int> _groupIndex = [];
    private long _roundsDone;
    private readonly long _kernelSequence;
    private long _inputSequence;
    private int _failures;
    private long _recordsWritten;

    public KernelCore(KernelSetup setup)
    {
        _setup = setup;
        _known = [.. setup.Components.Select(c => c.Id)];
        if (_known.Count != setup.Components.Count)
        {
            throw new ArgumentException("Two components share an id.", nameof(setup));
        }

        if (_known.Contains(KernelId))
        {
            throw new ArgumentException($"'{KernelId}' is the kernel's own id; a component cannot use it.", nameof(setup));
        }

        if (setup.ProgressEveryRounds <= 0)
        {
            throw new ArgumentOutOfRangeException(nameof(setup), setup.ProgressEveryRounds, "Progress must be reported every one round or more.");
        }

        foreach (var component in setup.Components.OrderBy(c => c.Id))
        {
            var key = new EventKey(SimTime.Epoch, EventPriority.First, KernelId, _kernelSequence++);
            _events.Add(new SimEvent(key, component.Id, RunStarted.Instance));
        }

        if (_known.Contains(ExternalInput.SenderId))
        {
            throw new ArgumentException($"'{ExternalInput.SenderId}' is the id of outside inputs; a component cannot use it.", nameof(setup));
        }

        foreach (var input in setup.Inputs) Inject(input);
    }

    /// <summary>
    /// Adds an outside input. It must fall after the last round taken, so that it is delivered exactly as it would
    /// have been had it been known from the start.
    /// </summary>
    public void Inject(ExternalInput input)
    {
        if (_roundsDone > 0 && input.At <= Now)
        {
            throw new ArgumentOutOfRangeException(nameof(input), input.At, $"An input must fall after the last instant handled ({Now}).");
        }

        if (!_known.Contains(input.Target)) throw new ArgumentException($"No component '{input.Target}' to take the input.", nameof(input));
        var key = new EventKey(input.At, EventPriority.First, ExternalInput.SenderId, _inputSequence++);
        _events.Add(new SimEvent(key, input.Target, input.Payload));
    }

    /// <summary>The instant of the next round, if any event is left.</summary>
    public bool TryPeekNextTime(out SimTime time) => _events.TryPeekTime(out time);

    public SimTime Now { get; private set; }

    public long EventsDelivered { get; private set; }

    public RunOutcome? Outcome { get; private set; }

    /// <summary>
    /// Takes the next instant's events, grouped by target in key order; false when the run is over
    /// (see <see cref="Outcome"/>).
    /// </summary>
    public bool TryBeginRound(out IReadOnlyList<(ComponentId Target, List<SimEvent> Events)> batches)
    {
        batches = [];
        if (Outcome is not null) return false;

        if (!_events.TryPeekTime(out var next))
        {
            Finish(new RunOutcome(RunOutcomeKind.Quiescent, "no event left to deliver", Now));
            return false;
        }

        if (next > _setup.Until)
        {
            Now = _setup.Until;
            Finish(new RunOutcome(RunOutcomeKind.TimeLimit, $"reached the time limit {_setup.Until}", _setup.Until));
            return false;
        }

        _events.TryTakeRound(_round, out var now);
        Now = now;
        EventsDelivered += _round.Count;
        var grouped = new List<(ComponentId, List<SimEvent>)>();
        _groupIndex.Clear();
        foreach (var simEvent in _round)
        {
            if (!_known.Contains(simEvent.Target))
            {
                throw new InvalidOperationException($"{simEvent.Key.Sender} sent {simEvent.Payload.GetType().Name} to unknown component '{simEvent.Target}'.");
            }

            if (_groupIndex.TryGetValue(simEvent.Target, out var index))
            {
                grouped[index].Item2.Add(simEvent);
            }
            else
            {
                _groupIndex[simEvent.Target] = grouped.Count;
                grouped.Add((simEvent.Target, [simEvent]));
            }
        }

        batches = grouped;
        return true;
    }

    /// <summary>Commits one round from the per-target results, in any order of arrival.</summary>
    public void CommitRound(IEnumerable<EventResult[]> batchResults)
    {
        _results.Clear();
        foreach (var batch in batchResults) _results.AddRange(batch);
        _results.Sort(static (a, b) => a.Trigger.CompareTo(b.Trigger));

        RunOutcome? stop = null;
        foreach (var result in _results)
        {
            if (result.Failure is { } failure)
            {
                stop ??= CommitFailure(result, failure);
                continue;
            }

            foreach (var record in result.Records) WriteRecord(record);
            // Scheduled before cancelled: a handler may cancel an event it scheduled in this same handling.
            foreach (var scheduled in result.Scheduled) _events.Add(scheduled);
            foreach (var handle in result.Cancelled) _events.Cancel(handle);
            stop ??= result.StopRequest;
        }

        _roundsDone++;
        if (stop is not null) Finish(stop);
        if (_setup.Progress is { } progress && _roundsDone % _setup.ProgressEveryRounds == 0)
        {
            progress(new KernelProgress(Now, _setup.Until, EventsDelivered));
        }
    }

    /// <summary>Ends the run from outside the event flow (an actor that died, a journal that failed).</summary>
    public void Abort(RunOutcomeKind kind, string reason)
    {
        if (Outcome is null) Finish(new RunOutcome(kind, reason, Now));
    }

    public RunResult Result() => new(
        Outcome ?? throw new InvalidOperationException("The run has not ended."),
        Now,
        EventsDelivered,
        _roundsDone,
        _recordsWritten,
        _failures);

    private RunOutcome? CommitFailure(EventResult result, ComponentFailure failure)
    {
        _failures++;
        var source = result.Trigger.Sender;
        var target = _round.First(e => e.Key == result.Trigger).Target;
        WriteRecord(new JournalRecord(
            Now,
            target,
            ComponentRecords.Failed,
            Severity.Alarm,
            [
                RecordField.Of("exception", failure.ExceptionType),
                RecordField.Of("message", failure.Message),
                RecordField.Of("event_from", source.Name),
                RecordField.Of("failures", failure.FailureCount),
                RecordField.Of("decision", failure.Restarted ? "restart-from-last-state" : "abort-run"),
            ]));
        return failure.Restarted
            ? null
            : new RunOutcome(RunOutcomeKind.ComponentFailed, $"{target} failed ({failure.ExceptionType}: {failure.Message})", Now);
    }

    private void WriteRecord(JournalRecord record)
    {
        _setup.Journal.Write(record);
        _recordsWritten++;
    }

    private void Finish(RunOutcome outcome)
    {
        Outcome = outcome;
        _setup.Progress?.Invoke(new KernelProgress(Now, _setup.Until, EventsDelivered));
    }
}
