using System.CommandLine;
using System.Globalization;
using System.Text.Json;
using DescentOps.Cli.Terminal;
using DescentOps.Cluster;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops worker --join HOST:PORT [--jobs K] [--listen HOST:PORT] [--secret-file FILE] [--verbose]</c>: a
/// long-running process that joins a clustered campaign and runs what it is given, until Ctrl-C (which hands back its
/// unfinished runs first).
/// </summary>
public static class WorkerCommand
{
    public static Command Create()
    {
        var joinOption = new Option<string>("--join") { Description = "The campaign node's HOST:PORT (what 'campaign --cluster' prints).", Required = true };
        var jobsOption = new Option<int?>("--jobs") { Description = "Runs at once (default: the machine's cores)." };
        var listenOption = new Option<string?>("--listen") { Description = "This worker's HOST:PORT as the campaign node can reach it (default 127.0.0.1 on a free port; required when --join is not loopback)." };
        var secretOption = new Option<string?>("--secret-file") { Description = $"A file holding the campaign's shared secret (else ${JoinSecret.EnvironmentVariable}); required when --join is not loopback." };
        var verboseOption = new Option<bool>("--verbose") { Description = "Log the cluster's comings and goings to stderr." };
        var akkaConfigOption = ClusterCampaign.AkkaConfigOption();
        var command = new Command("worker", "Join a clustered campaign and run its runs until stopped (Ctrl-C hands back unfinished runs).")
        {
            joinOption, jobsOption, listenOption, secretOption, verboseOption, akkaConfigOption,
        };
        command.SetAction(async (parse, _) =>
        {
            var join = ClusterCampaign.Address(parse.GetValue(joinOption)!, "--join");
            var jobs = parse.GetValue(jobsOption) ?? Environment.ProcessorCount;
            if (jobs is < 1 or > CampaignCommand.MaxJobs) throw new UsageException($"--jobs: 1 to {CampaignCommand.MaxJobs} runs at once");
            var listenText = parse.GetValue(listenOption);
            if (listenText is null && !join.IsLoopback) throw new UsageException("--listen: name this machine's address as the campaign node can reach it (HOST:PORT; port 0 picks a free one)");
            var listen = listenText is null ? new NodeAddress("127.0.0.1", 0) : ClusterCampaign.Address(listenText, "--listen");
            var secret = ClusterCampaign.Secret(parse.GetValue(secretOption));
            if (secret is null && !(join.IsLoopback && listen.IsLoopback))
            {
                throw new UsageException($"a worker beyond loopback needs the campaign's shared secret: --secret-file FILE or ${JoinSecret.EnvironmentVariable}");
            }

            var verbose = parse.GetValue(verboseOption);
            var akkaConfig = ClusterCampaign.UserConfig(parse.GetValue(akkaConfigOption));
            var counters = new WorkerCounters();
            var name = string.Create(CultureInfo.InvariantCulture, $"{Environment.MachineName}, pid {Environment.ProcessId}");
            var setup = new WorkerSetup(name, ToolInfo.Version, jobs, secret, PlanOf, NodeDiagnostics.Notice);
            Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"DescentOps {ToolInfo.Version}: worker with {jobs} slot(s), joining {join}; Ctrl-C stops it after handing back unfinished runs"));
            using var interruption = Interruption.Watch();
            try
            {
                await WorkerNode.RunAsync(setup, join, listen, counters, verbose, NodeDiagnostics.Logging(verbose), interruption.Token, akkaConfig).ConfigureAwait(false);
            }
            catch (WorkerRefusedException refused)
            {
                throw new UsageException($"the campaign node refused this worker: {refused.Message}");
            }

            Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"worker stopped: {counters.RunsDone} run(s) done, {counters.HandedBack} handed back"));
            return (int)ExitCode.Ok;
        });
        return command;
    }

    private static Campaigns.CampaignPlan PlanOf(string settingsJson) =>
        CampaignCommand.PlanOf(JsonSerializer.Deserialize<Dictionary<string, string>>(settingsJson) ?? throw new InvalidDataException("empty campaign settings"));
}
