using DescentOps.Engine.Components;
using DescentOps.Engine.Randomness;
using DescentOps.Mission.Autonomy;
using DescentOps.Mission.Messages;
using DescentOps.Primitives.Time;
using DescentOps.Records;
using DescentOps.Records.Kinds;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests.Autonomy;

/// <summary>
/// The one severity vocabulary from rule to record, as DEVELOPERS.md and LANGUAGE.md state it: a rule's
/// <c>severity</c> becomes the severity of the <c>rule.fired</c> record it writes (info → info, low → notice,
/// medium → warning, high → alarm), so <c>events --severity</c> and the report's notable list read the same words.
/// </summary>
public sealed class RuleSeverityRecordTests
{
    [Theory]
    [InlineData("info", Severity.Info)]
    [InlineData("low", Severity.Notice)]
    [InlineData("medium", Severity.Warning)]
    [InlineData("high", Severity.Alarm)]
    public void A_firing_is_recorded_at_the_severity_its_rule_states(string ruleSeverity, Severity recorded)
    {
        var text = BuiltInScenarios.Text("tilt-steering.yaml").Replace("severity high", "severity " + ruleSeverity, StringComparison.Ordinal);
        var scenario = ScenarioLoader.LoadText(text, "builtin:tilt-steering.yaml (severity " + ruleSeverity + ")");
        var autonomy = new OnboardAutonomyComponent(MissionRules.Compile(scenario));

        // counter-steer fires when the tilt is above 2 deg for 2 samples: two frames at 3 deg.
        var state = autonomy.InitialState;
        var fired = new List<JournalRecord>();
        for (long sequence = 1; sequence <= 2; sequence++)
        {
            var frame = new TelemetryFrame(sequence, SimTime.FromSecondsSinceEpoch(600 * sequence), "Melting", [("probe.tilt", 3 * Math.PI / 180)], 100, 0);
            var context = ComponentContext.Detached(MissionIds.Autonomy, new RandomStream(1, MissionIds.Autonomy), frame.SampledAt);
            state = autonomy.Handle(state, frame, context);
            fired.AddRange(context.Records.Where(r => r.Kind == RuleRecords.Fired));
        }

        var firing = Assert.Single(fired);
        Assert.Equal(recorded, firing.Severity);
    }
}
