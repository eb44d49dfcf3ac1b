using DescentOps.Primitives.Identity;

namespace DescentOps.Rules.Compiled;

/// <summary>Rules of equal priority allowed to share an actuator: the first to command it holds it.</summary>
public sealed record CompiledExclusion(ComponentId Target, IReadOnlyList<string> Rules);
