using DescentOps.Primitives.Units;
using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>
/// Splits rule text into tokens. Every character belongs to some token or is skipped as space or comment,
/// so lexing cannot fail; malformed words are the parser's to report, where it knows what was expected.
/// </summary>
internal static class RuleLexer
{
    public static IReadOnlyList<Token> Tokenize(string sourceName, string? text)
    {
        text ??= "";
        var tokens = new List<Token>();
        var line = 1;
        var column = 1;
        var firstOnLine = true;
        var i = 0;

        void Advance(int count)
        {
            for (var k = 0; k < count; k++)
            {
                if (text[i] == '\n')
                {
                    line++;
                    column = 1;
                    firstOnLine = true;
                }
                else
                {
                    column++;
                }

                i++;
            }
        }

        while (i < text.Length)
        {
            var c = text[i];
            if (char.IsWhiteSpace(c) || char.IsControl(c))
            {
                Advance(1);
                continue;
            }

            if (c == '#')
            {
                while (i < text.Length && text[i] != '\n')
                {
                    Advance(1);
                }

                continue;
            }

            var location = new SourceLocation(sourceName, line, column);
            var punctuation = PunctuationKind(c);
            if (punctuation is { } kind)
            {
                tokens.Add(new Token(kind, c.ToString(), double.NaN, location, firstOnLine));
                firstOnLine = false;
                Advance(1);
                continue;
            }

            var numberLength = NumberLength(text, i);
            if (numberLength > 0)
            {
                // "1,5 kW" or "1_500 m": a decimal comma or digit grouping is one bad number, not a number and a comma.
                while (i + numberLength + 1 < text.Length && text[i + numberLength] is ',' or '_' or '\'' && char.IsAsciiDigit(text[i + numberLength + 1]))
                {
                    numberLength += 2;
                    while (i + numberLength < text.Length && char.IsAsciiDigit(text[i + numberLength])) numberLength++;
                }

                var lexeme = text.Substring(i, numberLength);
                var parsed = StrictNumber.Length(lexeme) == lexeme.Length && StrictNumber.TryConvert(lexeme, out var value, out _)
                    ? value
                    : double.NaN;
                tokens.Add(new Token(TokenKind.Number, lexeme, parsed, location, firstOnLine));
                firstOnLine = false;
                Advance(numberLength);
                continue;
            }

            var start = i;
            var wordLength = 0;
            while (start + wordLength < text.Length && IsWordCharacter(text[start + wordLength]))
            {
                wordLength++;
            }

            tokens.Add(new Token(TokenKind.Word, text.Substring(start, wordLength), double.NaN, location, firstOnLine));
            firstOnLine = false;
            Advance(wordLength);
        }

        tokens.Add(new Token(TokenKind.End, "", double.NaN, new SourceLocation(sourceName, line, column), true));
        return tokens;
    }

    private static TokenKind? PunctuationKind(char c) => c switch
    {
        '{' => TokenKind.LeftBrace,
        '}' => TokenKind.RightBrace,
        '(' => TokenKind.LeftParen,
        ')' => TokenKind.RightParen,
        ',' => TokenKind.Comma,
        '=' => TokenKind.Equals,
        _ => null,
    };

    private static bool IsWordCharacter(char c) =>
        !char.IsWhiteSpace(c) && !char.IsControl(c) && c != '#' && PunctuationKind(c) is null;

    /// <summary>Length of a decimal number at <paramref name="start"/> ([+-] digits [. digits] [e [+-] digits]), or 0.</summary>
    private static int NumberLength(string text, int start)
    {
        var i = start;
        if (i < text.Length && (text[i] == '+' || text[i] == '-'))
        {
            i++;
        }

        var mantissaDigits = 0;
        while (i < text.Length && char.IsAsciiDigit(text[i]))
        {
            i++;
            mantissaDigits++;
        }

        if (i < text.Length && text[i] == '.')
        {
            var afterPoint = i + 1;
            var fractionDigits = 0;
            while (afterPoint + fractionDigits < text.Length && char.IsAsciiDigit(text[afterPoint + fractionDigits]))
            {
                fractionDigits++;
            }

            if (mantissaDigits + fractionDigits > 0)
            {
                i = afterPoint + fractionDigits;
                mantissaDigits += fractionDigits;
            }
        }

        if (mantissaDigits == 0)
        {
            return 0;
        }

        if (i < text.Length && (text[i] == 'e' || text[i] == 'E'))
        {
            var j = i + 1;
            if (j < text.Length && (text[j] == '+' || text[j] == '-'))
            {
                j++;
            }

            var exponentDigits = 0;
            while (j + exponentDigits < text.Length && char.IsAsciiDigit(text[j + exponentDigits]))
            {
                exponentDigits++;
            }

            if (exponentDigits > 0)
            {
                i = j + exponentDigits;
            }
        }

        return i - start;
    }
}
