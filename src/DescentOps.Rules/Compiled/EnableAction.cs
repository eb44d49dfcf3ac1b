namespace DescentOps.Rules.Compiled;

/// <summary>Enable a rule (a no-op when it is already enabled).</summary>
public sealed record EnableAction(string Rule) : CompiledAction;
