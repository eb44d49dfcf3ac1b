namespace DescentOps.Journal.Tests;

public sealed class ReadProgressStreamTests
{
    [Fact]
    public void A_verified_log_reports_growing_shares_that_end_at_one()
    {
        using var folder = new TemporaryDirectory();
        var path = folder.File("long.jsonl");
        // 60 000 events make a log of several report intervals (4 MiB each), so more than the final report is seen.
        File.WriteAllBytes(path, JournalSamples.Write(JournalSamples.Manifest(), JournalSamples.Events(60_000), JournalSamples.Summary()));
        var length = new FileInfo(path).Length;
        Assert.True(length > 2 * ReadProgressStream.ReportEveryBytes, $"sample log of {length} bytes is too short for this test");

        var shares = new List<double>();
        VerificationReport report;
        using (var stream = ReadProgressStream.OpenFile(path, shares.Add))
        {
            report = JournalVerifier.Verify(stream);
        }

        Assert.Equal(VerificationFailure.None, report.Failure);
        Assert.True(shares.Count >= 3, $"only {shares.Count} reports");
        Assert.Equal(shares.OrderBy(s => s), shares);
        Assert.All(shares, s => Assert.InRange(s, 0.0, 1.0));
        Assert.Equal(1.0, shares[^1]);
        // No report is more than one interval behind the bytes actually read.
        Assert.True(shares[0] <= (double)ReadProgressStream.ReportEveryBytes * 2 / length);
    }

    [Fact]
    public void Reading_through_it_gives_the_same_entries_as_reading_the_file()
    {
        using var folder = new TemporaryDirectory();
        var path = folder.File("small.jsonl");
        File.WriteAllBytes(path, JournalSamples.Standard());
        using var direct = JournalReader.Open(path);
        var reported = new List<double>();
        using var counted = new JournalReader(ReadProgressStream.OpenFile(path, reported.Add));

        Assert.Equal(direct.ReadAll().Count(), counted.ReadAll().Count());
        Assert.Equal(1.0, reported[^1]);
    }

    [Fact]
    public void A_stream_that_cannot_tell_its_length_is_refused()
    {
        using var pipe = new System.IO.Pipes.AnonymousPipeServerStream();
        Assert.Throws<ArgumentException>(() => new ReadProgressStream(pipe, _ => { }));
    }
}
