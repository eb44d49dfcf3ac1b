using System.Diagnostics;
using DescentOps.Journal;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>Ctrl-C or SIGTERM stops a run at once and says where its partial log is.</summary>
public sealed class InterruptTests
{
    [Theory]
    [InlineData("INT")]
    [InlineData("TERM")]
    public async Task A_signalled_run_stops_and_names_its_partial_log(string signal)
    {
        var folder = ToolProcess.NewTempDirectory();
        var scenario = Path.Combine(folder, "stuck.yaml");
        // As in KilledRunTests: without its rules the stall scenario's probe stays frozen in for a 300-year limit.
        var text = DescentOps.Scenarios.BuiltInScenarios.Text("stall-wall-boost.yaml");
        text = text[..text.IndexOf("rules: |", StringComparison.Ordinal)] + "run:\n  seed: 1\n  until: 300 yr\n";
        await File.WriteAllTextAsync(scenario, text);
        var log = Path.Combine(folder, "stopped.jsonl");
        string? Partial() => Directory.GetFiles(folder, "stopped.jsonl.*" + JournalWriter.PartialSuffix).SingleOrDefault();

        var start = new ProcessStartInfo("dotnet") { WorkingDirectory = folder, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in new[] { Path.Combine(AppContext.BaseDirectory, "descentops.dll"), "run", scenario, "-o", log, "--no-log-limit" }) start.ArgumentList.Add(a);
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        var guard = Stopwatch.StartNew();
        while ((Partial() is not { } growing || new FileInfo(growing).Length < 500_000) && guard.Elapsed < TimeSpan.FromMinutes(2) && !process.HasExited)
        {
            await Task.Delay(50);
        }

        Assert.False(process.HasExited, "the run ended before it could be signalled");
        using (var kill = Process.Start("kill", ["-" + signal, process.Id.ToString(System.Globalization.CultureInfo.InvariantCulture)])) await kill.WaitForExitAsync();
        // A hang guard only, not a timing assertion.
        await process.WaitForExitAsync().WaitAsync(TimeSpan.FromMinutes(2));

        Assert.Equal(130, process.ExitCode); // ExitCode.Interrupted
        var message = await stderr;
        _ = await stdout;
        var partial = Partial();
        Assert.NotNull(partial);
        Assert.Contains(partial, message, StringComparison.Ordinal);
        Assert.Contains("interrupted", message, StringComparison.Ordinal);
        Assert.False(File.Exists(log));
        var report = JournalVerifier.Verify(partial);
        Assert.Equal(VerificationFailure.TruncatedTail, report.Failure);
        Assert.True(report.LinesChecked > 1000, $"only {report.LinesChecked} lines");
    }
}
