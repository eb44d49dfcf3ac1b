using DescentOps.Engine.Journaling;
using DescentOps.Journal;

namespace DescentOps.Cli.Running;

/// <summary>
/// What a branch log's manifest records of its parent: the parent log's SHA-256, the branch instant, and the change
/// file's text (so a replay of the branch re-applies exactly the same change).
/// </summary>
public sealed record BranchInfo(string ParentSha256, double AtS, string ChangeName, string ChangeText)
{
    public IReadOnlyList<RecordField> ToFields() =>
    [
        RecordField.Of("branch_parent_sha256", ParentSha256),
        RecordField.Of("branch_at_s", AtS),
        RecordField.Of("branch_change_name", ChangeName),
        RecordField.Of("branch_change_text", ChangeText),
    ];

    public static BranchInfo? Of(RunManifest manifest)
    {
        string? Text(string name) => manifest.Extra.FirstOrDefault(f => f.Name == name).Text;
        if (Text("branch_change_text") is not { } change) return null;
        var at = manifest.Extra.First(f => f.Name == "branch_at_s").Number;
        return new BranchInfo(Text("branch_parent_sha256") ?? "", at, Text("branch_change_name") ?? "", change);
    }
}
