namespace DescentOps.Scenarios.Campaign;

/// <summary>The distribution an uncertain input is drawn from.</summary>
public enum UncertainDistribution
{
    Normal,
    LogNormal,
    Uniform,
    Triangular,
}
