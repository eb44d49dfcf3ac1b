using DescentOps.Mission.Autonomy;
using DescentOps.Records.Kinds;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests.Autonomy;

/// <summary>
/// What rules can see of the link: the path that carries the frames, as the link tells the probe; and true state that
/// no sensor reports is for fault triggers only.
/// </summary>
public sealed class LinkPathPointTests
{
    private const string Watch = """
          rule on-relays {
            runs on board
            severity low
            when probe.link_path is relays
            then { }
          }
          rule on-none {
            runs on board
            severity medium
            when probe.link_path is none
            then { }
          }
          rule on-fibre {
            runs on board
            severity info
            when probe.link_path is fibre
            then { }
          }

        run:
        """;

    [Fact]
    public async Task An_on_board_rule_sees_the_frames_move_to_the_relays_at_the_first_frame_after_the_fibre_shears()
    {
        var scenario = TestScenario.BuiltIn("tether-break-relays.yaml").Named("watch.yaml").InsertBefore("\nrun:\n", "\n" + Watch.Replace("\nrun:", "", StringComparison.Ordinal)).Load();
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        var broken = Assert.Single(sink.OfKind(TetherRecords.Broken)).Time;
        var fired = sink.OfKind(RuleRecords.Fired).ToList();
        var fibre = Assert.Single(fired, r => CollectingSink.TextField(r, "rule") == "on-fibre");
        var onRelays = fired.Where(r => CollectingSink.TextField(r, "rule") == "on-relays").ToList();
        var none = Assert.Single(fired, r => CollectingSink.TextField(r, "rule") == "on-none");
        Assert.True(fibre.Time < broken);
        // The scenario's story: relays from the shear; none while relay-5 is out (18 h from 2460 m); relays again after.
        Assert.Equal(2, onRelays.Count);
        Assert.True(onRelays[0].Time < none.Time && none.Time < onRelays[1].Time);
        var relays = onRelays[0];
        // The scenario's frames come every telemetry interval; the first one sampled after the break reports the relays.
        var interval = Primitives.Time.SimDuration.FromSeconds(scenario.Probe.TelemetryIntervalS);
        Assert.InRange(relays.Time.Ticks, broken.Ticks, (broken + interval).Ticks);
        Assert.Contains("probe.link_path=relays", CollectingSink.TextField(relays, "evidence"));
    }

    [Fact]
    public void True_state_is_refused_in_a_rule_and_read_by_a_fault_trigger()
    {
        var rule = MissionHarness.Edited(("\nrun:\n", """

            rules: |
              rule drifting {
                runs on ground
                severity low
                when probe.lateral_drift above 5 m
                then { }
              }

            run:

            """));
        var error = Assert.Single(MissionRules.Check(rule).Errors);
        Assert.Equal(Rules.Text.DiagnosticCode.TrueStateOnly, error.Code);

        var trigger = MissionHarness.Edited(("    remaining_fraction: 0.7\n", "    remaining_fraction: 0.7\n  - name: drift-trip\n    kind: power_dip\n    when: probe.lateral_drift above 5 m\n    duration: 1 h\n    remaining_fraction: 0.5\n"));
        Assert.Empty(DescentOps.Mission.Faults.FaultConditions.Check(trigger, out var compiled));
        Assert.Single(compiled);
    }

    [Fact]
    public void With_onboard_sampling_an_on_board_rule_cannot_read_the_link_path()
    {
        var scenario = MissionHarness.Edited(("\nrun:\n", "\nonboard_sampling:\n  interval: 1 min\n\nrules: |\n  autonomy E3\n" + Watch.Replace("\nrun:", "") + "\nrun:\n"));
        var errors = MissionRules.Check(scenario).Errors;
        Assert.NotEmpty(errors);
        Assert.All(errors, e => Assert.Contains("probe.link_path", e.Message));
    }
}
