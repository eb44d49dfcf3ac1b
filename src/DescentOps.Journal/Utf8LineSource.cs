namespace DescentOps.Journal;

/// <summary>
/// Splits a stream into LF-terminated lines without decoding or copying them: each line is a span into one
/// large read buffer, refilled in big sequential reads. The reader and the verifier share it so both agree
/// on what a line is.
/// </summary>
internal sealed class Utf8LineSource : IDisposable
{
    // 1 MiB reads: far fewer system calls than lines, and big enough for the kernel's read-ahead to keep up.
    private const int InitialBufferSize = 1024 * 1024;

    // A line longer than this is taken as a corrupt file rather than buffered until memory runs out; the
    // largest expected line (a manifest carrying its scenario text) is a few hundred kilobytes.
    internal const int MaxLineBytes = 256 * 1024 * 1024;

    private readonly Stream _stream;
    private readonly bool _leaveOpen;
    private byte[] _buffer = new byte[InitialBufferSize];
    private int _start;
    private int _scanned;
    private int _end;
    private bool _endOfStream;

    public Utf8LineSource(Stream stream, bool leaveOpen)
    {
        _stream = stream;
        _leaveOpen = leaveOpen;
    }

    /// <summary>1-based number of the line last returned; 0 before the first.</summary>
    public long LineNumber { get; private set; }

    public static FileStream OpenFile(string path) =>
        // bufferSize 0: reads go straight into our own buffer instead of through a second one.
        new(path, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 0, FileOptions.SequentialScan);

    /// <summary>
    /// The next line without its LF. <paramref name="terminated"/> is false only for a last line that the
    /// stream ends in the middle of. Returns false at the end of the stream.
    /// </summary>
    /// <exception cref="InvalidDataException">A line is longer than <see cref="MaxLineBytes"/>.</exception>
    public bool TryReadLine(out ReadOnlySpan<byte> line, out bool terminated)
    {
        while (true)
        {
            var newLine = _buffer.AsSpan(_scanned, _end - _scanned).IndexOf(JournalFormat.NewLine);
            if (newLine >= 0)
            {
                var lineEnd = _scanned + newLine;
                line = _buffer.AsSpan(_start, lineEnd - _start);
                _start = _scanned = lineEnd + 1;
                terminated = true;
                LineNumber++;
                return true;
            }

            _scanned = _end;
            if (_endOfStream)
            {
                terminated = false;
                if (_start == _end)
                {
                    line = default;
                    return false;
                }

                line = _buffer.AsSpan(_start, _end - _start);
                _start = _scanned = _end;
                LineNumber++;
                return true;
            }

            Refill();
        }
    }

    public void Dispose()
    {
        if (!_leaveOpen)
        {
            _stream.Dispose();
        }
    }

    private void Refill()
    {
        var partial = _end - _start;
        if (_start > 0)
        {
            _buffer.AsSpan(_start, partial).CopyTo(_buffer);
            _start = 0;
            _scanned = _end = partial;
        }

        if (_end == _buffer.Length)
        {
            if (_buffer.Length >= MaxLineBytes)
            {
                throw new InvalidDataException($"Line {LineNumber + 1} is longer than {MaxLineBytes} bytes.");
            }

            Array.Resize(ref _buffer, Math.Min(_buffer.Length * 2, MaxLineBytes));
        }

        var read = _stream.Read(_buffer, _end, _buffer.Length - _end);
        if (read == 0)
        {
            _endOfStream = true;
        }

        _end += read;
    }
}
