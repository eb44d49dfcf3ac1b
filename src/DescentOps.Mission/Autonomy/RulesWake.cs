namespace DescentOps.Mission.Autonomy;

/// <summary>A rule host's timer: a persistence period, a wait or an escalation comes due.</summary>
public sealed record RulesWake
{
    public static RulesWake Instance { get; } = new();

    private RulesWake()
    {
    }
}
