namespace DescentOps.Rules.Compiled;

/// <summary>The latest value of one numeric point less the latest value of another, of the same dimension, against a threshold.</summary>
public sealed record DifferenceCondition(string Left, string Right, Threshold Threshold) : CompiledCondition
{
    public override IEnumerable<string> Points => Left == Right ? [Left] : [Left, Right];
}
