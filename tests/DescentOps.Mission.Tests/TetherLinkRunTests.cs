using DescentOps.Scenarios.Model;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Mission.Tests;

/// <summary>The fibre's budget decides, frame by frame, whether the link carries; held frames go when it closes.</summary>
public sealed class TetherLinkRunTests
{
    [Fact]
    public async Task A_fibre_whose_budget_closes_only_once_the_pack_loss_shrinks_holds_the_first_frames_and_then_sends_them_all()
    {
        var scenario = MissionHarness.Edited(
            ("  signal_speed: 2.04e8 m/s\n", "  signal_speed: 2.04e8 m/s\n  pack_loss: 8\n  buffer_frames: 20000\n"),
            ("  until: 400 d", "  until: 40 d"));
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        // Computed, defaults otherwise (1000BASE-LX −11 dBm and −19 dBm, 0.35 dB/km, two connectors × 0.3 dB, margin ≥ 0),
        // 3.2 km spool: margin(x) = −11 − (0.35·x/1000 + 0.6 + 8·(1 − x/3200)) + 19 = −0.6 + 0.00215·x dB, so the link is
        // down from the first frame (−0.6 dB) and closes at x = 0.6 / 0.00215 = 279.07 m.
        var down = sink.OfKind("tether.link_down").Single();
        Assert.Equal(-0.6, CollectingSink.Field(down, "margin_db"), 9);
        var up = sink.OfKind("tether.link_up").Single();
        var closesAtM = 0.6 / 0.00215;
        Assert.InRange(CollectingSink.Field(up, "paid_out_m"), closesAtM, closesAtM + 1.0); // a frame's descent is well under 1 m
        Assert.InRange(CollectingSink.Field(up, "margin_db"), 0.0, 0.00215 * 1.0);

        // Nothing is lost: every frame made before the link closed waited and went home, in order, once it did.
        Assert.Empty(sink.OfKind("data.lost"));
        Assert.Empty(sink.OfKind("ground.gap"));
        var heldFrames = sink.OfKind("probe.telemetry").Count(r => r.Time < up.Time);
        Assert.True(heldFrames > 100);
        Assert.True(sink.OfKind("ground.telemetry").First().Time > up.Time);
        Assert.Equal(1, CollectingSink.IntegerField(sink.OfKind("ground.telemetry").First(), "frame"));
        var peak = sink.OfKind("probe.telemetry").Max(r => CollectingSink.Field(r, "buffer_fill"));
        // The probe reports the fill one frame late: the frame whose payout closes the link still shows every earlier one held.
        Assert.Equal(heldFrames / 20000.0, peak, 12);
    }

    [Fact]
    public void The_buffer_fill_is_a_point_a_sensor_fault_may_name()
    {
        var scenario = MissionHarness.Edited(("run:\n", "  - name: fill-stuck\n    kind: sensor_stuck\n    point: probe.buffer_fill\n    value: 0.5\n    at: 2 d\nrun:\n"));
        Assert.Equal(new FaultEffect.SensorStuck("probe.buffer_fill", 0.5), scenario.Faults.Single(f => f.Name == "fill-stuck").Effect);
        var percent = MissionHarness.Edited(("run:\n", "  - name: fill-stuck\n    kind: sensor_stuck\n    point: probe.buffer_fill\n    value: 50 %\n    at: 2 d\nrun:\n"));
        Assert.Equal(0.5, Assert.IsType<FaultEffect.SensorStuck>(percent.Faults.Single(f => f.Name == "fill-stuck").Effect).ValueSi!.Value, 12);
        var wrong = Assert.Throws<ScenarioException>(() => MissionHarness.Edited(("run:\n", "  - name: fill-stuck\n    kind: sensor_stuck\n    point: probe.buffer_fill\n    value: 3 m\n    at: 2 d\nrun:\n")));
        Assert.Contains("ratio", Assert.Single(wrong.Errors).Message);
    }
}
