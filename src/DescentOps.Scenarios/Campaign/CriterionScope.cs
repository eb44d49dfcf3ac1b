namespace DescentOps.Scenarios.Campaign;

/// <summary>
/// Whose figures a criterion judges. A scenario without landers has only the run's (<see cref="Run"/>). With landers a
/// criterion names one lander (<c>lander: NAME</c>), or asks it of every lander (<c>landers: every</c>, the default) or of
/// at least one (<c>landers: any</c>); each lander's own figures are measured, never a sum over landers.
/// </summary>
public enum CriterionScope
{
    Run,
    Lander,
    EveryLander,
    AnyLander,
}
