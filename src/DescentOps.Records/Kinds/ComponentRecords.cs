namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The kernel's supervision of components.</summary>
public static class ComponentRecords
{
    public const string Failed = "component.failed";
}
