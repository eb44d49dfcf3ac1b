using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Tests;

public sealed class ParserTests
{
    private static ParseResult Parse(string text) => RuleParser.Parse(new RuleSource("p.dorules", text));

    private static RuleDiagnostic Single(string text)
    {
        var result = Parse(text);
        return Assert.Single(result.Errors);
    }

    [Fact]
    public void A_complete_rule_reads_into_the_tree()
    {
        var result = Parse("""
            autonomy E3
            # comments run to the end of the line
            rule hot-head {
              runs on board
              severity high
              priority 7
              cooldown 30 min
              when (probe.head_temp above 420 K for 3 samples) and not probe.mode is safe
              then {
                send probe.head set_power(power = 2kW)
                wait 10 min
                send probe pause_descent
              }
              escalate after 2 h { send probe enter_safe_mode }
            }
            exclusive probe.head (hot-head, other)
            """);

        Assert.Empty(result.Errors);
        var rule = Assert.Single(result.RuleSet.Rules);
        Assert.Equal(AutonomyLevel.E3, result.RuleSet.Autonomy);
        Assert.Equal(("hot-head", Placement.Board, RuleSeverity.High, 7), (rule.Name.Text, rule.Placement, rule.Severity, rule.Priority));
        var all = Assert.IsType<AllOfSyntax>(rule.Condition);
        var persisted = Assert.IsType<HoldsForSamplesSyntax>(all.Operands[0]);
        Assert.Equal(3, persisted.Count);
        Assert.IsType<NotSyntax>(all.Operands[1]);
        var send = Assert.IsType<SendSyntax>(rule.Actions[0]);
        var power = Assert.Single(send.Arguments).Quantity!;
        Assert.Equal((2.0, "kW"), (power.Number, power.Unit));
        Assert.Equal(3, rule.Actions.Count);
        Assert.Equal(2, Assert.Single(rule.Escalations).After.Number);
        Assert.Equal(["hot-head", "other"], Assert.Single(result.RuleSet.Exclusions).Rules.Select(r => r.Text));
    }

    [Theory]
    // 'for' applies to the whole condition before it, back to 'when' or the opening bracket (LANGUAGE.md).
    [InlineData("a above 1 K and b above 2 K for 3 samples", "Samples(All(a,b))")]
    [InlineData("a above 1 K or b above 2 K and c above 3 K for 10 min", "Duration(Any(a,All(b,c)))")]
    [InlineData("not a above 1 K for 3 samples", "Samples(Not(a))")]
    [InlineData("(a above 1 K for 3 samples) and b above 2 K", "All(Samples(a),b)")]
    [InlineData("((a above 1 K or b above 2 K) for 2 samples) or c above 3 K", "Any(Samples(Any(a,b)),c)")]
    public void For_binds_loosest(string condition, string expected)
    {
        var result = Parse($"rule r {{ runs on ground severity low when {condition} then {{ }} }}");
        Assert.Empty(result.Errors);
        Assert.Equal(expected, Shape(Assert.Single(result.RuleSet.Rules).Condition!));
    }

    [Theory]
    [InlineData("a above 1 K for 3 samples and b above 2 K", "and")]
    [InlineData("a above 1 K for 10 min or b above 2 K", "or")]
    [InlineData("a above 1 K for 10 min for 3 samples", "for")]
    public void Anything_after_a_for_clause_must_be_bracketed(string condition, string word)
    {
        var error = Single($"rule r {{ runs on ground severity low when {condition} then {{ }} }}");
        Assert.Equal(DiagnosticCode.UnexpectedToken, error.Code);
        Assert.StartsWith($"'{word}' after a 'for' clause", error.Message);
    }

    private static string Shape(ConditionSyntax condition) => condition switch
    {
        LimitCheckSyntax limit => limit.Point.Text,
        AllOfSyntax all => $"All({string.Join(",", all.Operands.Select(Shape))})",
        AnyOfSyntax any => $"Any({string.Join(",", any.Operands.Select(Shape))})",
        NotSyntax not => $"Not({Shape(not.Operand)})",
        HoldsForSamplesSyntax samples => $"Samples({Shape(samples.Operand)})",
        HoldsForDurationSyntax duration => $"Duration({Shape(duration.Operand)})",
        _ => condition.GetType().Name,
    };

    [Fact]
    public void And_binds_tighter_than_or()
    {
        var rule = Assert.Single(Parse("rule r { runs on ground severity low when a above 1 K or b above 2 K and c above 3 K then { } }").RuleSet.Rules);
        var any = Assert.IsType<AnyOfSyntax>(rule.Condition);
        Assert.IsType<LimitCheckSyntax>(any.Operands[0]);
        Assert.IsType<AllOfSyntax>(any.Operands[1]);
    }

    [Fact]
    public void An_unexpected_token_is_located()
    {
        var error = Single("rule r {\n  runs on board\n  severity loud\n}");
        Assert.Equal((DiagnosticCode.UnexpectedToken, 3, 12), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Equal("p.dorules", error.Location.Source);
    }

    [Fact]
    public void A_number_too_large_for_a_double_is_an_invalid_number()
    {
        var error = Single("rule r { runs on board severity low when a above 1e999 K then { } }");
        Assert.Equal((DiagnosticCode.InvalidNumber, 1, 50), (error.Code, error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void A_fractional_priority_is_an_invalid_number()
    {
        var error = Single("rule r {\n priority 2.5\n}");
        Assert.Equal((DiagnosticCode.InvalidNumber, 2, 11), (error.Code, error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void A_name_with_a_bad_character_is_an_invalid_name()
    {
        var error = Single("rule hot$head { }");
        Assert.Equal((DiagnosticCode.InvalidName, 1, 6), (error.Code, error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void A_keyword_cannot_name_a_rule()
    {
        var error = Single("rule when { }");
        Assert.Equal((DiagnosticCode.InvalidName, 1, 6), (error.Code, error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void A_repeated_item_is_a_duplicate()
    {
        var error = Single("rule r {\n  severity low\n  severity high\n}");
        Assert.Equal((DiagnosticCode.DuplicateItem, 3, 3), (error.Code, error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void Missing_items_are_reported_at_the_rule_name()
    {
        var errors = Parse("rule lonely {\n}").Errors;
        // Four required items (runs, severity, when, then), all missing.
        Assert.Equal(4, errors.Count);
        Assert.All(errors, e => Assert.Equal((DiagnosticCode.MissingItem, 1, 6), (e.Code, e.Location.Line, e.Location.Column)));
    }

    [Fact]
    public void Nesting_beyond_the_limit_is_refused_not_overflowed()
    {
        // One more opening parenthesis than the limit allows.
        var depth = RuleParser.MaxNestingDepth + 1;
        var text = "rule r { when " + new string('(', depth) + "a above 1 K" + new string(')', depth) + " }";
        var error = Single(text);
        Assert.Equal(DiagnosticCode.NestingTooDeep, error.Code);
        // "rule r { when " is 14 characters, so the parenthesis that breaks the limit is at column 14 + depth + 1.
        Assert.Equal((1, 14 + depth + 1), (error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void Hostile_depth_does_not_exhaust_the_stack()
    {
        var text = "rule r { when " + new string('(', 100_000);
        Assert.Equal(DiagnosticCode.NestingTooDeep, Single(text).Code);
    }

    [Fact]
    public void Parsing_resumes_at_the_next_rule_after_an_error()
    {
        var result = Parse("rule a {\n  severity loud\n}\nrule b {\n  wat\n}\nrule c { runs on ground severity info when x is y then { } }");
        Assert.Equal([2, 5], result.Errors.Select(e => e.Location.Line));
        Assert.Equal("c", Assert.Single(result.RuleSet.Rules).Name.Text);
        Assert.Equal(["a", "b"], result.RuleSet.RulesWithErrors);
    }

    [Fact]
    public void An_unclosed_rule_is_reported_at_the_end_of_the_text()
    {
        var error = Single("rule r {\n  severity low\n");
        Assert.Equal((DiagnosticCode.UnexpectedToken, 3, 1), (error.Code, error.Location.Line, error.Location.Column));
        Assert.Contains("opened at line 1", error.Message);
    }

    [Fact]
    public void Empty_and_null_text_parse_to_an_empty_rule_set()
    {
        Assert.True(Parse("").Succeeded);
        Assert.True(RuleParser.Parse(new RuleSource("n", null!)).Succeeded);
    }
}
