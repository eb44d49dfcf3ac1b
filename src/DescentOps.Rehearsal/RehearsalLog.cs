using System.Globalization;
using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// How a rehearsal's log differs from a plain run's: its manifest says so, a console component takes part, and the
/// console's inputs are read back from the log's <c>operator.input</c> events, so a replay gives them again at the
/// same instants in the same order.
/// </summary>
public static class RehearsalLog
{
    public const string MarkerField = "rehearsal";
    public const string MarkerValue = "console inputs are the operator.input events";
    public const string FromLogField = "rehearsal_from_sha256";
    public const string FromAtField = "rehearsal_from_at_s";

    public static bool IsRehearsal(RunManifest manifest) => manifest.Extra.Any(f => f.Name == MarkerField);

    /// <summary>The manifest of a rehearsal: the run's own, marked, with where it started from when it did.</summary>
    public static RunManifest Mark(RunManifest manifest, string? fromSha256 = null, double? fromAtS = null)
    {
        var kept = manifest.Extra.Where(f => f.Name is not (MarkerField or FromLogField or FromAtField));
        var added = new List<RecordField> { RecordField.Of(MarkerField, MarkerValue) };
        if (fromSha256 is not null) added.Add(RecordField.Of(FromLogField, fromSha256));
        if (fromAtS is { } at) added.Add(RecordField.Of(FromAtField, at));
        return manifest with { Extra = [.. kept, .. added] };
    }

    /// <summary>The console inputs journaled in a log, in order, up to and including <paramref name="through"/>.</summary>
    public static IReadOnlyList<ExternalInput> ReadInputs(string path, SimTime? through = null)
    {
        var inputs = new List<ExternalInput>();
        using var reader = JournalReader.Open(path);
        while (reader.TryRead(out var entry))
        {
            if (entry is not EventEntry { Kind: "operator.input" } input) continue;
            var at = new SimTime(Integer(input, "at_tick"));
            if (through is { } limit && at > limit) break;
            var word = Text(input, "input");
            if (!OperatorInput.TryParseKind(word, out var kind)) throw new InvalidDataException($"{path}:{input.LineNumber}: unknown console input '{word}'.");
            inputs.Add(new ExternalInput(at, OperatorDeskComponent.DeskId, new OperatorInput(Integer(input, "number"), kind, Text(input, "body"))));
        }

        return inputs;
    }

    /// <summary>The console component and the inputs for a run of <paramref name="scenario"/>.</summary>
    public static RunAdditions Additions(Scenario scenario, IReadOnlyList<ExternalInput> inputs) =>
        new([new OperatorDeskComponent(scenario)], inputs);

    /// <summary>For re-running a logged run: the console and its inputs when the log is a rehearsal's, else null.</summary>
    public static RunAdditions? ForReplay(RunManifest manifest, Scenario scenario, string path) =>
        IsRehearsal(manifest) ? Additions(scenario, ReadInputs(path)) : null;

    private static long Integer(EventEntry entry, string name) => Field(entry, name).Integer;

    private static string Text(EventEntry entry, string name) => Field(entry, name).Text ?? "";

    private static RecordField Field(EventEntry entry, string name)
    {
        foreach (var field in entry.Data)
        {
            if (field.Name == name) return field;
        }

        throw new InvalidDataException(string.Create(CultureInfo.InvariantCulture, $"line {entry.LineNumber}: operator.input without '{name}'."));
    }
}
