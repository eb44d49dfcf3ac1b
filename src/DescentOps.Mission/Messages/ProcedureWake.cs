namespace DescentOps.Mission.Messages;

/// <summary>The ground's procedures are due: a step's time runs out.</summary>
public sealed record ProcedureWake
{
    public static ProcedureWake Instance { get; } = new();

    private ProcedureWake()
    {
    }
}
