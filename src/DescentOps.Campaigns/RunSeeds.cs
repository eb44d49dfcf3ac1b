namespace DescentOps.Campaigns;

/// <summary>
/// The seed of run i of a campaign with seed S: output i + 1 of the SplitMix64 generator started at S (Steele, Lea and
/// Flood 2014, "Fast splittable pseudorandom number generators", OOPSLA; the generator Blackman and Vigna recommend for
/// seeding xoshiro). SplitMix64's state advances by a fixed odd constant, so jumping to output i is one multiplication,
/// and its finaliser makes neighbouring outputs unrelated. Every variant's run i gets this seed (common random numbers);
/// inside a run, each component's stream is then seeded from (run seed, component id) as in any run.
/// </summary>
public static class RunSeeds
{
    public const string Scheme = "run i: output i+1 of SplitMix64 started at the campaign seed (Steele, Lea and Flood 2014); components then seeded as in any run";

    private const ulong Gamma = 0x9E3779B97F4A7C15UL;

    public static long ForRun(long campaignSeed, int index)
    {
        var x = unchecked((ulong)campaignSeed + (((ulong)index + 1) * Gamma));
        x = (x ^ (x >> 30)) * 0xBF58476D1CE4E5B9UL;
        x = (x ^ (x >> 27)) * 0x94D049BB133111EBUL;
        return unchecked((long)(x ^ (x >> 31)));
    }
}
