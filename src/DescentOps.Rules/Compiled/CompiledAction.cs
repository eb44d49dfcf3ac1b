namespace DescentOps.Rules.Compiled;

/// <summary>One step of a checked action sequence.</summary>
public abstract record CompiledAction;
