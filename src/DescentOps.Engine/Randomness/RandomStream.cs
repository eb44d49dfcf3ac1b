using DescentOps.Primitives.Identity;
using MathNet.Numerics.Distributions;
using MathNet.Numerics.Random;

namespace DescentOps.Engine.Randomness;

/// <summary>
/// A component's own random numbers. The generator is MathNet's Xoshiro256StarStar (Blackman and Vigna 2018,
/// "Scrambled linear pseudorandom number generators"), seeded from (run seed, component id) by SplitMix64
/// so that adding a vehicle does not shift the draws of the probe. The algorithm is part of the log's
/// meaning: changing it changes every randomized run, so it is fixed here and named in the manifest.
/// </summary>
public sealed class RandomStream
{
    public const string AlgorithmName = "MathNet.Numerics Xoshiro256StarStar, seeded by SplitMix64(run seed, FNV-1a(component id))";

    private readonly Xoshiro256StarStar _generator;

    public RandomStream(long runSeed, ComponentId component)
    {
        DerivedSeed = DeriveSeed(runSeed, component);
        _generator = new Xoshiro256StarStar(DerivedSeed, threadSafe: false);
    }

    public int DerivedSeed { get; }

    /// <summary>Uniform on [0, 1).</summary>
    public double NextUniform() => _generator.NextDouble();

    /// <summary>Uniform integer in [minInclusive, maxExclusive).</summary>
    public int NextInt(int minInclusive, int maxExclusive) => _generator.Next(minInclusive, maxExclusive);

    public double NextNormal(double mean, double standardDeviation) => Normal.Sample(_generator, mean, standardDeviation);

    public double NextExponential(double rate) => Exponential.Sample(_generator, rate);

    public int NextPoisson(double lambda) => Poisson.Sample(_generator, lambda);

    public static int DeriveSeed(long runSeed, ComponentId component)
    {
        var mixed = SplitMix64(unchecked((ulong)runSeed) ^ SplitMix64(component.StableHash));
        return unchecked((int)(mixed ^ (mixed >> 32)));
    }

    /// <summary>The SplitMix64 finaliser (Steele, Lea and Flood 2014), a standard seed scrambler.</summary>
    private static ulong SplitMix64(ulong x)
    {
        // Arithmetic modulo 2^64 by design.
        unchecked
        {
            x += 0x9E3779B97F4A7C15UL;
            x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9UL;
            x = (x ^ (x >> 27)) * 0x94D049BB133111EBUL;
            return x ^ (x >> 31);
        }
    }
}
