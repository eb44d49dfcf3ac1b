namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// How far ahead a PHOLD event schedules its child. Poisson in whole milliseconds makes zero delays and
/// ties common (many events per instant); exponential in microsecond ticks makes nearly every instant hold
/// one event, the worst case for a kernel that synchronises once per instant.
/// </summary>
public enum DelayLaw
{
    Poisson,
    Exponential,
}
