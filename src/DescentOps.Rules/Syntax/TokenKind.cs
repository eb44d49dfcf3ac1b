namespace DescentOps.Rules.Syntax;

/// <summary>The lexical classes of rule text. Keywords are words: the parser reads them by position, so a keyword can still be a discrete value.</summary>
internal enum TokenKind
{
    Word,
    Number,
    LeftBrace,
    RightBrace,
    LeftParen,
    RightParen,
    Comma,
    Equals,
    End,
}
