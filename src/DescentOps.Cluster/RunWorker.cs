using Akka;
using Akka.Actor;
using Akka.Cluster;
using DescentOps.Campaigns;
using DescentOps.Cluster.Protocol;

namespace DescentOps.Cluster;

/// <summary>
/// A worker's actor: finds the campaign node's dispatcher (given, or the campaign-role member of the cluster), joins it,
/// asks for one run per free slot, runs each on a thread of its own (<see cref="RunExecutor.Execute"/>) and sends the
/// record back. Told to stop (<see cref="StopAndHandBack"/>), it hands back what it has not finished and leaves.
/// </summary>
public sealed class RunWorker : ReceiveActor, IWithTimers
{
    private readonly WorkerSetup _setup;
    private readonly WorkerCounters _counters;
    private readonly Action<string> _refused;
    private readonly HashSet<RunKey> _running = [];
    private IActorRef? _dispatcher;
    private CampaignPlan? _plan;
    private string? _planSettings;
    private bool _stopping;
    private bool _subscribed;

    public ITimerScheduler Timers { get; set; } = null!;

    /// <summary>Asks the worker to hand back its unfinished runs and leave the campaign; answered with <see cref="Done"/>.</summary>
    public sealed record StopAndHandBack;

    private sealed record Finished(RunKey Key, RunRecord Record);

    private sealed record Failed(RunKey Key, Exception Error);

    private sealed record GreetAgain(Address Node);

    /// <summary>A greeting lost on the way (the node still starting, a dropped connection) is sent again after this long.</summary>
    private static readonly TimeSpan GreetingRetry = TimeSpan.FromSeconds(3);

    /// <summary>A worker; <paramref name="dispatcher"/> is given when it is in this actor system, otherwise found through the cluster.</summary>
    public RunWorker(WorkerSetup setup, WorkerCounters counters, Action<string> refused, IActorRef? dispatcher = null)
    {
        _setup = setup;
        _counters = counters;
        _refused = refused;
        _dispatcher = dispatcher;
        Receive<ClusterEvent.CurrentClusterState>(state =>
        {
            foreach (var member in state.Members.Where(m => m.Status == MemberStatus.Up)) Found(member);
        });
        Receive<ClusterEvent.MemberUp>(up => Found(up.Member));
        Receive<GreetAgain>(again => Greet(again.Node));
        Receive<Challenge>(challenge =>
        {
            if (_dispatcher is null || !Sender.Equals(_dispatcher)) Context.Watch(_dispatcher = Sender);
            Sender.Tell(new Proof(challenge.Nonce.Length == 0 || _setup.Secret is null ? "" : _setup.Secret.Prove(challenge.Nonce)));
        });
        Receive<Welcome>(OnWelcome);
        Receive<Refused>(refused =>
        {
            _setup.Notice($"the campaign node refused this worker: {refused.Reason}");
            _refused(refused.Reason);
        });
        Receive<Assign>(OnAssign);
        Receive<Finished>(finished =>
        {
            if (!_running.Remove(finished.Key) || _dispatcher is null) return;
            _counters.RunDone();
            _dispatcher.Tell(new RunDone(finished.Key.Variant, finished.Key.Index, RunRecordCodec.Encode(finished.Record)));
            if (!_stopping) _dispatcher.Tell(new AskWork(1));
        });
        Receive<Failed>(failed =>
        {
            if (!_running.Remove(failed.Key)) return;
            _dispatcher?.Tell(new RunFailed(failed.Key.Variant, failed.Key.Index, failed.Error.Message));
        });
        Receive<CampaignOver>(_ => _setup.Notice("the campaign is complete"));
        Receive<Terminated>(t =>
        {
            if (!t.ActorRef.Equals(_dispatcher)) return;
            _setup.Notice("the campaign node is gone");
            _dispatcher = null;
            _running.Clear();
            Context.System.Terminate(); // the worker's host starts a fresh node that waits for the next campaign node
        });
        Receive<StopAndHandBack>(_ =>
        {
            _stopping = true;
            if (_dispatcher is not null)
            {
                foreach (var key in _running) _dispatcher.Tell(new HandBack(key.Variant, key.Index));
                _dispatcher.Tell(new Leaving());
                _counters.HandBack(_running.Count);
                if (_running.Count > 0) _setup.Notice($"handed back {_running.Count} unfinished run(s)");
            }

            _running.Clear();
            Sender.Tell(Done.Instance);
        });
    }

    protected override void PreStart()
    {
        if (_dispatcher is not null)
        {
            _dispatcher.Tell(new Hello(_setup.Name, _setup.ToolVersion, _setup.Slots));
            return;
        }

        _subscribed = true;
        Akka.Cluster.Cluster.Get(Context.System).Subscribe(Self, ClusterEvent.InitialStateAsSnapshot, typeof(ClusterEvent.MemberUp));
    }

    protected override void PostStop()
    {
        if (_subscribed) Akka.Cluster.Cluster.Get(Context.System).Unsubscribe(Self);
    }

    private void Found(Member member)
    {
        if (member.HasRole(NodeRoles.Campaign)) Greet(member.Address);
    }

    private void Greet(Address node)
    {
        if (_dispatcher is not null || _stopping) return;
        Context.ActorSelection(new RootActorPath(node) / "user" / NodeRoles.DispatcherName).Tell(new Hello(_setup.Name, _setup.ToolVersion, _setup.Slots));
        Timers.StartSingleTimer("greet-" + node, new GreetAgain(node), GreetingRetry);
    }

    private void OnWelcome(Welcome welcome)
    {
        if (_planSettings != welcome.SettingsJson)
        {
            try
            {
                _plan = _setup.PlanOf(welcome.SettingsJson);
                _planSettings = welcome.SettingsJson;
            }
#pragma warning disable CA1031 // A campaign this build cannot read: the worker says why and stops.
            catch (Exception exception)
#pragma warning restore CA1031
            {
                _setup.Notice($"cannot run this campaign: {exception.Message}");
                _refused(exception.Message);
                return;
            }
        }

        _setup.Notice($"joined the campaign as {welcome.WorkerId}");
        if (!_stopping) Sender.Tell(new AskWork(_setup.Slots));
    }

    private void OnAssign(Assign assign)
    {
        var key = new RunKey(assign.Variant, assign.Index);
        if (_plan is null || _stopping || !_running.Add(key))
        {
            Sender.Tell(new HandBack(assign.Variant, assign.Index));
            return;
        }

        var plan = _plan;
        var spec = new RunSpec(assign.Variant, assign.Index, assign.Seed);
        var self = Self;
        // A run takes seconds to minutes: it gets a thread of its own, never one of the actor dispatcher's.
        Task.Factory.StartNew(() => RunExecutor.Execute(plan, spec), CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default)
            .ContinueWith(t => self.Tell(t.IsCompletedSuccessfully ? new Finished(key, t.Result) : new Failed(key, t.Exception?.GetBaseException() ?? new InvalidOperationException("run cancelled"))), TaskScheduler.Default);
    }
}
