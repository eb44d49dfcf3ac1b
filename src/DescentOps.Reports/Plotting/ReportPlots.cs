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
            [new(ProbeRecords.Telemetry, "depth_m", "depth", PerLander: true)], InvertY: true, MarkTimeline: true),
        new("descent-rate", "Descent rate", "rate (m/d)",
            [new(ProbeRecords.Telemetry, "velocity_m_s", "descent rate", Scale: SecondsPerDay, PerLander: true)]),
        new("power", "Heater power", "power (kW)",
            [new(ProbeRecords.Telemetry, "head_power_w", "head", Scale: 1e-3, PerLander: true), new(ProbeRecords.Telemetry, "wall_power_w", "wall", Scale: 1e-3, PerLander: true)]),
        new("energy", "Energy used", "energy (MWh)",
            [new(ProbeRecords.Telemetry, "energy_used_j", "energy used", Scale: 1 / JoulesPerMegawattHour, PerLander: true)]),
        new("ground-latency", "Telemetry latency at ground", "one-way latency (min)",
            [new(GroundRecords.Telemetry, "latency_s", "latency", Scale: 1.0 / 60, PerLander: true)]),
        new("buffer-fill", "Frames held at the probe", "buffer fill (%)",
            [new(ProbeRecords.Telemetry, "buffer_fill", "probe buffer", Scale: 100, PerLander: true)]),
        new("vehicle-battery", "Vehicle battery", "battery (MJ)",
            [new(VehicleRecords.Profile, "battery_j", "battery", Scale: 1e-6, PerSource: true)]),
    ];

    /// <summary>The shared link home's plots, drawn for a run with landers: channel use over time and what waits at each station.</summary>
    public static IReadOnlyList<PlotDefinition> SharedLink { get; } =
    [
        new("link-channels", "Shared link: channels in use", "channels busy as each frame goes",
            [new(LinkRecords.Sent, "channels_busy", "channels busy")]),
        new("link-waiting", "Shared link: frames waiting at each station", "frames queued",
            [new(LinkRecords.Sent, "frames_queued", "frames queued", PerLander: true)]),
    ];

    /// <summary>The series a report gathers in its one pass over the log.</summary>
    public static IEnumerable<SeriesDefinition> Gathered => Default.Concat(SharedLink).SelectMany(p => p.Series);

    /// <summary>The plots of a report on <paramref name="log"/>: the shared link's too when the run has landers.</summary>
    public static IReadOnlyList<PlotDefinition> For(RunLog log) => log?.SharedLink is null ? Default : [.. Default, .. SharedLink];
}
