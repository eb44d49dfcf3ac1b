using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class StopConditionTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    private static readonly ComponentId Clock = new("clock");

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_run_that_reaches_its_time_limit_ends_exactly_at_the_limit(KernelKind kind)
    {
        var limit = SimTime.FromSecondsSinceEpoch(10.5);

        var (result, journal) = await KernelRunner.RunAsync(kind, actors, [new Ticker(Clock, SimDuration.FromSeconds(1))], limit);

        Assert.Equal(RunOutcomeKind.TimeLimit, result.Outcome.Kind);
        Assert.Equal(limit, result.FinalTime);
        Assert.Equal(limit, result.Outcome.Time);
        Assert.Equal(11, journal.Count); // ticks at T+0, 1, ..., 10 s; the one at T+11 s is past the limit
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task An_event_exactly_at_the_limit_is_still_delivered(KernelKind kind)
    {
        var (result, journal) = await KernelRunner.RunAsync(kind, actors, [new Ticker(Clock, SimDuration.FromSeconds(1))], SimTime.FromSecondsSinceEpoch(10));

        Assert.Equal("10000000|clock|ticker.tick|Debug|n=10", journal[^1]);
        Assert.Equal(RunOutcomeKind.TimeLimit, result.Outcome.Kind);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_run_with_nothing_left_to_do_ends_quiescent_at_its_last_event(KernelKind kind)
    {
        var target = new ComponentId("recorder");
        ISimComponent[] components =
        [
            new Recorder(target),
            new Script(new ComponentId("script"), (SimDuration.FromSeconds(1), target, "a"), (SimDuration.FromSeconds(4), target, "b")),
        ];

        var (result, journal) = await KernelRunner.RunAsync(kind, actors, components, SimTime.FromSecondsSinceEpoch(100));

        Assert.Equal(["1000000|recorder|recorder.got|Info|message=a", "4000000|recorder|recorder.got|Info|message=b"], journal);
        Assert.Equal(RunOutcomeKind.Quiescent, result.Outcome.Kind);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(4), result.FinalTime);
        Assert.Equal(4L, result.EventsDelivered); // two starts, two messages
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_component_that_stops_the_run_ends_it_after_committing_that_instant(KernelKind kind)
    {
        ISimComponent[] components =
        [
            new Ticker(Clock, SimDuration.FromSeconds(1), stopAtTick: 5),
            new Ticker(new ComponentId("second-clock"), SimDuration.FromSeconds(1)),
        ];

        var (result, journal) = await KernelRunner.RunAsync(kind, actors, components, SimTime.FromSecondsSinceEpoch(100));

        Assert.Equal(RunOutcomeKind.Completed, result.Outcome.Kind);
        Assert.Equal("tick 5 reached", result.Outcome.Reason);
        Assert.Equal(SimTime.FromSecondsSinceEpoch(5), result.FinalTime);
        // Both clocks tick at T+0..5 s: 12 records; the instant of the stop is committed whole, nothing after it.
        Assert.Equal(12, journal.Count);
        Assert.Equal("5000000|second-clock|ticker.tick|Debug|n=5", journal[^1]);
    }
}
