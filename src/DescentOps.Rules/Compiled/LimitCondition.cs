namespace DescentOps.Rules.Compiled;

/// <summary>The latest value of a numeric point against a threshold.</summary>
public sealed record LimitCondition(string Point, Threshold Threshold) : CompiledCondition
{
    public override IEnumerable<string> Points => [Point];
}
