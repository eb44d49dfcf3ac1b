using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Compiled;

/// <summary>Send the rest of the sequence this much later (always positive).</summary>
public sealed record WaitAction(SimDuration Duration) : CompiledAction;
