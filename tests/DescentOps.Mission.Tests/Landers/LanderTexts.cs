namespace DescentOps.Mission.Tests.Landers;

/// <summary>
/// Scenario texts for the lander tests, composed from parts: each lander's own sections written once, at the top level
/// of a single-lander file or indented under its entry of a landers list. The invented Longfall mission on the invented
/// moon Ossery (see scenarios/default.yaml).
/// </summary>
internal static class LanderTexts
{
    private const string Shared = """
        scenario: longfall-lander-test
        body:
          name: Ossery
          site: {0}
          gravity: 1.0 m/s^2
          distance_to_ground: 1.08e9 km
          surface_pressure: 0 Pa
        shell:
          thickness: 2.5 km
          surface_temperature: 132 K
          ocean_salinity: 12 g/kg

        """;

    public const string TarnParts = """
        probe:
          name: Wendlow
          radius: 12 cm
          length: 2.4 m
          mass: 210 kg
          head_power: 6 kW
          wall_power: 10 kW
          electronics_power: 60 W
          telemetry_interval: 10 min
        tether:
          length: 3.2 km
          signal_speed: 2.04e8 m/s
        station:
          name: Cairn
          forwarding_delay: 2 s
        vehicles:
          - name: wisp-1
            battery: 1.5 kWh
            reserve: 0.2
            hotel_power: 8 W
            propulsion_power: 30 W
            speed: 0.4 m/s
            profile_depth: 300 m
        rules: |
          rule slow-descent-watch {
            runs on ground
            severity medium
            priority 1
            when probe.regime is Melting and probe.velocity below 0.6 m/h for 3 samples
            then { send probe.wall set_power(power = 3 kW) }
          }

        """;

    public const string BrackParts = """
        probe:
          name: Sallow
          radius: 10 cm
          length: 2.0 m
          mass: 180 kg
          head_power: 5 kW
          wall_power: 9 kW
          electronics_power: 50 W
          telemetry_interval: 15 min
        tether:
          length: 3.0 km
          signal_speed: 2.04e8 m/s
        station:
          name: Rook
          forwarding_delay: 3 s

        """;

    /// <summary>A power dip on brack's probe, so a fault runs in one lander and not the other.</summary>
    private const string BrackFault = """
        faults:
          - name: bus-sag-day-1
        {0}    kind: power_dip
            at: 1 d
            duration: 12 h
            remaining_fraction: 0.7

        """;

    private static readonly System.Text.CompositeFormat SharedFormat = System.Text.CompositeFormat.Parse(Shared);
    private static readonly System.Text.CompositeFormat BrackFaultFormat = System.Text.CompositeFormat.Parse(BrackFault);

    private static string Run(double days) => $"run:\n  seed: 20261203\n  until: {days.ToString(System.Globalization.CultureInfo.InvariantCulture)} d\n";

    /// <summary>One lander alone in the single-lander format.</summary>
    public static string Single(string site, string parts, bool withFault, double days) =>
        string.Format(System.Globalization.CultureInfo.InvariantCulture, SharedFormat, site) + parts + (withFault ? string.Format(System.Globalization.CultureInfo.InvariantCulture, BrackFaultFormat, "") : "") + Run(days);

    /// <summary>Tarn Flats and Brack Hollow in one scenario; the fault strikes brack.</summary>
    public static string Two(double days, string extra = "") =>
        string.Format(System.Globalization.CultureInfo.InvariantCulture, SharedFormat, "Tarn Flats")
        + "landers:\n"
        + Lander("tarn", "Tarn Flats", "12 deg", "0 deg", TarnParts)
        + Lander("brack", "Brack Hollow", "-30 deg", "40 deg", BrackParts)
        + string.Format(System.Globalization.CultureInfo.InvariantCulture, BrackFaultFormat, "    lander: brack\n")
        + extra
        + Run(days);

    private static string Lander(string name, string site, string latitude, string longitude, string parts) =>
        $"  - name: {name}\n    site: {site}\n    latitude: {latitude}\n    longitude: {longitude}\n"
        + string.Concat(parts.Split('\n').Select(l => l.Length == 0 ? "\n" : "    " + l + "\n"));
}
