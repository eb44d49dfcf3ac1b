namespace DescentOps.Mission.Procedures;

/// <summary>How a procedure ended: it reached 'done', or 'abort' (a failed step with nowhere to go, or a loop).</summary>
public enum ProcedureOutcome
{
    Done,
    Aborted,
}
