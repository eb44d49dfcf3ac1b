using DescentOps.Mission.Running;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>One shared run: read it, never change it (write its journal to a file of one's own to edit it).</summary>
internal sealed record SharedRun(Scenario Scenario, MissionSummary Summary, CollectingSink Sink, byte[] Journal)
{
    /// <summary>The journal written to a new file in a temporary folder that cleans up; its path.</summary>
    public async Task<string> WriteLogAsync(string fileName = "run.jsonl")
    {
        var path = Path.Combine(ToolProcess.NewTempDirectory(), fileName);
        await File.WriteAllBytesAsync(path, Journal);
        return path;
    }
}
