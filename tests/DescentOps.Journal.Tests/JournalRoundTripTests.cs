using System.IO.Hashing;
using System.Text;
using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Journal.Tests;

public sealed class JournalRoundTripTests
{
    [Fact]
    public void Manifest_events_and_summary_read_back_as_written()
    {
        var manifest = JournalSamples.Manifest();
        var events = JournalSamples.Events(5);
        var summary = JournalSamples.Summary();

        var entries = JournalSamples.ReadAll(JournalSamples.Write(manifest, events, summary), out var reader);

        Assert.False(reader.IsTruncated);
        Assert.Equal(1 + events.Count + 1, entries.Count);

        var readManifest = Assert.IsType<ManifestEntry>(entries[0]).Manifest;
        Assert.Equal(manifest with { Extra = [] }, readManifest with { Extra = [] });
        JournalSamples.AssertSameFields(manifest.Extra, readManifest.Extra);

        for (var i = 0; i < events.Count; i++)
        {
            var entry = Assert.IsType<EventEntry>(entries[1 + i]);
            Assert.Equal(i + 2, entry.LineNumber);
            Assert.Equal(i + 1, entry.Sequence);
            Assert.Equal(events[i].Time.SecondsSinceEpoch, entry.TimeSeconds);
            Assert.Equal(events[i].Source.Name, entry.Source);
            Assert.Equal(events[i].Kind, entry.Kind);
            Assert.Equal(events[i].Severity, entry.Severity);
            JournalSamples.AssertSameFields(events[i].Fields, entry.Data);
        }

        var readSummary = Assert.IsType<SummaryEntry>(entries[^1]);
        Assert.Equal(events.Count, readSummary.EventCount);
        Assert.Equal(summary.OutcomeKind, readSummary.Summary.OutcomeKind);
        Assert.Equal(summary.Reason, readSummary.Summary.Reason);
        Assert.Equal(summary.FinalTimeS, readSummary.Summary.FinalTimeS);
        JournalSamples.AssertSameFields(summary.Data, readSummary.Summary.Data);
    }

    [Fact]
    public void The_same_input_gives_the_same_bytes()
    {
        Assert.Equal(JournalSamples.Standard(), JournalSamples.Standard());
    }

    [Fact]
    public void The_standard_sample_keeps_its_bytes_across_builds_and_processes()
    {
        // Pinned from the first build of this format. A change here means journals written by earlier builds
        // would no longer be reproduced byte for byte: bump the format id rather than update this value lightly.
        const string pinned = "13dc80a561f88ccaf36c861ec7a85a135c9d5e5bcffbabaffe143280bccf4266";

        Assert.Equal(pinned, Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(JournalSamples.Standard())));
    }

    [Fact]
    public void An_event_line_has_the_documented_layout()
    {
        var record = new JournalRecord(
            new SimTime(2_500_000),
            new ComponentId("probe"),
            "probe.depth",
            Severity.Warning,
            [RecordField.Of("depth_m", 12.0), RecordField.Of("count", 3), RecordField.Of("ok", true), RecordField.Of("note", "a \"b\"")]);

        var lines = JournalSamples.SplitLines(JournalSamples.Write(JournalSamples.Manifest(), [record], JournalSamples.Summary()));
        var eventLine = Encoding.UTF8.GetString(lines[1]);

        // 12.0 keeps its ".0" so that it reads back as a double, not as the integer 12.
        const string expectedStart =
            "{\"type\":\"event\",\"seq\":1,\"t\":2.5,\"source\":\"probe\",\"kind\":\"probe.depth\",\"severity\":\"warning\"," +
            "\"data\":{\"depth_m\":12.0,\"count\":3,\"ok\":true,\"note\":\"a \\\"b\\\"\"},\"chain\":\"";
        Assert.StartsWith(expectedStart, eventLine);
        Assert.Matches("\"chain\":\"[0-9a-f]{32}\"}\n$", eventLine);
    }

    [Fact]
    public void The_manifest_line_carries_the_scenario_and_its_digest()
    {
        var manifest = JournalSamples.Manifest();
        var firstLine = Encoding.UTF8.GetString(JournalSamples.SplitLines(JournalSamples.Standard())[0]);

        Assert.StartsWith(
            "{\"type\":\"manifest\",\"format\":\"descentops-journal/1\",\"tool_version\":\"0.1.0-test\",\"scenario_name\":\"ice-shelf-drill\"," +
            $"\"scenario_sha256\":\"{manifest.ScenarioSha256}\",\"scenario_text\":\"# a scenario with \\\"quotes\\\", a tab\\t, a backslash \\\\, é and a line break\\nprobe:",
            firstLine);
        Assert.Contains("\"seed\":-42,\"until_s\":86400.5,\"random\":\"test-generator\",\"extra\":{\"host_threads\":2,\"profile\":\"ci\"},\"chain\":\"", firstLine);

        // The SHA-256 of "abc" from FIPS 180-2, appendix B.1: the digest is of the text's UTF-8 bytes, in lowercase hex.
        Assert.Equal("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", (manifest with { ScenarioText = "abc" }).ScenarioSha256);
    }

    [Fact]
    public void Each_chain_value_is_XxHash128_of_the_previous_value_and_the_line_before_its_chain_member()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var previous = new string('0', 32);
        foreach (var line in lines)
        {
            var text = Encoding.UTF8.GetString(line);
            var cut = text.LastIndexOf(",\"chain\":\"", StringComparison.Ordinal);
            var hashed = Encoding.UTF8.GetBytes(previous).Concat(Encoding.UTF8.GetBytes(text[..cut])).ToArray();
            var expected = Convert.ToHexStringLower(XxHash128.Hash(hashed));

            Assert.Equal($",\"chain\":\"{expected}\"}}\n", text[cut..]);
            previous = expected;
        }
    }

    [Fact]
    public void An_event_read_back_gives_the_engine_record_it_came_from()
    {
        // About 3.9 years of microseconds, with a last digit that a careless seconds conversion would lose.
        var record = new JournalRecord(new SimTime(123_456_789_012_345), new ComponentId("vehicle-2"), "vehicle.move", Severity.Notice, [RecordField.Of("x", 1.5)]);
        var entries = JournalSamples.ReadAll(JournalSamples.Write(JournalSamples.Manifest(), [record], JournalSamples.Summary()), out _);

        var back = Assert.IsType<EventEntry>(entries[1]).ToRecord();

        Assert.Equal(record.Time, back.Time);
        Assert.Equal(record.Source, back.Source);
        Assert.Equal(record.Kind, back.Kind);
        Assert.Equal(record.Severity, back.Severity);
    }

    [Fact]
    public void A_manifest_without_extra_has_no_extra_member()
    {
        var bytes = JournalSamples.Write(JournalSamples.Manifest() with { Extra = [] }, [], JournalSamples.Summary());
        var firstLine = Encoding.UTF8.GetString(JournalSamples.SplitLines(bytes)[0]);

        Assert.DoesNotContain("\"extra\"", firstLine);
        Assert.Contains("\"random\":\"test-generator\",\"chain\":\"", firstLine);
    }
}
