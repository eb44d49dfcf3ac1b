using System.Collections.Immutable;

namespace DescentOps.Rehearsal;

/// <summary>The names of the faults given at the console so far (a name is used once).</summary>
public sealed record OperatorDeskState(ImmutableHashSet<string> FaultNames);
