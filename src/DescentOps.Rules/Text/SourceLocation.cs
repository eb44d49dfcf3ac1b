namespace DescentOps.Rules.Text;

/// <summary>A place in rule text: 1-based line and column (columns count UTF-16 code units, a tab counts one).</summary>
public readonly record struct SourceLocation(string Source, int Line, int Column)
{
    public override string ToString() => $"{Source}:{Line}:{Column}";
}
