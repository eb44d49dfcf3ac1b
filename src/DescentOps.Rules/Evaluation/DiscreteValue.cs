namespace DescentOps.Rules.Evaluation;

/// <summary>A discrete state ("descending", "off").</summary>
public sealed record DiscreteValue(string State) : TelemetryValue
{
    public override string ToString() => State;
}
