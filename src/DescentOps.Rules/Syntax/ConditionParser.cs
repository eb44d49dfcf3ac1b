using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>The condition grammar: any-of over all-of over not, atoms of limits, states, rates, steps, persistence and time since.</summary>
internal sealed class ConditionParser
{
    private readonly TokenCursor _cursor;

    public ConditionParser(TokenCursor cursor) => _cursor = cursor;

    /// <summary>
    /// A whole condition: an 'or' chain, then optionally 'for' with a duration or a count of samples. 'for' binds
    /// loosest, so it applies to everything written before it back to 'when' or to the opening bracket; a
    /// persistence that should cover only a part is bracketed, and nothing may follow a 'for' clause but the end
    /// of the condition or its closing bracket, so 'A for 3 samples and B' is refused rather than read one way
    /// or the other.
    /// </summary>
    internal ConditionSyntax Parse(int depth)
    {
        var condition = ParseAnyOf(depth);
        if (!_cursor.Current.IsWord("for"))
        {
            return condition;
        }

        _cursor.Next();
        var amount = _cursor.Current;
        if (amount.Kind == TokenKind.Number && _cursor.Peek.IsWord("samples"))
        {
            var count = _cursor.ExpectWholeNumber("sample count", 1);
            _cursor.Next();
            condition = new HoldsForSamplesSyntax(condition, count, amount.Location, condition.Location);
        }
        else
        {
            condition = new HoldsForDurationSyntax(condition, _cursor.ExpectQuantity("a duration or 'N samples'"), condition.Location);
        }

        var after = _cursor.Current;
        if (after.IsWord("and") || after.IsWord("or") || after.IsWord("for"))
        {
            throw _cursor.Fail(DiagnosticCode.UnexpectedToken, after.Location,
                $"'{after.Text}' after a 'for' clause: 'for' applies to the whole condition before it, so bracket the part that must persist, as in '(A for 3 samples) {(after.Text == "for" ? "and" : after.Text)} B'");
        }

        return condition;
    }

    private ConditionSyntax ParseAnyOf(int depth)
    {
        var first = ParseAllOf(depth);
        if (!_cursor.Current.IsWord("or"))
        {
            return first;
        }

        var operands = new List<ConditionSyntax> { first };
        while (_cursor.Current.IsWord("or"))
        {
            _cursor.Next();
            operands.Add(ParseAllOf(depth));
        }

        return new AnyOfSyntax(operands, first.Location);
    }

    private ConditionSyntax ParseAllOf(int depth)
    {
        var first = ParseUnary(depth);
        if (!_cursor.Current.IsWord("and"))
        {
            return first;
        }

        var operands = new List<ConditionSyntax> { first };
        while (_cursor.Current.IsWord("and"))
        {
            _cursor.Next();
            operands.Add(ParseUnary(depth));
        }

        return new AllOfSyntax(operands, first.Location);
    }

    private ConditionSyntax ParseUnary(int depth)
    {
        if (depth > RuleParser.MaxNestingDepth)
        {
            throw _cursor.Fail(DiagnosticCode.NestingTooDeep, _cursor.Current.Location, $"the condition nests deeper than {RuleParser.MaxNestingDepth} levels");
        }

        if (_cursor.Current.IsWord("not"))
        {
            var not = _cursor.Next();
            return new NotSyntax(ParseUnary(depth + 1), not.Location);
        }

        return ParseAtom(depth);
    }

    private ConditionSyntax ParseAtom(int depth)
    {
        var start = _cursor.Current;
        if (start.Kind == TokenKind.LeftParen)
        {
            _cursor.Next();
            var inner = Parse(depth + 1);
            _cursor.Expect(TokenKind.RightParen, "')' to close the group");
            return inner;
        }

        if (start.IsWord("rate"))
        {
            _cursor.Next();
            _cursor.ExpectWord("of");
            var point = _cursor.ExpectName("telemetry point");
            _cursor.ExpectWord("over");
            var window = _cursor.ExpectQuantity("a window duration");
            return new RateCheckSyntax(point, window, ParseThreshold(point), start.Location);
        }

        if (start.IsWord("time"))
        {
            _cursor.Next();
            _cursor.ExpectWord("since");
            var happened = ParseBracketed(depth, "the event after 'time since'");
            var keyword = _cursor.Current;
            var comparison = keyword.IsWord("above") ? Comparison.Above : keyword.IsWord("below") ? Comparison.Below : (Comparison?)null;
            if (comparison is null)
            {
                throw _cursor.Fail(DiagnosticCode.UnexpectedToken, keyword.Location, $"expected 'above' or 'below' and a duration after 'time since (...)', found {keyword.Describe()}");
            }

            _cursor.Next();
            return new TimeSinceSyntax(happened, comparison.Value, _cursor.ExpectQuantity("a duration"), keyword.Location, start.Location);
        }

        if (start.IsWord("latched"))
        {
            _cursor.Next();
            return new LatchedSyntax(ParseBracketed(depth, "the condition after 'latched'"), start.Location);
        }

        if (start.IsWord("step"))
        {
            _cursor.Next();
            _cursor.ExpectWord("of");
            var point = _cursor.ExpectName("telemetry point");
            return new StepCheckSyntax(point, ParseThreshold(point), start.Location);
        }

        var name = _cursor.ExpectName("telemetry point, 'rate of', 'step of', 'time since', 'latched', 'not' or '('");
        if (_cursor.Current.IsWord("is"))
        {
            _cursor.Next();
            var negated = false;
            if (_cursor.Current.IsWord("not"))
            {
                _cursor.Next();
                negated = true;
            }

            return new StateCheckSyntax(name, _cursor.ExpectName("discrete value", allowKeyword: true), negated, start.Location);
        }

        if (_cursor.Current.IsWord("minus"))
        {
            _cursor.Next();
            var right = _cursor.ExpectName("telemetry point after 'minus'");
            return new DifferenceCheckSyntax(name, right, ParseThreshold(right), start.Location);
        }

        return new LimitCheckSyntax(name, ParseThreshold(name), start.Location);
    }

    /// <summary>"( CONDITION )": the brackets are required, so what the event or latch covers is always written out.</summary>
    private ConditionSyntax ParseBracketed(int depth, string what)
    {
        if (_cursor.Current.Kind != TokenKind.LeftParen)
        {
            throw _cursor.Fail(DiagnosticCode.UnexpectedToken, _cursor.Current.Location, $"expected '(' to open {what}, found {_cursor.Current.Describe()}");
        }

        _cursor.Next();
        var inner = Parse(depth + 1);
        _cursor.Expect(TokenKind.RightParen, "')' to close the group");
        return inner;
    }

    private ThresholdSyntax ParseThreshold(NameSyntax point)
    {
        var keyword = _cursor.Current;
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
            throw _cursor.Fail(DiagnosticCode.UnexpectedToken, keyword.Location, $"expected 'above', 'below', 'inside', 'outside', 'is' or 'minus' after '{point.Text}', found {keyword.Describe()}");
        }

        _cursor.Next();
        var lower = _cursor.ExpectQuantity("a threshold");
        if (comparison is Comparison.Above or Comparison.Below)
        {
            return new ThresholdSyntax(comparison, lower, null, keyword.Location);
        }

        _cursor.ExpectWord("to");
        return new ThresholdSyntax(comparison, lower, _cursor.ExpectQuantity("the upper end of the band"), keyword.Location);
    }
}
