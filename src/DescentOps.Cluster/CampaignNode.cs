using Akka.Actor;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Hosting;

namespace DescentOps.Cluster;

/// <summary>
/// A campaign's seed node: an actor system that forms the cluster on its own address, the dispatcher, and (unless
/// <c>--jobs 0</c>) a worker of its own that pulls runs like any other. <see cref="Completion"/> ends when every run is
/// stored, or with the failure that stopped the campaign.
/// </summary>
public sealed class CampaignNode : IAsyncDisposable
{
    private readonly IHost _host;
    private readonly TaskCompletionSource _finished = new(TaskCreationOptions.RunContinuationsAsynchronously);
    private ClusterStatus _status = ClusterStatus.Empty;

    private CampaignNode(IHost host) => _host = host;

    public Task Completion => _finished.Task;

    public ClusterStatus Status => Volatile.Read(ref _status);

    /// <summary>The address workers join (<c>HOST:PORT</c>, the port as bound when 0 was asked for).</summary>
    public NodeAddress Address { get; private set; } = NodeAddress.DefaultListen;

    public WorkerCounters LocalWorker { get; } = new();

    /// <summary>The transport's name in Akka addresses: <c>akka.tcp</c>, or <c>akka.ssl.tcp</c> with TLS on.</summary>
    public string Protocol { get; private set; } = "akka.tcp";

    /// <summary>Starts the node; <paramref name="localSlots"/> runs at once on the campaign node itself (0: it only dispatches).</summary>
    public static async Task<CampaignNode> StartAsync(DispatcherSetup setup, NodeAddress listen, int localSlots, Func<string, Campaigns.CampaignPlan> planOf, bool verbose, Action<IServiceCollection> logging, string? akkaConfig = null)
    {
        CampaignNode? node = null;
        var host = NodeHost.Build(listen, NodeRoles.Campaign, [], verbose, logging, (system, registry) =>
        {
            var dispatcher = system.ActorOf(Props.Create(() => new CampaignDispatcher(setup, node!._finished, s => Volatile.Write(ref node._status, s))), NodeRoles.DispatcherName);
            registry.Register<CampaignDispatcher>(dispatcher);
            if (localSlots > 0)
            {
                var worker = new WorkerSetup($"campaign node, {Environment.MachineName}", setup.ToolVersion, localSlots, setup.Secret, planOf, _ => { });
                system.ActorOf(Props.Create(() => new RunWorker(worker, node!.LocalWorker, r => node._finished.TrySetException(new InvalidOperationException(r)), dispatcher)), NodeRoles.WorkerName);
            }
        }, akkaConfig);
        node = new CampaignNode(host);
        await host.StartAsync().ConfigureAwait(false);
        var system = host.Services.GetRequiredService<ActorSystem>();
        // If the node's actor system ends before the campaign does, the campaign cannot finish here: say so rather than wait.
        _ = system.WhenTerminated.ContinueWith(
            _ => node._finished.TrySetException(new InvalidOperationException("the campaign node's cluster stopped before the campaign ended; run the same command with --resume")),
            TaskScheduler.Default);
        var cluster = Akka.Cluster.Cluster.Get(system);
        cluster.Join(cluster.SelfAddress); // the first and only seed: the cluster forms around the campaign node
        node.Address = new NodeAddress(cluster.SelfAddress.Host!, cluster.SelfAddress.Port ?? listen.Port);
        node.Protocol = cluster.SelfAddress.Protocol;
        return node;
    }

    public async ValueTask DisposeAsync()
    {
        using var bounded = new CancellationTokenSource(TimeSpan.FromSeconds(15));
        try
        {
            await _host.StopAsync(bounded.Token).ConfigureAwait(false);
        }
        finally
        {
            _host.Dispose();
        }
    }
}
