namespace DescentOps.Mission.Procedures;

/// <summary>What became of a step: it passed, its check failed, or its wait ran past its time.</summary>
public enum StepVerdict
{
    Passed,
    Failed,
    Late,
}
