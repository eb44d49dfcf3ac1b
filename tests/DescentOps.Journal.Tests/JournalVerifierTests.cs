using System.Text;

namespace DescentOps.Journal.Tests;

public sealed class JournalVerifierTests
{
    // The standard sample: manifest, five events, summary.
    private const int StandardLineCount = 7;

    [Fact]
    public void An_untouched_journal_verifies()
    {
        var report = Verify(JournalSamples.Standard());

        Assert.True(report.Ok, report.ToString());
        Assert.Equal(StandardLineCount, report.LinesChecked);
        Assert.Null(report.FirstBadLine);
    }

    [Fact]
    public void A_journal_file_verifies_from_its_path()
    {
        using var directory = new TemporaryDirectory();
        var path = directory.File("run.jsonl");
        File.WriteAllBytes(path, JournalSamples.Standard());

        Assert.True(JournalVerifier.Verify(path).Ok);
    }

    [Fact]
    public void One_edited_byte_in_an_event_is_reported_at_its_line()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var line = Encoding.UTF8.GetString(lines[3]);
        var position = line.IndexOf("\"step\":2", StringComparison.Ordinal) + "\"step\":".Length;
        lines[3][position] = (byte)'7';

        var report = Verify(JournalSamples.Join(lines));

        AssertFailure(report, VerificationFailure.ChainMismatch, line: 4);
    }

    [Fact]
    public void An_edited_scenario_text_is_reported_at_the_manifest()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var position = Encoding.UTF8.GetString(lines[0]).IndexOf("5000", StringComparison.Ordinal);
        lines[0][position] = (byte)'9';

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.ChainMismatch, line: 1);
    }

    [Fact]
    public void A_deleted_line_is_reported_at_the_line_after_the_gap()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.RemoveAt(2);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.ChainMismatch, line: 3);
    }

    [Fact]
    public void Swapped_lines_are_reported_at_the_first_of_them()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        (lines[2], lines[3]) = (lines[3], lines[2]);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.ChainMismatch, line: 3);
    }

    [Fact]
    public void A_tail_cut_inside_a_line_is_reported_as_truncated_at_that_line()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var kept = JournalSamples.Join(lines.Take(4)).Concat(lines[4].Take(lines[4].Length / 2)).ToArray();

        AssertFailure(Verify(kept), VerificationFailure.TruncatedTail, line: 5);
    }

    [Fact]
    public void A_last_line_without_its_newline_is_truncated()
    {
        var bytes = JournalSamples.Standard();

        AssertFailure(Verify(bytes[..^1]), VerificationFailure.TruncatedTail, line: StandardLineCount);
    }

    [Fact]
    public void A_journal_without_its_summary_is_truncated()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.RemoveAt(lines.Count - 1);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.TruncatedTail, line: StandardLineCount);
    }

    [Fact]
    public void A_journal_without_its_manifest_is_reported_as_such()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.RemoveAt(0);

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.MissingManifest, line: 1);
    }

    [Fact]
    public void An_empty_file_has_no_manifest()
    {
        AssertFailure(Verify([]), VerificationFailure.MissingManifest, line: 1);
    }

    [Fact]
    public void A_line_without_a_chain_member_is_unparseable()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines.Insert(2, "{\"type\":\"event\",\"seq\":99}\n"u8.ToArray());

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.UnparseableLine, line: 3);
    }

    [Fact]
    public void A_chain_value_that_is_not_lowercase_hex_is_unparseable()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines[1][^4] = (byte)'G';

        AssertFailure(Verify(JournalSamples.Join(lines)), VerificationFailure.UnparseableLine, line: 2);
    }

    [Fact]
    public void Anything_after_the_summary_is_rejected()
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
