using System.Text;

namespace DescentOps.Journal.Tests;

public sealed class JournalVerifierTests
{
    // The standard sample: manifest, five events, summary.
    private const int StandardLineCount = 7;

    [Fact]
    public void AnUntouchedJournalVerifies()
    {
        var report = Verify(JournalSamples.Standard());

        Assert.True(report.Ok, report.ToString());
        Assert.Equal(StandardLineCount, report.LinesChecked);
        Assert.Null(report.FirstBadLine);
    }

    [Fact]
    public void AJournalFileVerifiesFromItsPath()
    {
        using var directory = new TemporaryDirectory();
        var path = directory.File("run.jsonl");
        File.WriteAllBytes(path, JournalSamples.Standard());

        Assert.True(JournalVerifier.Verify(path).Ok);
    }

    [Fact]
    public void OneEditedByteInAnEventIsReportedAtItsLine()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var line = Encoding.UTF8.GetString(lines[3]);
        var position = line.IndexOf("\"step\":2", StringComparison.Ordinal) + "\"step\":".Length;
        lines[3][position] = (byte)'7';

        var report = Verify(JournalSamples.Join(lines));

        AssertFailure(report, VerificationFailure.ChainMismatch, line: 4);
    }

    [Fact]
    public void AnEditedScenarioTextIsReportedAtTheManifest()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var position = Encoding.UTF8.GetString(lines[0]).IndexOf("5000", StringComparison.Ordinal);
        lines[0][position] = (byte)'9';

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.ChainMismatch, line: 1);
    }

    [Fact]
    public void ADeletedLineIsReportedAtTheLineAfterTheGap()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.RemoveAt(2);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.ChainMismatch, line: 3);
    }

    [Fact]
    public void SwappedLinesAreReportedAtTheFirstOfThem()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        (lines[2], lines[3]) = (lines[3], lines[2]);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.ChainMismatch, line: 3);
    }

    [Fact]
    public void ATailCutInsideALineIsReportedAsTruncatedAtThatLine()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var kept = JournalSamples.Join(lines.Take(4)).Concat(lines[4].Take(lines[4].Length / 2)).ToArray();

        AssertFailure(Verify(kept), VerificationFailure.TruncatedTail, line: 5);
    }

    [Fact]
    public void ALastLineWithoutItsNewlineIsTruncated()
    {
        var bytes = JournalSamples.Standard();

        AssertFailure(Verify(bytes[..^1]), VerificationFailure.TruncatedTail, line: StandardLineCount);
    }

    [Fact]
    public void AJournalWithoutItsSummaryIsTruncated()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.RemoveAt(lines.Count - 1);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.TruncatedTail, line: StandardLineCount);
    }

    [Fact]
    public void AJournalWithoutItsManifestIsReportedAsSuch()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.RemoveAt(0);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.MissingManifest, line: 1);
    }

    [Fact]
    public void AnEmptyFileHasNoManifest()
    {
        AssertFailure(Verify([]), VerificationFailure.MissingManifest, line: 1);
    }

    [Fact]
    public void ALineWithoutAChainMemberIsUnparseable()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.Insert(2, "{\"type\":\"event\",\"seq\":99}\n"u8.ToArray());

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.UnparseableLine, line: 3);
    }

    [Fact]
    public void AChainValueThatIsNotLowercaseHexIsUnparseable()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines[1][^4] = (byte)'G';

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.UnparseableLine, line: 2);
    }

    [Fact]
    public void AnythingAfterTheSummaryIsRejected()
    {
        var bytes = JournalSamples.Standard();
        var twice = bytes.Concat(bytes).ToArray();

        var report = Verify(twice);

        Assert.False(report.Ok);
        Assert.Equal(StandardLineCount + 1, report.FirstBadLine);
    }

    private static VerificationReport Verify(byte[] journal) => JournalVerifier.Verify(new MemoryStream(journal));

    private static void AssertFailure(VerificationReport report, VerificationFailure failure, long line)
    {
        Assert.False(report.Ok);
        Assert.Equal(failure, report.Failure);
        Assert.Equal(line, report.FirstBadLine);
        Assert.Equal(line - 1, report.LinesChecked);
    }
}
