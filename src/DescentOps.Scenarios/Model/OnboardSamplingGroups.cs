namespace DescentOps.Scenarios.Model;

/// <summary>
/// The groups of probe points a scenario may give one on-board sampling interval: the sensors that share a bus or a
/// board on a probe of this kind. The probe's discrete regime is a point of its own (<c>probe.regime</c>).
/// </summary>
public static class OnboardSamplingGroups
{
    public const string RegimePoint = "probe.regime";

    public static IReadOnlyList<(string Group, IReadOnlyList<string> Points)> All { get; } =
    [
        ("motion", ["probe.depth", "probe.velocity", "probe.tilt"]),
        ("thermal", ["probe.ice_temperature"]),
        ("power", ["probe.head_power", "probe.wall_power", "probe.energy_used", "probe.battery_soc", "probe.bus_power_available"]),
        ("link", ["probe.buffer_fill"]),
    ];

    /// <summary>Every point the probe samples on board: the numeric points and the regime.</summary>
    public static IReadOnlyList<string> Points { get; } = [.. ProbeTelemetryPoints.Numeric.Select(p => p.Name), RegimePoint];

    /// <summary>The names an entry of <c>onboard_sampling.points</c> may take: a point or a group.</summary>
    public static IReadOnlyList<string> Names { get; } = [.. Points, .. All.Select(g => g.Group)];

    public static string? GroupOf(string point) => All.Where(g => g.Points.Contains(point)).Select(g => g.Group).FirstOrDefault();
}
