using DescentOps.Engine.Running;
using DescentOps.Physics.Acoustics;
using DescentOps.Physics.Ocean;
using DescentOps.Records;
using DescentOps.Scenarios.Loading;
using DescentOps.Tests.Shared;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The released vehicles in whole runs: the acoustic link's outage and recovery, loss to a flat battery, the
/// vehicle_loss fault, the recall command and the energy account. Every scenario here has a 30 m shell so the probe
/// reaches the ocean in under two simulated days.
/// </summary>
public sealed class VehicleScenarioTests
{
    private const string Drift = "vehicle-drift-out-of-range.yaml";
    private const string Flat = "vehicle-flat-battery.yaml";

    private static Task<(Running.MissionSummary Summary, CollectingSink Sink)> RunAsync(string text, string name = "vehicle.yaml") =>
        MissionHarness.RunAsync(ScenarioLoader.LoadText(text, name));

    private static string Edit(string name, string line, string replacement) => TestScenario.BuiltIn(name).Replace(line, replacement).Text;

    private static string Text(JournalRecord record, string field) => record.Fields.Single(f => f.Name == field).Text!;

    [Fact]
    public async Task A_vehicle_drifts_out_of_acoustic_range_keeps_its_data_and_delivers_it_when_back()
    {
        var (_, summary, sink, _) = await SharedRuns.OfBuiltInAsync(Drift);

        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        var link = sink.OfKind("vehicle.acoustic_link").Single();
        var maxRangeM = CollectingSink.Field(link, "max_range_m");
        var outOfRange = sink.OfKind("vehicle.out_of_range").Single();
        var back = sink.OfKind("vehicle.back_in_range").Single();
        Assert.True(back.Time > outOfRange.Time);

        // Out: beyond the zero-margin range with a negative margin; back: inside it with a non-negative one.
        Assert.True(CollectingSink.Field(outOfRange, "range_m") > maxRangeM);
        Assert.True(CollectingSink.Field(outOfRange, "margin_db") < 0);
        Assert.True(CollectingSink.Field(back, "range_m") <= maxRangeM);
        Assert.True(CollectingSink.Field(back, "margin_db") >= 0);
        Assert.Equal("range", Text(outOfRange, "cause"));

        // Computed: one message per 10-minute interval was held while out of range, and all of them came through.
        var outageS = CollectingSink.Field(back, "out_of_range_s");
        Assert.Equal(outageS / 600.0, CollectingSink.IntegerField(back, "delivered_held"));
        Assert.Empty(sink.OfKind("vehicle.data_lost"));
        Assert.Empty(sink.OfKind("vehicle.lost"));
        var energy = sink.OfKind("vehicle.energy").Single();
        Assert.Equal(CollectingSink.IntegerField(energy, "messages_produced"), CollectingSink.IntegerField(energy, "messages_delivered"));
        Assert.Equal(0, CollectingSink.IntegerField(energy, "messages_held"));

        // It came home by the battery rule and docked.
        Assert.Equal("battery at the return level", Text(sink.OfKind("vehicle.returning").Single(), "reason"));
        Assert.Single(sink.OfKind("vehicle.docked"));
        Assert.Equal("all sorties flown", Text(sink.OfKind("vehicle.task_complete").Single(), "reason"));
    }

    [Fact]
    public async Task The_link_budget_in_the_log_is_the_Francois_Garrison_absorption_at_the_scenario_values()
    {
        var (_, _, sink, _) = await SharedRuns.OfBuiltInAsync(Drift);
        var link = sink.OfKind("vehicle.acoustic_link").Single();

        // Computed here from the scenario's values: 34 g/kg read as reference salinity (S_P = 34·35/35.16504),
        // −1.8 °C, 12 kHz, pH 8, at the Earth depth whose absolute pressure equals the logged one under the shell. An
        // Earth depth is measured from a surface under one standard atmosphere, so the depth is that of the sea pressure
        // (absolute less 101325 Pa, as the TEOS-10 manual, IOC, SCOR and IAPSO 2010, defines sea pressure), never below
        // the surface. Under this 30 m lid on an airless body that is 0 m; the formula's pressure terms then stay at 1.
        var basePressurePa = CollectingSink.Field(sink.OfKind("probe.started").Single(), "base_pressure_pa");
        var depthM = SeawaterPressureDepth.StandardOceanDepthM(Math.Max(0.0, basePressurePa - 101_325.0), 9.80665);
        Assert.Equal(depthM, CollectingSink.Field(link, "earth_equivalent_depth_m"), 9);
        var expected = SeawaterAbsorption.FrancoisGarrisonDbPerKm(12e3, 273.15 - 1.8, 34.0 * 35.0 / 35.16504, depthM, 8.0);
        Assert.Equal(expected, CollectingSink.Field(link, "absorption_db_per_km"), 12);

        // The range limit is where the sonar equation's margin is zero: SL 140 − TL − (50 + 10·log10 2000) − DT 10.
        var rangeM = CollectingSink.Field(link, "max_range_m");
        var tl = (1.5 * 10 * Math.Log10(rangeM)) + (expected * rangeM / 1000);
        Assert.Equal(0.0, 140 - tl - (50 + (10 * Math.Log10(2000))) - 10, 6);
    }

    [Fact]
    public async Task A_vehicle_that_cannot_make_headway_against_the_current_is_lost_to_a_flat_battery()
    {
        var (_, summary, sink, _) = await SharedRuns.OfBuiltInAsync(Flat);

        var lost = sink.OfKind("vehicle.lost").Single();
        Assert.Equal("vehicle-wisp-2", lost.Source.Name);
        Assert.Equal("flat battery", Text(lost, "reason"));
        Assert.Equal(0.0, CollectingSink.Field(lost, "battery_j"), 3);

        // Its still-water estimate of the way home fitted in the battery it had; the current did not let it.
        var returning = sink.OfKind("vehicle.returning").Single(r => r.Source.Name == "vehicle-wisp-2");
        Assert.True(CollectingSink.Field(returning, "estimated_energy_j") < CollectingSink.Field(returning, "battery_j"));
        // Computed: against a 0.3 m/s current straight on, a 0.35 m/s vehicle closes at 0.05 m/s, and 33 W
        // (8 W hotel + 25 W propulsion) for the distance at that speed is more than it had.
        var closing = CollectingSink.Field(returning, "closing_speed_m_s");
        Assert.Equal(0.05, closing, 2);
        Assert.True(33.0 * CollectingSink.Field(returning, "distance_m") / closing > CollectingSink.Field(returning, "battery_j"));

        // The glider in still water flew both its sorties, so the run completes with one vehicle lost.
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        Assert.Equal("1 vehicle finished its task, 1 lost", summary.Outcome.Reason);
        Assert.Equal(2, sink.OfKind("vehicle.docked").Count(r => r.Source.Name == "vehicle-wisp-1"));
        Assert.Single(sink.OfKind("vehicle.sortie"));
    }

    [Fact]
    public async Task Without_the_current_the_same_vehicle_comes_home()
    {
        var text = Edit(Flat, "    current:\n      speed: 0.3 m/s\n      direction: 90 deg\n", "");
        var (summary, sink) = await RunAsync(text);

        Assert.Empty(sink.OfKind("vehicle.lost"));
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        Assert.Equal("all 2 vehicles finished their tasks", summary.Outcome.Reason);
    }

    [Fact]
    public async Task Every_vehicle_energy_account_balances()
    {
        foreach (var name in new[] { Drift, Flat })
        {
            var (_, _, sink, _) = await SharedRuns.OfBuiltInAsync(name);
            var accounts = sink.OfKind("vehicle.energy").ToList();
            Assert.NotEmpty(accounts);
            foreach (var account in accounts)
            {
                // Battery at the end = initial + charged − used; the legs' sums are kept apart from the battery's.
                var expected = CollectingSink.Field(account, "initial_j") + CollectingSink.Field(account, "charged_j") - CollectingSink.Field(account, "used_j");
                Assert.Equal(expected, CollectingSink.Field(account, "battery_j"), 3);
            }
        }
    }

    [Fact]
    public async Task Vehicles_without_the_new_fields_write_only_the_original_records()
    {
        var (_, _, sink, _) = await SharedRuns.OfDefaultAsync();
        var kinds = sink.Records.Where(r => r.Source.Name.StartsWith("vehicle-", StringComparison.Ordinal)).Select(r => r.Kind).ToHashSet();
        Assert.Equal(["vehicle.profile", "vehicle.released", "vehicle.task_complete"], kinds.Order(StringComparer.Ordinal));
    }

    [Theory]
    [InlineData("entrapment", "", "entrapped")]
    [InlineData("battery", "    remaining_fraction: 0\n", "flat battery")]
    public async Task A_vehicle_loss_fault_loses_the_vehicle_with_its_cause(string cause, string extra, string reason)
    {
        // The vehicle is released at about 1.63 d (the logged breakthrough of this scenario); the fault comes later.
        var fault = $"faults:\n  - name: wisp-1-{cause}\n    kind: vehicle_loss\n    at: 1.8 d\n    vehicle: wisp-1\n    cause: {cause}\n{extra}\n";
        var (summary, sink) = await RunAsync(Edit(Drift, "run:\n", fault + "run:\n"));

        Assert.Equal("vehicle-wisp-1", sink.OfKind("fault.injected").Single().Fields.Single(f => f.Name == "target").Text);
        Assert.Equal(reason, Text(sink.OfKind("vehicle.lost").Single(), "reason"));
        Assert.Equal(RunOutcomeKind.MissionLost, summary.Outcome.Kind);
        Assert.Equal("the vehicle was lost", summary.Outcome.Reason);
    }

    [Fact]
    public async Task An_entrapment_that_ends_leaves_the_vehicle_to_come_home_and_the_summary_measures_the_recovery()
    {
        var fault = "faults:\n  - name: wisp-1-caught\n    kind: vehicle_loss\n    at: 1.8 d\n    duration: 3 h\n    vehicle: wisp-1\n    cause: entrapment\n\n";
        var (summary, sink) = await RunAsync(Edit(Drift, "run:\n", fault + "run:\n"));

        var entrapped = sink.OfKind("vehicle.entrapped").Single();
        var freed = sink.OfKind("vehicle.freed").Single();
        // Computed: held for the fault's 3 h, drawing only the 8 W hotel load meanwhile.
        Assert.Equal(3 * 3600.0, (freed.Time - entrapped.Time).TotalSeconds, 6);
        Assert.Equal(8.0 * 3 * 3600, CollectingSink.Field(entrapped, "battery_j") - CollectingSink.Field(freed, "battery_j"), 3);
        Assert.Empty(sink.OfKind("vehicle.lost"));
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
        var measure = summary.Faults.Single();
        Assert.Equal(sink.OfKind("vehicle.docked").Single().Time.SecondsSinceEpoch - (1.8 * 86400), measure.RecoveredAfterS!.Value, 6);
    }

    [Fact]
    public async Task A_dead_link_longer_than_the_tolerance_loses_the_vehicle_and_its_held_data()
    {
        var fault = "faults:\n  - name: wisp-1-modem\n    kind: vehicle_loss\n    at: 1.7 d\n    vehicle: wisp-1\n    cause: out_of_range\n\n";
        var text = Edit(Drift, "    max_out_of_range: 12 h\n", "    max_out_of_range: 2 h\n").Replace("run:\n", fault + "run:\n", StringComparison.Ordinal);
        var (_, sink) = await RunAsync(text);

        var lost = sink.OfKind("vehicle.lost").Single();
        Assert.Equal("out of acoustic range too long", Text(lost, "reason"));
        Assert.Equal("link fault", Text(sink.OfKind("vehicle.out_of_range").First(), "cause"));
        // Computed: messages every 10 min over a 2 h outage, counted from the first missed one: 2 h / 10 min + 1.
        Assert.Equal(13, CollectingSink.IntegerField(lost, "data_lost"));
        Assert.Equal(13, CollectingSink.IntegerField(sink.OfKind("vehicle.data_lost").Single(), "messages"));
    }

    [Theory]
    [InlineData("board")]
    [InlineData("ground")]
    public async Task A_recall_from_a_rule_brings_the_vehicle_home_early(string placement)
    {
        var rules = $"rules: |\n  autonomy E3\n  rule recall-at-ocean {{\n    runs on {placement}\n    severity low\n    when probe.regime is AtOcean for 6 samples\n    then {{ send vehicle-wisp-1 recall_vehicle }}\n  }}\n\n";
        var (summary, sink) = await RunAsync(Edit(Drift, "run:\n", rules + "run:\n"));

        Assert.Single(sink.OfKind("rule.fired"));
        // From the ground the command goes up the light time and down the fibre, then through the probe's modem.
        var executed = sink.OfKind("command.executed").Single();
        Assert.Equal("vehicle-wisp-1", executed.Source.Name);
        Assert.Equal(placement, Text(executed, "placement"));
        // On board it acts at once; from the ground it waits at least the one-way light time, 1.08e9 km / c.
        var latencyS = CollectingSink.Field(executed, "latency_s");
        Assert.True(placement == "board" ? latencyS == 0.0 : latencyS > 1.08e12 / 299_792_458.0, $"{placement}: {latencyS} s");
        Assert.Single(sink.OfKind("vehicle.recalled"));
        Assert.Equal("recalled", Text(sink.OfKind("vehicle.returning").Single(), "reason"));
        Assert.Equal("recalled", Text(sink.OfKind("vehicle.task_complete").Single(), "reason"));
        Assert.Empty(sink.OfKind("vehicle.out_of_range"));
        Assert.Equal(RunOutcomeKind.Completed, summary.Outcome.Kind);
    }
}
