using DescentOps.Engine.Scheduling;

namespace DescentOps.Mission;

/// <summary>
/// The order of mission events that fall on one instant: a fault acts first, then commands, then the
/// physics step that sees both, and telemetry last so that a frame reports the state after the instant.
/// </summary>
public static class MissionPriority
{
    public static EventPriority Fault => new(16);
    public static EventPriority Command => new(32);
    public static EventPriority Physics => new(64);
    public static EventPriority Telemetry => new(128);
}
