namespace DescentOps.Rules.Compiled;

/// <summary>The operand has held on Count consecutive samples of its own points (the repetition count of a monitor).</summary>
public sealed record HoldsForSamplesCondition(CompiledCondition Operand, int Count) : CompiledCondition
{
    public override IEnumerable<string> Points => Operand.Points;
}
