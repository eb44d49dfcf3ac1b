using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class ZeroDelayChainTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_chain_of_fifty_zero_delay_hops_happens_at_one_instant_in_hop_order(KernelKind kind)
    {
        const int hops = 50;
        var ring = Enumerable.Range(0, 4).Select(i => new ComponentId($"relay-{i}")).ToArray();
        var components = new List<ISimComponent>();
        for (var i = 0; i < ring.Length; i++) components.Add(new Relay(ring[i], ring[(i + 1) % ring.Length], hops));
        var start = SimDuration.FromSeconds(3);
        components.Add(new Script(new ComponentId("script"), (start, ring[0], new Relay.Hop(1))));

        var (result, journal) = await KernelRunner.RunAsync(kind, actors, components, SimTime.MaxValue);

        // Hop n is handled by relay-((n-1) mod 4), all at T+3 s = 3,000,000 ticks.
        var expected = Enumerable.Range(1, hops).Select(n => $"3000000|relay-{(n - 1) % 4}|relay.hop|Debug|n={n}");
        Assert.Equal(expected, journal);
        Assert.Equal(new SimTime(3_000_000), result.FinalTime);
        // One round for the starts at the epoch, then one per hop: each zero-delay hop waits for the commit of the one before.
        Assert.Equal(1 + hops, result.Rounds);
        Assert.Equal(RunOutcomeKind.Quiescent, result.Outcome.Kind);
    }
}
