namespace DescentOps.Rules.Compiled;

/// <summary>The operand does not hold.</summary>
public sealed record NotCondition(CompiledCondition Operand) : CompiledCondition
{
    public override IEnumerable<string> Points => Operand.Points;
}
