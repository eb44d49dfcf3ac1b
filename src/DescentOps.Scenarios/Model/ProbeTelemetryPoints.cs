using DescentOps.Scenarios.Format;

namespace DescentOps.Scenarios.Model;

/// <summary>
/// The probe's numeric telemetry points that a scenario can name (a sensor fault's point), with the dimension of
/// each. The mission's rule catalogue offers the same points, plus the discrete ones.
/// </summary>
public static class ProbeTelemetryPoints
{
    public static IReadOnlyList<(string Name, QuantityKind Kind)> Numeric { get; } =
    [
        ("probe.depth", QuantityKind.Length),
        ("probe.velocity", QuantityKind.Speed),
        ("probe.ice_temperature", QuantityKind.Temperature),
        ("probe.head_power", QuantityKind.Power),
        ("probe.wall_power", QuantityKind.Power),
        ("probe.energy_used", QuantityKind.Energy),
        ("probe.tilt", QuantityKind.Angle),
        ("probe.battery_soc", QuantityKind.Ratio),
        ("probe.bus_power_available", QuantityKind.Power),
        ("probe.buffer_fill", QuantityKind.Ratio),
        ("probe.jet_power", QuantityKind.Power),
        ("probe.hole_radius", QuantityKind.Length),
    ];

    public static QuantityKind? KindOf(string name) =>
        Numeric.Where(p => p.Name == name).Select(p => (QuantityKind?)p.Kind).FirstOrDefault();
}
