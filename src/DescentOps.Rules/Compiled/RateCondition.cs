using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Compiled;

/// <summary>
/// The change of a point per second between its newest sample and the newest sample at least Window older;
/// false until the history spans the window.
/// </summary>
public sealed record RateCondition(string Point, SimDuration Window, Threshold ThresholdPerSecond) : CompiledCondition
{
    public override IEnumerable<string> Points => [Point];
}
