using System.Globalization;
using Akka.Actor;
using Akka.Cluster;
using Akka.Configuration;
using DescentOps.Campaigns;
using DescentOps.Cluster.Protocol;
using Xunit;

namespace DescentOps.Cluster.Tests;

/// <summary>Clusters of several actor systems in this process, on loopback; every wait has a hang guard.</summary>
[Collection(InProcessClusterCollection.Name)]
public sealed class InProcessClusterTests
{
    [Fact]
    public async Task A_clustered_campaign_gives_the_local_campaigns_summary_and_tables()
    {
        var local = ClusterFixture.TempDir();
        var common = new[] { "campaign", ClusterFixture.Scenario, "--runs", "6", "--seed", "11", "--versus", ClusterFixture.NoBoost };
        var (exit, _, stderr) = await ClusterFixture.CliAsync([.. common, "--jobs", "2", "--output", local]);
        Assert.True(exit == 0, stderr);

        // A loaded machine can hold one worker's join back until the other has done every run; that attempt cannot show
        // both joins, so it is made again (at most three times); every check applies to the attempt that counts.
        for (var attempt = 1; ; attempt++)
        {
            var clustered = ClusterFixture.TempDir();
            var port = ClusterFixture.FreePort();
            await using var b = new ClusterFixture.Worker(port, slots: 2); // the one whose join line is checked starts first
            await using var a = new ClusterFixture.Worker(port);
            var (clusterExit, stdout, clusterErr) = await ClusterFixture.CliAsync([.. common, "--cluster", "--akka-config", ClusterFixture.PatientAkkaFile(), "--listen", $"127.0.0.1:{port}", "--jobs", "0", "--output", clustered]).WaitAsync(ClusterFixture.Guard);
            Assert.True(clusterExit == 0, stdout + clusterErr);
            if (!(a.Welcomed && b.Welcomed) && attempt < 3) continue;

            Assert.Equal(File.ReadAllText(Path.Combine(local, "summary.json")), File.ReadAllText(Path.Combine(clustered, "summary.json")));
            Assert.Equal(ClusterFixture.Dump(local), ClusterFixture.Dump(clustered));
            Assert.Equal(12, a.Counters.RunsDone + b.Counters.RunsDone); // --jobs 0: the campaign node ran none itself
            Assert.Contains("joined with 2 slot(s)", stdout, StringComparison.Ordinal);
            Assert.Contains($"listening on 127.0.0.1:{port}", stdout, StringComparison.Ordinal);
            break;
        }
    }

    [Fact]
    public async Task A_clustered_three_lander_campaign_gives_the_local_campaigns_per_lander_results()
    {
        var local = ClusterFixture.TempDir();
        var clustered = ClusterFixture.TempDir();
        var common = new[] { "campaign", DescentOps.Campaigns.Tests.LanderCampaignScenario.File(), "--runs", "6", "--seed", "5" };
        var (exit, _, stderr) = await ClusterFixture.CliAsync([.. common, "--jobs", "2", "--output", local]);
        Assert.True(exit == 0, stderr);

        var port = ClusterFixture.FreePort();
        await using var worker = new ClusterFixture.Worker(port, slots: 2);
        var (clusterExit, stdout, clusterErr) = await ClusterFixture.CliAsync([.. common, "--cluster", "--akka-config", ClusterFixture.PatientAkkaFile(), "--listen", $"127.0.0.1:{port}", "--jobs", "0", "--output", clustered]).WaitAsync(ClusterFixture.Guard);
        Assert.True(clusterExit == 0, stdout + clusterErr);
        Assert.Equal(6, worker.Counters.RunsDone); // every run crossed the wire

        Assert.Equal(File.ReadAllText(Path.Combine(local, "summary.json")), File.ReadAllText(Path.Combine(clustered, "summary.json")));
        var dump = ClusterFixture.Dump(local);
        Assert.Equal(dump, ClusterFixture.Dump(clustered));
        Assert.Equal(18, dump.Split('\n').SkipWhile(l => l != "landers").Skip(1).TakeWhile(l => l != "lander_criteria").Count()); // 6 runs x 3 landers
    }

    [Fact]
    public async Task A_clustered_campaign_gives_the_local_campaigns_coverage_table()
    {
        var local = ClusterFixture.TempDir();
        var clustered = ClusterFixture.TempDir();
        var common = new[] { "campaign", DescentOps.Campaigns.Tests.CoverageCampaignScenario.File(), "--runs", "8", "--seed", "3" };
        var (exit, _, stderr) = await ClusterFixture.CliAsync([.. common, "--jobs", "2", "--output", local]);
        Assert.True(exit == 0, stderr);

        var port = ClusterFixture.FreePort();
        await using var worker = new ClusterFixture.Worker(port, slots: 2);
        var (clusterExit, stdout, clusterErr) = await ClusterFixture.CliAsync([.. common, "--cluster", "--listen", $"127.0.0.1:{port}", "--jobs", "0", "--output", clustered]).WaitAsync(ClusterFixture.Guard);
        Assert.True(clusterExit == 0, stdout + clusterErr);
        Assert.Equal(8, worker.Counters.RunsDone);

        var summary = File.ReadAllText(Path.Combine(local, "summary.json"));
        Assert.Equal(summary, File.ReadAllText(Path.Combine(clustered, "summary.json")));
        Assert.Contains("\"procedure_branches\"", summary, StringComparison.Ordinal);
        var dump = ClusterFixture.Dump(local);
        Assert.Equal(dump, ClusterFixture.Dump(clustered));
        Assert.Equal(64, dump.Split('\n').SkipWhile(l => l != "procedure_branches").Skip(1).Count(l => l.Length > 0)); // 8 runs x 8 branches
    }

    [Fact]
    public async Task A_precision_stop_ends_a_clustered_campaign_where_it_ends_a_local_one()
    {
        var local = ClusterFixture.TempDir();
        var clustered = ClusterFixture.TempDir();
        var common = new[] { "campaign", ClusterFixture.Scenario, "--runs", "60", "--seed", "41", "--precision", "0.3" };
        var (exit, stdout, stderr) = await ClusterFixture.CliAsync([.. common, "--jobs", "2", "--output", local]);
        Assert.True(exit == 0, stderr);
        Assert.Contains("precision reached after 10 runs", stdout, StringComparison.Ordinal); // 10 of 10 succeed: Wilson half-width about 0.14

        var port = ClusterFixture.FreePort();
        await using var worker = new ClusterFixture.Worker(port);
        (exit, stdout, stderr) = await ClusterFixture.CliAsync([.. common, "--cluster", "--akka-config", ClusterFixture.PatientAkkaFile(), "--listen", $"127.0.0.1:{port}", "--jobs", "1", "--output", clustered]).WaitAsync(ClusterFixture.Guard);
        Assert.True(exit == 0, stdout + stderr);
        Assert.Equal(File.ReadAllText(Path.Combine(local, "summary.json")), File.ReadAllText(Path.Combine(clustered, "summary.json")));
        Assert.Equal(ClusterFixture.Dump(local), ClusterFixture.Dump(clustered));
    }

    [Fact]
    public async Task A_worker_that_joins_late_gets_work()
    {
        // A loaded machine can hold the late worker's join back until the first worker has done every run; that attempt
        // shows nothing (the late worker was never welcomed) and is made again, at most three times. A late worker that
        // was welcomed and got no work fails the test at once.
        for (var attempt = 1; ; attempt++)
        {
            var dir = ClusterFixture.TempDir();
            var port = ClusterFixture.FreePort();
            // The command runs synchronously on its caller's thread: give it one of its own.
            var campaign = Task.Run(() => ClusterFixture.CliAsync("campaign", ClusterFixture.Scenario, "--runs", "60", "--seed", "3", "--cluster", "--akka-config", ClusterFixture.PatientAkkaFile(), "--listen", $"127.0.0.1:{port}", "--jobs", "0", "--output", dir));
            await using var first = new ClusterFixture.Worker(port);
            await ClusterFixture.Until(() => first.Counters.RunsDone >= 2 || campaign.IsCompleted, "the first worker's second run");
            Assert.False(campaign.IsCompleted, "the campaign ended before the second worker could join");
            await using var late = new ClusterFixture.Worker(port);
            var (exit, stdout, stderr) = await campaign.WaitAsync(ClusterFixture.Guard);
            Assert.True(exit == 0, stdout + stderr);
            if (!late.Welcomed && attempt < 3) continue;
            Assert.True(late.Welcomed, $"the late worker was not welcomed in three attempts\n{stdout}");
            Assert.True(late.Counters.RunsDone > 0, $"the late worker ran nothing; the first ran {first.Counters.RunsDone}\n{stdout}");
            Assert.Equal(60, first.Counters.RunsDone + late.Counters.RunsDone);
            Assert.Equal(60, ClusterFixture.StoredRuns(dir));
            return;
        }
    }

    [Fact]
    public async Task A_stopped_worker_hands_back_its_run_and_another_finishes_it()
    {
        // A worker with one slot asks again the moment a run ends, so while runs remain it nearly always holds one; on a
        // loaded machine the stop can fall between a result and the next assignment. That attempt hands back nothing
        // (checked: the campaign still ends whole) and is made again, at most three times.
        for (var attempt = 1; ; attempt++)
        {
            var dir = ClusterFixture.TempDir();
            var port = ClusterFixture.FreePort();
            var campaign = Task.Run(() => ClusterFixture.CliAsync("campaign", ClusterFixture.Scenario, "--runs", "20", "--seed", "43", "--cluster", "--akka-config", ClusterFixture.PatientAkkaFile(), "--listen", $"127.0.0.1:{port}", "--jobs", "0", "--output", dir));
            var stopping = new ClusterFixture.Worker(port);
            await ClusterFixture.Until(() => stopping.Counters.RunsDone >= 2 || campaign.IsCompleted, "the first worker's second run");
            Assert.False(campaign.IsCompleted, "the campaign ended before the worker could be stopped");
            await stopping.DisposeAsync(); // as Ctrl-C: coordinated shutdown, whose first task hands back
            Assert.InRange(stopping.Counters.HandedBack, 0, 1); // one slot: never more than one run held

            await using var other = new ClusterFixture.Worker(port);
            var (exit, stdout, stderr) = await campaign.WaitAsync(ClusterFixture.Guard);
            Assert.True(exit == 0, stdout + stderr);
            Assert.Contains("worker w1 left", stdout, StringComparison.Ordinal);
            Assert.Equal(20, ClusterFixture.StoredRuns(dir));
            Assert.Equal(20, stopping.Counters.RunsDone + other.Counters.RunsDone); // a handed-back run is done once, by the other
            if (stopping.Counters.HandedBack == 0 && attempt < 3) continue;
            Assert.Equal(1, stopping.Counters.HandedBack);
            Assert.Matches(@"worker w1 handed back run \d+ of baseline", stdout);
            return;
        }
    }

    [Fact]
    public async Task A_duplicate_result_is_discarded_and_logged()
    {
        var plan = ClusterFixture.Plan(seed: 5);
        var work = Enumerable.Range(0, 3).Select(i => new RunKey(CampaignVariant.BaselineName, i)).ToList();
        var accepted = new List<RunRecord>();
        var notices = new List<string>();
        var setup = new DispatcherSetup("{}", plan, work, "test-build", null, r => { lock (accepted) accepted.Add(r); return true; }, () => int.MaxValue, n => { lock (notices) notices.Add(n); });
        await using var node = await CampaignNode.StartAsync(setup, new NodeAddress("127.0.0.1", 0), 0, _ => plan, false, _ => { });

        using var system = ActorSystem.Create(NodeRoles.SystemName, ConfigurationFactory.ParseString(string.Create(CultureInfo.InvariantCulture, $$"""
            akka.actor.provider = cluster
            akka.remote.dot-netty.tcp.hostname = 127.0.0.1
            akka.remote.dot-netty.tcp.port = 0
            akka.cluster.seed-nodes = ["{{ClusterConfig.SeedAddress(node.Address)}}"]
            akka.cluster.roles = [worker]
            akka.loglevel = ERROR
            akka.stdout-loglevel = OFF
            """)));
        system.ActorOf(Props.Create(() => new TwiceSendingWorker(plan)), "twice");
        await node.Completion.WaitAsync(ClusterFixture.Guard);

        Assert.Equal([0, 1, 2], accepted.Select(r => r.Index).Order());
        Assert.True(node.Status.Duplicates >= 2, $"{node.Status.Duplicates} duplicate(s) counted");
        lock (notices) Assert.Contains(notices, n => n.Contains("late duplicate of run 0 of baseline", StringComparison.Ordinal));
        await system.Terminate().WaitAsync(ClusterFixture.Guard);
    }

    [Fact]
    public async Task A_worker_without_the_shared_secret_gets_no_work()
    {
        var plan = ClusterFixture.Plan(seed: 9, toolVersion: Cli.ToolInfo.Version);
        var secret = JoinSecret.FromText("the-campaign-secret-of-this-test");
        var stored = 0;
        var setup = new DispatcherSetup(System.Text.Json.JsonSerializer.Serialize(Settings(plan)), plan, [new RunKey(CampaignVariant.BaselineName, 0), new RunKey(CampaignVariant.BaselineName, 1)],
            Cli.ToolInfo.Version, secret, _ => { Interlocked.Increment(ref stored); return true; }, () => int.MaxValue, _ => { });
        await using var node = await CampaignNode.StartAsync(setup, new NodeAddress("127.0.0.1", 0), 0, _ => plan, false, _ => { });

        await using var stranger = new ClusterFixture.Worker(node.Address.Port, secret: JoinSecret.FromText("a-guess-at-the-campaign-secret"));
        var refused = await Assert.ThrowsAsync<WorkerRefusedException>(() => stranger.Running.WaitAsync(ClusterFixture.Guard));
        Assert.Contains("shared secret", refused.Message, StringComparison.Ordinal);
        Assert.Equal(0, stranger.Counters.RunsDone);

        await using var member = new ClusterFixture.Worker(node.Address.Port, secret: secret);
        await node.Completion.WaitAsync(ClusterFixture.Guard);
        Assert.Equal(2, stored);
        Assert.Equal(2, member.Counters.RunsDone);
    }

    internal static Dictionary<string, string> Settings(CampaignPlan plan) => new()
    {
        ["scenario_name"] = plan.Scenario.Name,
        ["scenario_text"] = plan.Scenario.SourceText,
        ["seed"] = plan.Seed.ToString(CultureInfo.InvariantCulture),
        ["until_s"] = plan.UntilS.ToString("R", CultureInfo.InvariantCulture),
        ["tool_version"] = plan.ToolVersion,
        ["random"] = plan.RandomAlgorithm,
        ["variants"] = "[\"baseline\"]",
        ["changes"] = "{\"baseline\":null}",
    };

    /// <summary>A worker that speaks the protocol but sends every result twice, as a worker thought lost might.</summary>
    private sealed class TwiceSendingWorker : ReceiveActor
    {
        public TwiceSendingWorker(CampaignPlan plan)
        {
            Receive<ClusterEvent.MemberUp>(up =>
            {
                if (up.Member.HasRole(NodeRoles.Campaign)) Context.ActorSelection(new RootActorPath(up.Member.Address) / "user" / NodeRoles.DispatcherName).Tell(new Hello("twice", "test-build", 1));
            });
            Receive<ClusterEvent.CurrentClusterState>(_ => { });
            Receive<Challenge>(_ => Sender.Tell(new Proof("")));
            Receive<Welcome>(_ => Sender.Tell(new AskWork(1)));
            Receive<Assign>(assign =>
            {
                var json = RunRecordCodec.Encode(RunExecutor.Execute(plan, new RunSpec(assign.Variant, assign.Index, assign.Seed)));
                Sender.Tell(new RunDone(assign.Variant, assign.Index, json));
                Sender.Tell(new RunDone(assign.Variant, assign.Index, json));
                Sender.Tell(new AskWork(1));
            });
            Receive<CampaignOver>(_ => { });
        }

        protected override void PreStart() => Akka.Cluster.Cluster.Get(Context.System).Subscribe(Self, ClusterEvent.InitialStateAsEvents, typeof(ClusterEvent.MemberUp));
    }
}
