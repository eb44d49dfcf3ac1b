using DescentOps.Engine.Running;
using DescentOps.Records;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tests;

/// <summary>
/// The probe's hot-water jet mode in whole runs: a rule switches the jets on and the speed becomes the one the energy
/// balance of hot-water drilling gives for the jets' heat and hole; a clogged nozzle cuts the speed in proportion to the
/// heat it leaves; the jets' heat and pump are on the bill; the load refuses jets that do not fit the probe.
/// </summary>
public sealed class HotWaterJetRunTests
{
    private const double Hour = 3600.0;

    private const string JetsSection =
        "  telemetry_interval: 10 min\n" +
        "  jets:\n" +
        "    heat: 5 kW\n" +
        "    pump_power: 300 W\n" +
        "    minimum_hole_radius: 11 cm\n" +
        "    hole_radius: 11.45 cm\n";

    private const string JetsOnRule =
        "rules: |\n" +
        "  autonomy E3\n" +
        "  rule jets-on {\n" +
        "    runs on board\n" +
        "    severity info\n" +
        "    priority 1\n" +
        "    when probe.depth above 20 m\n" +
        "    then { send probe.jets set_power(power = 5 kW) }\n" +
        "  }\n\n" +
        "run:\n";

    /// <summary>
    /// The default mission moved to a warm shell of 250 K at its surface, under an atmosphere (liquid from the first
    /// metre), with a 10 cm probe carrying 5 kW of jets set to cut an 11.45 cm hole: the conditions of the reference
    /// note's PRB-10. The jets go on at 20 m by an on-board rule.
    /// </summary>
    private static string Text(params (string Line, string Replacement)[] more)
    {
        var text = MissionHarness.DefaultText;
        (string, string)[] edits =
        [
            ("  surface_pressure: 0 Pa", "  surface_pressure: 100 kPa"),
            ("  surface_temperature: 132 K", "  surface_temperature: 250 K"),
            ("  radius: 12 cm", "  radius: 10 cm"),
            ("  telemetry_interval: 10 min\n", JetsSection),
            ("\nrun:\n", "\n" + JetsOnRule),
            ("  until: 400 d", "  until: 3 d"),
            .. more,
        ];
        foreach (var (line, replacement) in edits)
        {
            Assert.Contains(line, text);
            text = text.Replace(line, replacement, StringComparison.Ordinal);
        }

        return text;
    }

    private static Scenario Load(string text) => ScenarioLoader.LoadText(text, "jets.yaml");

    private static double F(JournalRecord r, string name) => CollectingSink.Field(r, name);

    [Fact]
    public async Task Switching_the_jets_on_gives_the_speed_of_the_reference_notes_worked_figure()
    {
        var (summary, sink) = await MissionHarness.RunAsync(Load(Text()));
        Assert.Equal(RunOutcomeKind.TimeLimit, summary.Outcome.Kind); // a 3-day slice of the descent
        var command = sink.OfKind("command.executed").First();
        Assert.Contains("probe.jets set_power", CollectingSink.TextField(command, "command"), StringComparison.Ordinal);
        var onAt = command.Time.SecondsSinceEpoch;
        var frames = sink.OfKind("probe.telemetry").ToList();
        var before = frames.Last(f => f.Time.SecondsSinceEpoch < onAt);
        var after = frames.Where(f => f.Time.SecondsSinceEpoch > onAt + Hour).ToList();
        Assert.NotEmpty(after);

        // Reference note ice-and-descent §4.6, PRB-10 (CALC): jet heat 5 kW, η 0.8, ice at 250 K, a hole of 0.11450 m
        // radius is cut at 1 m/h (pure ice melting at 273.15 K). The run's ice is 250 K at the surface and warms by
        // about 0.7 K over the first 80 m of this 2.5 km shell (23 K over 2.5 km); its melting point is within 0.01 K of 273.15 K there.
        // Ice warmer by 0.7 K needs about 0.36 % less heat per kilogram (c ≈ 1.95 kJ/(kg K) of about 380 kJ/kg in all),
        // so 0.5 % holds the figure with room for the note's rounding of R_h to five digits (0.04 % in speed).
        foreach (var frame in after)
        {
            Assert.Equal("Melting", CollectingSink.TextField(frame, "regime"));
            Assert.InRange(F(frame, "ice_temperature_k"), 250.0, 250.7);
            Approx(1.0 / Hour, F(frame, "velocity_m_s"), 5e-3, "jet speed against PRB-10");
            Assert.Equal(5e3, F(frame, "jet_heat_w"));
            Assert.Equal(300.0, F(frame, "jet_pump_power_w"));
            Assert.Equal(0.1145, F(frame, "hole_radius_m"), 12);
            Assert.Equal(0.0, F(frame, "head_power_w")); // the head is out of contact and idles
        }

        // Before, the 6 kW head melted its own 10 cm hole: about twice as fast (ideal balance 6 kW at 10 cm against
        // 0.8 · 5 kW at 11.45 cm: (6/4) · (11.45/10)² ≈ 2.0; the side loss and the film make the head somewhat slower).
        Assert.Equal(0.0, F(before, "jet_heat_w"));
        Assert.Equal(0.1, F(before, "hole_radius_m"), 12);
        Assert.InRange(F(before, "velocity_m_s") / F(after[0], "velocity_m_s"), 1.3, 2.1);

        // The jets' heat and pump are on the bill: between two frames with the jets on, the energy used grows by
        // (jets 5 kW + pump 300 W + wall 10 kW + electronics 60 W) over the 600 s (the probe has no power system).
        var (a, b) = (after[0], after[1]);
        var seconds = b.Time.SecondsSinceEpoch - a.Time.SecondsSinceEpoch;
        Approx((5e3 + 300.0 + 10e3 + 60.0) * seconds, F(b, "energy_used_j") - F(a, "energy_used_j"), 1e-9, "energy between frames");

        var jets = sink.OfKind("probe.jets").Last();
        Approx(1.0 / Hour, F(jets, "speed_m_s"), 5e-3, "logged operating point");
        Approx(0.0145, F(jets, "clearance_m"), 1e-9, "clearance");
    }

    [Fact]
    public async Task A_clogged_nozzle_slows_the_jets_by_the_share_of_heat_it_leaves()
    {
        var fault = "faults:\n" +
            "  - name: nozzle-clog\n" +
            "    kind: clogged_nozzle\n" +
            "    at: 36 h\n" +
            "    duration: 12 h\n" +
            "    remaining_fraction: 0.6\n";
        var text = Text();
        var start = text.IndexOf("faults:\n", StringComparison.Ordinal);
        var end = text.IndexOf("\nrules: |", StringComparison.Ordinal);
        text = text[..start] + fault + text[end..];
        var (summary, sink) = await MissionHarness.RunAsync(Load(text));
        Assert.Equal(RunOutcomeKind.TimeLimit, summary.Outcome.Kind); // a 3-day slice of the descent

        // Energy balance η f P = π R_h² v ρ (L + Δh_s): at the same hole, ice and efficiency, v is proportional to the
        // heat at the bottom f·P, so a nozzle that passes 60 % of the heat gives 60 % of the speed, and all of it back
        // once cleared.
        var clogged = sink.OfKind("probe.nozzle_clogged").Single();
        Assert.Equal(36 * Hour, clogged.Time.SecondsSinceEpoch, 6);
        Approx(0.6, F(clogged, "speed_after_m_s") / F(clogged, "speed_before_m_s"), 1e-12, "speed ratio at the clog");
        Approx(0.6 * 5e3, F(clogged, "heat_at_bottom_after_w"), 1e-12, "heat at the bottom");

        var frames = sink.OfKind("probe.telemetry").ToList();
        var before = frames.Last(f => f.Time.SecondsSinceEpoch < 36 * Hour);
        var during = frames.First(f => f.Time.SecondsSinceEpoch > 36 * Hour);
        var after = frames.First(f => f.Time.SecondsSinceEpoch > 48 * Hour);
        // Ten minutes apart the ice differs by micro-kelvins: the frames show the same ratio to 1e-4.
        Approx(0.6, F(during, "velocity_m_s") / F(before, "velocity_m_s"), 1e-4, "speed ratio in the frames");
        Approx(1.0, F(after, "velocity_m_s") / F(before, "velocity_m_s"), 1e-3, "speed back after the clearance");
        // The heat is still drawn while clogged: what the nozzle does not pass is lost up the hole.
        Assert.Equal(5e3, F(during, "jet_heat_w"));
        Assert.Single(sink.OfKind("probe.nozzle_cleared"));
    }

    [Fact]
    public async Task A_wider_hole_is_slower_and_freezes_in_later_when_the_probe_stops()
    {
        // Two runs, hole radius 11.45 cm and 16 cm, paused at 35 m with the wall heaters off: the wider hole is cut more
        // slowly (v ∝ 1/R_h² at the same heat) and its wider clearance takes longer to freeze in around the stopped body.
        var pause = "  rule stop-and-cool {\n" +
            "    runs on board\n" +
            "    severity info\n" +
            "    priority 2\n" +
            "    when probe.depth above 35 m\n" +
            "    then {\n      send probe.wall set_power(power = 0 W)\n      send probe pause_descent\n    }\n" +
            "  }\n\n" +
            "run:\n";
        var narrow = await MissionHarness.RunAsync(Load(Text(("  }\n\nrun:\n", "  }\n" + pause))));
        var wide = await MissionHarness.RunAsync(Load(Text(("  }\n\nrun:\n", "  }\n" + pause), ("    hole_radius: 11.45 cm\n", "    hole_radius: 16 cm\n"))));
        double Speed((Running.MissionSummary, CollectingSink Sink) run) => F(run.Sink.OfKind("probe.jets").First(r => F(r, "speed_m_s") > 0), "speed_m_s");
        Approx(Math.Pow(0.1145 / 0.16, 2), Speed(wide) / Speed(narrow), 1e-9, "v ∝ 1/R_h²");

        double Freeze((Running.MissionSummary, CollectingSink Sink) run) => F(run.Sink.OfKind("probe.refreezing").Single(), "freeze_time_s");
        Assert.Equal(0.0145, F(narrow.Sink.OfKind("probe.refreezing").Single(), "gap_m"), 9);
        Assert.Equal(0.06, F(wide.Sink.OfKind("probe.refreezing").Single(), "gap_m"), 9);
        Assert.True(Freeze(wide) > 4 * Freeze(narrow), $"wide {Freeze(wide)} s against narrow {Freeze(narrow)} s");
    }

    [Fact]
    public async Task On_a_bus_the_jets_are_one_load_of_heat_and_pump()
    {
        // A fission source of 20 kW electric and the default loads: the jets join them at priority 1, beside the wall.
        const string power = "power:\n  source: fission\n  electric_power: 20 kW\n  conversion_efficiency: 0.3\n\ntether:\n";
        var (_, sink) = await MissionHarness.RunAsync(Load(Text(("\ntether:\n", "\n" + power))));
        Assert.Contains("jets:1", CollectingSink.TextField(sink.OfKind("probe.power").Single(), "loads"), StringComparison.Ordinal);
        var on = sink.OfKind("probe.telemetry").Last();
        // Electronics 60 W + wall 10 kW + jets 5 kW + pump 300 W; the idle head asks for nothing.
        Assert.Equal(60.0 + 10e3 + 5e3 + 300.0, F(on, "bus_load_w"), 9);
        Approx(1.0 / Hour, F(on, "velocity_m_s"), 5e-3, "jet speed on the bus");

        // Named loads must include the jets for a probe that has them.
        const string named = "power:\n  source: fission\n  electric_power: 20 kW\n  conversion_efficiency: 0.3\n  loads:\n" +
            "    - name: electronics\n      role: electronics\n      priority: 0\n" +
            "    - name: head\n      role: head_heater\n      priority: 0\n" +
            "    - name: wall\n      role: wall_heater\n      priority: 1\n\ntether:\n";
        var missing = Assert.Throws<ScenarioException>(() => Load(Text(("\ntether:\n", "\n" + named))));
        Assert.Contains(missing.Errors, e => e.FieldPath == "power.loads" && e.Message.Contains("jets", StringComparison.Ordinal));
    }

    [Fact]
    public void Jets_that_do_not_fit_the_probe_or_its_bus_are_refused_at_their_field()
    {
        var narrow = Assert.Throws<ScenarioException>(() => Load(Text(("    minimum_hole_radius: 11 cm\n", "    minimum_hole_radius: 9 cm\n"))));
        Assert.Contains(narrow.Errors, e => e.FieldPath == "probe.jets.minimum_hole_radius");
        var under = Assert.Throws<ScenarioException>(() => Load(Text(("    hole_radius: 11.45 cm\n", "    hole_radius: 10.5 cm\n"))));
        Assert.Contains(under.Errors, e => e.FieldPath == "probe.jets.hole_radius");
        var noJets = Assert.Throws<ScenarioException>(() => MissionHarness.Edited(("faults:\n", "faults:\n  - name: clog\n    kind: clogged_nozzle\n    at: 1 d\n    remaining_fraction: 0.5\n")));
        Assert.Contains(noJets.Errors, e => e.FieldPath == "faults[0].kind");
        // The rule catalogue has no jets for a probe without them; with jets it checks the power against their heat.
        var noTarget = DescentOps.Mission.Autonomy.MissionRules.Check(MissionHarness.Edited(("\nrun:\n", "\n" + JetsOnRule)));
        Assert.Contains(noTarget.Errors, e => e.Message.Contains("probe.jets", StringComparison.Ordinal));
        Assert.Empty(DescentOps.Mission.Autonomy.MissionRules.Check(Load(Text())).Errors);
        var tooHot = DescentOps.Mission.Autonomy.MissionRules.Check(Load(Text(("set_power(power = 5 kW)", "set_power(power = 6 kW)"))));
        Assert.NotEmpty(tooHot.Errors);
    }

    private static void Approx(double expected, double actual, double relative, string what) =>
        Assert.True(Math.Abs(actual - expected) <= relative * Math.Abs(expected), $"{what}: expected {expected:R}, got {actual:R} (relative {(actual - expected) / expected:E2})");
}
