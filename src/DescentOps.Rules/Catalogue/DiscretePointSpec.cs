namespace DescentOps.Rules.Catalogue;

/// <summary>A point that reports one of a fixed set of states (a mode, a switch position).</summary>
public sealed record DiscretePointSpec(string Name, IReadOnlyList<string> Values) : TelemetryPointSpec(Name);
