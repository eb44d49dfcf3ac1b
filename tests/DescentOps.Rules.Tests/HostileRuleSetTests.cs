using System.Text;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

/// <summary>Rule sets as a careless or hostile author writes them: the checker answers with diagnostics, never a crash, in time near-linear in the rules.</summary>
public sealed class HostileRuleSetTests
{
    private static string HeadRule(string name, int priority = 5, string header = "") =>
        $"rule {name} {{ runs on board severity high priority {priority} {header}\n  when probe.head_temp above 600 K\n  then {{ send probe.head set_power(power = 1 kW) }} }}\n";

    [Fact]
    public void A_rule_that_enables_a_rule_with_an_error_is_checked_without_a_crash()
    {
        // "Sequence contains no matching element" came from looking up the enabled rule among the compiled ones.
        var text = """
            rule starter { runs on board severity high
              when probe.head_temp above 600 K
              then { send probe pause_descent enable broken } }
            rule broken { runs on board severity high starts disabled
              when probe.tail_temp above 600 K
              then { send probe.wall set_power(power = 1 kW) } }
            """;
        var result = TestCatalogue.Check(text);
        var error = Assert.Single(result.Errors);
        Assert.Equal(DiagnosticCode.UnknownPoint, error.Code);
    }

    [Fact]
    public void A_thousand_rules_on_one_actuator_are_one_conflict_naming_the_group()
    {
        var text = new StringBuilder();
        for (var i = 0; i < 1000; i++) text.Append(HeadRule($"r{i}"));
        var result = TestCatalogue.Check(text.ToString());
        var error = Assert.Single(result.Errors);
        Assert.Equal(DiagnosticCode.ActuatorConflict, error.Code);
        Assert.Contains("1000 rules command 'probe.head' at priority 5", error.Message);
        Assert.Contains("and 992 more", error.Message);
    }

    [Fact]
    public void Conflicts_are_grouped_by_priority_and_only_unexcluded_rules_are_named()
    {
        var text = HeadRule("a") + HeadRule("b") + HeadRule("c") + HeadRule("d", 4) + HeadRule("e", 4)
            + "exclusive probe.head (a, b)\nexclusive probe.head (d, e)\n";
        var error = Assert.Single(TestCatalogue.Check(text).Errors);
        // a and b exclude each other but neither excludes c: all three may act at once with c.
        Assert.Contains("3 rules command 'probe.head' at priority 5", error.Message);
        Assert.True(TestCatalogue.Check(text + "exclusive probe.head (a, c)\nexclusive probe.head (b, c)\n").Succeeded);
    }

    [Fact]
    public void A_large_exclusive_block_is_accepted()
    {
        var text = new StringBuilder();
        var names = Enumerable.Range(0, 3000).Select(i => $"r{i}").ToArray();
        foreach (var name in names) text.Append(HeadRule(name));
        text.Append("exclusive probe.head (").Append(string.Join(", ", names)).Append(")\n");
        var result = TestCatalogue.Check(text.ToString());
        Assert.True(result.Succeeded, string.Join("\n", result.Errors.Take(3)));
        Assert.Equal(3000, result.RuleSet!.Rules.Count);
    }

    [Theory]
    [InlineData("1,5 kW", "comma")]
    [InlineData("1_500 W", "grouping")]
    [InlineData("1e309 W", "too large")]
    public void A_decimal_comma_grouping_or_overflow_in_a_rule_is_refused_with_the_reason(string power, string reason)
    {
        var text = $"rule r {{ runs on board severity high\n  when probe.head_temp above 600 K\n  then {{ send probe.head set_power(power = {power}) }} }}";
        var error = Assert.Single(TestCatalogue.Check(text).Errors);
        Assert.Equal(DiagnosticCode.InvalidNumber, error.Code);
        Assert.Contains(reason, error.Message);
    }

    [Fact]
    public void Rules_read_the_units_scenarios_read()
    {
        // One table: a week is 7 × 86400 s = 604800 s in a rule as in a scenario; units keep their case.
        var set = TestCatalogue.Compile("rule r { runs on board severity high\n  when probe.head_temp above 600 K for 1 wk\n  then { send probe pause_descent } }");
        Assert.NotNull(set);
        var error = Assert.Single(TestCatalogue.Check("rule r { runs on board severity high\n  when probe.head_temp above 600 k\n  then { send probe pause_descent } }").Errors);
        Assert.Equal(DiagnosticCode.UnknownUnit, error.Code);
    }
}
