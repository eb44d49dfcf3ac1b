namespace DescentOps.Rules.Compiled;

/// <summary>The latest state of a discrete point equals (or, negated, differs from) an expected value.</summary>
public sealed record StateCondition(string Point, string Value, bool Negated) : CompiledCondition
{
    public override IEnumerable<string> Points => [Point];
}
