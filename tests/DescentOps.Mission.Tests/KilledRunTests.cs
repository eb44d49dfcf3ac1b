using System.Diagnostics;
using DescentOps.Journal;

namespace DescentOps.Mission.Tests;

/// <summary>A run killed mid-way leaves a log whose intact prefix verifies, under its temporary name only.</summary>
public sealed class KilledRunTests
{
    [Fact]
    public async Task A_run_killed_mid_way_leaves_an_intact_prefix_under_the_partial_name()
    {
        var folder = ToolProcess.NewTempDirectory();
        var scenario = Path.Combine(folder, "stuck.yaml");
        // Without its rules the stall scenario's probe stays frozen in: with a 300-year limit the run goes on for
        // minutes of wall time, long enough to be killed while it writes.
        var text = DescentOps.Scenarios.BuiltInScenarios.Text("stall-wall-boost.yaml");
        text = text[..text.IndexOf("rules: |", StringComparison.Ordinal)] + "run:\n  seed: 1\n  until: 300 yr\n";
        await File.WriteAllTextAsync(scenario, text);
        var log = Path.Combine(folder, "killed.jsonl");
        // Each run writes under a temporary name of its own: killed.jsonl.<random>.partial.
        string? Partial() => Directory.GetFiles(folder, "killed.jsonl.*" + JournalWriter.PartialSuffix).SingleOrDefault();

        var start = new ProcessStartInfo("dotnet") { WorkingDirectory = folder, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in new[] { Path.Combine(AppContext.BaseDirectory, "descentops.dll"), "run", scenario, "--log", log, "--kernel", "sequential", "--no-log-limit" }) start.ArgumentList.Add(a);
        using var process = Process.Start(start)!;
        var guard = Stopwatch.StartNew();
        while ((Partial() is not { } growing || new FileInfo(growing).Length < 2_000_000) && guard.Elapsed < TimeSpan.FromMinutes(2) && !process.HasExited)
        {
            await Task.Delay(50);
        }

        Assert.False(process.HasExited, "the run ended before it could be killed");
        process.Kill(entireProcessTree: true); // SIGKILL on Linux: no finally blocks, no flush
        await process.WaitForExitAsync();

        Assert.False(File.Exists(log), "a killed run must not leave a file under the final name");
        var report = JournalVerifier.Verify(Partial()!);
        // Either the kill fell between two buffer flushes (the file ends in a whole line but lacks its summary) or
        // in the middle of one (a cut line): both are a truncated tail, and every line before it is intact.
        Assert.Equal(VerificationFailure.TruncatedTail, report.Failure);
        Assert.True(report.LinesChecked > 1000, $"only {report.LinesChecked} lines");
    }
}
