using DescentOps.Primitives.Time;
using DescentOps.Rules.Syntax;

namespace DescentOps.Rules.Compiled;

/// <summary>
/// The time since <see cref="Event"/> last began to hold (its latest start) is above or below <see cref="Duration"/>;
/// false until the event has happened once.
/// </summary>
public sealed record TimeSinceCondition(CompiledCondition Event, Comparison Comparison, SimDuration Duration) : CompiledCondition
{
    public override IEnumerable<string> Points => Event.Points;
}
