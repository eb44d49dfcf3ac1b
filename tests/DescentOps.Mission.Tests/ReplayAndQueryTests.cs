using DescentOps.Cli;
using DescentOps.Cli.Commands;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Journal.Comparison;
using DescentOps.Journal.Querying;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;

namespace DescentOps.Mission.Tests;

/// <summary>Logs as records people work with: re-run, compared, filtered.</summary>
public sealed class ReplayAndQueryTests
{
    public static TheoryData<string> ScenarioFiles() => [.. BuiltInScenarios.Names];

    [Theory]
    [MemberData(nameof(ScenarioFiles))]
    public async Task Every_scenario_replays_identically(string name)
    {
        // The sequential kernel's run (shared with the tests that read it) replayed by the actor kernel, in full.
        var log = await (await SharedRuns.OfBuiltInAsync(name)).WriteLogAsync();

        var logged = LoggedRun.Open(log);
        var comparison = await LogReplay.CompareAsync(logged, KernelChoice.Actors);

        Assert.Null(comparison.Divergence);
        Assert.Equal(File.ReadLines(log).Count(), comparison.LinesMatched);
    }

    [Fact]
    public async Task A_replay_of_events_that_do_not_follow_from_the_manifest_diverges_where_the_draws_differ()
    {
        // A log with an intact chain whose events came from seed 2 while its manifest says seed 1: what a
        // replay sees when a run cannot be reproduced (a changed binary, a hidden input).
        var scenario = BuiltInScenarios.Default();
        var log = await WriteLogAsync(manifestSeed: 1, runSeed: 2, scenario);
        var logged = LoggedRun.Open(log);
        var comparison = await LogReplay.CompareAsync(logged, KernelChoice.Sequential);

        var divergence = Assert.IsType<JournalDivergence>(comparison.Divergence);
        Assert.Contains("vehicle", divergence.LineA + divergence.LineB);
        Assert.NotNull(divergence.TimeA);
        Assert.Equal(divergence.Line - 1, comparison.LinesMatched);
    }

    [Fact]
    public async Task An_edited_log_is_refused_for_replay()
    {
        var log = await (await SharedRuns.OfDefaultAsync()).WriteLogAsync();
        var lines = await File.ReadAllLinesAsync(log);
        lines[10] = lines[10].Replace("\"t\":", "\"t\":9", StringComparison.Ordinal);
        await File.WriteAllTextAsync(log, string.Join('\n', lines) + "\n");

        var refusal = Assert.Throws<LogIntegrityException>(() => LoggedRun.Open(log));
        Assert.Contains(":11:", refusal.Message);
    }

    [Fact]
    public async Task A_truncated_log_replays_its_intact_prefix()
    {
        var log = await (await SharedRuns.OfDefaultAsync()).WriteLogAsync();
        var bytes = await File.ReadAllBytesAsync(log);
        await File.WriteAllBytesAsync(log, bytes[..(bytes.Length / 3)]);

        var logged = LoggedRun.Open(log);
        Assert.True(logged.IsTruncated);
        var comparison = await LogReplay.CompareAsync(logged, KernelChoice.Sequential);

        Assert.Null(comparison.Divergence);
        Assert.Equal(logged.IntactLines, comparison.LinesMatched);
    }

    [Fact]
    public async Task Diff_of_a_run_with_itself_is_empty_and_with_another_seed_names_the_first_vehicle_draw()
    {
        var a = await (await SharedRuns.OfDefaultAsync(seed: 1)).WriteLogAsync();
        var b = await (await SharedRuns.OfDefaultAsync(seed: 2)).WriteLogAsync();

        Assert.True(JournalDiff.Compare(a, a).Identical);
        var diff = JournalDiff.Compare(a, b);
        Assert.False(diff.Identical);
        var divergence = Assert.IsType<JournalDivergence>(diff.FirstEventDivergence);
        Assert.Contains("vehicle", divergence.LineA + divergence.LineB);
        // Breakthrough does not depend on the seed (the descent draws nothing), so the divergence is after it.
        var breakthrough = JournalQuery.Events(a, new EventFilter(["probe.breakthrough"], [])).Single().Event;
        Assert.True(divergence.TimeA >= breakthrough.TimeSeconds);
    }

    [Fact]
    public async Task Event_filters_return_exactly_the_matching_lines()
    {
        // The log and the in-memory records of one run.
        var run = await SharedRuns.OfDefaultAsync();
        var log = await run.WriteLogAsync();
        var sink = run.Sink;

        // Day 40 to 41 of the tether and the probe's telemetry, computed from the in-memory records.
        var filter = new EventFilter(["probe.telemetry", "tether."], [], FromS: 40 * 86400.0, ToS: 41 * 86400.0);
        var expected = sink.Records
            .Where(r => (r.Kind == "probe.telemetry" || r.Kind.StartsWith("tether.", StringComparison.Ordinal))
                        && r.Time.SecondsSinceEpoch >= 40 * 86400.0 && r.Time.SecondsSinceEpoch <= 41 * 86400.0)
            .Select(r => (r.Kind, r.Time.SecondsSinceEpoch))
            .ToList();
        var actual = JournalQuery.Events(log, filter).Select(e => (e.Event.Kind, e.Event.TimeSeconds)).ToList();

        // One frame every 10 minutes over a day, both ends included: 24 × 6 + 1 = 145.
        Assert.Equal(145, actual.Count(e => e.Kind == "probe.telemetry"));
        Assert.Equal(expected, actual);
    }

    private static async Task<string> WriteLogAsync(long manifestSeed, long runSeed, Scenarios.Model.Scenario scenario)
    {
        var path = Path.Combine(ToolProcess.NewTempDirectory(), $"seed{manifestSeed}-{runSeed}.jsonl");
        using var writer = JournalWriter.Create(path, RunCommand.ManifestFor(scenario, manifestSeed, scenario.Run.UntilS));
        await JournaledRun.RunAsync(scenario, RunCommand.ManifestFor(scenario, runSeed, scenario.Run.UntilS), writer, KernelChoice.Sequential);
        return path;
    }
}
