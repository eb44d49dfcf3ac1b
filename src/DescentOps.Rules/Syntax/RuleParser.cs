using DescentOps.Primitives.Units;
using System.Globalization;
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
        "for", "samples", "time", "since", "latched",
    };

    private static readonly HashSet<string> TopLevelKeywords = new(StringComparer.Ordinal) { "rule", "exclusive", "autonomy" };

    private readonly IReadOnlyList<Token> _tokens;
    private readonly List<RuleDiagnostic> _errors = [];
    private int _position;

    private RuleParser(IReadOnlyList<Token> tokens)
    {
        _tokens = tokens;
    }

    public static ParseResult Parse(RuleSource source)
    {
        var name = source.Name ?? "";
        var parser = new RuleParser(RuleLexer.Tokenize(name, source.Text));
        return parser.ParseRuleSet(name);
    }

    /// <summary>True for words the language reserves; they cannot name rules, points, targets or units.</summary>
    public static bool IsKeyword(string word) => Keywords.Contains(word);

    private Token Current => _tokens[_position];

    private Token Next()
    {
        var token = _tokens[_position];
        if (_position < _tokens.Count - 1)
        {
            _position++;
        }

        return token;
    }

    private ParseResult ParseRuleSet(string sourceName)
    {
        var rules = new List<RuleSyntax>();
        var exclusions = new List<ExclusionSyntax>();
        var rulesWithErrors = new List<string>();
        AutonomyLevel? autonomy = null;
        var autonomyLocation = new SourceLocation(sourceName, 1, 1);

        while (Current.Kind != TokenKind.End)
        {
            var start = Current;
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
                    Next();
                    if (autonomy is not null)
                    {
                        Fail(DiagnosticCode.DuplicateItem, start.Location, "the autonomy level is already set");
                    }

                    var level = Current;
                    autonomy = level.Kind == TokenKind.Word && level.Text is "E1" or "E2" or "E3" or "E4"
                        ? Enum.Parse<AutonomyLevel>(Next().Text)
                        : throw Fail(DiagnosticCode.UnexpectedToken, level.Location, $"expected an autonomy level (E1, E2, E3 or E4), found {level.Describe()}");
                    autonomyLocation = start.Location;
                }
                else
                {
                    throw Fail(DiagnosticCode.UnexpectedToken, start.Location, $"expected 'rule', 'exclusive' or 'autonomy', found {start.Describe()}");
                }
            }
            catch (SyntaxAbort)
            {
                if (start.IsWord("rule") && _tokens[Math.Min(IndexOf(start) + 1, _tokens.Count - 1)] is { Kind: TokenKind.Word } nameToken)
                {
                    rulesWithErrors.Add(nameToken.Text);
                }

                Resynchronise(start);
            }
        }

        var tree = new RuleSetSyntax(sourceName, autonomy, autonomyLocation, rules, exclusions) { RulesWithErrors = rulesWithErrors };
        return new ParseResult(tree, _errors.ToArray());
    }

    private int IndexOf(Token token)
    {
        for (var i = 0; i < _tokens.Count; i++)
        {
            if (ReferenceEquals(_tokens[i], token))
            {
                return i;
            }
        }

        return _tokens.Count - 1;
    }

    /// <summary>Skips to the next line that starts with a top-level keyword, always moving past the item that failed.</summary>
    private void Resynchronise(Token failedItemStart)
    {
        if (ReferenceEquals(Current, failedItemStart))
        {
            Next();
        }

        while (Current.Kind != TokenKind.End && !(Current.FirstOnLine && Current.Kind == TokenKind.Word && TopLevelKeywords.Contains(Current.Text)))
        {
            Next();
        }
    }

    private RuleSyntax ParseRule()
    {
        var ruleKeyword = Next();
        var name = ExpectName("rule name");
        Expect(TokenKind.LeftBrace, $"'{{' to open rule '{name.Text}'");

        Placement? placement = null;
        RuleSeverity? severity = null;
        int? priority = null;
        QuantitySyntax? cooldown = null;
        bool? startsDisabled = null;
        ConditionSyntax? condition = null;
        IReadOnlyList<ActionSyntax>? actions = null;
        var escalations = new List<EscalationSyntax>();

        while (Current.Kind != TokenKind.RightBrace)
        {
            var item = Current;
            if (item.Kind == TokenKind.End)
            {
                throw Fail(DiagnosticCode.UnexpectedToken, item.Location, $"expected '}}' to close rule '{name.Text}' (opened at line {ruleKeyword.Location.Line})");
            }

            if (item.Kind != TokenKind.Word)
            {
                throw Fail(DiagnosticCode.UnexpectedToken, item.Location, $"expected a rule item (runs, severity, priority, cooldown, starts, when, then, escalate) or '}}', found {item.Describe()}");
            }

            Next();
            switch (item.Text)
            {
                case "runs":
                    RejectDuplicate(placement is not null, item);
                    ExpectWord("on");
                    placement = ExpectChoice("placement", ("board", Placement.Board), ("ground", Placement.Ground));
                    break;
                case "severity":
                    RejectDuplicate(severity is not null, item);
                    severity = ExpectChoice("severity", ("info", RuleSeverity.Info), ("low", RuleSeverity.Low), ("medium", RuleSeverity.Medium), ("high", RuleSeverity.High));
                    break;
                case "priority":
                    RejectDuplicate(priority is not null, item);
                    priority = ExpectWholeNumber("priority", 0);
                    break;
                case "cooldown":
                    RejectDuplicate(cooldown is not null, item);
                    cooldown = ExpectQuantity("a cooldown duration");
                    break;
                case "starts":
                    RejectDuplicate(startsDisabled is not null, item);
                    startsDisabled = ExpectChoice("starting state", ("disabled", true), ("enabled", false));
                    break;
                case "when":
                    RejectDuplicate(condition is not null, item);
                    condition = ParseCondition(0);
                    break;
                case "then":
                    RejectDuplicate(actions is not null, item);
                    actions = ParseBlock();
                    break;
                case "escalate":
                    ExpectWord("after");
                    var after = ExpectQuantity("an escalation delay");
                    escalations.Add(new EscalationSyntax(after, ParseBlock(), item.Location));
                    break;
                default:
                    throw Fail(DiagnosticCode.UnexpectedToken, item.Location, $"expected a rule item (runs, severity, priority, cooldown, starts, when, then, escalate) or '}}', found {item.Describe()}");
            }
        }

        Next();
        if (placement is null)
        {
            Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' does not say where it runs: add 'runs on board' or 'runs on ground'");
        }

        if (severity is null)
        {
            Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' has no severity: add 'severity info|low|medium|high'");
        }

        if (condition is null)
        {
            Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' has no 'when' condition");
        }

        if (actions is null)
        {
            Report(DiagnosticCode.MissingItem, name.Location, $"rule '{name.Text}' has no 'then' actions");
        }

        return new RuleSyntax(name, placement, severity, priority ?? 0, cooldown, startsDisabled ?? false, condition, actions ?? [], escalations, ruleKeyword.Location);
    }

    private ExclusionSyntax ParseExclusion()
    {
        var keyword = Next();
        var target = ExpectName("command target");
        Expect(TokenKind.LeftParen, "'(' and the rules that share the target");
        var rules = new List<NameSyntax> { ExpectName("rule name") };
        while (Current.Kind == TokenKind.Comma)
        {
            Next();
            rules.Add(ExpectName("rule name"));
        }

        Expect(TokenKind.RightParen, "',' or ')'");
        return new ExclusionSyntax(target, rules, keyword.Location);
    }

    private List<ActionSyntax> ParseBlock()
    {
        Expect(TokenKind.LeftBrace, "'{' to open an action block");
        var actions = new List<ActionSyntax>();
        while (Current.Kind != TokenKind.RightBrace)
        {
            var step = Current;
            if (step.IsWord("send"))
            {
                Next();
                actions.Add(ParseSend(step.Location));
            }
            else if (step.IsWord("wait"))
            {
                Next();
                actions.Add(new WaitSyntax(ExpectQuantity("a wait duration"), step.Location));
            }
            else if (step.IsWord("enable"))
            {
                Next();
                actions.Add(new EnableSyntax(ExpectName("rule name"), step.Location));
            }
            else if (step.IsWord("disable"))
            {
                Next();
                actions.Add(new DisableSyntax(ExpectName("rule name"), step.Location));
            }
            else if (step.IsWord("start"))
            {
                Next();
                actions.Add(new StartSyntax(ExpectName("procedure name"), step.Location));
            }
            else
            {
                throw Fail(DiagnosticCode.UnexpectedToken, step.Location, $"expected an action (send, wait, enable, disable, start) or '}}', found {step.Describe()}");
            }
        }

        Next();
        return actions;
    }

    /// <summary>"TARGET COMMAND(name = value, ...)", the part of a send after the keyword.</summary>
    private SendSyntax ParseSend(SourceLocation location)
    {
        var target = ExpectName("command target");
        var command = ExpectName("command name");
        var arguments = new List<ArgumentSyntax>();
        if (Current.Kind == TokenKind.LeftParen)
        {
            Next();
            if (Current.Kind != TokenKind.RightParen)
            {
                arguments.Add(ParseArgument());
                while (Current.Kind == TokenKind.Comma)
                {
                    Next();
                    arguments.Add(ParseArgument());
                }
            }

            Expect(TokenKind.RightParen, "',' or ')' after an argument");
        }

        return new SendSyntax(target, command, arguments, location);
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
            var send = parser.ParseSend(parser.Current.Location);
            if (parser.Current.Kind != TokenKind.End)
            {
                throw parser.Fail(DiagnosticCode.UnexpectedToken, parser.Current.Location, $"expected the end of the command, found {parser.Current.Describe()}");
            }

            return (send, parser._errors.ToArray());
        }
        catch (SyntaxAbort)
        {
            return (null, parser._errors.ToArray());
        }
    }

    private ArgumentSyntax ParseArgument()
    {
        var name = ExpectName("argument name");
        Expect(TokenKind.Equals, $"'=' after argument '{name.Text}'");
        var value = Current;
        if (value.Kind == TokenKind.Number)
        {
            return new ArgumentSyntax(name, ExpectQuantity("an argument value"), null, name.Location);
        }

        if (value.Kind == TokenKind.Word)
        {
            return new ArgumentSyntax(name, null, ExpectName("argument value", allowKeyword: true), name.Location);
        }

        throw Fail(DiagnosticCode.UnexpectedToken, value.Location, $"expected a value for argument '{name.Text}', found {value.Describe()}");
    }

    /// <summary>
    /// A whole condition: an 'or' chain, then optionally 'for' with a duration or a count of samples. 'for' binds
    /// loosest, so it applies to everything written before it back to 'when' or to the opening bracket; a
    /// persistence that should cover only a part is bracketed, and nothing may follow a 'for' clause but the end
    /// of the condition or its closing bracket, so 'A for 3 samples and B' is refused rather than read one way
    /// or the other.
    /// </summary>
    private ConditionSyntax ParseCondition(int depth)
    {
        var condition = ParseAnyOf(depth);
        if (!Current.IsWord("for"))
        {
            return condition;
        }

        Next();
        var amount = Current;
        if (amount.Kind == TokenKind.Number && _tokens[Math.Min(_position + 1, _tokens.Count - 1)].IsWord("samples"))
        {
            var count = ExpectWholeNumber("sample count", 1);
            Next();
            condition = new HoldsForSamplesSyntax(condition, count, amount.Location, condition.Location);
        }
        else
        {
            condition = new HoldsForDurationSyntax(condition, ExpectQuantity("a duration or 'N samples'"), condition.Location);
        }

        var after = Current;
        if (after.IsWord("and") || after.IsWord("or") || after.IsWord("for"))
        {
            throw Fail(DiagnosticCode.UnexpectedToken, after.Location,
                $"'{after.Text}' after a 'for' clause: 'for' applies to the whole condition before it, so bracket the part that must persist, as in '(A for 3 samples) {(after.Text == "for" ? "and" : after.Text)} B'");
        }

        return condition;
    }

    private ConditionSyntax ParseAnyOf(int depth)
    {
        var first = ParseAllOf(depth);
        if (!Current.IsWord("or"))
        {
            return first;
        }

        var operands = new List<ConditionSyntax> { first };
        while (Current.IsWord("or"))
        {
            Next();
            operands.Add(ParseAllOf(depth));
        }

        return new AnyOfSyntax(operands, first.Location);
    }

    private ConditionSyntax ParseAllOf(int depth)
    {
        var first = ParseUnary(depth);
        if (!Current.IsWord("and"))
        {
            return first;
        }

        var operands = new List<ConditionSyntax> { first };
        while (Current.IsWord("and"))
        {
            Next();
            operands.Add(ParseUnary(depth));
        }

        return new AllOfSyntax(operands, first.Location);
    }

    private ConditionSyntax ParseUnary(int depth)
    {
        if (depth > MaxNestingDepth)
        {
            throw Fail(DiagnosticCode.NestingTooDeep, Current.Location, $"the condition nests deeper than {MaxNestingDepth} levels");
        }

        if (Current.IsWord("not"))
        {
            var not = Next();
            return new NotSyntax(ParseUnary(depth + 1), not.Location);
        }

        return ParseAtom(depth);
    }

    private ConditionSyntax ParseAtom(int depth)
    {
        var start = Current;
        if (start.Kind == TokenKind.LeftParen)
        {
            Next();
            var inner = ParseCondition(depth + 1);
            Expect(TokenKind.RightParen, "')' to close the group");
            return inner;
        }

        if (start.IsWord("rate"))
        {
            Next();
            ExpectWord("of");
            var point = ExpectName("telemetry point");
            ExpectWord("over");
            var window = ExpectQuantity("a window duration");
            return new RateCheckSyntax(point, window, ParseThreshold(point), start.Location);
        }

        if (start.IsWord("time"))
        {
            Next();
            ExpectWord("since");
            var happened = ParseBracketed(depth, "the event after 'time since'");
            var keyword = Current;
            var comparison = keyword.IsWord("above") ? Comparison.Above : keyword.IsWord("below") ? Comparison.Below : (Comparison?)null;
            if (comparison is null)
            {
                throw Fail(DiagnosticCode.UnexpectedToken, keyword.Location, $"expected 'above' or 'below' and a duration after 'time since (...)', found {keyword.Describe()}");
            }

            Next();
            return new TimeSinceSyntax(happened, comparison.Value, ExpectQuantity("a duration"), keyword.Location, start.Location);
        }

        if (start.IsWord("latched"))
        {
            Next();
            return new LatchedSyntax(ParseBracketed(depth, "the condition after 'latched'"), start.Location);
        }

        if (start.IsWord("step"))
        {
            Next();
            ExpectWord("of");
            var point = ExpectName("telemetry point");
            return new StepCheckSyntax(point, ParseThreshold(point), start.Location);
        }

        var name = ExpectName("telemetry point, 'rate of', 'step of', 'time since', 'latched', 'not' or '('");
        if (Current.IsWord("is"))
        {
            Next();
            var negated = false;
            if (Current.IsWord("not"))
            {
                Next();
                negated = true;
            }

            return new StateCheckSyntax(name, ExpectName("discrete value", allowKeyword: true), negated, start.Location);
        }

        return new LimitCheckSyntax(name, ParseThreshold(name), start.Location);
    }

    /// <summary>"( CONDITION )": the brackets are required, so what the event or latch covers is always written out.</summary>
    private ConditionSyntax ParseBracketed(int depth, string what)
    {
        if (Current.Kind != TokenKind.LeftParen)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, Current.Location, $"expected '(' to open {what}, found {Current.Describe()}");
        }

        Next();
        var inner = ParseCondition(depth + 1);
        Expect(TokenKind.RightParen, "')' to close the group");
        return inner;
    }

    private ThresholdSyntax ParseThreshold(NameSyntax point)
    {
        var keyword = Current;
        var kind = keyword.Kind == TokenKind.Word
            ? keyword.Text switch
            {
                "above" => Comparison.Above,
                "below" => Comparison.Below,
                "inside" => Comparison.Inside,
                "outside" => Comparison.Outside,
                _ => (Comparison?)null,
            }
            : null;
        if (kind is not { } comparison)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, keyword.Location, $"expected 'above', 'below', 'inside', 'outside' or 'is' after '{point.Text}', found {keyword.Describe()}");
        }

        Next();
        var lower = ExpectQuantity("a threshold");
        if (comparison is Comparison.Above or Comparison.Below)
        {
            return new ThresholdSyntax(comparison, lower, null, keyword.Location);
        }

        ExpectWord("to");
        return new ThresholdSyntax(comparison, lower, ExpectQuantity("the upper end of the band"), keyword.Location);
    }

    private QuantitySyntax ExpectQuantity(string what)
    {
        var number = Current;
        if (number.Kind != TokenKind.Number)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, number.Location, $"expected {what}, found {number.Describe()}");
        }

        if (double.IsNaN(number.NumberValue))
        {
            throw Fail(DiagnosticCode.InvalidNumber, number.Location, StrictNumber.WhyNot(number.Text, StrictNumber.Length(number.Text)) ?? $"'{number.Text}' is too large to be a number");
        }

        Next();
        var unit = Current;
        if (unit.Kind == TokenKind.Word && !Keywords.Contains(unit.Text))
        {
            Next();
            return new QuantitySyntax(number.NumberValue, unit.Text, number.Location, unit.Location);
        }

        return new QuantitySyntax(number.NumberValue, "", number.Location, number.Location);
    }

    private int ExpectWholeNumber(string what, int minimum)
    {
        var number = Current;
        if (number.Kind != TokenKind.Number)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, number.Location, $"expected a {what}, found {number.Describe()}");
        }

        var value = number.NumberValue;
        if (double.IsNaN(value) || value != Math.Floor(value) || value < minimum || value > MaxWholeNumber)
        {
            throw Fail(DiagnosticCode.InvalidNumber, number.Location, $"a {what} is a whole number from {minimum} to {MaxWholeNumber.ToString(CultureInfo.InvariantCulture)}, found '{number.Text}'");
        }

        Next();
        return (int)value;
    }

    private NameSyntax ExpectName(string what, bool allowKeyword = false)
    {
        var token = Current;
        if (token.Kind != TokenKind.Word)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, token.Location, $"expected a {what}, found {token.Describe()}");
        }

        if (!IsValidName(token.Text))
        {
            throw Fail(DiagnosticCode.InvalidName, token.Location, $"'{token.Text}' is not a valid {what}: a name starts with a letter and holds letters, digits, '_', '-' and '.'");
        }

        if (!allowKeyword && Keywords.Contains(token.Text))
        {
            throw Fail(DiagnosticCode.InvalidName, token.Location, $"expected a {what}, found the keyword '{token.Text}'");
        }

        Next();
        return new NameSyntax(token.Text, token.Location);
    }

    private static bool IsValidName(string text) =>
        text.Length > 0 && char.IsAsciiLetter(text[0]) && text.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-' or '.');

    private T ExpectChoice<T>(string what, params (string Word, T Value)[] choices)
    {
        var token = Current;
        foreach (var (word, value) in choices)
        {
            if (token.IsWord(word))
            {
                Next();
                return value;
            }
        }

        throw Fail(DiagnosticCode.UnexpectedToken, token.Location, $"expected a {what} ({string.Join(", ", choices.Select(c => c.Word))}), found {token.Describe()}");
    }

    private void ExpectWord(string keyword)
    {
        if (!Current.IsWord(keyword))
        {
            throw Fail(DiagnosticCode.UnexpectedToken, Current.Location, $"expected '{keyword}', found {Current.Describe()}");
        }

        Next();
    }

    private void Expect(TokenKind kind, string what)
    {
        if (Current.Kind != kind)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, Current.Location, $"expected {what}, found {Current.Describe()}");
        }

        Next();
    }

    private void RejectDuplicate(bool alreadySet, Token item)
    {
        if (alreadySet)
        {
            throw Fail(DiagnosticCode.DuplicateItem, item.Location, $"'{item.Text}' is given twice in this rule");
        }
    }

    private void Report(DiagnosticCode code, SourceLocation location, string message) =>
        _errors.Add(new RuleDiagnostic(location, DiagnosticSeverity.Error, code, message));

    private SyntaxAbort Fail(DiagnosticCode code, SourceLocation location, string message)
    {
        Report(code, location, message);
        return new SyntaxAbort();
    }

    /// <summary>Unwinds to the top-level loop after an error has been recorded; never leaves the parser.</summary>
    private sealed class SyntaxAbort : Exception;
}
