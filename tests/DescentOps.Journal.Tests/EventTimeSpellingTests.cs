using System.Globalization;
using System.Text;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Journal.Tests;

/// <summary>
/// The writer spells event times from ticks without the double formatter; these tests hold that spelling to
/// the general one, ticks / 10^6 formatted "R" (plus ".0" when it looks like an integer).
/// </summary>
public sealed class EventTimeSpellingTests
{
    // 2^33 s in ticks: where the writer's shortcut ends.
    private const long ShortcutLimit = (1L << 33) * 1_000_000;

    [Fact]
    public void Times_around_the_shortcuts_boundaries_are_spelled_as_the_general_formatter_spells_them()
    {
        long[] ticks =
        [
            0, 1, 9, 10, 99, 100, 999, 1_000, 1_001, 10_000, 100_000, 999_999, 1_000_000, 1_000_001, 1_500_000,
            123_456_789, 86_400_000_000, ShortcutLimit - 1, ShortcutLimit, ShortcutLimit + 1, long.MaxValue, -1, -1_500_000,
        ];

        AssertSpelledLikeTheGeneralFormatter(ticks);
    }

    [Fact]
    public void Random_times_of_every_magnitude_are_spelled_as_the_general_formatter_spells_them()
    {
        // A fixed seed: the same 20,000 times on every run, spread over every power of two a tick count can reach.
        var random = new Random(20_260_601);
        var ticks = new long[20_000];
        for (var i = 0; i < ticks.Length; i++)
        {
            var bits = random.Next(1, 63);
            ticks[i] = random.NextInt64(1L << (bits - 1), bits == 63 ? long.MaxValue : 1L << bits);
        }

        AssertSpelledLikeTheGeneralFormatter(ticks);
    }

    private static void AssertSpelledLikeTheGeneralFormatter(long[] ticks)
    {
        var records = ticks.Select(t => new JournalRecord(new SimTime(t), new ComponentId("probe"), "probe.tick", Severity.Debug, []));
        var lines = JournalSamples.SplitLines(JournalSamples.Write(JournalSamples.Manifest(), records, JournalSamples.Summary()));

        for (var i = 0; i < ticks.Length; i++)
        {
            var line = Encoding.UTF8.GetString(lines[1 + i]);
            var start = line.IndexOf(",\"t\":", StringComparison.Ordinal) + ",\"t\":".Length;
            var spelled = line[start..line.IndexOf(',', start)];

            var seconds = ticks[i] / 1e6;
            var expected = seconds.ToString("R", CultureInfo.InvariantCulture);
            if (!expected.Contains('.') && !expected.Contains('E'))
            {
                expected += ".0";
            }

            Assert.True(expected == spelled, $"ticks {ticks[i]}: expected {expected}, written {spelled}");
        }
    }
}
