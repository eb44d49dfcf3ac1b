using DescentOps.Primitives.Units;
using System.Globalization;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>
/// The parser's place in the token list, with the expectations every part of the grammar shares: each reads a token or
/// records a located error and throws <see cref="SyntaxAbort"/>.
/// </summary>
internal sealed class TokenCursor
{
    private readonly IReadOnlyList<Token> _tokens;
    private readonly List<RuleDiagnostic> _errors = [];
    private int _position;

    public TokenCursor(IReadOnlyList<Token> tokens) => _tokens = tokens;

    /// <summary>The errors recorded so far, in the order found.</summary>
    public IReadOnlyList<RuleDiagnostic> Errors => _errors;

    /// <summary>The token under the cursor (the end token once the text is used up).</summary>
    public Token Current => _tokens[_position];

    /// <summary>The token after <see cref="Current"/> (or the end token), without moving.</summary>
    public Token Peek => _tokens[Math.Min(_position + 1, _tokens.Count - 1)];

    public Token Next()
    {
        var token = _tokens[_position];
        if (_position < _tokens.Count - 1)
        {
            _position++;
        }

        return token;
    }

    /// <summary>The token after <paramref name="token"/> (or the end token).</summary>
    public Token After(Token token) => _tokens[Math.Min(IndexOf(token) + 1, _tokens.Count - 1)];

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

    public QuantitySyntax ExpectQuantity(string what)
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
        if (unit.Kind == TokenKind.Word && !RuleParser.IsKeyword(unit.Text))
        {
            Next();
            return new QuantitySyntax(number.NumberValue, unit.Text, number.Location, unit.Location);
        }

        return new QuantitySyntax(number.NumberValue, "", number.Location, number.Location);
    }

    public int ExpectWholeNumber(string what, int minimum)
    {
        var number = Current;
        if (number.Kind != TokenKind.Number)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, number.Location, $"expected a {what}, found {number.Describe()}");
        }

        var value = number.NumberValue;
        if (double.IsNaN(value) || value != Math.Floor(value) || value < minimum || value > RuleParser.MaxWholeNumber)
        {
            throw Fail(DiagnosticCode.InvalidNumber, number.Location, $"a {what} is a whole number from {minimum} to {RuleParser.MaxWholeNumber.ToString(CultureInfo.InvariantCulture)}, found '{number.Text}'");
        }

        Next();
        return (int)value;
    }

    public NameSyntax ExpectName(string what, bool allowKeyword = false)
    {
        var token = Current;
        if (token.Kind != TokenKind.Word)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, token.Location, $"expected a {what}, found {token.Describe()}");
        }

        if (!IsValidName(token.Text))
        {
            throw Fail(DiagnosticCode.InvalidName, token.Location, $"'{token.Text}' is not a valid {what}: a name starts with a letter and holds letters, digits, '_', '-', '.' and '/' (a lander's name and a slash before a point or target)");
        }

        if (!allowKeyword && RuleParser.IsKeyword(token.Text))
        {
            throw Fail(DiagnosticCode.InvalidName, token.Location, $"expected a {what}, found the keyword '{token.Text}'");
        }

        Next();
        return new NameSyntax(token.Text, token.Location);
    }

    private static bool IsValidName(string text) =>
        text.Length > 0 && char.IsAsciiLetter(text[0]) && text.All(c => char.IsAsciiLetterOrDigit(c) || c is '_' or '-' or '.' or '/');

    public T ExpectChoice<T>(string what, params (string Word, T Value)[] choices)
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

    public void ExpectWord(string keyword)
    {
        if (!Current.IsWord(keyword))
        {
            throw Fail(DiagnosticCode.UnexpectedToken, Current.Location, $"expected '{keyword}', found {Current.Describe()}");
        }

        Next();
    }

    public void Expect(TokenKind kind, string what)
    {
        if (Current.Kind != kind)
        {
            throw Fail(DiagnosticCode.UnexpectedToken, Current.Location, $"expected {what}, found {Current.Describe()}");
        }

        Next();
    }

    public void RejectDuplicate(bool alreadySet, Token item)
    {
        if (alreadySet)
        {
            throw Fail(DiagnosticCode.DuplicateItem, item.Location, $"'{item.Text}' is given twice in this rule");
        }
    }

    public void Report(DiagnosticCode code, SourceLocation location, string message) =>
        _errors.Add(new RuleDiagnostic(location, DiagnosticSeverity.Error, code, message));

    public SyntaxAbort Fail(DiagnosticCode code, SourceLocation location, string message)
    {
        Report(code, location, message);
        return new SyntaxAbort();
    }
}
