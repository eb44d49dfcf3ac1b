using System.Globalization;
using DescentOps.Primitives.Time;

namespace DescentOps.Benchmarks.Phold;

/// <summary>The benchmark's knobs, parsed from "--name value" pairs after the word "phold".</summary>
public sealed record PholdOptions(
    int Processes,
    int Tokens,
    long TargetEvents,
    double MeanDelayMs,
    DelayLaw? OnlyLaw,
    int Repeats,
    long Seed)
{
    public static PholdOptions Default { get; } = new(8, 64, 400_000, 1.0, null, 5, 1);

    public IEnumerable<DelayLaw> Laws => OnlyLaw is { } law ? [law] : [DelayLaw.Poisson, DelayLaw.Exponential];

    /// <summary>
    /// The time limit that yields about <see cref="TargetEvents"/> token events: each token fires once per
    /// mean delay, so events ≈ tokens × limit / mean delay. A Poisson delay of mean λ is drawn as whole
    /// milliseconds, as is the exponential one but in ticks, so both laws share the mean.
    /// </summary>
    public SimTime Until => SimTime.Epoch + SimDuration.FromSeconds(TargetEvents * MeanDelayMs / 1000.0 / Tokens);

    public static PholdOptions Parse(IReadOnlyList<string> args)
    {
        var options = Default;
        for (var i = 0; i < args.Count; i += 2)
        {
            if (i + 1 >= args.Count) throw new ArgumentException($"option {args[i]} needs a value");
            var value = args[i + 1];
            options = args[i] switch
            {
                "--lps" => options with { Processes = PositiveInt(value) },
                "--tokens" => options with { Tokens = PositiveInt(value) },
                "--events" => options with { TargetEvents = long.Parse(value, CultureInfo.InvariantCulture) },
                "--mean-delay-ms" => options with { MeanDelayMs = double.Parse(value, CultureInfo.InvariantCulture) },
                "--delay" => options with { OnlyLaw = Enum.Parse<DelayLaw>(value, ignoreCase: true) },
                "--repeats" => options with { Repeats = PositiveInt(value) },
                "--seed" => options with { Seed = long.Parse(value, CultureInfo.InvariantCulture) },
                _ => throw new ArgumentException($"unknown option {args[i]}"),
            };
        }

        return options;
    }

    private static int PositiveInt(string value)
    {
        var n = int.Parse(value, CultureInfo.InvariantCulture);
        return n > 0 ? n : throw new ArgumentException($"expected a positive number, got {value}");
    }
}
