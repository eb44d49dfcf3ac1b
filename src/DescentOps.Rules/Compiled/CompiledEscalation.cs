using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Compiled;

/// <summary>Actions to run After the firing if the rule's condition has not cleared by then.</summary>
public sealed record CompiledEscalation(SimDuration After, IReadOnlyList<CompiledAction> Actions);
