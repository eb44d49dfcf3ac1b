using System.Text;

namespace DescentOps.Campaigns;

/// <summary>
/// A write-only stream that keeps nothing but the last bytes written, so a journal can be encoded and chained in full
/// without touching a disk, and the summary line's chain value read off the end.
/// </summary>
public sealed class ChainTailStream : Stream
{
    private const int TailBytes = 256;
    private readonly byte[] _tail = new byte[TailBytes];
    private int _length;

    public override bool CanRead => false;
    public override bool CanSeek => false;
    public override bool CanWrite => true;
    public override long Length => throw new NotSupportedException();

    public override long Position
    {
        get => throw new NotSupportedException();
        set => throw new NotSupportedException();
    }

    /// <summary>The chain value of the last complete line written.</summary>
    public string LastChain()
    {
        var text = Encoding.ASCII.GetString(_tail, 0, _length);
        var at = text.LastIndexOf("\"chain\":\"", StringComparison.Ordinal);
        return at < 0 ? "" : text.Substring(at + 9, 32);
    }

    public override void Write(ReadOnlySpan<byte> buffer)
    {
        if (buffer.Length >= TailBytes)
        {
            buffer[^TailBytes..].CopyTo(_tail);
            _length = TailBytes;
            return;
        }

        var keep = Math.Min(_length, TailBytes - buffer.Length);
        Array.Copy(_tail, _length - keep, _tail, 0, keep);
        buffer.CopyTo(_tail.AsSpan(keep));
        _length = keep + buffer.Length;
    }

    public override void Write(byte[] buffer, int offset, int count) => Write(buffer.AsSpan(offset, count));

    public override void Flush()
    {
    }

    public override int Read(byte[] buffer, int offset, int count) => throw new NotSupportedException();
    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
    public override void SetLength(long value) => throw new NotSupportedException();
}
