using System.Globalization;
using DescentOps.Records;
using DescentOps.Journal;

namespace DescentOps.Cli.Running;

/// <summary>
/// One generation of branching as a manifest records it: the parent log's SHA-256, the branch instant, and the change
/// file's text. A branch of a branch carries every generation, numbered from 1, so a replay re-applies all the
/// changes in order.
/// </summary>
public sealed record BranchInfo(int Generation, string ParentSha256, double AtS, string ChangeName, string ChangeText)
{
    public IReadOnlyList<RecordField> ToFields() =>
    [
        RecordField.Of(Name("parent_sha256"), ParentSha256),
        RecordField.Of(Name("at_s"), AtS),
        RecordField.Of(Name("change_name"), ChangeName),
        RecordField.Of(Name("change_text"), ChangeText),
    ];

    /// <summary>Every generation recorded in the manifest, oldest first.</summary>
    public static IReadOnlyList<BranchInfo> All(RunManifest manifest)
    {
        var generations = new List<BranchInfo>();
        for (var g = 1; ; g++)
        {
            string Key(string part) => string.Create(CultureInfo.InvariantCulture, $"branch_{g}_{part}");
            var change = manifest.Extra.FirstOrDefault(f => f.Name == Key("change_text")).Text;
            if (change is null) return generations;
            generations.Add(new BranchInfo(
                g,
                manifest.Extra.First(f => f.Name == Key("parent_sha256")).Text ?? "",
                manifest.Extra.First(f => f.Name == Key("at_s")).Number,
                manifest.Extra.FirstOrDefault(f => f.Name == Key("change_name")).Text ?? "",
                change));
        }
    }

    /// <summary>The newest generation, or null for a log that is not a branch.</summary>
    public static BranchInfo? Of(RunManifest manifest) => All(manifest) is { Count: > 0 } all ? all[^1] : null;

    private string Name(string part) => string.Create(CultureInfo.InvariantCulture, $"branch_{Generation}_{part}");
}
