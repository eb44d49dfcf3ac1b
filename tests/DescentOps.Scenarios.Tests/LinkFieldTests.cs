using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Tests;

/// <summary>The tether's optical fields, the relays section and the relay faults: defaults, values and located errors.</summary>
public sealed class LinkFieldTests
{
    private const string File = "bad.yaml";

    private static ScenarioError SingleError(string text) => MalformedScenarioTests.SingleError(text);

    /// <summary>Where the every-field fixture lists its relay failure among its faults.</summary>
    private static int RelayFault => ScenarioLoader.LoadText(ScenarioText.Default, File).Faults.ToList().FindIndex(f => f.Kind == Model.FaultKind.RelayFailure);

    [Fact]
    public void Without_the_new_fields_the_link_is_todays_healthy_fibre_with_no_buffer_and_no_relays()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.RepositoryDefault, "default.yaml");
        Assert.Null(scenario.Relays);
        Assert.Equal(0, scenario.Tether.BufferFrames);
        Assert.Equal(FibreOpticsModel.Default, scenario.Tether.OpticsOrDefault);
    }

    [Fact]
    public void The_fixture_reads_its_link_fields_in_SI()
    {
        var scenario = ScenarioLoader.LoadText(ScenarioText.Default, "every-field.yaml");
        var optics = scenario.Tether.OpticsOrDefault;
        Assert.Equal(("1000base-lx", 0.35, 4, 1.0), (optics.Transceiver, optics.AttenuationDbPerKm!.Value, optics.SpliceCount, optics.PackLossDb));
        Assert.Equal(500, scenario.Tether.BufferFrames);
        var relays = scenario.Relays!;
        Assert.Equal(3, relays.Carried);
        Assert.Equal([600.0, 1200.0], relays.DropDepthsM);
        Assert.Equal(100e6, relays.FrequencyHz);
        Assert.Equal(2 * 3.6e6, relays.BatteryEnergyJ, 6); // 2 kWh
        Assert.Equal(0.5, relays.ForwardingDelayS);
        var fault = scenario.Faults.Single(f => f.Kind == FaultKind.RelayFailure);
        Assert.Equal(new FaultEffect.RelayFailure(2), fault.Effect);
    }

    [Fact]
    public void With_an_interval_and_no_count_the_probe_carries_one_relay_per_whole_interval_above_the_ocean()
    {
        // Computed: a 2.5 km shell and 400 m intervals give drops at 400, 800, ..., 2400 m: six relays; 500 m intervals
        // give 500 ... 2000 m (2500 m is the ocean): four.
        string Plan(string interval) => ScenarioText.DefaultWith("  carried: 3\n  drops:\n    - depth: 600 m\n    - depth: 1200 m\n", $"  interval: {interval}\n")
            .Replace("    relay: relay-2", "    relay: relay-1", StringComparison.Ordinal);
        Assert.Equal(6, ScenarioLoader.LoadText(Plan("400 m"), File).Relays!.Carried);
        Assert.Equal(4, ScenarioLoader.LoadText(Plan("500 m"), File).Relays!.Carried);
    }

    [Fact]
    public void A_relay_failure_must_name_a_relay_the_probe_carries()
    {
        var beyond = ScenarioText.DefaultWith("    relay: relay-2", "    relay: relay-4");
        var error = SingleError(beyond);
        Assert.Equal($"faults[{RelayFault}].relay", error.FieldPath);
        Assert.Equal(ScenarioText.LineOf(beyond, "relay: relay-4"), error.Location.Line);
        Assert.Contains("carries 3 relays", error.Message);

        var unreadable = ScenarioText.DefaultWith("    relay: relay-2", "    relay: second");
        Assert.Contains("is not a relay", SingleError(unreadable).Message);

        var missing = ScenarioText.DefaultWith("    relay: relay-2\n", "");
        Assert.Equal($"faults[{RelayFault}].relay", SingleError(missing).FieldPath);

        Assert.Equal(new FaultEffect.RelayFailure(2), ScenarioLoader.LoadText(ScenarioText.DefaultWith("    relay: relay-2", "    relay: 2"), File).Faults[RelayFault].Effect);
    }

    [Fact]
    public void Relay_plans_and_spool_jams_are_checked_across_fields()
    {
        var both = ScenarioText.DefaultWith("  carried: 3\n", "  carried: 3\n  interval: 400 m\n");
        Assert.Equal("relays.interval", SingleError(both).FieldPath);

        var tooFew = ScenarioText.DefaultWith("  carried: 3\n", "  carried: 1\n");
        var error = SingleError(tooFew.Replace("    relay: relay-2", "    relay: relay-1", StringComparison.Ordinal));
        Assert.Equal("relays.carried", error.FieldPath);

        var healing = ScenarioText.DefaultWith("    kind: relay_failure\n    relay: relay-2\n", "    kind: spool_jam\n");
        Assert.Equal($"faults[{RelayFault}].duration", SingleError(healing).FieldPath);

        var badClass = ScenarioText.DefaultWith("  transceiver: 1000base-lx", "  transceiver: 40gbase-er4");
        Assert.Equal("tether.transceiver", SingleError(badClass).FieldPath);
    }
}
