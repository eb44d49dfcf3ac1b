using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>
/// With a power system on the probe, a docked vehicle's charger is a load on the probe's bus, the last in priority:
/// it charges at its power while the bus can give it, and waits while the bus sheds it.
/// </summary>
public sealed class DockOnProbeBusTests
{
    private const string Power = """
        power:
          source: fission
          electric_power: 10 kW
          conversion_efficiency: 0.3
          loads:
            - { name: electronics, role: electronics, priority: 0 }
            - { name: head, role: head_heater, priority: 0 }
            - { name: wall, role: wall_heater, priority: 1 }
            - { name: science, role: fixed, priority: 2, power: 300 W }

        tether:

        """;

    private static string WithPower(string faults = "") =>
        TestScenario.BuiltIn("vehicle-flat-battery.yaml").Replace("\ntether:\n", "\n" + Power).InsertBefore("\nrun:", faults).Text;

    private static (double TimeS, double BatteryJ) Docked(CollectingSink sink) =>
        sink.OfKind("vehicle.charging").Where(r => r.Source.Name == "vehicle-wisp-1").Select(r => (r.Time.SecondsSinceEpoch, CollectingSink.Field(r, "battery_j"))).First();

    private static double SecondSortieS(CollectingSink sink) =>
        sink.OfKind("vehicle.sortie").First(r => r.Source.Name == "vehicle-wisp-1").Time.SecondsSinceEpoch;

    [Fact]
    public async Task The_charger_draws_on_the_probes_bus_and_fills_the_battery_at_its_power()
    {
        var scenario = ScenarioLoader.LoadText(WithPower(), "dock.yaml");
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        var granted = sink.OfKind("probe.dock_power").First();
        Assert.Equal(100.0, CollectingSink.Field(granted, "granted_w"));
        // Computed: the glider (0.1 kWh = 360 kJ) docks with the logged charge and fills at 100 W.
        var (dockedS, batteryJ) = Docked(sink);
        Assert.Equal(dockedS + ((360_000 - batteryJ) / 100.0), SecondSortieS(sink), 2e-6); // to the microsecond tick
        // On the bus (heaters off in the ocean): electronics + the 300 W science load + the 100 W charger while it
        // charges, and the charger's 100 W given back once the battery is full.
        var baseW = scenario.Probe.ElectronicsPowerW + 300;
        var frames = sink.OfKind("probe.telemetry").Where(r => r.Time.SecondsSinceEpoch > dockedS).ToList();
        Assert.Equal(baseW + 100, CollectingSink.Field(frames.First(), "bus_load_w"), 6);
        Assert.Equal(baseW, CollectingSink.Field(frames.First(r => r.Time.SecondsSinceEpoch > SecondSortieS(sink)), "bus_load_w"), 6);
    }

    [Fact]
    public async Task While_the_bus_sheds_the_charger_the_vehicle_waits()
    {
        // A dip leaves 1 % of 10 kW = 100 W from before the glider docks until a day later: the electronics (60 W) run,
        // the science load and the charger (lowest priority) are shed, so charging starts only when the dip ends.
        var dip = "\nfaults:\n  - name: converter-sag\n    kind: power_dip\n    at: 2.5 d\n    duration: 1.5 d\n    remaining_fraction: 0.01\n";
        var scenario = ScenarioLoader.LoadText(WithPower(dip), "dock-dip.yaml");
        var (_, sink) = await MissionHarness.RunAsync(scenario);

        var (dockedS, batteryJ) = Docked(sink);
        Assert.InRange(dockedS, 2.5 * 86_400, 4 * 86_400);
        var grants = sink.OfKind("vehicle.dock_power").Where(r => r.Source.Name == "vehicle-wisp-1").ToList();
        Assert.Equal(0.0, CollectingSink.Field(grants[0], "granted_w"));
        Assert.Equal(4 * 86_400, grants[1].Time.SecondsSinceEpoch, 6);
        Assert.Equal(100.0, CollectingSink.Field(grants[1], "granted_w"));
        // Computed: nothing is charged before the dip ends, then (360 kJ − battery) at 100 W.
        Assert.Equal((4 * 86_400) + ((360_000 - batteryJ) / 100.0), SecondSortieS(sink), 5);
    }
}
