using System.Net;
using System.Net.Sockets;
using System.Text.Json;
using DescentOps.Campaigns;
using DescentOps.Cli;
using DescentOps.Cli.Commands;
using DescentOps.Engine.Randomness;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;
using Microsoft.Data.Sqlite;

namespace DescentOps.Cluster.Tests;

/// <summary>The campaign test scenario, the command line in this process, free loopback ports and in-process workers.</summary>
internal static class ClusterFixture
{
    public static string Scenario => Path.Combine(AppContext.BaseDirectory, "short-stall.yaml");

    public static string NoBoost => Path.Combine(AppContext.BaseDirectory, "no-boost.yaml");

    /// <summary>Hang guard for anything that waits on a cluster: generous, never a timing assertion.</summary>
    public static readonly TimeSpan Guard = TimeSpan.FromSeconds(120);

    /// <summary>
    /// Akka settings for tests that wait on real membership: a member may miss heartbeats for 15 s (the tool's own
    /// default is 4 s) before it is unreachable. Two cores shared by several test runs can starve a node's heartbeats
    /// for seconds; a worker downed for that would redo runs and break the exact counts these tests check. A worker
    /// that is really gone (killed) is still found lost, only later.
    /// </summary>
    public const string PatientAkka = "akka.cluster.failure-detector.acceptable-heartbeat-pause = 15s";

    /// <summary><see cref="PatientAkka"/> as a file for <c>--akka-config</c>.</summary>
    public static string PatientAkkaFile()
    {
        var path = Path.Combine(TempDir(), "patient.hocon");
        File.WriteAllText(path, PatientAkka);
        return path;
    }

    public static CampaignPlan Plan(long seed, string toolVersion = "test-build")
    {
        var scenario = ScenarioLoader.LoadFile(Scenario);
        return new CampaignPlan(scenario, [CampaignVariant.Baseline], seed, scenario.Run.UntilS, toolVersion, RandomStream.AlgorithmName);
    }

    /// <summary>A fresh folder that goes when the test process ends.</summary>
    public static string TempDir() => TestFolders.New();

    /// <summary>A loopback port free a moment ago (the node binds it right after).</summary>
    public static int FreePort()
    {
        using var listener = new TcpListener(IPAddress.Loopback, 0);
        listener.Start();
        return ((IPEndPoint)listener.LocalEndpoint).Port;
    }

    /// <summary>The command line in this process with its output captured.</summary>
    public static Task<(int ExitCode, string Stdout, string Stderr)> CliAsync(params string[] args) => InProcessCli.RunAsync(args);

    /// <summary>A worker in this process, as <c>descentops worker --join</c> runs one; stopped by disposing.</summary>
    public sealed class Worker : IAsyncDisposable
    {
        private readonly CancellationTokenSource _stop = new();

        /// <summary>Joins the campaign node at <paramref name="port"/>; Akka settings <see cref="PatientAkka"/> unless others are given.</summary>
        public Worker(int port, int slots = 1, JoinSecret? secret = null, string toolVersion = "", string? akkaConfig = null)
        {
            var setup = new WorkerSetup("in-process", toolVersion.Length == 0 ? ToolInfo.Version : toolVersion, slots, secret, PlanOf, n => { lock (Notices) Notices.Add(n); });
            Running = Task.Run(() => WorkerNode.RunAsync(setup, new NodeAddress("127.0.0.1", port), new NodeAddress("127.0.0.1", 0), Counters, false, _ => { }, _stop.Token, akkaConfig ?? PatientAkka));
        }

        /// <summary>True once the campaign node has welcomed this worker.</summary>
        public bool Welcomed
        {
            get
            {
                lock (Notices) return Notices.Any(n => n.StartsWith("joined the campaign as ", StringComparison.Ordinal));
            }
        }

        public WorkerCounters Counters { get; } = new();

        public List<string> Notices { get; } = [];

        public Task Running { get; }

        public async ValueTask DisposeAsync()
        {
            await _stop.CancelAsync();
            try
            {
                await Running.WaitAsync(Guard);
            }
            catch (WorkerRefusedException)
            {
            }

            _stop.Dispose();
        }

        private static CampaignPlan PlanOf(string json) => CampaignCommand.PlanOf(JsonSerializer.Deserialize<Dictionary<string, string>>(json)!);
    }

    /// <summary>Waits for a condition (polling), failing the test with the message if the guard runs out.</summary>
    public static async Task Until(Func<bool> condition, string what)
    {
        var started = DateTime.UtcNow;
        while (!condition())
        {
            if (DateTime.UtcNow - started > Guard) throw new TimeoutException($"gave up waiting: {what}");
            await Task.Delay(50);
        }
    }

    /// <summary>Every table's rows, ordered by their key, as text: two equal dumps mean equal tables.</summary>
    public static string Dump(string dir) => Campaigns.Tests.CampaignTables.Dump(dir);

    /// <summary>Runs stored so far (0 before the database exists); read-only, beside a writer.</summary>
    public static int StoredRuns(string dir)
    {
        var path = Path.Combine(dir, "campaign.sqlite");
        if (!File.Exists(path)) return 0;
        try
        {
            using var connection = new SqliteConnection($"Data Source={path};Pooling=False;Mode=ReadOnly");
            connection.Open();
            using var command = connection.CreateCommand();
            command.CommandText = "SELECT count(*) FROM runs";
            return Convert.ToInt32(command.ExecuteScalar(), System.Globalization.CultureInfo.InvariantCulture);
        }
        catch (SqliteException)
        {
            return 0; // not created yet
        }
    }
}
