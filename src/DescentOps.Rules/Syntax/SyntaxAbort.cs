namespace DescentOps.Rules.Syntax;

/// <summary>Unwinds to the top-level loop after an error has been recorded; never leaves the parser.</summary>
internal sealed class SyntaxAbort : Exception;
