using DescentOps.Engine.Components;
using DescentOps.Records;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Identity;

namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// One PHOLD logical process for the kernels: every token it receives is passed on to a random process
/// after a random delay. At the time limit it journals its order checksum, so a run with no event journal
/// still says what order it delivered; with <c>journalEvents</c> it also journals every token it handles.
/// </summary>
public sealed class PholdProcess : SimComponent<PholdProcess.State>
{
    public const string ChecksumKind = "phold.checksum";
    public const string EventKind = "phold.event";

    private readonly int _index;
    private readonly IReadOnlyList<ComponentId> _processes;
    private readonly PholdOptions _options;
    private readonly DelayLaw _law;
    private readonly bool _journalEvents;

    public PholdProcess(int index, IReadOnlyList<ComponentId> processes, PholdOptions options, DelayLaw law, bool journalEvents)
        : base(processes[index])
    {
        _index = index;
        _processes = processes;
        _options = options;
        _law = law;
        _journalEvents = journalEvents;
    }

    public override State InitialState => new(OrderChecksum.Start, 0);

    /// <summary>Token ids owned at the start by process <paramref name="index"/>: every N-th, from its index.</summary>
    public static IEnumerable<long> InitialTokens(int index, PholdOptions options)
    {
        for (long id = index; id < options.Tokens; id += options.Processes) yield return id;
    }

    public override State Handle(State state, object message, ComponentContext context)
    {
        switch (message)
        {
            case RunStarted:
                foreach (var id in InitialTokens(_index, _options)) Pass(new Token(id, _index), context);
                // Priority Last: at the limit itself, the first round's tokens still count toward the checksum.
                context.ScheduleSelf(_options.Until - context.Now, Report.Instance, EventPriority.Last);
                return state;
            case Token token:
                if (_journalEvents)
                {
                    context.Record(EventKind, Severity.Debug, RecordField.Of("token", token.Id), RecordField.Of("from", token.SenderIndex));
                }

                Pass(token with { SenderIndex = _index }, context);
                return new State(OrderChecksum.Event(state.Hash, context.Now.Ticks, token.Id, token.SenderIndex), state.Handled + 1);
            case Report:
                context.Record(ChecksumKind, Severity.Info, RecordField.Of("hash", unchecked((long)state.Hash)), RecordField.Of("handled", state.Handled));
                return state;
            default:
                throw new InvalidOperationException($"{Id} got {message}");
        }
    }

    private void Pass(Token token, ComponentContext context)
    {
        var target = PholdDelay.DrawTarget(context.Random, _processes.Count);
        var delay = PholdDelay.DrawDelay(context.Random, _law, _options.MeanDelayMs);
        context.Schedule(_processes[target], delay, token);
    }

    public sealed record State(ulong Hash, long Handled);

    /// <summary>A token in flight: its id for the checksum, and who sent it last.</summary>
    public sealed record Token(long Id, int SenderIndex);

    public sealed record Report
    {
        public static Report Instance { get; } = new();
    }
}
