using Akka.Cluster.Hosting;
using Akka.Cluster.Hosting.SBR;
using Akka.Configuration;
using Akka.Hosting;
using Akka.Remote.Hosting;

namespace DescentOps.Cluster;

/// <summary>
/// The Akka settings every node of a campaign's cluster uses: remoting on the given address, clustering with the roles,
/// and Akka's split-brain resolver with the keep-oldest strategy, counting only campaign-role members, and
/// <c>down-if-alone = off</c>. The campaign node is the only member of that role, so the side of a partition that holds it
/// is the side that survives: a worker cut off from it is downed (it stops, its runs go to others, and it rejoins
/// when it can), and the campaign node, which holds the store, is never downed by losing workers. A majority rule would
/// be wrong here: two workers could outvote the node that holds the results.
/// </summary>
public static class ClusterConfig
{
    /// <summary>How long a worker may miss heartbeats before it is unreachable, and how long a partition must hold before it is resolved.</summary>
    public static readonly TimeSpan HeartbeatPause = TimeSpan.FromSeconds(4);

    public static readonly TimeSpan StableAfter = TimeSpan.FromSeconds(5);

    /// <summary>Largest message: a campaign's settings carry the scenario and change texts (4 MiB, far above any scenario).</summary>
    public const int MaxFrameBytes = 4 * 1024 * 1024;

    /// <summary>The settings, then <paramref name="akkaConfig"/> (HOCON from <c>--akka-config</c>, e.g. Akka.Remote's TLS settings) over them.</summary>
    public static AkkaConfigurationBuilder Apply(AkkaConfigurationBuilder builder, NodeAddress listen, string role, IReadOnlyList<NodeAddress> seeds, bool verbose, string? akkaConfig = null)
    {
        var c = System.Globalization.CultureInfo.InvariantCulture;
        var user = akkaConfig is null ? null : ConfigurationFactory.ParseString(akkaConfig);
        var tls = user?.GetBoolean("akka.remote.dot-netty.tcp.enable-ssl", false) ?? false;
        builder
            .WithRemoting(new RemoteOptions { HostName = listen.Host, PublicHostName = listen.Host, Port = listen.Port, MaxFrameSize = MaxFrameBytes })
            .WithClustering(new ClusterOptions
            {
                Roles = [role],
                SeedNodes = [.. seeds.Select(s => SeedAddress(s, tls))],
                SplitBrainResolver = new KeepOldestOption { DownIfAlone = false, Role = NodeRoles.Campaign },
                LogInfo = verbose,
            })
            .AddHocon(ConfigurationFactory.ParseString(string.Create(c, $$"""
                akka.cluster.split-brain-resolver.stable-after = {{StableAfter.TotalSeconds}}s
                # Flapping reachability (a loaded machine) must not down everyone: that would stop the node holding the store.
                akka.cluster.split-brain-resolver.down-all-when-unstable = off
                akka.cluster.failure-detector.acceptable-heartbeat-pause = {{HeartbeatPause.TotalSeconds}}s
                akka.cluster.retry-unsuccessful-join-after = 2s
                akka.cluster.seed-node-timeout = 2s
                akka.remote.log-remote-lifecycle-events = {{(verbose ? "on" : "off")}}
                akka.log-dead-letters = {{(verbose ? "10" : "off")}}
                akka.log-dead-letters-during-shutdown = off
                akka.stdout-loglevel = OFF
                akka.remote.retry-gate-closed-for = 1s
                """)), HoconAddMode.Prepend)
            .ConfigureLoggers(loggers =>
            {
                // Without --verbose only errors: a worker waiting for its campaign node would otherwise warn at every join attempt.
                loggers.LogLevel = verbose ? Akka.Event.LogLevel.InfoLevel : Akka.Event.LogLevel.ErrorLevel;
                loggers.LogConfigOnStart = false;
                loggers.ClearLoggers();
                loggers.AddLoggerFactory();
            });
        if (user is not null) builder.AddHocon(user, HoconAddMode.Prepend);
        return builder;
    }

    /// <summary>An <c>--akka-config</c> file's HOCON text, checked to parse; the error names the file.</summary>
    public static string ReadUserConfig(string path)
    {
        if (!File.Exists(path)) throw new FormatException($"--akka-config: no such file {path}");
        if (new FileInfo(path).Length > 1_000_000) throw new FormatException($"--akka-config: {path} is over 1 MB; Akka settings are a few lines");
        var text = File.ReadAllText(path);
        try
        {
            ConfigurationFactory.ParseString(text);
        }
#pragma warning disable CA1031 // The HOCON parser throws several exception types; each is a bad file.
        catch (Exception exception)
#pragma warning restore CA1031
        {
            throw new FormatException($"--akka-config: {path} is not HOCON: {exception.Message}", exception);
        }

        return text;
    }

    /// <summary>The Akka address of a node listening on this host and port (Akka.Remote names a TLS transport <c>akka.ssl.tcp</c>).</summary>
    public static string SeedAddress(NodeAddress node, bool tls = false) => $"{(tls ? "akka.ssl.tcp" : "akka.tcp")}://{NodeRoles.SystemName}@{node}";
}
