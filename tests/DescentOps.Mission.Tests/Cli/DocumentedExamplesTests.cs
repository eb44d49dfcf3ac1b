using System.Text.RegularExpressions;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>
/// Every rule example in the rule language's document and in the README goes through <c>descentops check</c> against
/// the built-in default scenario's catalogue, the one a user gets without <c>--scenario</c>: an example that names a
/// point or a command the tool does not have fails here, not in a reader's hands.
/// </summary>
[Collection(InProcessCliCollection.Name)]
public sealed partial class DocumentedExamplesTests
{
    [GeneratedRegex(@"^```(?<lang>\w*)\n(?<body>.*?)^```", RegexOptions.Multiline | RegexOptions.Singleline)]
    private static partial Regex FencedBlock();


    private static IEnumerable<(string Lang, string Body)> Blocks(string document) =>
        FencedBlock().Matches(RepositoryRoot.Text(document))
            .Select(m => (m.Groups["lang"].Value, m.Groups["body"].Value));

    /// <summary>
    /// Rule sets: the `dorules` blocks, and the literal `rules: |` blocks inside YAML examples, each with the built-in
    /// scenario whose catalogue it is written for: the default, or the one a YAML example names on its first line
    /// (<c># scenario: NAME.yaml</c>).
    /// </summary>
    private static List<(string Rules, string? Scenario)> RuleSets(string document)
    {
        var sets = new List<(string, string?)>();
        foreach (var (lang, body) in Blocks(document))
        {
            if (lang == "dorules")
            {
                sets.Add((body, null));
                continue;
            }

            if (lang != "yaml") continue;
            const string ScenarioMark = "# scenario: ";
            var scenario = body.StartsWith(ScenarioMark, StringComparison.Ordinal) ? body[ScenarioMark.Length..body.IndexOf('\n', StringComparison.Ordinal)].Trim() : null;
            var lines = body.Split('\n');
            for (var i = 0; i < lines.Length; i++)
            {
                var trimmed = lines[i].TrimStart();
                if (trimmed != "rules: |") continue;
                var indent = lines[i].Length - trimmed.Length;
                var block = lines.Skip(i + 1).TakeWhile(l => l.Length == 0 || l.Length - l.TrimStart().Length > indent).ToArray();
                sets.Add((string.Join('\n', block), scenario));
            }
        }

        return sets;
    }

    private static async Task AssertChecksClean(string folder, params string[] arguments)
    {
        var (exit, stdout, stderr) = await InProcessTool.RunAsync(folder, ["check", .. arguments]);
        Assert.True(exit == 0, $"check {string.Join(' ', arguments)} exited {exit}:\n{stdout}{stderr}");
        Assert.Contains(": 0 errors, 0 warnings", stdout);
    }

    [Theory]
    [InlineData("src/DescentOps.Rules/LANGUAGE.md", 1)]
    [InlineData("README.md", 1)]
    public async Task Every_rule_set_in_a_document_passes_check(string document, int atLeast)
    {
        var sets = RuleSets(document);
        Assert.True(sets.Count >= atLeast, $"{document}: expected at least {atLeast} rule examples, found {sets.Count}");
        var folder = ToolProcess.NewTempDirectory();
        for (var i = 0; i < sets.Count; i++)
        {
            var file = Path.Combine(folder, $"example-{i + 1}.dorules");
            await File.WriteAllTextAsync(file, sets[i].Rules);
            if (sets[i].Scenario is { } scenario) await AssertChecksClean(folder, file, "--scenario", scenario);
            else await AssertChecksClean(folder, file);
        }
    }

    [Theory]
    [InlineData("src/DescentOps.Rules/LANGUAGE.md")]
    [InlineData("README.md")]
    public async Task Every_mission_rules_example_passes_check_in_the_scenario_it_names(string document)
    {
        // A YAML example holding a 'mission_rules: |' section names its built-in scenario on its first line; the
        // section is added to that scenario before its run section, and the whole goes through check.
        var examples = Blocks(document).Where(b => b.Lang == "yaml" && b.Body.Contains("\nmission_rules: |\n", StringComparison.Ordinal)).ToArray();
        Assert.NotEmpty(examples);
        var folder = ToolProcess.NewTempDirectory();
        for (var i = 0; i < examples.Length; i++)
        {
            const string ScenarioMark = "# scenario: ";
            var body = examples[i].Body;
            Assert.StartsWith(ScenarioMark, body);
            var firstLineEnd = body.IndexOf('\n', StringComparison.Ordinal);
            var scenario = TestScenario.BuiltIn(body[ScenarioMark.Length..firstLineEnd].Trim()).AddSection(body[(firstLineEnd + 1)..]);
            var file = Path.Combine(folder, $"mission-{i + 1}.yaml");
            await File.WriteAllTextAsync(file, scenario.Text);
            await AssertChecksClean(folder, file);
        }
    }

    [Fact]
    public async Task The_readme_fault_conditions_pass_check_in_the_default_scenario()
    {
        // The README's fault list with 'when:' conditions is added to the default scenario's own faults.
        var faults = Blocks("README.md").Where(b => b.Lang == "yaml" && b.Body.StartsWith("  - name:", StringComparison.Ordinal) && b.Body.Contains("when:", StringComparison.Ordinal)).ToArray();
        Assert.NotEmpty(faults);
        var folder = ToolProcess.NewTempDirectory();
        var scenario = DescentOps.Scenarios.BuiltInScenarios.Text("default.yaml").Replace("\r\n", "\n", StringComparison.Ordinal);
        Assert.Contains("\nfaults:\n", scenario);
        for (var i = 0; i < faults.Length; i++)
        {
            var file = Path.Combine(folder, $"faults-{i + 1}.yaml");
            await File.WriteAllTextAsync(file, scenario.Replace("\nfaults:\n", "\nfaults:\n" + faults[i].Body, StringComparison.Ordinal));
            await AssertChecksClean(folder, file);
        }
    }
}
