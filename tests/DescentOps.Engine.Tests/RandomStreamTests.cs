using DescentOps.Engine.Randomness;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class RandomStreamTests
{
    private static readonly ComponentId Probe = new("probe");

    // Seeds 42, 43, 7 and 5 are arbitrary; 16 uniform draws make an accidental match of two streams impossible
    // in practice (each draw has 2^53 values), while 100 rounds of each distribution cover their rejection loops.
    private static double[] Draws(long seed, ComponentId id, int count = 16)
    {
        var stream = new RandomStream(seed, id);
        return [.. Enumerable.Range(0, count).Select(_ => stream.NextUniform())];
    }

    [Fact]
    public void The_same_seed_and_id_give_the_same_draws()
    {
        Assert.Equal(Draws(42, Probe), Draws(42, new ComponentId("probe")));
        Assert.Equal(RandomStream.DeriveSeed(42, Probe), new RandomStream(42, Probe).DerivedSeed);
    }

    [Fact]
    public void A_different_id_or_seed_gives_different_draws()
    {
        Assert.NotEqual(Draws(42, Probe), Draws(42, new ComponentId("tether")));
        Assert.NotEqual(Draws(42, Probe), Draws(43, Probe));
    }

    [Fact]
    public void Every_distribution_repeats_for_the_same_seed_and_id()
    {
        var a = new RandomStream(7, Probe);
        var b = new RandomStream(7, Probe);
        for (var i = 0; i < 100; i++)
        {
            Assert.Equal(a.NextInt(0, 1000), b.NextInt(0, 1000));
            Assert.Equal(a.NextNormal(0, 1), b.NextNormal(0, 1));
            Assert.Equal(a.NextExponential(2), b.NextExponential(2));
            Assert.Equal(a.NextPoisson(3), b.NextPoisson(3));
        }
    }

    [Fact]
    public void Adding_a_component_does_not_change_another_components_draws()
    {
        var alone = new CollectingJournalSink();
        var together = new CollectingJournalSink();
        SequentialKernel.Run(new KernelSetup([new Drawer(Probe, 10)], 5, SimTime.MaxValue, alone));
        SequentialKernel.Run(new KernelSetup([new Drawer(new ComponentId("alpha"), 10), new Drawer(Probe, 10)], 5, SimTime.MaxValue, together));

        var probeLines = together.Lines.Where(l => l.Contains("|probe|", StringComparison.Ordinal)).ToArray();
        Assert.Equal(10, alone.Lines.Count);
        Assert.Equal(alone.Lines, probeLines);
        // The other drawer drew too, and not the probe's numbers: otherwise the comparison above is hollow.
        var alphaDraws = together.Lines.Where(l => l.Contains("|alpha|", StringComparison.Ordinal)).Select(l => l.Split('|')[^1]);
        Assert.NotEqual(probeLines.Select(l => l.Split('|')[^1]), alphaDraws);
    }
}
