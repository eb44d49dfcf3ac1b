using DescentOps.Records;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Journal.Tests;

public sealed class JournalWriterTests
{
    [Fact]
    public void Nothing_is_under_the_final_name_until_complete_renames_the_partial_file()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");
        string partial;

        using (var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest()))
        {
            foreach (var record in JournalSamples.Events(5))
            {
                writer.Write(record);
            }

            Assert.False(File.Exists(finalPath));
            Assert.True(File.Exists(writer.PartialPath));
            partial = writer.PartialPath!;

            writer.Complete(JournalSamples.Summary());
        }

        Assert.False(File.Exists(partial));
        Assert.Equal(JournalSamples.Standard(), File.ReadAllBytes(finalPath));
    }

    [Fact]
    public void Complete_replaces_an_older_journal()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");
        File.WriteAllText(finalPath, "an older run\n");

        using (var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest()))
        {
            writer.Complete(JournalSamples.Summary());
        }

        Assert.True(JournalVerifier.Verify(finalPath).Ok);
    }

    [Fact]
    public void Abandon_leaves_no_file()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");

        using (var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest()))
        {
            writer.Write(JournalSamples.Events(1)[0]);
            writer.Abandon();
        }

        Assert.Empty(Directory.GetFileSystemEntries(directory.Path));
    }

    [Fact]
    public void Disposing_an_unfinished_journal_keeps_every_line_under_the_partial_name()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");

        string partial;
        using (var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest()))
        {
            partial = writer.PartialPath!;
            foreach (var record in JournalSamples.Events(5))
            {
                writer.Write(record);
            }
        }

        Assert.False(File.Exists(finalPath));
        var report = JournalVerifier.Verify(partial);
        Assert.Equal(VerificationFailure.TruncatedTail, report.Failure);
        Assert.Equal(6, report.LinesChecked);
    }

    [Fact]
    public void What_is_on_disk_while_a_run_is_in_progress_is_an_intact_prefix()
    {
        using var directory = new TemporaryDirectory();
        var finalPath = directory.File("run.jsonl");

        using var writer = JournalWriter.Create(finalPath, JournalSamples.Manifest());

        // About 220 bytes an event: 2,000 events are some 440 KB, several times the writer's 64 KiB buffer.
        foreach (var record in JournalSamples.Events(2_000))
        {
            writer.Write(record);
        }

        // What a reader sees at this moment is what a kill at this moment would leave behind.
        using var onDisk = new FileStream(writer.PartialPath!, FileMode.Open, FileAccess.Read, FileShare.ReadWrite);
        var report = JournalVerifier.Verify(onDisk);

        Assert.Equal(VerificationFailure.TruncatedTail, report.Failure);
        Assert.InRange(report.LinesChecked, 2, 2_000);
        writer.Abandon();
    }

    [Fact]
    public void A_record_that_cannot_be_encoded_leaves_no_trace_and_the_journal_still_completes()
    {
        using var stream = new MemoryStream();
        using (var writer = JournalWriter.Create(stream, JournalSamples.Manifest()))
        {
            writer.Write(JournalSamples.Events(1)[0]);

            // The severity is looked up after seq, t, source and kind are already encoded: the failure is mid-line.
            var broken = new JournalRecord(SimTime.Epoch, new ComponentId("probe"), "probe.bad", (Severity)99, [RecordField.Of("x", 1)]);
            Assert.ThrowsAny<ArgumentOutOfRangeException>(() => writer.Write(broken));

            writer.Write(JournalSamples.Events(2)[1]);
            writer.Complete(JournalSamples.Summary());
        }

        var bytes = stream.ToArray();
        Assert.True(JournalVerifier.Verify(new MemoryStream(bytes)).Ok);
        var entries = JournalSamples.ReadAll(bytes, out _);
        Assert.Equal([1L, 2L], entries.OfType<EventEntry>().Select(entry => entry.Sequence));
        Assert.Equal(2, Assert.IsType<SummaryEntry>(entries[^1]).EventCount);
    }

    [Fact]
    public void A_lone_surrogate_is_refused_rather_than_replaced()
    {
        // One fact rather than a theory: xunit serializes theory data through UTF-8, which would already have
        // replaced the lone surrogates with U+FFFD before the test ran.
        string[] texts = ["a\uD800b", "ends high \uD83D", "\uDE00 starts low"];
        using var writer = JournalWriter.Create(new MemoryStream(), JournalSamples.Manifest());
        foreach (var text in texts)
        {
            var record = new JournalRecord(SimTime.Epoch, new ComponentId("probe"), "probe.note", Severity.Info, [RecordField.Of("text", text)]);

            Assert.Throws<ArgumentException>(() => writer.Write(record));
        }
    }

    [Fact]
    public void A_well_formed_surrogate_pair_is_kept()
    {
        var text = "face \U0001F600 end";
        var record = new JournalRecord(SimTime.Epoch, new ComponentId("probe"), "probe.note", Severity.Info, [RecordField.Of("text", text)]);

        var entries = JournalSamples.ReadAll(JournalSamples.Write(JournalSamples.Manifest(), [record], JournalSamples.Summary()), out _);

        Assert.Equal(text, Assert.IsType<EventEntry>(entries[1]).Data[0].Text);
    }

    [Fact]
    public void After_an_output_failure_the_writer_refuses_more_lines_and_still_disposes()
    {
        // Room for the sample manifest (460 bytes) but not for the first 64 KiB buffer of events.
        var stream = new FailingStream(acceptedBytes: 1_000);
        var writer = JournalWriter.Create(stream, JournalSamples.Manifest());

        Assert.Throws<IOException>(() =>
        {
            foreach (var record in JournalSamples.Events(2_000))
            {
                writer.Write(record);
            }
        });
        Assert.Throws<InvalidOperationException>(() => writer.Write(JournalSamples.Events(1)[0]));
        Assert.Throws<InvalidOperationException>(() => writer.Complete(JournalSamples.Summary()));
        writer.Dispose();

        Assert.Equal(VerificationFailure.TruncatedTail, JournalVerifier.Verify(new MemoryStream(stream.ToArray())).Failure);
    }

    [Fact]
    public void No_line_can_be_written_after_complete()
    {
        using var writer = JournalWriter.Create(new MemoryStream(), JournalSamples.Manifest());
        writer.Complete(JournalSamples.Summary());

        Assert.Throws<InvalidOperationException>(() => writer.Write(JournalSamples.Events(1)[0]));
        Assert.Throws<InvalidOperationException>(() => writer.Complete(JournalSamples.Summary()));
    }

    [Fact]
    public void A_manifest_longer_than_the_buffer_is_written_whole()
    {
        // Twice the writer's 64 KiB buffer.
        var manifest = JournalSamples.Manifest() with { ScenarioText = new string('x', 128 * 1024) };
        var bytes = JournalSamples.Write(manifest, JournalSamples.Events(3), JournalSamples.Summary());

        Assert.True(JournalVerifier.Verify(new MemoryStream(bytes)).Ok);
        var entries = JournalSamples.ReadAll(bytes, out _);
        Assert.Equal(manifest.ScenarioText, Assert.IsType<ManifestEntry>(entries[0]).Manifest.ScenarioText);
    }
}
