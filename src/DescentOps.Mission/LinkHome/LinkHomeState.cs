using System.Collections.Immutable;
using DescentOps.Engine.Scheduling;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.LinkHome;

/// <summary>
/// The shared link's committed state: each lander's store, in the scenario's order, and each channel's holder and the
/// instant it is free again. <see cref="Pending"/> is the component's next wake-up.
/// </summary>
public sealed record LinkHomeState(ImmutableArray<LinkQueue> Landers, ImmutableArray<string?> ChannelHolders, ImmutableArray<SimTime> ChannelFreeAt, EventHandle? Pending)
{
    public int Index(string lander)
    {
        for (var i = 0; i < Landers.Length; i++)
        {
            if (Landers[i].Name == lander) return i;
        }

        throw new ArgumentException($"'{lander}' is not a lander of this link.", nameof(lander));
    }

    /// <summary>Channels carrying a frame at <paramref name="now"/>.</summary>
    public int Busy(SimTime now) => ChannelFreeAt.Count(t => t > now);
}
