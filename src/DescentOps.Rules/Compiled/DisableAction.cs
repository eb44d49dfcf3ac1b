namespace DescentOps.Rules.Compiled;

/// <summary>Disable a rule: it stops watching, forgets its persistence state, drops its pending steps and its actuators.</summary>
public sealed record DisableAction(string Rule) : CompiledAction;
