using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Tests;

/// <summary>A fault is a start and one effect of a closed set, each holding only the data its kind needs.</summary>
public sealed class FaultModelTests
{
    private static readonly Type[] EffectTypes = [.. typeof(FaultEffect).GetNestedTypes().Where(t => t is { IsAbstract: false } && t.IsSubclassOf(typeof(FaultEffect)))];

    [Fact]
    public void Every_fault_kind_has_exactly_one_effect_type()
    {
        var kinds = EffectTypes.Select(t => ((FaultEffect)System.Runtime.CompilerServices.RuntimeHelpers.GetUninitializedObject(t)).Kind).ToList();
        Assert.Equal(kinds.Count, kinds.Distinct().Count());
        Assert.Equal(Enum.GetValues<FaultKind>().Order(), kinds.Order());
    }

    [Fact]
    public void No_effect_or_start_can_be_declared_outside_its_closed_set()
    {
        // The base types' only constructors are private (a nested type may call them, nothing else can).
        foreach (var closed in new[] { typeof(FaultEffect), typeof(FaultStart), typeof(FaultEffect.SensorFault) })
        {
            Assert.All(closed.GetConstructors(System.Reflection.BindingFlags.Instance | System.Reflection.BindingFlags.Public | System.Reflection.BindingFlags.NonPublic)
                .Where(c => !(c.GetParameters() is [var p] && p.ParameterType == closed)), // the record's copy constructor
                c => Assert.True(c.IsPrivate || c.IsFamilyAndAssembly, $"{closed.Name} has a constructor open to other assemblies"));
        }
    }

    [Fact]
    public void Each_kind_reads_as_its_effect_with_its_values_in_SI()
    {
        var change = ScenarioLoader.LoadChange(
            """
            add_faults:
              - { name: a, kind: power_dip, at: 1 d, duration: 2 h, remaining_fraction: 0.3 }
              - { name: b, kind: heater_segment_failure, at_depth: 120 m, remaining_fraction: 0.2 }
              - { name: c, kind: tilt_kick, at: 1 d, angle: 3 deg }
              - { name: d, kind: tether_break, at: 2 d }
              - { name: e, kind: spool_jam, at: 2 d }
              - { name: f, kind: relay_failure, at: 2 d, relay: relay-3 }
              - { name: g, kind: station_failure, at: 2 d }
              - { name: h, kind: station_upset, at: 2 d, duration: 2 h }
              - { name: i, kind: vehicle_loss, at: 2 d, vehicle: wisp-1, cause: battery, remaining_fraction: 0.1 }
              - { name: j, kind: sensor_stuck, at: 2 d, point: probe.depth }
              - { name: k, kind: sensor_bias, at: 2 d, point: probe.depth, value: 5 m }
              - { name: l, kind: sensor_noise, mean_interval: 10 d, not_before: 1 d, occurrences: 2, duration: 1 h, point: probe.velocity, value: 0.36 m/h }
              - { name: m, kind: sensor_dropout, when: probe.depth > 100 m, point: probe.tilt }
              - { name: n, kind: clogged_nozzle, at: 2 d, remaining_fraction: 0.5 }
            """, "change.yaml");

        FaultEffect[] expected =
        [
            new FaultEffect.PowerDip(0.3),
            new FaultEffect.HeaterSegmentFailure(0.2),
            new FaultEffect.TiltKick(3 * Math.PI / 180), // a degree is π/180 rad by definition
            new FaultEffect.TetherBreak(),
            new FaultEffect.SpoolJam(),
            new FaultEffect.RelayFailure(3),
            new FaultEffect.StationFailure(),
            new FaultEffect.StationUpset(),
            new FaultEffect.VehicleLoss("wisp-1", VehicleLossCause.Battery, 0.1),
            new FaultEffect.SensorStuck("probe.depth", null),
            new FaultEffect.SensorBias("probe.depth", 5.0),
            new FaultEffect.SensorNoise("probe.velocity", 1e-4), // 0.36 m/h = 0.36/3600 m/s
            new FaultEffect.SensorDropout("probe.tilt"),
            new FaultEffect.CloggedNozzle(0.5),
        ];
        Assert.Equal(expected.Length, change.AddFaults.Count);
        for (var i = 0; i < expected.Length; i++)
        {
            Assert.Equal(expected[i].GetType(), change.AddFaults[i].Effect.GetType());
            if (expected[i] is FaultEffect.TiltKick kick) Assert.Equal(kick.AngleRad, ((FaultEffect.TiltKick)change.AddFaults[i].Effect).AngleRad, 15);
            else if (expected[i] is FaultEffect.SensorNoise noise) Assert.Equal(noise.SigmaSi, ((FaultEffect.SensorNoise)change.AddFaults[i].Effect).SigmaSi, 15);
            else Assert.Equal(expected[i], change.AddFaults[i].Effect);
        }

        Assert.Equal(EffectTypes.Length, expected.Select(e => e.GetType()).Distinct().Count());
        Assert.Equal(new FaultStart.AtTime(86400), change.AddFaults[0].Start);
        Assert.Equal(new FaultStart.AtDepth(120), change.AddFaults[1].Start);
        Assert.Equal(new FaultStart.AtRandom(864000, 86400, 2), change.AddFaults[11].Start);
        var condition = Assert.IsType<FaultStart.OnCondition>(change.AddFaults[12].Start);
        Assert.Equal(("probe.depth > 100 m", 14), (condition.When, condition.WhenAt.Line)); // the 13th fault, on line 14
        Assert.Equal(7200.0, change.AddFaults[0].DurationS);
        Assert.Null(change.AddFaults[1].DurationS);
    }

    [Fact]
    public void A_fault_that_breaks_a_rule_of_its_kind_is_refused_at_its_field_and_builds_nothing()
    {
        var error = Assert.Single(Assert.Throws<ScenarioException>(() => ScenarioLoader.LoadChange(
            """
            add_faults:
              - { name: ok, kind: tether_break, at: 1 d }
              - { name: half, kind: sensor_bias, at: 1 d, point: probe.depth }
            """, "change.yaml")).Errors);
        Assert.Equal(("add_faults[1].value", 3), (error.FieldPath, error.Location.Line));
        Assert.Contains("sensor_bias needs the offset", error.Message);
    }
}
