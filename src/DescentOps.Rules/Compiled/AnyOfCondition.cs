namespace DescentOps.Rules.Compiled;

/// <summary>At least one operand holds.</summary>
public sealed record AnyOfCondition(IReadOnlyList<CompiledCondition> Operands) : CompiledCondition
{
    public override IEnumerable<string> Points => Operands.SelectMany(o => o.Points).Distinct(StringComparer.Ordinal);
}
