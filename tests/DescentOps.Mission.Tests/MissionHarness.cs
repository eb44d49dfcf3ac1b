using DescentOps.Cli.Commands;
using DescentOps.Cli.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Model;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>Runs missions the way the command line does, into memory.</summary>
internal static class MissionHarness
{
    public static string DefaultText => BuiltInScenarios.Text(BuiltInScenarios.DefaultName);

    public static Scenario Edited(params (string Line, string Replacement)[] edits) =>
        edits.Aggregate(TestScenario.Of(DefaultText, "edited.yaml"), (text, edit) => text.Replace(edit.Line, edit.Replacement)).Load();

    /// <summary>A scenario's text with its rules block taken out: the same faults, met without the rules.</summary>
    public static string WithoutRules(string text)
    {
        var start = text.IndexOf("rules: |", StringComparison.Ordinal);
        var end = text.IndexOf("\nrun:", StringComparison.Ordinal);
        Assert.True(start > 0 && end > start);
        return text[..start] + text[(end + 1)..];
    }

    public static async Task<(MissionSummary Summary, CollectingSink Sink)> RunAsync(Scenario scenario, KernelChoice kernel = KernelChoice.Sequential, long? seed = null)
    {
        var sink = new CollectingSink();
        var summary = await MissionRunner.RunAsync(scenario, seed ?? scenario.Run.Seed, scenario.Run.UntilS, sink, kernel);
        return (summary, sink);
    }

    /// <summary>The complete journal bytes of a run, exactly as <c>descentops run</c> writes them.</summary>
    public static async Task<byte[]> JournalBytesAsync(Scenario scenario, long seed, KernelChoice kernel) =>
        (await RecordAsync(scenario, seed, kernel)).Journal;

    /// <summary>A whole run as <c>descentops run</c> makes it, to its limit: journal bytes, records and summary at once.</summary>
    public static async Task<RecordedRun> RecordAsync(Scenario scenario, long seed, KernelChoice kernel)
    {
        var manifest = RunCommand.ManifestFor(scenario, seed, scenario.Run.UntilS);
        var sink = new CollectingSink();
        using var stream = new MemoryStream();
        MissionSummary summary;
        using (var writer = JournalWriter.Create(stream, manifest))
        {
            summary = await JournaledRun.RunAsync(scenario, manifest, writer, kernel, observer: sink);
        }

        return new RecordedRun(scenario, summary, sink, stream.ToArray());
    }
}
