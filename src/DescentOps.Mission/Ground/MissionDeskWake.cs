namespace DescentOps.Mission.Ground;

/// <summary>The mission desk's rules have a step due (a persistence ending, a wait, an escalation).</summary>
public sealed record MissionDeskWake
{
    public static MissionDeskWake Instance { get; } = new();
}
