namespace DescentOps.Scenarios.Loading;

/// <summary>A place in a source file: 1-based line and column.</summary>
public readonly record struct SourceLocation(string File, int Line, int Column)
{
    public override string ToString() => $"{File}:{Line}:{Column}";
}
