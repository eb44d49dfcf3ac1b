using System.Reflection;
using System.Text.RegularExpressions;
using DescentOps.Mission.Autonomy;
using DescentOps.Records.Kinds;
using DescentOps.Rules.Evaluation;

namespace DescentOps.Mission.Tests.Architecture;

/// <summary>The record vocabulary: one style for every kind, no kind defined twice, every rule event with its own kind.</summary>
public sealed partial class RecordVocabularyTests
{
    [GeneratedRegex("^[a-z]+\\.[a-z]+(_[a-z]+)*$")]
    private static partial Regex KindStyle();

    private static IReadOnlyList<(string Catalogue, string Kind)> Catalogued() =>
        [.. typeof(ProbeRecords).Assembly.GetTypes()
            .Where(t => t.Namespace == typeof(ProbeRecords).Namespace && t.IsAbstract && t.IsSealed)
            .SelectMany(t => t.GetFields(BindingFlags.Public | BindingFlags.Static)
                .Where(f => f.IsLiteral && f.FieldType == typeof(string))
                .Select(f => (t.Name, (string)f.GetRawConstantValue()!)))];

    [Fact]
    public void Every_kind_is_snake_case_under_its_source_and_defined_once()
    {
        var kinds = Catalogued();
        Assert.True(kinds.Count > 70, $"only {kinds.Count} kinds catalogued");
        foreach (var (catalogue, kind) in kinds)
        {
            Assert.Matches(KindStyle(), kind);
            var source = kind[..kind.IndexOf('.', StringComparison.Ordinal)];
            Assert.Equal(catalogue, string.Concat(char.ToUpperInvariant(source[0]), source[1..], "Records"));
        }

        Assert.Equal(kinds.Count, kinds.Select(k => k.Kind).Distinct(StringComparer.Ordinal).Count());
    }

    [Fact]
    public void Every_rule_event_has_its_own_snake_case_kind()
    {
        var kinds = Enum.GetValues<RuleEventKind>().Select(RuleHost.KindOf).ToList();
        Assert.Equal(kinds.Count, kinds.Distinct(StringComparer.Ordinal).Count());
        Assert.All(kinds, k => Assert.Matches(KindStyle(), k));
        Assert.Equal("rule.actuator_released", RuleHost.KindOf(RuleEventKind.ActuatorReleased));
    }

    [Fact]
    public void Every_kind_in_the_golden_logs_is_catalogued()
    {
        var catalogued = Catalogued().Select(k => k.Kind).ToHashSet(StringComparer.Ordinal);
        var folder = Path.Combine(Path.GetDirectoryName(typeof(RecordVocabularyTests).Assembly.Location)!, "..", "..", "..", "..", "golden");
        var logged = Directory.GetFiles(folder, "*.jsonl")
            .SelectMany(File.ReadLines)
            .Select(l => Regex.Match(l, "\"type\":\"event\".*?\"kind\":\"([^\"]+)\""))
            .Where(m => m.Success)
            .Select(m => m.Groups[1].Value)
            .ToHashSet(StringComparer.Ordinal);
        Assert.NotEmpty(logged);
        Assert.Empty(logged.Except(catalogued));
    }
}
