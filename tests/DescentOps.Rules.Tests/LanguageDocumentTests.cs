using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Units;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Checking;
using DescentOps.Rules.Text;
using DescentOps.Rules.Units;

namespace DescentOps.Rules.Tests;

public sealed class LanguageDocumentTests
{
    private static string FindDocument()
    {
        for (var directory = new DirectoryInfo(AppContext.BaseDirectory); directory is not null; directory = directory.Parent)
        {
            var candidate = Path.Combine(directory.FullName, "src", "DescentOps.Rules", "LANGUAGE.md");
            if (File.Exists(candidate))
            {
                return candidate;
            }
        }

        throw new FileNotFoundException("LANGUAGE.md not found above the test output directory");
    }

    [Fact]
    public void The_example_in_the_language_document_checks_clean()
    {
        var text = File.ReadAllText(FindDocument());
        var start = text.IndexOf("```dorules\n", StringComparison.Ordinal) + "```dorules\n".Length;
        var example = text[start..text.IndexOf("```", start, StringComparison.Ordinal)];
        // The example's catalogue: ranges are round numbers for the invented probe, not a design.
        var catalogue = new TelemetryCatalogue(
            [
                new NumericPointSpec("probe.head_temp", PhysicalDimension.Temperature, 0.0, 1000.0),
                new NumericPointSpec("probe.depth", PhysicalDimension.Length, 0.0, 5000.0),
                new DiscretePointSpec("probe.mode", ["descending", "paused", "safe"]),
                new DiscretePointSpec("station.link", ["up", "down"]),
            ],
            [
                new CommandSpec(new ComponentId("probe.head"), "set_power", [new QuantityArgumentSpec("power", PhysicalDimension.Power, 0.0, 8000.0)]),
                new CommandSpec(new ComponentId("probe"), "pause_descent", []),
                new CommandSpec(new ComponentId("probe"), "enter_safe_mode", []),
                new CommandSpec(new ComponentId("wisp-1"), "recall", []),
                new CommandSpec(new ComponentId("station"), "drop_relay", [new QuantityArgumentSpec("relay", PhysicalDimension.Dimensionless, 1.0, 4.0)]),
            ]);

        var result = RuleChecker.CheckSource(new RuleSource("LANGUAGE.md", example), catalogue);

        Assert.Empty(result.Errors);
        Assert.Empty(result.Warnings);
        Assert.Equal(["hot-head", "slow-melt", "link-lost"], result.RuleSet!.Rules.Select(r => r.Name));
    }
}
