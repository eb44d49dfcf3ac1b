using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>
/// Reads rule text into a <see cref="RuleSetSyntax"/>. It never throws: every problem becomes a located error,
/// the rule that holds it is left out of the tree, and reading resumes at the next line that starts a
/// top-level item, so one slip does not hide the errors after it.
/// </summary>
public sealed class RuleParser
{
    /// <summary>Deep enough for any honest condition, shallow enough that hostile text cannot exhaust the stack.</summary>
    public const int MaxNestingDepth = 32;

    public const int MaxWholeNumber = 1_000_000;

    private static readonly HashSet<string> Keywords = new(StringComparer.Ordinal)
    {
        "rule", "runs", "on", "board", "ground", "severity", "priority", "cooldown", "starts", "disabled", "enabled",
        "when", "then", "escalate", "after", "send", "wait", "enable", "disable", "start", "exclusive", "autonomy",
        "and", "or", "not", "above", "below", "inside", "outside", "to", "is", "rate", "of", "over", "step",
        "for", "samples", "time", "since", "latched", "minus",
    };

    private static readonly HashSet<string> TopLevelKeywords = new(StringComparer.Ordinal) { "rule", "exclusive", "autonomy" };

    private readonly TokenCursor _cursor;
    private readonly ConditionParser _conditions;
    private readonly ActionParser _actions;

    private RuleParser(IReadOnlyList<Token> tokens)
    {
        _cursor = new TokenCursor(tokens);
        _conditions = new ConditionParser(_cursor);
        _actions = new ActionParser(_cursor);
    }

    public static ParseResult Parse(RuleSource source)
    {
        var name = source.Name ?? "";
        var parser = new RuleParser(RuleLexer.Tokenize(name, source.Text));
        return parser.ParseRuleSet(name);
    }

    /// <summary>True for words the language reserves; they cannot name rules, points, targets or units.</summary>
    public static bool IsKeyword(string word) => Keywords.Contains(word);

    private ParseResult ParseRuleSet(string sourceName)
    {
        var rules = new List<RuleSyntax>();
        var exclusions = new List<ExclusionSyntax>();
        var rulesWithErrors = new List<string>();
        AutonomyLevel? autonomy = null;
        var autonomyLocation = new SourceLocation(sourceName, 1, 1);

        while (_cursor.Current.Kind != TokenKind.End)
        {
            var start = _cursor.Current;
            try
            {
                if (start.IsWord("rule"))
                {
                    rules.Add(ParseRule());
                }
                else if (start.IsWord("exclusive"))
                {
                    exclusions.Add(ParseExclusion());
                }
                else if (start.IsWord("autonomy"))
                {
                    _cursor.Next();
                    if (autonomy is not null)
                    {
                        _cursor.Fail(DiagnosticCode.DuplicateItem, start.Location, "the autonomy level is already set");
                    }

                    var level = _cursor.Current;
                    autonomy = level.Kind == TokenKind.Word && level.Text is "E1" or "E2" or "E3" or "E4"
                        ? Enum.Parse<AutonomyLevel>(_cursor.Next().Text)
                        : throw _cursor.Fail(DiagnosticCode.UnexpectedToken, level.Location, $"expected an autonomy level (E1, E2, E3 or E4), found {level.Describe()}");
                    autonomyLocation = start.Location;
                }
                else
                {
                    throw _cursor.Fail(DiagnosticCode.UnexpectedToken, start.Location, $"expected 'rule', 'exclusive' or 'autonomy', found {start.Describe()}");
                }
            }
            catch (SyntaxAbort)
            {
                if (start.IsWord("rule") && _cursor.After(start) is { Kind: TokenKind.Word } nameToken)
                {
                    rulesWithErrors.Add(nameToken.Text);
                }

                Resynchronise(start);
            }
        }

        var tree = new RuleSetSyntax(sourceName, autonomy, autonomyLocation, rules, exclusions) { RulesWithErrors = rulesWithErrors };
        return new ParseResult(tree, _cursor.Errors.ToArray());
    }

    /// <summary>Skips to the next line that starts with a top-level keyword, always moving past the item that failed.</summary>
    private void Resynchronise(Token failedItemStart)
    {
        if (ReferenceEquals(_cursor.Current, failedItemStart))
        {
            _cursor.Next();
        }

        while (_cursor.Current.Kind != TokenKind.End && !(_cursor.Current.FirstOnLine && _cursor.Current.Kind == TokenKind.Word && TopLevelKeywords.Contains(_cursor.Current.Text)))
        {
            _cursor.Next();
        }
    }

    private RuleSyntax ParseRule()
    {
        var ruleKeyword = _cursor.Next();
        var name = _cursor.ExpectName("rule name");
        _cursor.Expect(TokenKind.LeftBrace, $"'{{' to open rule '{name.Text}'");

        Placement? placement = null;
        RuleSeverity? severity = null;
        int? priority = null;
        QuantitySyntax? cooldown = null;
        bool? startsDisabled = null;
        ConditionSyntax? condition = null;
        IReadOnlyList<ActionSyntax>? actions = null;
        var escalations = new List<EscalationSyntax>();

        while (_cursor.Current.Kind != TokenKind.RightBrace)
        {
            var item = _cursor.Current;
            if (item.Kind == TokenKind.End)
            {
                throw _cursor.Fail(DiagnosticCode.UnexpectedToken, item.Location, $"expected '}}' to close rule '{name.Text}' (opened at line {ruleKeyword.Location.Line})");
            }

            if (item.Kind != TokenKind.Word)
            {
                throw _cursor.Fail(DiagnosticCode.UnexpectedToken, item.Location, $"expected a rule item (runs, severity, priority, cooldown, starts, when, then, escalate) or '}}', found {item.Describe()}");
            }

            _cursor.Next();
            switch (item.Text)
            {
                case "runs":
                    _cursor.RejectDuplicate(placement is not null, item);
                    _cursor.ExpectWord("on");
                    placement = _cursor.ExpectChoice("placement", ("board", Placement.Board), ("ground", Placement.Ground));
                    break;
                case "severity":
                    _cursor.RejectDuplicate(severity is not null, item);
                    severity = _cursor.ExpectChoice("severity", ("info", RuleSeverity.Info), ("low", RuleSeverity.Low), ("medium", RuleSeverity.Medium), ("high", RuleSeverity.High));
                    break;
                case "priority":
                    _cursor.RejectDuplicate(priority is not null, item);
                    priority = _cursor.ExpectWholeNumber("priority", 0);
                    break;
                case "cooldown":
                    _cursor.RejectDuplicate(cooldown is not null, item);
                    cooldown = _cursor.ExpectQuantity("a cooldown duration");
                    break;
                case "starts":
                    _cursor.RejectDuplicate(startsDisabled is not null, item);
                    startsDisabled = _cursor.ExpectChoice("starting state", ("disabled", true), ("enabled", false));
                    break;
                case "when":
                    _cursor.RejectDuplicate(condition is not null, item);
                    condition = _conditions.Parse(0);
                    break;
                case "then":
                    _cursor.RejectDuplicate(actions is not null, item);
                    actions = _actions.ParseBlock();
                    break;
                case "escalate":
                    _cursor.ExpectWord("after");
                    var after = _cursor.ExpectQuantity("an escalation delay");
                    escalations.Add(new EscalationSyntax(after, _actions.ParseBlock(), item.Location));
                    break;
                default:
                    throw _cursor.Fail(DiagnosticCode.UnexpectedToken, item.Location, $"expected a rule item (runs, severity, priority, cooldown, starts, when, then, escalate) or '}}', found {item.Describe()}");
            }
        }

        _cursor.Next();
        if (placement is null)
        {
            _cursor.Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' does not say where it runs: add 'runs on board' or 'runs on ground'");
        }

        if (severity is null)
        {
            _cursor.Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' has no severity: add 'severity info|low|medium|high'");
        }

        if (condition is null)
        {
            _cursor.Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' has no 'when' condition");
        }

        if (actions is null)
        {
            _cursor.Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' has no 'then' actions");
        }

        return new RuleSyntax(name, placement, severity, priority ?? 0, cooldown, startsDisabled ?? false, condition, actions ?? [], escalations, ruleKeyword.Location);
    }

    private ExclusionSyntax ParseExclusion()
    {
        var keyword = _cursor.Next();
        var target = _cursor.ExpectName("command target");
        _cursor.Expect(TokenKind.LeftParen, "'(' and the rules that share the target");
        var rules = new List<NameSyntax> { _cursor.ExpectName("rule name") };
        while (_cursor.Current.Kind == TokenKind.Comma)
        {
            _cursor.Next();
            rules.Add(_cursor.ExpectName("rule name"));
        }

        _cursor.Expect(TokenKind.RightParen, "',' or ')'");
        return new ExclusionSyntax(target, rules, keyword.Location);
    }

    /// <summary>
    /// Reads one telecommand written as a rule's send is, without the keyword: "probe.wall set_power(power = 3 kW)".
    /// Used where a command stands alone (a time-tagged telecommand); never throws.
    /// </summary>
    public static (SendSyntax? Send, IReadOnlyList<RuleDiagnostic> Errors) ParseCommand(RuleSource source)
    {
        var parser = new RuleParser(RuleLexer.Tokenize(source.Name ?? "", source.Text));
        try
        {
            var send = parser._actions.ParseSend(parser._cursor.Current.Location);
            if (parser._cursor.Current.Kind != TokenKind.End)
            {
                throw parser._cursor.Fail(DiagnosticCode.UnexpectedToken, parser._cursor.Current.Location, $"expected the end of the command, found {parser._cursor.Current.Describe()}");
            }

            return (send, parser._cursor.Errors.ToArray());
        }
        catch (SyntaxAbort)
        {
            return (null, parser._cursor.Errors.ToArray());
        }
    }
}
