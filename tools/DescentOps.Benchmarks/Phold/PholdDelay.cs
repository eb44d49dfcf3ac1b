using DescentOps.Engine.Randomness;
using DescentOps.Primitives.Time;

namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// The one place both the plain engine and the kernel model draw a child's target and delay, so that the two
/// implementations cannot drift apart in the order or kind of draws.
/// </summary>
public static class PholdDelay
{
    public static int DrawTarget(RandomStream random, int processes) => random.NextInt(0, processes);

    public static SimDuration DrawDelay(RandomStream random, DelayLaw law, double meanDelayMs) => law switch
    {
        DelayLaw.Poisson => SimDuration.FromSeconds(random.NextPoisson(meanDelayMs) / 1000.0),
        DelayLaw.Exponential => SimDuration.FromSeconds(random.NextExponential(1.0 / meanDelayMs) / 1000.0),
        _ => throw new ArgumentOutOfRangeException(nameof(law), law, null),
    };
}
