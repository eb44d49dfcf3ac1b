using DescentOps.Primitives.Identity;

namespace DescentOps.Mission;

/// <summary>The fixed component ids of a mission; vehicles are named by the scenario.</summary>
public static class MissionIds
{
    public static ComponentId Probe { get; } = new("probe");
    public static ComponentId Tether { get; } = new("tether");
    public static ComponentId Station { get; } = new("station");
    public static ComponentId Ground { get; } = new("ground");
    public static ComponentId FaultInjector { get; } = new("fault-injector");
    public static ComponentId Autonomy { get; } = new("autonomy");

    /// <summary>The link home several landers share (none in a single-lander scenario).</summary>
    public static ComponentId LinkHome { get; } = new("link-home");

    /// <summary>The ground's desk for the mission's own rules across landers (only with a scenario's mission_rules).</summary>
    public static ComponentId MissionDesk { get; } = new("mission-desk");

    public static ComponentId Vehicle(string name) => new("vehicle-" + name);
}
