using Akka;
using Akka.Actor;
using Microsoft.Extensions.DependencyInjection;

namespace DescentOps.Cluster;

/// <summary>
/// <c>descentops worker</c>: a generic host with a cluster node that joins the campaign node at the given address and
/// runs what it is given. When the campaign node goes (the campaign ended, or the node died and this worker was downed),
/// a fresh node waits to join again, so a campaign resumed at the same address finds its workers. Stopping (Ctrl-C)
/// hands back unfinished runs before the node leaves.
/// </summary>
public static class WorkerNode
{
    /// <summary>How long a stopping worker waits for its hand-back to be sent before it leaves anyway.</summary>
    private static readonly TimeSpan HandBackTimeout = TimeSpan.FromSeconds(5);

    /// <summary>Runs until <paramref name="stop"/> is cancelled (0) or the campaign node refuses this worker (the reason is thrown).</summary>
    public static async Task RunAsync(WorkerSetup setup, NodeAddress join, NodeAddress listen, WorkerCounters counters, bool verbose, Action<IServiceCollection> logging, CancellationToken stop, string? akkaConfig = null)
    {
        while (!stop.IsCancellationRequested)
        {
            var refused = new TaskCompletionSource<string>(TaskCreationOptions.RunContinuationsAsynchronously);
            IActorRef? worker = null;
            using var host = NodeHost.Build(listen, NodeRoles.Worker, [join], verbose, logging, (system, registry) =>
            {
                worker = system.ActorOf(Props.Create(() => new RunWorker(setup, counters, r => refused.TrySetResult(r), null)), NodeRoles.WorkerName);
                registry.Register<RunWorker>(worker);
                CoordinatedShutdown.Get(system).AddTask(CoordinatedShutdown.PhaseBeforeServiceUnbind, "hand-back-runs", async () =>
                {
                    try
                    {
                        return await worker.Ask<Done>(new RunWorker.StopAndHandBack(), HandBackTimeout).ConfigureAwait(false);
                    }
                    catch (AskTimeoutException)
                    {
                        return Done.Instance;
                    }
                });
            }, akkaConfig);
            await host.StartAsync(CancellationToken.None).ConfigureAwait(false);
            var system = host.Services.GetRequiredService<ActorSystem>();
            setup.Notice($"waiting to join the campaign node at {join} (this node: {Akka.Cluster.Cluster.Get(system).SelfAddress})");
            var stopped = Task.Delay(Timeout.Infinite, stop);
            var ended = await Task.WhenAny(system.WhenTerminated, refused.Task, stopped).ConfigureAwait(false);
            using (var bounded = new CancellationTokenSource(TimeSpan.FromSeconds(15)))
            {
                // Coordinated shutdown: the hand-back task first, then leaving the cluster.
                await host.StopAsync(bounded.Token).ConfigureAwait(false);
            }

            if (ended == refused.Task) throw new WorkerRefusedException(await refused.Task.ConfigureAwait(false));
            if (ended == stopped) return;
            try
            {
                await Task.Delay(TimeSpan.FromSeconds(1), stop).ConfigureAwait(false);
            }
            catch (OperationCanceledException)
            {
                return;
            }
        }
    }
}
