namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The fault injector: faults drawn, triggered, injected and cleared.</summary>
public static class FaultRecords
{
    public const string Cleared = "fault.cleared";
    public const string Drawn = "fault.drawn";
    public const string Injected = "fault.injected";
    public const string Triggered = "fault.triggered";
}
