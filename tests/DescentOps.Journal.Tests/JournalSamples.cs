using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Journal.Tests;

/// <summary>Small journals with every kind of value, built the same way each time.</summary>
internal static class JournalSamples
{
    public static RunManifest Manifest() => new(
        ToolVersion: "0.1.0-test",
        ScenarioName: "ice-shelf-drill",
        ScenarioText: "# a scenario with \"quotes\", a tab\t, a backslash \\, é and a line break\nprobe:\n  heater_w: 5000\n",
        Seed: -42,
        UntilSeconds: 86_400.5,
        RandomAlgorithm: "test-generator")
    {
        Extra = [RecordField.Of("host_threads", 2), RecordField.Of("profile", "ci")],
    };

    public static IReadOnlyList<JournalRecord> Events(int count)
    {
        var records = new List<JournalRecord>(count);
        for (var i = 0; i < count; i++)
        {
            records.Add(new JournalRecord(
                new SimTime(1_500_000L * (i + 1)),
                new ComponentId(i % 2 == 0 ? "probe" : "tether"),
                i % 2 == 0 ? "probe.depth" : "tether.payout",
                (Severity)(i % 6),
                [
                    RecordField.Of("depth_m", 12.25 + i),
                    RecordField.Of("step", (long)i),
                    RecordField.Of("heater_on", i % 3 == 0),
                    RecordField.Of("note", $"line {i} \"quoted\" ü"),
                ]));
        }

        return records;
    }

    public static RunSummary Summary() => new(
        "Completed",
        "reached the ice-water interface",
        9.0,
        [RecordField.Of("final_depth_m", 412.75), RecordField.Of("restarts", 0), RecordField.Of("frozen_in", false)]);

    public static byte[] Write(RunManifest manifest, IEnumerable<JournalRecord> events, RunSummary summary)
    {
        using var stream = new MemoryStream();
        using (var writer = JournalWriter.Create(stream, manifest))
        {
            foreach (var record in events)
            {
                writer.Write(record);
            }

            writer.Complete(summary);
        }

        return stream.ToArray();
    }

    public static byte[] Standard() => Write(Manifest(), Events(5), Summary());

    /// <summary>The lines of a journal, each with its LF, so tests can cut and splice whole lines.</summary>
    public static List<byte[]> SplitLines(byte[] journal)
    {
        var lines = new List<byte[]>();
        var start = 0;
        for (var i = 0; i < journal.Length; i++)
        {
            if (journal[i] == (byte)'\n')
            {
                lines.Add(journal[start..(i + 1)]);
                start = i + 1;
            }
        }

        Assert.Equal(journal.Length, start);
        return lines;
    }

    public static byte[] Join(IEnumerable<byte[]> lines) => lines.SelectMany(line => line).ToArray();

    public static void AssertSameFields(IReadOnlyList<RecordField> expected, IReadOnlyList<RecordField> actual)
    {
        Assert.Equal(expected.Count, actual.Count);
        for (var i = 0; i < expected.Count; i++)
        {
            Assert.Equal(expected[i].Name, actual[i].Name);
            Assert.Equal(expected[i].Kind, actual[i].Kind);

            // Bit patterns, because double equality calls -0.0 and 0.0 equal.
            Assert.Equal(BitConverter.DoubleToInt64Bits(expected[i].Number), BitConverter.DoubleToInt64Bits(actual[i].Number));
            Assert.Equal(expected[i].Integer, actual[i].Integer);
            Assert.Equal(expected[i].Text, actual[i].Text);
        }
    }

    public static List<JournalEntry> ReadAll(byte[] journal, out JournalReader reader)
    {
        reader = new JournalReader(new MemoryStream(journal));
        return reader.ReadAll().ToList();
    }
}
