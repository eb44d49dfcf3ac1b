namespace DescentOps.Mission.Procedures;

/// <summary>What became of a step: it passed, its check failed, or its wait ran past its time.</summary>
public enum StepVerdict
{
    Passed,
    Failed,
    Late,

    /// <summary>A person skipped the step: its command never went, and the procedure goes on as if it passed.</summary>
    Skipped,
}
