using DescentOps.Primitives.Identity;

namespace DescentOps.Rules.Catalogue;

/// <summary>A telecommand a component accepts. The target is also the actuator that mutual exclusion guards.</summary>
public sealed record CommandSpec(ComponentId Target, string Name, IReadOnlyList<ArgumentSpec> Arguments);
