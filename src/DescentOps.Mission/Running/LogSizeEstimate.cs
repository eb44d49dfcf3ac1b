using System.Globalization;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Running;

/// <summary>
/// How large a run's log may grow, from its time limit and telemetry interval, before it starts: a valid but endless
/// run (a frame a second for a thousand years) would otherwise fill the disk at gigabytes a minute.
/// </summary>
public static class LogSizeEstimate
{
    /// <summary>
    /// Bytes of log per telemetry frame: 680 measured on the built-in default scenario (10.9 MB for 16,056 frames:
    /// the frame's records with the run's other events spread over them), rounded up.
    /// </summary>
    public const double BytesPerFrame = 700;

    /// <summary>A run whose log could pass this is refused unless asked for: 2 GB, five years of a frame a minute.</summary>
    public const double DefaultLimitBytes = 2e9;

    /// <summary>The log's size if the run lasts until its time limit (it may end sooner, at mission completion).</summary>
    public static double UpperBoundBytes(Scenario scenario, double untilS)
    {
        ArgumentNullException.ThrowIfNull(scenario);
        return (untilS / scenario.Probe.TelemetryIntervalS + 1) * BytesPerFrame;
    }

    /// <summary>"4.4 GB" style, for messages.</summary>
    public static string Describe(double bytes) => bytes switch
    {
        >= 1e12 => string.Create(CultureInfo.InvariantCulture, $"{bytes / 1e12:G3} TB"),
        >= 1e9 => string.Create(CultureInfo.InvariantCulture, $"{bytes / 1e9:G3} GB"),
        _ => string.Create(CultureInfo.InvariantCulture, $"{bytes / 1e6:G3} MB"),
    };
}
