using DescentOps.Engine.Components;
using DescentOps.Engine.Running;
using DescentOps.Engine.Tests.Models;
using DescentOps.Engine.Tests.Support;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Tests;

public sealed class SupervisionTests(ActorSystemFixture actors) : IClassFixture<ActorSystemFixture>
{
    private static readonly ComponentId Counter = new("counter");

    /// <summary>A counter and a script that bumps it at T+1 s, T+2 s, ... failing where <paramref name="fails"/> says.</summary>
    private static ISimComponent[] Model(FailurePolicy policy, int maxRestarts, params bool[] fails) =>
    [
        new FlakyCounter(Counter, policy, maxRestarts),
        new Script(
            new ComponentId("script"),
            [.. fails.Select((fail, i) => (SimDuration.FromSeconds(i + 1), Counter, (object)new FlakyCounter.Bump(fail)))]),
    ];

    private static string Failed(long ticks, int value, int failures, string decision) =>
        $"{ticks}|counter|component.failed|Alarm|exception=InvalidOperationException,message=injected fault at value {value},event_from=script,failures={failures},decision={decision}";

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_restarted_component_is_logged_as_failed_and_carries_on_from_its_last_committed_state(KernelKind kind)
    {
        var (result, journal) = await KernelRunner.RunAsync(kind, actors, Model(FailurePolicy.RestartFromLastState, 3, false, true, false), SimTime.MaxValue);

        // T+1: value 1; its echo comes at T+2, before the failing bump because "counter" < "script".
        // The failing bump at T+2 computed value 2, journaled it and scheduled an echo: none of that may survive.
        // T+3: value 2 again, proving the state went back to 1 and not to the half-done 2; its echo at T+4.
        Assert.Equal(
            [
                "1000000|counter|counter.value|Info|value=1",
                "2000000|counter|counter.echo|Info|value=1",
                Failed(2_000_000, 2, 1, "restart-from-last-state"),
                "3000000|counter|counter.value|Info|value=2",
                "4000000|counter|counter.echo|Info|value=2",
            ],
            journal);
        Assert.Equal(RunOutcomeKind.Quiescent, result.Outcome.Kind);
        Assert.Equal(1, result.ComponentFailures);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_component_that_fails_more_often_than_its_restart_budget_ends_the_run_as_failed(KernelKind kind)
    {
        // maxRestarts 1: the first failure (T+1) is restarted, the second (T+2) exceeds the budget.
        var (result, journal) = await KernelRunner.RunAsync(kind, actors, Model(FailurePolicy.RestartFromLastState, 1, true, true, false), SimTime.MaxValue);

        Assert.Equal([Failed(1_000_000, 1, 1, "restart-from-last-state"), Failed(2_000_000, 1, 2, "abort-run")], journal);
        Assert.Equal(RunOutcomeKind.ComponentFailed, result.Outcome.Kind);
        Assert.Equal(new SimTime(2_000_000), result.Outcome.Time);
        Assert.Equal(new SimTime(2_000_000), result.FinalTime); // the bump at T+3 was never delivered
        Assert.Equal(2, result.ComponentFailures);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_component_with_the_abort_policy_ends_the_run_at_its_first_failure(KernelKind kind)
    {
        var (result, journal) = await KernelRunner.RunAsync(kind, actors, Model(FailurePolicy.AbortRun, 3, false, true, false), SimTime.MaxValue);

        Assert.Equal(
            [
                "1000000|counter|counter.value|Info|value=1",
                "2000000|counter|counter.echo|Info|value=1",
                Failed(2_000_000, 2, 1, "abort-run"),
            ],
            journal);
        Assert.Equal(RunOutcomeKind.ComponentFailed, result.Outcome.Kind);
        Assert.Contains("injected fault at value 2", result.Outcome.Reason, StringComparison.Ordinal);
        Assert.Equal(new SimTime(2_000_000), result.FinalTime);
    }

    [Theory]
    [InlineData(KernelKind.Sequential)]
    [InlineData(KernelKind.Actor)]
    public async Task A_failure_that_no_restart_can_cure_ends_the_run_at_once_even_under_the_restart_policy(KernelKind kind)
    {
        // A model asked outside its validity range would fail the same way after a restart: the run is aborted at the
        // first such failure instead of being restarted and left to idle to its time limit.
        ISimComponent[] model =
        [
            new OutOfRange(Counter),
            new Script(new ComponentId("script"), [(SimDuration.FromSeconds(1), Counter, "go"), (SimDuration.FromSeconds(2), Counter, "go")]),
        ];
        var (result, journal) = await KernelRunner.RunAsync(kind, actors, model, SimTime.MaxValue);

        Assert.Equal(RunOutcomeKind.ComponentFailed, result.Outcome.Kind);
        Assert.Equal(new SimTime(1_000_000), result.Outcome.Time);
        Assert.Equal(1, result.ComponentFailures);
        Assert.Contains("decision=abort-run", Assert.Single(journal), StringComparison.Ordinal);
    }

    private sealed class RangeLeft() : Exception("a model was asked outside its range"), Primitives.Failures.IAbortsRun;

    private sealed class OutOfRange(ComponentId id) : SimComponent<int>(id, FailurePolicy.RestartFromLastState, maxRestarts: 3)
    {
        public override int InitialState => 0;

        public override int Handle(int state, object message, ComponentContext context) =>
            message is RunStarted ? state : throw new RangeLeft();
    }
}
