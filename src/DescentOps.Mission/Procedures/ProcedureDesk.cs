using DescentOps.Primitives.Time;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Procedures;

/// <summary>
/// The ground team's procedures at work: which run, at which step, watching which frames. Transitions are the pure
/// <see cref="ProcedureRunner"/>'s; the watches are stateful evaluators, so, like <see cref="Autonomy.RuleHost"/>, the
/// desk's state is named by the number of inputs it has taken (<see cref="Version"/>) and <see cref="RestoreTo"/>
/// replays them into a fresh desk, so the ground team can restart from its last state.
/// </summary>
public sealed class ProcedureDesk
{
    private readonly IReadOnlyList<CompiledProcedure> _procedures;
    private readonly List<(int Procedure, string? By, IReadOnlyList<TelemetrySample>? Samples, SimTime Time, DeskAnswer? Answer)> _inputs = [];
    private ProcedureRun?[] _runs;
    private ProcedureWatch?[] _watches;

    public ProcedureDesk(IReadOnlyList<CompiledProcedure> procedures)
    {
        _procedures = procedures;
        _runs = new ProcedureRun?[procedures.Count];
        _watches = new ProcedureWatch?[procedures.Count];
    }

    public IReadOnlyList<CompiledProcedure> Procedures => _procedures;

    /// <summary>How many inputs the desk has taken: its part of the ground team's state.</summary>
    public int Version => _inputs.Count;

    /// <summary>The run of procedure <paramref name="index"/>, if it was ever started.</summary>
    public ProcedureRun? RunOf(int index) => _runs[index];

    /// <summary>The earliest instant a running step is late, if any step waits.</summary>
    public SimTime? NextDeadline => _runs.Where(r => r is { IsRunning: true }).Select(r => r!.Deadline).Where(d => d is not null).Min();

    public int IndexOf(string procedure)
    {
        for (var i = 0; i < _procedures.Count; i++)
        {
            if (_procedures[i].Name == procedure) return i;
        }

        return -1;
    }

    /// <summary>Brings the desk back to <paramref name="version"/> by replaying its inputs into fresh runs and watches.</summary>
    public void RestoreTo(int version)
    {
        if (version == _inputs.Count) return;
        if (version > _inputs.Count || version < 0) throw new ArgumentOutOfRangeException(nameof(version), version, $"the desk has taken {_inputs.Count} inputs");
        _inputs.RemoveRange(version, _inputs.Count - version);
        foreach (var watch in _watches) watch?.Dispose();
        _runs = new ProcedureRun?[_procedures.Count];
        _watches = new ProcedureWatch?[_procedures.Count];
        foreach (var input in _inputs) Take(input);
    }

    /// <summary>Starts procedure <paramref name="index"/> now, unless it is running; with <paramref name="peopleAnswer"/>, people confirm its steps.</summary>
    public IReadOnlyList<ProcedureOutput> Start(int index, string by, SimTime now, bool peopleAnswer = false) =>
        Record((index, by, null, now, peopleAnswer ? DeskAnswer.PeopleAnswer : null));

    /// <summary>A frame reached the ground: every running step's watch sees it.</summary>
    public IReadOnlyList<ProcedureOutput> OnFrame(IReadOnlyList<TelemetrySample> samples, SimTime now) => Record((-1, null, samples, now, null));

    /// <summary>Time has come to <paramref name="now"/>: steps whose time ran out are late.</summary>
    public IReadOnlyList<ProcedureOutput> OnWake(SimTime now) => Record((-1, null, null, now, null));

    /// <summary>A person at the console confirmed or skipped a step; it counts only if that step waits for an answer.</summary>
    public IReadOnlyList<ProcedureOutput> Answer(string procedure, string step, bool confirmed, string by, long number, SimTime now) =>
        Record((IndexOf(procedure), by, null, now, new DeskAnswer(procedure, step, confirmed, number)));

    private List<ProcedureOutput> Record((int Procedure, string? By, IReadOnlyList<TelemetrySample>? Samples, SimTime Time, DeskAnswer? Answer) input)
    {
        // A frame or a wake with no step watching changes nothing: it is not kept, so a quiet desk costs no memory.
        if (input.By is null && !_watches.Any(w => w is not null)) return [];
        _inputs.Add(input);
        return Take(input);
    }

    private List<ProcedureOutput> Take((int Procedure, string? By, IReadOnlyList<TelemetrySample>? Samples, SimTime Time, DeskAnswer? Answer) input)
    {
        var outputs = new List<ProcedureOutput>();
        var now = input.Time;
        if (input.Answer is { Procedure: not null } answer && input.By is { } who) return Answer(input.Procedure, answer, who, now);
        if (input.By is { } by)
        {
            var i = input.Procedure;
            if (_runs[i] is { IsRunning: true } running)
            {
                outputs.Add(new ProcedureStartIgnored(now, _procedures[i].Name, by, _procedures[i].Steps[running.Step].Name));
                return outputs;
            }

            Apply(i, ProcedureRunner.Start(_procedures[i], by, now, input.Answer is not null), outputs);
            return outputs;
        }

        for (var i = 0; i < _procedures.Count; i++)
        {
            if (_runs[i] is not { IsRunning: true } run || _watches[i] is not { } watch) continue;
            if (input.Samples is { } samples)
            {
                var (ended, held, evidence) = watch.OnFrame(samples);
                if (ended) Apply(i, ProcedureRunner.WaitEnded(_procedures[i], run, held, evidence, now), outputs);
            }
            else if (run.Deadline is { } deadline && now >= deadline)
            {
                Apply(i, ProcedureRunner.TimedOut(_procedures[i], run, watch.LastSeen(), now), outputs);
            }
        }

        return outputs;
    }

    private List<ProcedureOutput> Answer(int index, DeskAnswer answer, string by, SimTime now)
    {
        var outputs = new List<ProcedureOutput>();
        var run = index >= 0 ? _runs[index] : null;
        var reason = index < 0 ? "no such procedure"
            : run is not { IsRunning: true } ? "the procedure is not running"
            : _procedures[index].Steps[run.Step].Name != answer.Step ? $"the procedure is at step '{_procedures[index].Steps[run.Step].Name}'"
            : !run.AwaitingAnswer ? "the step does not wait for an answer"
            : null;
        if (reason is not null)
        {
            outputs.Add(new ProcedureAnswerIgnored(now, answer.Procedure!, answer.Step, by, answer.Number, reason));
            return outputs;
        }

        Apply(index, ProcedureRunner.Answer(_procedures[index], run!, answer.Confirmed, by, answer.Number, now), outputs);
        return outputs;
    }

    /// <summary>Takes a transition: a step that starts watching gets a fresh watch; a finished run none.</summary>
    private void Apply(int index, ProcedureTransition transition, List<ProcedureOutput> outputs)
    {
        _runs[index] = transition.Run;
        outputs.AddRange(transition.Outputs);
        if (transition.Outputs.OfType<StepStarted>().Any() || !transition.Run.IsRunning)
        {
            _watches[index]?.Dispose();
            _watches[index] = null;
        }

        var step = _procedures[index].Steps[transition.Run.Step];
        if (transition.Run.IsRunning && !transition.Run.AwaitingAnswer && step.Watches && _watches[index] is null) _watches[index] = new ProcedureWatch(step);
    }
}
