using Microsoft.Extensions.Hosting;

namespace DescentOps.Cluster;

/// <summary>A host lifetime that leaves Ctrl-C and SIGTERM alone: the command watches them and decides what stopping means.</summary>
internal sealed class QuietLifetime : IHostLifetime
{
    public Task WaitForStartAsync(CancellationToken cancellationToken) => Task.CompletedTask;

    public Task StopAsync(CancellationToken cancellationToken) => Task.CompletedTask;
}
