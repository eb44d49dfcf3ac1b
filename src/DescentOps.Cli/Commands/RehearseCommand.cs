using System.CommandLine;
using System.Globalization;
using System.Net;
using DescentOps.Cli.Running;
using DescentOps.Rehearsal;
using DescentOps.Rehearsal.Web;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops rehearse SCENARIO [--pace X] [--listen ADDR:PORT] [--from LOG --at TIME] [--output PATH]</c>: a live
/// rehearsal in the browser, paced against the wall clock, written to a log like any run.
/// </summary>
public static class RehearseCommand
{
    public static Command Create()
    {
        var scenarioArgument = new Argument<string?>("SCENARIO")
        {
            Description = "Scenario file or built-in name (the default when omitted); with --from, the log's scenario is used.",
            Arity = ArgumentArity.ZeroOrOne,
        };
        var paceOption = new Option<double>("--pace")
        {
            Description = "Simulated seconds per wall second (default 3600: an hour a second); changeable from the supervisor's page.",
            DefaultValueFactory = _ => 3600,
        };
        var listenOption = new Option<string>("--listen")
        {
            Description = "Address and port to listen on (default 127.0.0.1:0, loopback, a free port).",
            DefaultValueFactory = _ => "127.0.0.1:0",
        };
        var fromOption = new Option<string?>("--from") { Description = "A logged run to re-run to --at and hand over there." };
        var atOption = new Option<string?>("--at") { Description = "With --from: the instant to start from, e.g. '40 d'." };
        var outputOption = new Option<string?>("--output", "-o", "--log") { Description = "Where to write the session's log (default: logs/<scenario>-rehearsal-seed<N>.jsonl)." };
        var command = new Command("rehearse", "Rehearse live in a browser: a supervisor injects faults, the team watches delayed telemetry and sends telecommands.")
        {
            scenarioArgument, paceOption, listenOption, fromOption, atOption, outputOption,
        };
        command.SetAction((parse, cancel) => ExecuteAsync(
            parse.GetValue(scenarioArgument), parse.GetValue(paceOption), parse.GetValue(listenOption)!, parse.GetValue(fromOption), parse.GetValue(atOption), parse.GetValue(outputOption), cancel));
        return command;
    }

    private static async Task<int> ExecuteAsync(string? scenarioName, double pace, string listen, string? fromPath, string? atText, string? output, CancellationToken cancel)
    {
        if (!PaceClock.IsValidPace(pace)) throw new UsageException(string.Create(CultureInfo.InvariantCulture, $"--pace: above 0 and at most {PaceClock.MaxPace:R} simulated seconds per second."));
        if (!IPEndPoint.TryParse(listen, out var endpoint) || !listen.Contains(':', StringComparison.Ordinal)) throw new UsageException($"--listen: '{listen}' is not ADDR:PORT (e.g. 127.0.0.1:8080).");
        if ((fromPath is null) != (atText is null)) throw new UsageException("--from and --at go together.");
        double? atS = null;
        if (atText is not null)
        {
            if (!QuantityParser.TryParseSi(QuantityKind.Duration, atText, out var at, out var error)) throw new UsageException($"--at: {error}");
            atS = at;
        }

        var from = fromPath is null ? null : LoggedRun.Open(fromPath);
        var scenario = from?.Scenario ?? ScenarioSource.Load(scenarioName);
        if (from is not null && scenarioName is not null && ScenarioSource.Load(scenarioName).Name != from.Scenario.Name)
        {
            throw new UsageException($"SCENARIO: '{scenarioName}' is not the scenario of {fromPath} ('{from.Scenario.Name}').");
        }

        // A rehearsal refuses what run and check refuse (a logged run's scenario already passed).
        if (scenario.Landers.Count > 0)
        {
            // The rehearsal desk commands one station and shows one probe; several landers would need a desk per lander.
            throw new UsageException($"SCENARIO: '{scenario.Name}' has {scenario.Landers.Count} landers; rehearse takes a scenario of one lander (without a 'landers' list).");
        }

        if (from is null && Mission.Running.MissionPreflight.Errors(scenario) is { Count: > 0 } refusals) throw new Scenarios.Loading.ScenarioException(refusals);
        var seed = from?.Manifest.Seed ?? scenario.Run.Seed;
        var path = output is null ? RehearsalLaunch.DefaultLogPath(scenario, seed) : Path.GetFullPath(output);
        if (File.Exists(path)) throw new UsageException($"--output: {path} exists; a rehearsal never replaces a log.");
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        if (from is not null) Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"re-running {fromPath} to {atS / 86400:0.###} d ..."));
        var session = RehearsalLaunch.Prepare(scenario, pace, path, from, atS);

        await using var server = await RehearsalServer.StartAsync(session, endpoint).ConfigureAwait(false);
        if (!IPAddress.IsLoopback(endpoint.Address))
        {
            Console.Out.WriteLine($"warning: listening on {endpoint.Address}, not only this machine; anyone with the token can steer the rehearsal.");
        }

        Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"DescentOps {ToolInfo.Version}: rehearsing '{scenario.Name}' at {pace:R} simulated s per s from {session.NowS / 86400:0.###} d"));
        Console.Out.WriteLine($"  address      {server.Address}");
        Console.Out.WriteLine($"  token        {server.Token.Value}");
        Console.Out.WriteLine($"  supervisor   {server.PageAddress("supervisor")}");
        Console.Out.WriteLine($"  team         {server.PageAddress("team")}");
        Console.Out.WriteLine($"  event log    {path} (complete when the session ends)");
        Console.Out.WriteLine("End the session from the supervisor's page, or press Ctrl+C.");

        var interrupted = new TaskCompletionSource();
        ConsoleCancelEventHandler onCancel = (_, e) =>
        {
            e.Cancel = true;
            interrupted.TrySetResult();
        };
        Console.CancelKeyPress += onCancel;
        try
        {
            await Task.WhenAny(server.Ended, interrupted.Task, Task.Delay(Timeout.Infinite, cancel)).ConfigureAwait(false);
        }
        finally
        {
            Console.CancelKeyPress -= onCancel;
        }

        await server.StopAsync().ConfigureAwait(false);
        if (session.Result is { } result)
        {
            Console.Out.WriteLine(string.Create(CultureInfo.InvariantCulture, $"session ended at {result.FinalTimeS / 86400:0.####} d: {result.Outcome.Kind}: {result.Outcome.Reason}"));
            Console.Out.WriteLine($"  event log    {path}");
        }

        return (int)ExitCode.Ok;
    }
}
