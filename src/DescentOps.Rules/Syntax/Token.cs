using DescentOps.Rules.Text;

namespace DescentOps.Rules.Syntax;

/// <summary>
/// One token. FirstOnLine lets the parser resynchronise at the next line that starts a top-level item;
/// NumberValue is NaN for a number that does not fit a double, which the parser reports.
/// </summary>
internal sealed record Token(TokenKind Kind, string Text, double NumberValue, SourceLocation Location, bool FirstOnLine)
{
    public bool IsWord(string keyword) => Kind == TokenKind.Word && string.Equals(Text, keyword, StringComparison.Ordinal);

    public string Describe() => Kind switch
    {
        TokenKind.End => "end of text",
        TokenKind.Word => $"'{Text}'",
        TokenKind.Number => $"number '{Text}'",
        _ => $"'{Text}'",
    };
}
