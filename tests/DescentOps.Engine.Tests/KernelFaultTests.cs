using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class KernelFaultTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    private static readonly ComponentId Clock = new("clock");

    [Fact]
    public void A_journal_that_cannot_be_written_stops_the_sequential_run_with_its_exception()
    {
        var setup = new KernelSetup([new Ticker(Clock, SimDuration.FromSeconds(1))], 1, SimTime.FromSecondsSinceEpoch(10), new FailingJournalSink());

        var error = Assert.Throws<IOException>(() => SequentialKernel.Run(setup));
        Assert.Equal("journal device full", error.Message);
    }

    [Fact]
    public async Task A_journal_that_cannot_be_written_faults_the_actor_run_instead_of_hanging_it()
    {
        var setup = new KernelSetup([new Ticker(Clock, SimDuration.FromSeconds(1))], 1, SimTime.FromSecondsSinceEpoch(10), new FailingJournalSink());

        var error = await Assert.ThrowsAsync<IOException>(() => ActorKernel.RunAsync(actors.System, setup).WaitAsync(KernelRunner.HangGuard));
        Assert.Equal("journal device full", error.Message);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task An_event_for_an_unknown_component_ends_the_run_with_an_error_that_names_it(KernelKind kind)
    {
        ISimComponent[] components = [new Script(new ComponentId("script"), (SimDuration.FromSeconds(1), new ComponentId("nobody"), "hello"))];

        var error = await Assert.ThrowsAsync<InvalidOperationException>(() => KernelRunner.RunAsync(kind, actors, components, SimTime.MaxValue));
        Assert.Contains("unknown component 'nobody'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_components_with_one_id_are_refused_before_the_run_starts()
    {
        var setup = new KernelSetup([new Recorder(Clock), new Recorder(Clock)], 1, SimTime.MaxValue, new CollectingJournalSink());

        Assert.Throws<ArgumentException>(() => SequentialKernel.Run(setup));
    }
}
