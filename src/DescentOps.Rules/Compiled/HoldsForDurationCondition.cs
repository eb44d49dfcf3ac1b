using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Compiled;

/// <summary>The operand has held without a break for at least Duration (values hold between samples).</summary>
public sealed record HoldsForDurationCondition(CompiledCondition Operand, SimDuration Duration) : CompiledCondition
{
    public override IEnumerable<string> Points => Operand.Points;
}
