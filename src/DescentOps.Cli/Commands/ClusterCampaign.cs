using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using DescentOps.Campaigns;
using DescentOps.Cli.Terminal;
using DescentOps.Cluster;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>campaign ... --cluster [--listen HOST:PORT] [--secret-file FILE] [--verbose]</c>: the campaign node of a cluster.
/// It forms the cluster on its address, hands runs to the workers that join (and to itself unless <c>--jobs 0</c>), and
/// stores results exactly as a local campaign does; the command's other steps (settings, resume, summary) are the same.
/// </summary>
public static class ClusterCampaign
{
    /// <summary>The options <c>campaign</c> gains, and how to read them.</summary>
    public sealed class Options
    {
        public Option<bool> Cluster { get; } = new("--cluster") { Description = "Run the campaign on a cluster: this process is its seed node and hands runs to 'descentops worker' processes that join it." };

        public Option<string?> Listen { get; } = new("--listen") { Description = $"With --cluster: the address workers join (default {NodeAddress.DefaultListen}; any other than loopback needs a shared secret)." };

        public Option<string?> SecretFile { get; } = new("--secret-file") { Description = $"With --cluster: a file holding the shared secret workers must prove (else ${JoinSecret.EnvironmentVariable})." };

        public Option<bool> Verbose { get; } = new("--verbose") { Description = "With --cluster: log the cluster's comings and goings to stderr." };

        public Option<string?> AkkaConfig { get; } = AkkaConfigOption();

        public IEnumerable<Option> All => [Cluster, Listen, SecretFile, Verbose, AkkaConfig];

        /// <summary>The cluster request, or null for a local campaign; refused before anything runs when it is incomplete.</summary>
        public Request? Read(System.CommandLine.ParseResult parse)
        {
            var listen = parse.GetValue(Listen);
            var secretFile = parse.GetValue(SecretFile);
            var verbose = parse.GetValue(Verbose);
            var akkaConfig = parse.GetValue(AkkaConfig);
            if (!parse.GetValue(Cluster))
            {
                if (listen is not null || secretFile is not null || verbose || akkaConfig is not null) throw new UsageException("--listen, --secret-file, --verbose and --akka-config go with --cluster");
                return null;
            }

            var address = listen is null ? NodeAddress.DefaultListen : Address(listen, "--listen");
            var secret = Secret(secretFile);
            if (secret is null && !address.IsLoopback)
            {
                throw new UsageException($"--listen {address} is reachable from other machines: give a shared secret (--secret-file FILE or ${JoinSecret.EnvironmentVariable}) so only your workers take part");
            }

            return new Request(address, secret, verbose, UserConfig(akkaConfig));
        }
    }

    public sealed record Request(NodeAddress Listen, JoinSecret? Secret, bool Verbose, string? AkkaConfig);

    /// <summary><c>--akka-config FILE</c>, for both node kinds.</summary>
    public static Option<string?> AkkaConfigOption() => new("--akka-config") { Description = "A HOCON file of Akka settings laid over the node's own (README: transport security with Akka.Remote's TLS settings)." };

    public static string? UserConfig(string? path)
    {
        if (path is null) return null;
        try
        {
            return ClusterConfig.ReadUserConfig(path);
        }
        catch (FormatException exception)
        {
            throw new UsageException(exception.Message);
        }
    }

    public static NodeAddress Address(string text, string option)
    {
        try
        {
            return NodeAddress.Parse(text, option);
        }
        catch (FormatException exception)
        {
            throw new UsageException(exception.Message);
        }
    }

    public static JoinSecret? Secret(string? file)
    {
        try
        {
            return JoinSecret.Load(file, Environment.GetEnvironmentVariable);
        }
        catch (FormatException exception)
        {
            throw new UsageException(exception.Message);
        }
    }

    /// <summary>
    /// Runs the campaign's remaining work on the cluster; returns the failure that stopped it, or null when every run is
    /// stored or the command was interrupted (the caller tells which).
    /// </summary>
    public static Exception? Run(
        Request request,
        CampaignPlan plan,
        IReadOnlyDictionary<string, string> settings,
        IReadOnlyList<(string Variant, int Index)> work,
        int localSlots,
        Func<RunRecord, bool> accept,
        Func<int> stopIndex,
        CampaignProgress progress,
        CancellationToken cancel)
    {
        var setup = new DispatcherSetup(
            JsonSerializer.Serialize(settings),
            plan,
            [.. work.Select(w => new RunKey(w.Variant, w.Index))],
            ToolInfo.Version,
            request.Secret,
            accept,
            stopIndex,
            NodeDiagnostics.Notice);
        CampaignNode node;
        try
        {
            node = CampaignNode.StartAsync(setup, request.Listen, localSlots, _ => plan, request.Verbose, NodeDiagnostics.Logging(request.Verbose), request.AkkaConfig).GetAwaiter().GetResult();
        }
        catch (Exception exception) when (exception is not OperationCanceledException)
        {
            throw new UsageException($"--listen {request.Listen}: the campaign node could not start there ({exception.GetBaseException().Message})");
        }

        try
        {
            progress.Detail = () =>
            {
                var s = node.Status;
                return string.Create(CultureInfo.InvariantCulture, $"{s.Workers} worker(s), {s.InFlight} in flight");
            };
            Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"  cluster: listening on {node.Address}{(request.Secret is null ? "" : " (shared secret required)")}; start workers with: descentops worker --join {node.Address}{(localSlots > 0 ? $"; {localSlots} run(s) at once here too" : "; no runs here (--jobs 0)")}"));
            try
            {
                node.Completion.Wait(cancel);
                return null;
            }
            catch (OperationCanceledException)
            {
                return null;
            }
            catch (AggregateException failure)
            {
                return failure.GetBaseException();
            }
        }
        finally
        {
            var status = node.Status;
            if (status.Duplicates > 0) NodeDiagnostics.Notice($"{status.Duplicates} late duplicate result(s) discarded");
            node.DisposeAsync().AsTask().GetAwaiter().GetResult();
        }
    }
}
