namespace DescentOps.Rules.Compiled;

/// <summary>Every operand holds.</summary>
public sealed record AllOfCondition(IReadOnlyList<CompiledCondition> Operands) : CompiledCondition
{
    public override IEnumerable<string> Points => Operands.SelectMany(o => o.Points).Distinct(StringComparer.Ordinal);
}
