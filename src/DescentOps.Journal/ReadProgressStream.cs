namespace DescentOps.Journal;

/// <summary>
/// A read-only pass-through over a file that reports the share of it read so far, so that a command reading a long
/// log can show how far it has got. It reports at most once per <see cref="ReportEveryBytes"/> and once at the end.
/// </summary>
public sealed class ReadProgressStream : Stream
{
    /// <summary>Four mebibytes: some 30 000 lines of a typical log, a few milliseconds of reading.</summary>
    public const long ReportEveryBytes = 4L << 20;

    private readonly Stream _inner;
    private readonly Action<double> _share;
    private readonly double _length;
    private long _read;
    private long _nextReportAt = ReportEveryBytes;

    /// <param name="inner">A readable stream of known length; it is disposed with this one.</param>
    /// <param name="share">Called with the share read, from 0 to 1.</param>
    public ReadProgressStream(Stream inner, Action<double> share)
    {
        ArgumentNullException.ThrowIfNull(inner);
        ArgumentNullException.ThrowIfNull(share);
        if (!inner.CanRead || !inner.CanSeek) throw new ArgumentException("The stream must be readable and of known length.", nameof(inner));
        _inner = inner;
        _share = share;
        _length = Math.Max(1, inner.Length);
    }

    /// <summary>Opens a file for one sequential pass that reports its progress.</summary>
    public static ReadProgressStream OpenFile(string path, Action<double> share) => new(Utf8LineSource.OpenFile(path), share);

    public override bool CanRead => true;

    public override bool CanSeek => false;

    public override bool CanWrite => false;

    public override long Length => _inner.Length;

    public override long Position
    {
        get => _inner.Position;
        set => throw new NotSupportedException();
    }

    public override int Read(byte[] buffer, int offset, int count) => Count(_inner.Read(buffer, offset, count));

    public override int Read(Span<byte> buffer) => Count(_inner.Read(buffer));

    public override void Flush()
    {
    }

    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

    public override void SetLength(long value) => throw new NotSupportedException();

    public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();

    protected override void Dispose(bool disposing)
    {
        if (disposing) _inner.Dispose();
        base.Dispose(disposing);
    }

    private int Count(int bytes)
    {
        _read += bytes;
        if (bytes == 0 || _read >= _nextReportAt)
        {
            _nextReportAt = _read + ReportEveryBytes;
            _share(Math.Min(1, _read / _length));
        }

        return bytes;
    }
}
