using DescentOps.Engine.Components;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class CancellationTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    private static readonly ComponentId Dog = new("watchdog");
    private static readonly ComponentId Stimulus = new("script");

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task An_armed_timer_fires_when_nothing_cancels_it(KernelKind kind)
    {
        // The control for the test below: the same watchdog without a disarm does fire, at T+10 s.
        var (result, journal) = await KernelRunner.RunAsync(kind, actors, [new Watchdog(Dog, SimDuration.FromSeconds(10))], SimTime.MaxValue);

        Assert.Equal(["10000000|watchdog|watchdog.fired|Warning|"], journal);
        Assert.Equal(new SimTime(10_000_000), result.FinalTime);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_timer_cancelled_by_a_later_event_never_fires(KernelKind kind)
    {
        ISimComponent[] components =
        [
            new Watchdog(Dog, SimDuration.FromSeconds(10)),
            new Script(Stimulus, (SimDuration.FromSeconds(5), Dog, Watchdog.Disarm.Instance)),
        ];

        var (result, journal) = await KernelRunner.RunAsync(kind, actors, components, SimTime.MaxValue);

        Assert.Equal(["5000000|watchdog|watchdog.disarmed|Info|"], journal);
        // Nothing was left after the disarm at T+5 s: the cancelled timeout did not even move time on.
        Assert.Equal(new SimTime(5_000_000), result.FinalTime);
        Assert.Equal(2L + 1L, result.EventsDelivered); // two starts and the disarm
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_timer_scheduled_and_cancelled_in_the_same_handling_never_fires(KernelKind kind)
    {
        var (_, journal) = await KernelRunner.RunAsync(kind, actors, [new SelfCancellingTimer(new ComponentId("timer"))], SimTime.MaxValue);

        // Only the kept timer at T+2 s; the regretted one at T+1 s was cancelled before it was ever committed.
        Assert.Equal(["2000000|timer|timer.fired|Info|name=kept"], journal);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task Cancelling_another_components_event_is_refused_and_the_event_still_fires(KernelKind kind)
    {
        var meddler = new ComponentId("meddler");
        ISimComponent[] components = [new Watchdog(Dog, SimDuration.FromSeconds(10), showHandleTo: meddler), new Meddler(meddler)];

        var (result, journal) = await KernelRunner.RunAsync(kind, actors, components, SimTime.MaxValue);

        Assert.Equal(2, journal.Count);
        Assert.StartsWith("1000000|meddler|component.failed|Alarm|exception=InvalidOperationException,message=meddler may cancel only its own events", journal[0]);
        Assert.Equal("10000000|watchdog|watchdog.fired|Warning|", journal[1]);
        Assert.Equal(1, result.ComponentFailures);
    }
}
