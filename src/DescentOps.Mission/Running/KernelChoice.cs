namespace DescentOps.Mission.Running;

/// <summary>Which kernel runs a mission: both write the same journal; the sequential one is the reference.</summary>
public enum KernelChoice
{
    Actors,
    Sequential,
}
