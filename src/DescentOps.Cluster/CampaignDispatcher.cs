using Akka.Actor;
using Akka.Event;
using DescentOps.Cluster.Protocol;

namespace DescentOps.Cluster;

/// <summary>
/// The campaign node's actor: it admits workers (same build, the shared secret when one is set), hands out runs to
/// those that ask, stores results through <see cref="DispatcherSetup.Accept"/>, and gives a lost worker's runs to the
/// others. The bookkeeping is <see cref="DispatchLedger"/>; this actor only translates messages into its calls.
/// </summary>
public sealed class CampaignDispatcher : ReceiveActor
{
    private const int MaxSlotsPerWorker = 1024;

    private readonly DispatcherSetup _setup;
    private readonly TaskCompletionSource _finished;
    private readonly Action<ClusterStatus> _publish;
    private readonly DispatchLedger _ledger;
    private readonly Dictionary<IActorRef, Session> _sessions = [];
    private readonly Dictionary<string, IActorRef> _byId = new(StringComparer.Ordinal);
    private readonly ILoggingAdapter _log = Context.GetLogger();
    private int _joined;
    private int _accepted;
    private int _duplicates;

    public CampaignDispatcher(DispatcherSetup setup, TaskCompletionSource finished, Action<ClusterStatus> publish)
    {
        _setup = setup;
        _finished = finished;
        _publish = publish;
        _ledger = new DispatchLedger(setup.Work);
        _ledger.StopAt(setup.StopIndex());
        Receive<Hello>(OnHello);
        Receive<Proof>(OnProof);
        Receive<AskWork>(m => WithWorker(id => _ledger.Ask(id, Math.Clamp(m.Slots, 0, Math.Max(0, SlotsOf(id) - _ledger.FreeSlotsOf(id) - _ledger.HeldBy(id).Count)))));
        Receive<RunDone>(OnRunDone);
        Receive<RunFailed>(m => WithWorker(id => _finished.TrySetException(new InvalidOperationException($"run {m.Index} of {m.Variant} failed on worker {id}: {m.Message}"))));
        Receive<HandBack>(m => WithWorker(id =>
        {
            if (_ledger.HandBack(id, [new RunKey(m.Variant, m.Index)]).Count > 0) _setup.Notice($"worker {id} handed back run {m.Index} of {m.Variant}");
        }));
        Receive<Leaving>(_ => WithWorker(id => Lose(id, "left")));
        Receive<Terminated>(m =>
        {
            if (_sessions.Remove(m.ActorRef, out var session) && session.Id is not null)
            {
                Lose(session.Id, "lost");
                _byId.Remove(session.Id);
                DispatchAll();
            }
        });
    }

    protected override void PreStart()
    {
        Publish();
        if (_ledger.Finished) _finished.TrySetResult();
    }

    private sealed class Session(string name, int slots, string nonce)
    {
        public string Name { get; } = name;
        public int Slots { get; } = slots;
        public string Nonce { get; } = nonce;
        public string? Id { get; set; }
    }

    private int SlotsOf(string id) => _sessions[_byId[id]].Slots;

    private void OnHello(Hello hello)
    {
        if (_sessions.ContainsKey(Sender)) return;
        if (hello.ToolVersion != _setup.ToolVersion)
        {
            Refuse($"this campaign is run by DescentOps {_setup.ToolVersion}, the worker is {Clip(hello.ToolVersion)}: only the same build gives the same results");
            return;
        }

        if (hello.Slots is < 1 or > MaxSlotsPerWorker)
        {
            Refuse($"a worker offers 1 to {MaxSlotsPerWorker} slots, not {hello.Slots}");
            return;
        }

        var nonce = _setup.Secret is null ? "" : JoinSecret.NewNonce();
        _sessions[Sender] = new Session(Clip(hello.Name), hello.Slots, nonce);
        Context.Watch(Sender);
        Sender.Tell(new Challenge(nonce));
    }

    private void OnProof(Proof proof)
    {
        if (!_sessions.TryGetValue(Sender, out var session) || session.Id is not null) return;
        if (_setup.Secret is { } secret && !secret.Verify(session.Nonce, proof.Mac))
        {
            _sessions.Remove(Sender);
            Context.Unwatch(Sender);
            Refuse("the worker does not hold the campaign's shared secret");
            Akka.Cluster.Cluster.Get(Context.System).Down(Sender.Path.Address);
            return;
        }

        session.Id = $"w{++_joined}";
        _byId[session.Id] = Sender;
        _ledger.AddWorker(session.Id);
        Sender.Tell(new Welcome(session.Id, _setup.SettingsJson));
        _setup.Notice($"worker {session.Id} ({session.Name}) joined with {session.Slots} slot(s)");
        if (_ledger.Finished) Sender.Tell(new CampaignOver());
        Publish();
    }

    private void OnRunDone(RunDone done) => WithWorker(id =>
    {
        var key = new RunKey(done.Variant, done.Index);
        Campaigns.RunRecord record;
        try
        {
            record = ResultCheck.Validate(_setup.Plan, key, done.RecordJson);
        }
        catch (InvalidDataException exception)
        {
            _log.Warning("result for run {0} from worker {1} refused: {2}", key, id, exception.Message);
            _ledger.HandBack(id, [key]);
            return;
        }

        switch (_ledger.Complete(key))
        {
            case ResultVerdict.Accepted:
                if (_setup.Accept(record))
                {
                    _accepted++;
                }
                else
                {
                    _duplicates++;
                    _setup.Notice($"run {key.Index} of {key.Variant} from worker {id} was already stored: discarded");
                }

                break;
            case ResultVerdict.Duplicate:
                _duplicates++;
                _setup.Notice($"late duplicate of run {key.Index} of {key.Variant} from worker {id}: discarded");
                break;
            default:
                _log.Warning("result for run {0} from worker {1} is not a run this campaign handed out: discarded", key, id);
                break;
        }

        _ledger.StopAt(_setup.StopIndex());
    });

    private void Lose(string id, string how)
    {
        if (!_ledger.Knows(id)) return;
        var back = _ledger.RemoveWorker(id);
        if (_finished.Task.IsCompleted) return; // the campaign is over: workers leaving is no news
        _setup.Notice(back.Count == 0 ? $"worker {id} {how}" : $"worker {id} {how}; {back.Count} unfinished run(s) go to others ({string.Join(", ", back)})");
    }

    /// <summary>Runs a step for an admitted worker, then hands out what can be handed out; messages from others are dropped.</summary>
    private void WithWorker(Action<string> step)
    {
        if (!_sessions.TryGetValue(Sender, out var session) || session.Id is null)
        {
            _log.Warning("a message from {0}, which has not joined, dropped", Sender.Path);
            return;
        }

        try
        {
            step(session.Id);
        }
#pragma warning disable CA1031 // A failure to store ends the campaign; the command reports it.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            _finished.TrySetException(exception);
            return;
        }

        DispatchAll();
    }

    private void DispatchAll()
    {
        foreach (var (worker, key) in _ledger.Dispatch())
        {
            _byId[worker].Tell(new Assign(key.Variant, key.Index, _setup.Plan.Spec(key.Variant, key.Index).Seed));
            if (_log.IsInfoEnabled) _log.Info("run {0} of {1} assigned to worker {2}", key.Index, key.Variant, worker); // with --verbose
        }

        if (_ledger.Finished && _finished.TrySetResult())
        {
            foreach (var worker in _byId.Values) worker.Tell(new CampaignOver());
        }

        Publish();
    }

    private void Publish() => _publish(new ClusterStatus(_ledger.Workers, _ledger.InFlight, _ledger.Pending, _accepted, _duplicates));

    private void Refuse(string reason)
    {
        _setup.Notice($"worker at {Sender.Path.Address} refused: {reason}");
        Sender.Tell(new Refused(reason));
    }

    private static string Clip(string text) => text.Length <= 200 ? text : text[..200] + "...";
}
