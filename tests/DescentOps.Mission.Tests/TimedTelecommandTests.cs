using DescentOps.Primitives.Time;
using DescentOps.Records.Kinds;

namespace DescentOps.Mission.Tests;

/// <summary>
/// Time-tagged telecommands: one the ground sends at its time reaches the probe exactly one uplink later (light time,
/// the station's forwarding, the fibre paid out when it arrives at the surface end); one stored on board is executed at
/// its time. The expected delays are computed here from the default scenario's own figures, not read from the run.
/// </summary>
public sealed class TimedTelecommandTests
{
    // 2 d 00:30 for the ground command, 2 d 06:00 for the stored one: neither on a 10-min frame instant.
    private const double GroundAtS = 2 * 86400 + 1800;
    private const double BoardAtS = 2 * 86400 + 6 * 3600 + 7;

    private const string Block = """
        telecommands:
          - { at: 48.5 h, from: ground, send: "probe.wall set_power(power = 1 kW)" }
          - { at: 194407 s, from: board, send: probe.head set_power(power = 5 kW) }

        run:
        """;

    private static DescentOps.Scenarios.Model.Scenario Scenario() =>
        MissionHarness.Edited(("\nrun:\n", "\n" + Block + "\n"), ("until: 400 d", "until: 3 d"));

    [Fact]
    public async Task A_ground_telecommand_executes_one_uplink_delay_after_its_time()
    {
        var scenario = Scenario();
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        var sent = Assert.Single(sink.OfKind(CommandRecords.Sent));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(GroundAtS), sent.Time);
        Assert.Equal("telecommands[0]", CollectingSink.TextField(sent, "origin"));

        // The path, from the default scenario: 1.08e9 km at the speed of light (CODATA c = 299,792,458 m/s), the
        // station's 2 s forwarding delay, then the fibre paid out when the command reaches the surface end, at
        // 2.04e8 m/s. Each leg is scheduled in whole microsecond ticks, so each is rounded as the kernel rounds it.
        var light = SimDuration.FromSeconds(1.08e12 / 299_792_458.0);
        var forwarding = SimDuration.FromSeconds(2.0);
        var atSurfaceEnd = SimTime.FromSecondsSinceEpoch(GroundAtS) + light + forwarding;
        var paidOutM = sink.OfKind(ProbeRecords.Telemetry).Where(r => r.Time <= atSurfaceEnd).Max(r => CollectingSink.Field(r, "depth_m"));
        Assert.InRange(paidOutM, 1.0, 2500.0); // the probe is in the ice by day 2
        var expected = light + forwarding + SimDuration.FromSeconds(paidOutM / 2.04e8);

        var executed = Assert.Single(sink.OfKind(CommandRecords.Executed), r => CollectingSink.TextField(r, "origin") == "telecommands[0]");
        Assert.Equal(SimTime.FromSecondsSinceEpoch(GroundAtS) + expected, executed.Time);
        Assert.Equal("ground", CollectingSink.TextField(executed, "placement"));
        Assert.Equal(1000.0, CollectingSink.Field(executed, "wall_setpoint_w"));
        Assert.Equal(expected.TotalSeconds, CollectingSink.Field(executed, "latency_s"), 6);
    }

    [Fact]
    public async Task A_stored_telecommand_executes_at_its_time()
    {
        var (_, sink) = await MissionHarness.RunAsync(Scenario());

        var released = Assert.Single(sink.OfKind(CommandRecords.Released));
        Assert.Equal(SimTime.FromSecondsSinceEpoch(BoardAtS), released.Time);
        var executed = Assert.Single(sink.OfKind(CommandRecords.Executed), r => CollectingSink.TextField(r, "origin") == "telecommands[1]");
        Assert.Equal(SimTime.FromSecondsSinceEpoch(BoardAtS), executed.Time);
        Assert.Equal(("board", 0.0, 5000.0), (CollectingSink.TextField(executed, "placement"), CollectingSink.Field(executed, "latency_s"), CollectingSink.Field(executed, "head_setpoint_w")));
    }

    [Fact]
    public async Task Without_telecommands_nothing_is_sent_or_released()
    {
        var (_, sink) = await MissionHarness.RunAsync(MissionHarness.Edited(("until: 400 d", "until: 3 d")));
        Assert.Empty(sink.OfKind(CommandRecords.Sent));
        Assert.Empty(sink.OfKind(CommandRecords.Released));
    }

    [Theory]
    [InlineData("probe.wall set_power(power = 1 m)", "UnitMismatch")]
    [InlineData("probe.wall set_power(power = 99 kW)", "ArgumentOutOfRange")]
    [InlineData("probe.tail wag", "UnknownCommand")]
    [InlineData("probe.wall set_power(power = 1 kW) extra", "UnexpectedToken")]
    public void A_bad_telecommand_is_refused_at_its_place_in_the_file(string send, string code)
    {
        var scenario = MissionHarness.Edited(("\nrun:\n", $"\ntelecommands:\n  - at: 1 d\n    from: ground\n    send: {send}\n\nrun:\n"));
        var error = Assert.Single(DescentOps.Mission.Autonomy.MissionTimeline.Errors(scenario));
        Assert.Equal("telecommands[0].send", error.FieldPath);
        Assert.StartsWith(code + ":", error.Message);
        var lines = scenario.SourceText.Split('\n');
        Assert.StartsWith("    send: ", lines[error.Location.Line - 1]);
        Assert.True(error.Location.Column >= "    send: ".Length + 1);
    }
}
