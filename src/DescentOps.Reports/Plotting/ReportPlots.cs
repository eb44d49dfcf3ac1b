using DescentOps.Records.Kinds;

namespace DescentOps.Reports.Plotting;

/// <summary>
/// The plots of a post-mortem, in the order they appear. Adding a plot for a new telemetry point (tilt, link
/// margin, buffer fill, dose...) is one entry here; a log without that point gets a note instead of a plot.
/// </summary>
public static class ReportPlots
{
    private const double SecondsPerDay = 86_400;
    private const double JoulesPerMegawattHour = 3.6e9;

    public static IReadOnlyList<PlotDefinition> Default { get; } =
    [
        new("depth", "Probe depth", "depth below surface (m)",
            [new(ProbeRecords.Telemetry, "depth_m", "depth")], InvertY: true, MarkTimeline: true),
        new("descent-rate", "Descent rate", "rate (m/d)",
            [new(ProbeRecords.Telemetry, "velocity_m_s", "descent rate", Scale: SecondsPerDay)]),
        new("power", "Heater power", "power (kW)",
            [new(ProbeRecords.Telemetry, "head_power_w", "head", Scale: 1e-3), new(ProbeRecords.Telemetry, "wall_power_w", "wall", Scale: 1e-3)]),
        new("energy", "Energy used", "energy (MWh)",
            [new(ProbeRecords.Telemetry, "energy_used_j", "energy used", Scale: 1 / JoulesPerMegawattHour)]),
        new("ground-latency", "Telemetry latency at ground", "one-way latency (min)",
            [new(GroundRecords.Telemetry, "latency_s", "latency", Scale: 1.0 / 60)]),
        new("buffer-fill", "Frames held at the probe", "buffer fill (%)",
            [new(ProbeRecords.Telemetry, "buffer_fill", "probe buffer", Scale: 100)]),
        new("vehicle-battery", "Vehicle battery", "battery (MJ)",
            [new(VehicleRecords.Profile, "battery_j", "battery", Scale: 1e-6, PerSource: true)]),
    ];
}
