using System.Buffers;

namespace DescentOps.Journal;

/// <summary>
/// Checks a journal's hash chain and layout at the speed the disk delivers it: lines are hashed as raw bytes
/// straight from a large read buffer, and only the fixed-shape ends of each line are looked at (the type at
/// its start, the chain member at its end), never parsed as JSON.
/// </summary>
/// <remarks>
/// The chain (see the format notes on <see cref="JournalWriter"/>) is XxHash128, not a cryptographic hash. It
/// is there to detect accidental damage: a changed byte, a lost, duplicated or reordered line, a file cut off
/// by a crash or a partial copy. Against someone who edits a log deliberately no keyless chain helps, SHA-256
/// or otherwise, because they can recompute every later link; so the chain is chosen for speed, and a real
/// defence against forgery would have to be a signature kept outside the file.
/// </remarks>
public static class JournalVerifier
{
    private static readonly SearchValues<byte> LowerHexDigits = SearchValues.Create("0123456789abcdef"u8);

    public static VerificationReport Verify(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        return Verify(Utf8LineSource.OpenFile(path), leaveOpen: false);
    }

    public static VerificationReport Verify(Stream stream)
    {
        ArgumentNullException.ThrowIfNull(stream);
        return Verify(stream, leaveOpen: true);
    }

    private static VerificationReport Verify(Stream stream, bool leaveOpen)
    {
        using var lines = new Utf8LineSource(stream, leaveOpen);
        var chain = new JournalChain();
        var lastWasSummary = false;
        long good = 0;
        while (true)
        {
            ReadOnlySpan<byte> line;
            bool terminated;
            try
            {
                if (!lines.TryReadLine(out line, out terminated))
                {
                    break;
                }
            }
            catch (InvalidDataException exception)
            {
                return Bad(good, VerificationFailure.UnparseableLine, exception.Message);
            }

            var lineNumber = lines.LineNumber;
            if (lineNumber == 1 && !line.StartsWith(JournalFormat.ManifestPrefix))
            {
                return Bad(good, VerificationFailure.MissingManifest, "The first line is not a manifest.");
            }

            if (!terminated)
            {
                return Bad(good, VerificationFailure.TruncatedTail, "The last line is cut short (no newline).");
            }

            if (!TrySplitChain(line, out var body, out var recordedChain))
            {
                return Bad(good, VerificationFailure.UnparseableLine, "The line does not end with a chain member.");
            }

            chain.Advance(body);
            if (!recordedChain.SequenceEqual(chain.CurrentHex))
            {
                return Bad(good, VerificationFailure.ChainMismatch,
                    "The chain value does not follow from the previous line: this line was edited, or a line before it is missing or out of order.");
            }

            if (lastWasSummary)
            {
                return Bad(good, VerificationFailure.UnparseableLine, "A line follows the summary line.");
            }

            if (lineNumber > 1)
            {
                lastWasSummary = line.StartsWith(JournalFormat.SummaryPrefix);
                if (!lastWasSummary && !line.StartsWith(JournalFormat.EventPrefix))
                {
                    return Bad(good, VerificationFailure.UnparseableLine, "The line is neither an event nor the summary.");
                }
            }

            good++;
        }

        if (good == 0)
        {
            return Bad(good, VerificationFailure.MissingManifest, "The journal is empty.");
        }

        return lastWasSummary
            ? new VerificationReport(good, VerificationFailure.None, null, "The chain holds from the manifest to the summary.")
            : Bad(good, VerificationFailure.TruncatedTail, "The journal ends without a summary line.");
    }

    /// <summary>
    /// Finds the chain member from the end of the line, where it always is: <c>,"chain":"</c>, 32 lowercase
    /// hex digits, <c>"}</c>. Looking from the end needs no JSON parsing and cannot be fooled by the same text
    /// inside a string value earlier on the line.
    /// </summary>
    private static bool TrySplitChain(ReadOnlySpan<byte> line, out ReadOnlySpan<byte> body, out ReadOnlySpan<byte> chainHex)
    {
        body = chainHex = default;
        var suffixLength = JournalFormat.ChainSuffixLength;
        if (line.Length <= suffixLength || !line.EndsWith(JournalFormat.LineEnd))
        {
            return false;
        }

        var bodyLength = line.Length - suffixLength;
        if (!line[bodyLength..].StartsWith(JournalFormat.ChainSeparator))
        {
            return false;
        }

        chainHex = line.Slice(bodyLength + JournalFormat.ChainSeparator.Length, JournalFormat.ChainHexLength);
        if (chainHex.IndexOfAnyExcept(LowerHexDigits) >= 0)
        {
            return false;
        }

        body = line[..bodyLength];
        return true;
    }

    private static VerificationReport Bad(long good, VerificationFailure failure, string detail) =>
        new(good, failure, good + 1, detail);
}
