using DescentOps.Journal.Comparison;

namespace DescentOps.Mission.Tests;

/// <summary>
/// A folder holding a full run of the built-in stall-wall-boost scenario as <c>parent.jsonl</c>, the parent of the
/// branch tests. The run is made once per test process through the command line in process and copied into each
/// folder: the same binary, scenario and seed give the same bytes, so a copy is that run.
/// </summary>
internal sealed class BranchFolder
{
    public const string Scenario = "stall-wall-boost.yaml";

    private static readonly Lazy<Task<byte[]>> ParentBytes = new(async () =>
    {
        var folder = ToolProcess.NewTempDirectory();
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, "run", Scenario, "--log", "parent.jsonl");
        Assert.True(exit == 0, stdout + stderr);
        return await System.IO.File.ReadAllBytesAsync(System.IO.Path.Combine(folder, "parent.jsonl"));
    });

    private BranchFolder(string path) => Path = path;

    public string Path { get; }

    public string ParentLog => File("parent.jsonl");

    public string File(string name) => System.IO.Path.Combine(Path, name);

    public static async Task<BranchFolder> WithParentAsync()
    {
        var folder = new BranchFolder(ToolProcess.NewTempDirectory());
        await System.IO.File.WriteAllBytesAsync(folder.ParentLog, await ParentBytes.Value);
        return folder;
    }

    /// <summary>Writes <paramref name="change"/> as <paramref name="changeFile"/> and runs <c>branch</c> of <paramref name="from"/> at <paramref name="at"/> into <paramref name="log"/>.</summary>
    public async Task<(int ExitCode, string Stdout, string Stderr)> BranchAsync(string change, string at, string log = "branch.jsonl", string from = "parent.jsonl", string changeFile = "change.yaml")
    {
        await System.IO.File.WriteAllTextAsync(File(changeFile), change);
        return await InProcessTool.RunAsync(Path, "branch", from, "--at", at, "--with", changeFile, "--log", log);
    }

    public Task<(int ExitCode, string Stdout, string Stderr)> ToolAsync(params string[] arguments) => InProcessTool.RunAsync(Path, arguments);

    /// <summary>The first event where the branch's log parts from the parent's, required to lie at <paramref name="atS"/> and not a line before.</summary>
    public JournalDivergence PartingAt(double atS, string log = "branch.jsonl")
    {
        var divergence = Assert.IsType<JournalDivergence>(JournalDiff.Compare(ParentLog, File(log)).FirstEventDivergence);
        Assert.Equal(atS, divergence.TimeB);
        return divergence;
    }
}
