namespace DescentOps.Rules.Evaluation;

/// <summary>What a sample carries: a number in SI or a discrete state.</summary>
public abstract record TelemetryValue;
