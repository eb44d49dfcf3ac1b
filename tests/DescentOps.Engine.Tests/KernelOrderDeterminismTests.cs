using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class KernelOrderDeterminismTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    // 8 nodes x 6 tokens x (40 hops + the first pass): about 2,000 token events plus timers per run, enough
    // for thousands of tied instants yet a fraction of a second per run.
    private const int Nodes = 8;
    private const int TokensPerNode = 6;
    private const int Hops = 40;
    private const long Seed = 77; // any seed; the one below it must merely differ

    private static IReadOnlyList<ISimComponent> Mesh()
    {
        var ids = Enumerable.Range(0, Nodes).Select(i => new ComponentId($"node-{i}")).ToArray();
        // workFactor = i^2: node-7 burns 49 times the work of node-1 and node-0 none, so finishing order varies.
        return [.. ids.Select((id, i) => (ISimComponent)new MeshNode(id, ids, i * i, TokensPerNode, Hops))];
    }

    [Fact]
    public async Task The_actor_kernel_writes_the_same_journal_as_the_sequential_kernel_on_every_one_of_twenty_runs()
    {
        var reference = new CollectingJournalSink();
        var expected = SequentialKernel.Run(new KernelSetup(Mesh(), Seed, SimTime.MaxValue, reference));

        // The model must really be tie-heavy, or this test would prove nothing about tie breaking:
        // fewer rounds than events means instants with several events each.
        Assert.True(expected.EventsDelivered > 2 * expected.Rounds, $"{expected.EventsDelivered} events in {expected.Rounds} rounds");
        Assert.Equal(RunOutcomeKind.Quiescent, expected.Outcome.Kind);

        for (var run = 0; run < 20; run++)
        {
            var sink = new CollectingJournalSink();
            var result = await ActorKernel.RunAsync(actors.System, new KernelSetup(Mesh(), Seed, SimTime.MaxValue, sink))
                .WaitAsync(KernelRunner.HangGuard);

            Assert.Equal(expected, result);
            Assert.Equal(reference.Lines, sink.Lines);
        }
    }

    [Fact]
    public void A_different_seed_gives_a_different_journal()
    {
        // Guards the test above against a model whose journal does not depend on the draws at all.
        var a = new CollectingJournalSink();
        var b = new CollectingJournalSink();
        SequentialKernel.Run(new KernelSetup(Mesh(), Seed, SimTime.MaxValue, a));
        SequentialKernel.Run(new KernelSetup(Mesh(), Seed + 1, SimTime.MaxValue, b));

        Assert.NotEqual(a.Lines, b.Lines);
    }
}
