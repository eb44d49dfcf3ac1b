using System.Text;

namespace DescentOps.Journal.Tests;

public sealed class JournalReaderTests
{
    [Fact]
    public void A_cut_tail_ends_the_read_cleanly_and_says_where()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        var cut = JournalSamples.Join(lines.Take(3)).Concat(lines[3].Take(20)).ToArray();

        var entries = JournalSamples.ReadAll(cut, out var reader);

        Assert.Equal(3, entries.Count);
        Assert.True(reader.IsTruncated);
        Assert.Equal(4, reader.TruncatedAtLine);
    }

    [Fact]
    public void A_journal_without_its_summary_is_truncated()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());

        var entries = JournalSamples.ReadAll(JournalSamples.Join(lines.Take(lines.Count - 1)), out var reader);

        Assert.Equal(lines.Count - 1, entries.Count);
        Assert.All(entries.Skip(1), entry => Assert.IsType<EventEntry>(entry));
        Assert.True(reader.IsTruncated);
        Assert.Equal(lines.Count, reader.TruncatedAtLine);
    }

    [Fact]
    public void A_complete_journal_is_not_truncated()
    {
        JournalSamples.ReadAll(JournalSamples.Standard(), out var reader);

        Assert.False(reader.IsTruncated);
        Assert.Null(reader.TruncatedAtLine);
    }

    [Fact]
    public void A_malformed_line_in_the_middle_is_an_error_naming_the_line()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines[2] = "{\"type\":\"event\",\"seq\":\n"u8.ToArray();

        var error = Assert.Throws<InvalidDataException>(() => JournalSamples.ReadAll(JournalSamples.Join(lines), out _));

        Assert.Contains("line 3", error.Message);
    }

    [Fact]
    public void A_scenario_text_that_does_not_match_its_digest_is_rejected()
    {
        var lines = JournalSamples.SplitLines(JournalSamples.Standard());
        lines[0] = Encoding.UTF8.GetBytes(Encoding.UTF8.GetString(lines[0]).Replace("heater_w: 5000", "heater_w: 9000", StringComparison.Ordinal));

        var error = Assert.Throws<InvalidDataException>(() => JournalSamples.ReadAll(JournalSamples.Join(lines), out _));

        Assert.Contains("scenario_sha256", error.Message);
    }

    [Fact]
    public void A_line_after_the_summary_is_an_error()
    {
        var bytes = JournalSamples.Standard();

        Assert.Throws<InvalidDataException>(() => JournalSamples.ReadAll(bytes.Concat(bytes).ToArray(), out _));
    }
}
