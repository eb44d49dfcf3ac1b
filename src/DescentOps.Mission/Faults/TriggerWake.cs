namespace DescentOps.Mission.Faults;

/// <summary>The injector's timer for the end of a trigger condition's persistence period between frames.</summary>
public sealed record TriggerWake
{
    public static TriggerWake Instance { get; } = new();
}
