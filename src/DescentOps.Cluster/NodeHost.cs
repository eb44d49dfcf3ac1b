using Akka.Actor;
using Akka.Hosting;
using Microsoft.Extensions.DependencyInjection;
using Microsoft.Extensions.Hosting;

namespace DescentOps.Cluster;

/// <summary>A generic host holding one cluster node's actor system (Akka.Hosting), with the logging the command chose.</summary>
internal static class NodeHost
{
    public static IHost Build(NodeAddress listen, string role, IReadOnlyList<NodeAddress> seeds, bool verbose, Action<IServiceCollection> logging, Action<ActorSystem, IActorRegistry> actors, string? akkaConfig)
    {
        var builder = Host.CreateEmptyApplicationBuilder(new HostApplicationBuilderSettings { DisableDefaults = true });
        builder.Services.AddSingleton<IHostLifetime, QuietLifetime>();
        logging(builder.Services);
        builder.Services.AddAkka(NodeRoles.SystemName, akka =>
        {
            ClusterConfig.Apply(akka, listen, role, seeds, verbose, akkaConfig);
            akka.WithActors(actors);
        });
        return builder.Build();
    }
}
