using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests.Autonomy;

/// <summary>
/// The rules' state follows the component's state: handling the same message from the same state twice, as the kernel
/// does after rolling back a failed handling, gives the same outputs, although the evaluator ran on in between.
/// </summary>
public sealed class RuleRollbackTests
{
    private static TelemetryFrame Frame(long sequence, double tiltDeg) =>
        new(sequence, SimTime.FromSecondsSinceEpoch(600 * sequence), "Melting", [("probe.tilt", tiltDeg * Math.PI / 180)], 100, 0);

    private static ComponentContext At(TelemetryFrame frame) =>
        ComponentContext.Detached(MissionIds.Autonomy, new RandomStream(1, MissionIds.Autonomy), frame.SampledAt);

    [Fact]
    public void Handling_a_frame_again_from_the_committed_state_repeats_the_first_outcome()
    {
        // tilt-steering.yaml: counter-steer fires when the tilt is above 2 deg for 2 samples.
        var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text("tilt-steering.yaml"), "builtin:tilt-steering.yaml");
        var autonomy = new OnboardAutonomyComponent(MissionRules.Compile(scenario));
        Assert.Equal(FailurePolicy.RestartFromLastState, autonomy.FailurePolicy);

        var first = Frame(1, 3);
        var afterFirst = autonomy.Handle(autonomy.InitialState, first, At(first));

        var second = Frame(2, 3);
        var firstTry = At(second);
        var afterSecond = autonomy.Handle(afterFirst, second, firstTry);
        Assert.Contains(firstTry.Records, r => r.Kind == "rule.fired");

        // A third frame moves the evaluator on; then the kernel rolls back to the state after the first frame.
        var third = Frame(3, 3);
        autonomy.Handle(afterSecond, third, At(third));
        var retry = At(second);
        var afterRetry = autonomy.Handle(afterFirst, second, retry);

        Assert.Equal(firstTry.Records.Select(r => (r.Kind, string.Join(",", r.Fields))), retry.Records.Select(r => (r.Kind, string.Join(",", r.Fields))));
        Assert.Equal(firstTry.Scheduled.Select(e => (e.Key.Time, e.Target, e.Payload.ToString())), retry.Scheduled.Select(e => (e.Key.Time, e.Target, e.Payload.ToString())));
        Assert.Equal(afterSecond.RulesVersion, afterRetry.RulesVersion);
    }
}
