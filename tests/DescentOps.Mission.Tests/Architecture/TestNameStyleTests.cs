using System.Text.RegularExpressions;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Architecture;

/// <summary>
/// One test-name style across the suite: a test's name is the sentence it proves, words joined by underscores
/// (<c>A_cut_tail_ends_the_read_cleanly_and_says_where</c>), so a failing test reads as a claim in the runner's output.
/// Checked over the sources of every test project, since one assembly cannot see the others.
/// </summary>
public sealed partial class TestNameStyleTests
{
    [Fact]
    public void Every_test_in_every_test_project_is_named_as_a_sentence()
    {
        var offenders = new List<string>();
        var tests = Path.Combine(RepositoryRoot.Path, "tests");
        foreach (var file in Directory.EnumerateFiles(tests, "*.cs", SearchOption.AllDirectories))
        {
            var relative = Path.GetRelativePath(tests, file);
            if (relative.Contains("/bin/", StringComparison.Ordinal) || relative.Contains("/obj/", StringComparison.Ordinal)) continue;
            foreach (Match test in TestMethod().Matches(File.ReadAllText(file)))
            {
                var name = test.Groups["name"].Value;
                if (!name.Contains('_', StringComparison.Ordinal)) offenders.Add($"{relative}: {name}");
            }
        }

        Assert.True(offenders.Count == 0, "tests not named as sentences (Words_joined_by_underscores):\n" + string.Join("\n", offenders));
    }

    [Fact]
    public void The_style_check_finds_a_test_named_in_another_style()
    {
        const string source = "    [Fact]\n    public void ALineAfterTheSummaryIsAnError()\n    {\n    }\n    [Theory]\n    [InlineData(1)]\n    public async Task Each_value_reads_back(int x)\n";
        var names = TestMethod().Matches(source).Select(m => m.Groups["name"].Value).ToList();
        Assert.Equal(["ALineAfterTheSummaryIsAnError", "Each_value_reads_back"], names);
    }

    /// <summary>A test attribute, any further attribute lines, then the method's name.</summary>
    [GeneratedRegex(@"^\s*\[(?:Fact|Theory|Property)\b[^\n]*\n(?:\s*\[[^\n]*\n)*\s*public\s+(?:static\s+)?(?:async\s+)?[\w<>]+\s+(?<name>\w+)\s*\(", RegexOptions.Multiline)]
    private static partial Regex TestMethod();
}
