using System.Text;

namespace DescentOps.Journal.Comparison;

/// <summary>
/// A write-only stream that compares what is written to it, line by line, with an expected journal, and
/// remembers the first line that differs. A replay writes its journal here, so a rerun is checked as it
/// runs without a second file on disk. Lines past <c>compareLines</c> are accepted and ignored (used for a
/// truncated original, whose intact prefix is all there is to compare).
/// </summary>
public sealed class LineComparingStream : Stream
{
    private readonly Utf8LineSource _expected;
    private readonly long _compareLines;
    private readonly MemoryStream _pending = new();
    private long _line;
    private bool _finished;

    public LineComparingStream(Stream expected, long compareLines = long.MaxValue)
    {
        _expected = new Utf8LineSource(expected, leaveOpen: false);
        _compareLines = compareLines;
    }

    public JournalDivergence? Divergence { get; private set; }

    /// <summary>Lines compared and found equal.</summary>
    public long LinesMatched { get; private set; }

    public override bool CanRead => false;
    public override bool CanSeek => false;
    public override bool CanWrite => true;
    public override long Length => throw new NotSupportedException();
    public override long Position { get => throw new NotSupportedException(); set => throw new NotSupportedException(); }

    public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

    public override void Write(ReadOnlySpan<byte> buffer)
    {
        while (!buffer.IsEmpty)
        {
            var newline = buffer.IndexOf((byte)'\n');
            if (newline < 0)
            {
                _pending.Write(buffer);
                return;
            }

            _pending.Write(buffer[..newline]);
            CompareLine(_pending.GetBuffer().AsSpan(0, (int)_pending.Length));
            _pending.SetLength(0);
            buffer = buffer[(newline + 1)..];
        }
    }

    /// <summary>
    /// Ends the comparison once the rerun's journal is complete (disposing does it too): an expected journal
    /// that goes on past the rerun's end is a divergence as well.
    /// </summary>
    public void Finish()
    {
        if (_finished) return;
        _finished = true;
        if (Divergence is not null || _line >= _compareLines) return;
        if (_pending.Length > 0)
        {
            CompareLine(_pending.GetBuffer().AsSpan(0, (int)_pending.Length));
            _pending.SetLength(0);
        }

        if (Divergence is null && _expected.TryReadLine(out var extra, out _))
        {
            Divergence = new JournalDivergence(_line + 1, JournalLineTime.Of(extra), null, Encoding.UTF8.GetString(extra), null);
        }
    }

    public override void Flush()
    {
    }

    public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
    public override void SetLength(long value) => throw new NotSupportedException();

    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            Finish();
            _expected.Dispose();
            _pending.Dispose();
        }

        base.Dispose(disposing);
    }

    private void CompareLine(ReadOnlySpan<byte> actual)
    {
        _line++;
        if (Divergence is not null || _line > _compareLines) return;
        if (!_expected.TryReadLine(out var expected, out _))
        {
            Divergence = new JournalDivergence(_line, null, JournalLineTime.Of(actual), null, Encoding.UTF8.GetString(actual));
            return;
        }

        if (expected.SequenceEqual(actual))
        {
            LinesMatched++;
            return;
        }

        Divergence = new JournalDivergence(_line, JournalLineTime.Of(expected), JournalLineTime.Of(actual), Encoding.UTF8.GetString(expected), Encoding.UTF8.GetString(actual));
    }
}
