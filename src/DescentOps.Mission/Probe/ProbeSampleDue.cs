namespace DescentOps.Mission.Probe;

/// <summary>The probe's on-board sampling timer: time to read sensors for the on-board rules.</summary>
public sealed record ProbeSampleDue
{
    public static ProbeSampleDue Instance { get; } = new();

    private ProbeSampleDue()
    {
    }
}
