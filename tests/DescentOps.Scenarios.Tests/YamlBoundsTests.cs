using System.Text;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Scenarios.Tests;

/// <summary>Hostile YAML is refused with a located error before it is built into a tree: no stack overflow, no blow-up.</summary>
public sealed class YamlBoundsTests
{
    [Fact]
    public void Deep_nesting_is_refused_without_exhausting_the_stack()
    {
        // 30,000 levels of flow lists overflowed the stack of the tree builder.
        var text = "scenario: " + new string('[', 30_000) + new string(']', 30_000) + "\n";
        var error = MalformedScenarioTests.SingleError(text);
        Assert.Contains("nested more than 64 deep", error.Message);
        Assert.Equal(1, error.Location.Line);
    }

    [Fact]
    public void Aliases_that_expand_past_the_bound_are_refused()
    {
        // Each level holds ten aliases of the level before: 10^9 values in a few hundred bytes.
        var text = new StringBuilder("a0: &a0 [x, x, x, x, x, x, x, x, x, x]\n");
        for (var i = 1; i < 10; i++)
        {
            text.Append($"a{i}: &a{i} [").Append(string.Join(", ", Enumerable.Repeat($"*a{i - 1}", 10))).Append("]\n");
        }

        var error = MalformedScenarioTests.SingleError(text.ToString());
        Assert.Contains("once its aliases are expanded", error.Message);
        Assert.Equal(6, error.Location.Line); // a5 stands for 1,111,111 values: the first level past a million
    }

    [Fact]
    public void An_alias_used_as_a_key_is_refused()
    {
        var error = MalformedScenarioTests.SingleError("a: &k {x: 1}\n? *k\n: 2\n");
        Assert.Contains("not accepted as a key", error.Message);
        Assert.Equal(2, error.Location.Line);
    }

    [Fact]
    public void An_oversized_file_is_refused_before_it_is_read()
    {
        var path = Path.Combine(Path.GetTempPath(), $"descentops-big-{Guid.NewGuid():N}.yaml");
        try
        {
            using (var file = File.Create(path)) file.SetLength(YamlBounds.MaxBytes + 1);
            var exception = Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadFile(path));
            Assert.Contains("a scenario may hold at most", Assert.Single(exception.Errors).Message);
        }
        finally
        {
            File.Delete(path);
        }
    }

    [Fact]
    public void Ordinary_anchors_and_aliases_still_load()
    {
        var text = ScenarioText.DefaultWith("  radius: 12 cm", "  radius: &r 12 cm");
        Assert.Equal(0.12, ScenarioLoader.LoadText(text, "ok.yaml").Probe.RadiusM, 12);
    }
}

/// <summary>Names are one line: a block scalar's trailing line break is refused, not carried into every log.</summary>
public sealed class OneLineNameTests
{
    [Theory]
    [InlineData("  name: Wendlow", "  name: |\n    Wendlow", "probe.name")]
    [InlineData("  - name: wisp-1", "  - name: \"wisp-1\\n\"", "vehicles[0].name")]
    [InlineData("scenario: longfall-tarn-flats", "scenario: |\n  longfall-tarn-flats", "scenario")]
    public void A_name_with_a_line_break_is_refused(string line, string replacement, string field)
    {
        var error = MalformedScenarioTests.SingleError(ScenarioText.DefaultWith(line, replacement));
        Assert.Equal(field, error.FieldPath);
        Assert.Contains("line break", error.Message);
    }
}
