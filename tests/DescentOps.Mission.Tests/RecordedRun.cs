using DescentOps.Mission.Running;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// A whole run as <c>descentops run</c> makes it: its journal bytes, its records and its summary
/// (<see cref="MissionHarness.RecordAsync"/>). One from <see cref="SharedRuns"/> is read, never changed: write its
/// journal to a file of one's own to edit it.
/// </summary>
internal sealed record RecordedRun(Scenario Scenario, MissionSummary Summary, CollectingSink Sink, byte[] Journal)
{
    /// <summary>The journal written to a new file in a temporary folder that cleans up; its path.</summary>
    public async Task<string> WriteLogAsync(string fileName = "run.jsonl")
    {
        var path = Path.Combine(ToolProcess.NewTempDirectory(), fileName);
        await File.WriteAllBytesAsync(path, Journal);
        return path;
    }
}
