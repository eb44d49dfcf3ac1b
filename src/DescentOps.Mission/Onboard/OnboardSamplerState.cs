using System.Collections.Immutable;
using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission.Onboard;

/// <summary>The sampler's part of the probe's state: its pending sample event and the last sample given of each point.</summary>
public sealed record OnboardSamplerState(EventHandle? Pending, ImmutableSortedDictionary<string, SentSample> Sent)
{
    public static OnboardSamplerState Empty { get; } = new(null, ImmutableSortedDictionary<string, SentSample>.Empty.WithComparers(StringComparer.Ordinal));
}
