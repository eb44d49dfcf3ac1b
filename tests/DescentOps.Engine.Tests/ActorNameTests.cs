using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class ActorNameTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    [Theory]
    [InlineData("vehicle/2")] // '/' separates actor path elements
    [InlineData("probe#1")] // '#' starts an actor path's uid
    [InlineData("probe?x")] // '?' is outside the characters Akka allows
    [InlineData("sonde-ä")] // non-ASCII
    public async Task A_component_id_that_is_no_valid_actor_name_runs_in_the_actor_kernel_as_in_the_sequential_one(string name)
    {
        // ComponentId allows any name without whitespace, so both kernels must accept every such name.
        var target = new ComponentId(name);
        ISimComponent[] Model() =>
        [
            new Recorder(target),
            new Script(new ComponentId("script"), (SimDuration.FromSeconds(1), target, "ping")),
        ];

        var (sequential, expected) = await KernelRunner.RunAsync(KernelKind.Sequential, actors, Model(), SimTime.MaxValue);
        var (actor, journal) = await KernelRunner.RunAsync(KernelKind.Actor, actors, Model(), SimTime.MaxValue);

        Assert.Equal([$"1000000|{name}|recorder.got|Info|message=ping"], expected);
        Assert.Equal(expected, journal);
        Assert.Equal(sequential, actor);
        Assert.Equal(RunOutcomeKind.Quiescent, actor.Outcome.Kind);
    }

    [Fact]
    public async Task Two_actor_runs_can_share_one_actor_system_at_the_same_time()
    {
        var target = new ComponentId("recorder");
        ISimComponent[] Model() => [new Recorder(target), new Script(new ComponentId("script"), (SimDuration.FromSeconds(1), target, "ping"))];

        var first = ActorKernel.RunAsync(actors.System, new KernelSetup(Model(), 1, SimTime.MaxValue, new CollectingJournalSink()));
        var second = ActorKernel.RunAsync(actors.System, new KernelSetup(Model(), 1, SimTime.MaxValue, new CollectingJournalSink()));
        var results = await Task.WhenAll(first, second).WaitAsync(KernelRunner.HangGuard);

        Assert.Equal(results[0], results[1]);
    }
}
