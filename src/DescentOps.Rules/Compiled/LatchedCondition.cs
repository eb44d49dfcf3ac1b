namespace DescentOps.Rules.Compiled;

/// <summary>Holds from the first instant the operand held, until the rule is disabled (which resets the latch).</summary>
public sealed record LatchedCondition(CompiledCondition Operand) : CompiledCondition
{
    public override IEnumerable<string> Points => Operand.Points;
}
