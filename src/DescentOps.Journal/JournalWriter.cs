using DescentOps.Records;

namespace DescentOps.Journal;

/// <summary>
/// Writes one run's journal: the manifest at creation, each event as the kernel delivers it, and the summary
/// at <see cref="Complete"/>. A file journal is written under <see cref="PartialPath"/> and renamed to its
/// final name only once the summary is on disk, so a file under the final name is always a finished run.
/// </summary>
/// <remarks>
/// <para>Lines are gathered in a 64 KiB buffer and handed to the file whenever the next line would not fit, so
/// a killed process leaves a prefix of whole lines (at most the last one cut, which the verifier reports as a
/// truncated tail) and the cost per event is a small memory copy, not a system call.</para>
/// <para>Disposing without <see cref="Complete"/> or <see cref="Abandon"/> hands over what is buffered and
/// leaves the partial file in place, exactly as a crash would but with nothing lost: the evidence of a failed
/// run stays, under a name nobody will take for a finished log. After an I/O error the writer is faulted:
/// it refuses further lines, since what reached the file is unknown, and disposing it only closes the file.</para>
/// <para>Each line ends with a hash chain value; see <see cref="JournalVerifier"/> for what it proves and why
/// the hash is not cryptographic.</para>
/// </remarks>
public sealed class JournalWriter : IJournalSink, IDisposable
{
    /// <summary>Appended to the final path while the run is in progress.</summary>
    public const string PartialSuffix = ".partial";

    // 64 KiB: large enough that system calls are rare next to encoding (a typical event line is ~220 bytes,
    // so one write per ~300 events), small enough that a crash loses little and the buffer stays in L2 cache.
    private const int BufferSize = 64 * 1024;

    // A line buffer that fits the usual event several times over; the manifest may grow it once.
    private const int InitialLineCapacity = 4 * 1024;

    private readonly Stream _output;
    private readonly bool _ownsOutput;
    private readonly JournalLineEncoder _encoder = new(InitialLineCapacity);
    private readonly byte[] _buffer = new byte[BufferSize];
    private int _buffered;
    private State _state = State.Open;

    private readonly bool _replaceExisting;

    private JournalWriter(Stream output, bool ownsOutput, string? finalPath, string? partialPath, bool replaceExisting = false)
    {
        _output = output;
        _ownsOutput = ownsOutput;
        FinalPath = finalPath;
        PartialPath = partialPath;
        _replaceExisting = replaceExisting;
    }

    private enum State
    {
        Open,
        Completed,
        Abandoned,
        Closed,

        // An I/O error: what reached the file is unknown, so nothing more may be appended to it.
        Faulted,
    }

    /// <summary>Where the finished journal will be; null for a stream journal.</summary>
    public string? FinalPath { get; }

    /// <summary>Where the journal is while the run is in progress; null for a stream journal.</summary>
    public string? PartialPath { get; }

    /// <summary>Events written so far.</summary>
    public long EventCount => _encoder.EventCount;

    /// <summary>
    /// Starts a file journal under a temporary name of its own beside <paramref name="finalPath"/>
    /// (<c>&lt;final&gt;.&lt;random&gt;.partial</c>) and writes the manifest through to the file at once, so that even a
    /// run killed at its first event leaves a log that says what it was.
    /// </summary>
    /// <remarks>
    /// The temporary file is created exclusively (it must not exist, and a symbolic link there is not followed), so
    /// two runs aimed at one path never share a file and an earlier crashed run's partial log is left alone.
    /// <paramref name="replaceExisting"/> decides what <see cref="Complete"/> does when the final name is taken by the
    /// time the run ends: replace that file, or refuse and keep the finished journal under its temporary name.
    /// </remarks>
    public static JournalWriter Create(string finalPath, RunManifest manifest, bool replaceExisting = true)
    {
        ArgumentException.ThrowIfNullOrEmpty(finalPath);
        ArgumentNullException.ThrowIfNull(manifest);
        var fullFinalPath = Path.GetFullPath(finalPath);
        var (file, partialPath) = CreateExclusive(fullFinalPath);
        var writer = new JournalWriter(file, ownsOutput: true, fullFinalPath, partialPath, replaceExisting);
        try
        {
            writer.Start(manifest);
        }
        catch
        {
            writer.Abandon();
            throw;
        }

        return writer;
    }

    /// <summary>A fresh temporary file beside <paramref name="fullFinalPath"/>, created with O_EXCL semantics.</summary>
    private static (FileStream File, string Path) CreateExclusive(string fullFinalPath)
    {
        for (var attempt = 0; ; attempt++)
        {
            var token = Convert.ToHexStringLower(System.Security.Cryptography.RandomNumberGenerator.GetBytes(4));
            var partialPath = $"{fullFinalPath}.{token}{PartialSuffix}";
            try
            {
                // CreateNew fails on any existing entry, a symbolic link included, so nothing outside is written through it.
                // bufferSize 0: this class does its own buffering; a second buffer inside FileStream would only copy twice.
                return (new FileStream(partialPath, FileMode.CreateNew, FileAccess.Write, FileShare.Read, bufferSize: 0), partialPath);
            }
            catch (IOException) when (attempt < 8 && File.Exists(partialPath))
            {
                // Another writer drew the same token: draw again.
            }
        }
    }

    /// <summary>
    /// Starts a journal on a caller's stream (tests, in-memory runs). The stream is flushed but never closed,
    /// and nothing is renamed or deleted.
    /// </summary>
    public static JournalWriter Create(Stream stream, RunManifest manifest)
    {
        ArgumentNullException.ThrowIfNull(stream);
        ArgumentNullException.ThrowIfNull(manifest);
        var writer = new JournalWriter(stream, ownsOutput: false, finalPath: null, partialPath: null);
        writer.Start(manifest);
        return writer;
    }

    public void Write(JournalRecord record)
    {
        ArgumentNullException.ThrowIfNull(record);
        ThrowUnlessOpen();
        Append(_encoder.EncodeEvent(record));
    }

    /// <summary>
    /// Writes the summary, pushes everything to disk, closes the file and moves it to <see cref="FinalPath"/>,
    /// replacing an older journal there only if the writer was created to. The rename comes after the flush to disk
    /// so that a power cut can leave the old file or the new one under the final name, never a torn one.
    /// </summary>
    /// <exception cref="IOException">The final name is taken and the writer may not replace it; the finished journal
    /// stays under <see cref="PartialPath"/>.</exception>
    public void Complete(RunSummary summary)
    {
        ArgumentNullException.ThrowIfNull(summary);
        ThrowUnlessOpen();
        Append(_encoder.EncodeSummary(summary));
        FlushBuffer();
        try
        {
            if (_ownsOutput)
            {
                ((FileStream)_output).Flush(flushToDisk: true);
            }
            else
            {
                _output.Flush();
            }
        }
        catch
        {
            _state = State.Faulted;
            throw;
        }

        // Completed before the rename: if the rename fails, the whole journal is still under the partial name.
        _state = State.Completed;
        if (_ownsOutput)
        {
            _output.Dispose();
            // Without overwrite the move is a link and an unlink: it fails, atomically, if the name was taken meanwhile.
            File.Move(PartialPath!, FinalPath!, overwrite: _replaceExisting);
        }
    }

    /// <summary>
    /// Gives the run's journal up: closes and deletes the partial file. For a stream journal it only stops
    /// further writes, since bytes already handed to a caller's stream cannot be taken back.
    /// </summary>
    public void Abandon()
    {
        if (_state is State.Completed or State.Abandoned or State.Closed)
        {
            return;
        }

        _state = State.Abandoned;
        if (_ownsOutput)
        {
            _output.Dispose();
            File.Delete(PartialPath!);
        }
    }

    public void Dispose()
    {
        if (_state is State.Completed or State.Abandoned or State.Closed)
        {
            return;
        }

        var flush = _state == State.Open;
        _state = State.Closed;
        try
        {
            if (flush)
            {
                FlushBuffer();
                _output.Flush();
            }
        }
        finally
        {
            if (_ownsOutput)
            {
                _output.Dispose();
            }
        }
    }

    private void Start(RunManifest manifest)
    {
        Append(_encoder.EncodeManifest(manifest));
        FlushBuffer();
        try
        {
            _output.Flush();
        }
        catch
        {
            _state = State.Faulted;
            throw;
        }
    }

    private void Append(ReadOnlySpan<byte> line)
    {
        if (line.Length > _buffer.Length - _buffered)
        {
            FlushBuffer();
            if (line.Length > _buffer.Length)
            {
                // A line longer than the buffer (a large scenario text) goes straight through.
                WriteThrough(line);
                return;
            }
        }

        line.CopyTo(_buffer.AsSpan(_buffered));
        _buffered += line.Length;
    }

    private void FlushBuffer()
    {
        if (_buffered > 0)
        {
            WriteThrough(_buffer.AsSpan(0, _buffered));
            _buffered = 0;
        }
    }

    private void WriteThrough(ReadOnlySpan<byte> bytes)
    {
        try
        {
            _output.Write(bytes);
        }
        catch
        {
            _state = State.Faulted;
            throw;
        }
    }

    private void ThrowUnlessOpen()
    {
        if (_state != State.Open)
        {
            throw new InvalidOperationException($"The journal is {_state.ToString().ToLowerInvariant()}; no more lines can be written.");
        }
    }
}
