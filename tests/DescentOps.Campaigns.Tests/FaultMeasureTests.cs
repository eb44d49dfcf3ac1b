using DescentOps.Records;
using DescentOps.Mission.Running;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using Xunit;

namespace DescentOps.Campaigns.Tests;

/// <summary>Fault measures fed with hand-made records: each number below is laid out in the test.</summary>
public sealed class FaultMeasureTests
{
    private static readonly ComponentId Probe = new("probe");
    private const double Hour = 3600;

    private static JournalRecord Injected(double t, string kind, string point = "") =>
        new(SimTime.FromSecondsSinceEpoch(t), new ComponentId("fault-injector"), "fault.injected", Severity.Alarm,
            [RecordField.Of("fault", "f"), RecordField.Of("kind", kind), RecordField.Of("target", "probe"), RecordField.Of("point", point)]);

    private static JournalRecord Frame(double t, string regime, double speed, double tilt = 0) =>
        new(SimTime.FromSecondsSinceEpoch(t), Probe, "probe.telemetry", Severity.Info,
            [RecordField.Of("depth_m", 100.0), RecordField.Of("velocity_m_s", speed), RecordField.Of("tilt_rad", tilt), RecordField.Of("regime", regime)]);

    private static JournalRecord Fired(double t, string rule) =>
        new(SimTime.FromSecondsSinceEpoch(t), new ComponentId("autonomy"), "rule.fired", Severity.Warning, [RecordField.Of("rule", rule)]);

    [Fact]
    public void A_probe_stopped_46_hours_does_not_recover_on_a_tenth_of_an_hour_of_melting()
    {
        var measures = new FaultMeasures();
        measures.Observe(Frame(0, "Melting", 2.6e-4));
        measures.Observe(Injected(0, "PowerDip"));
        var t = 0.0;
        for (; t < 46 * Hour; t += 600) measures.Observe(Frame(t + 600, "Stopped", 0));
        measures.Observe(Frame(t + 360, "Melting", 2.6e-4)); // 0.1 h of melting
        t += 360;
        measures.Observe(Frame(t + 600, "Stopped", 0));
        Assert.Null(Assert.Single(measures.Measures()).RecoveredAfterS);

        // Melting again from t + 1200 s for more than the 6 h hold: recovered, dated from when the good stretch began.
        var began = t + 1200;
        for (var s = began; s <= began + (6 * Hour); s += 600) measures.Observe(Frame(s, "Melting", 2.6e-4));
        Assert.Equal(began, Assert.Single(measures.Measures()).RecoveredAfterS!.Value, 6);
    }

    [Fact]
    public void A_permanent_tether_break_never_recovers_even_when_relays_carry_the_frames()
    {
        var measures = new FaultMeasures();
        measures.Observe(Injected(10 * Hour, "TetherBreak"));
        measures.Observe(new JournalRecord(SimTime.FromSecondsSinceEpoch(11 * Hour), new ComponentId("tether"), "relay.path_up", Severity.Notice, []));
        for (var t = 11 * Hour; t < 100 * Hour; t += 600) measures.Observe(Frame(t, "Melting", 2.6e-4));
        var measure = Assert.Single(measures.Measures());
        Assert.Null(measure.RecoveredAfterS);
        Assert.True(measure.HasRecoveryMeasure);
    }

    [Fact]
    public void A_rule_about_something_else_does_not_detect_the_fault()
    {
        var rules = new Dictionary<string, IReadOnlyList<string>>
        {
            ["tilt-watch"] = ["probe.tilt"],
            ["slow-melt"] = ["probe.velocity"],
            ["named"] = ["probe.ice_temperature"],
        };
        var measures = new FaultMeasures(rules, new Dictionary<string, IReadOnlyList<string>>());
        measures.Observe(Injected(0, "PowerDip"));
        measures.Observe(Fired(600, "tilt-watch"));
        measures.Observe(Fired(1200, "slow-melt"));
        Assert.Equal(1200, Assert.Single(measures.Measures()).DetectedAfterS!.Value, 6);

        var named = new FaultMeasures(rules, new Dictionary<string, IReadOnlyList<string>> { ["f"] = ["named"] });
        named.Observe(Injected(0, "SensorStuck", "probe.depth"));
        named.Observe(Fired(600, "slow-melt"));
        named.Observe(Fired(1800, "named"));
        Assert.Equal(1800, Assert.Single(named.Measures()).DetectedAfterS!.Value, 6);
    }
}
