namespace DescentOps.Journal.Tests;

/// <summary>A writable stream that accepts a given number of bytes and then fails like a full disk.</summary>
internal sealed class FailingStream(int acceptedBytes) : MemoryStream
{
    public override void Write(ReadOnlySpan<byte> buffer)
    {
        ThrowIfFull(buffer.Length);
        base.Write(buffer);
    }

    public override void Write(byte[] buffer, int offset, int count)
    {
        ThrowIfFull(count);
        base.Write(buffer, offset, count);
    }

    private void ThrowIfFull(int count)
    {
        if (Length + count > acceptedBytes)
        {
            throw new IOException("No space left on the test device.");
        }
    }
}
