namespace DescentOps.Rules.Compiled;

/// <summary>The signed difference between a point's last two samples (newest minus previous) against a threshold.</summary>
public sealed record StepCondition(string Point, Threshold Threshold) : CompiledCondition
{
    public override IEnumerable<string> Points => [Point];
}
