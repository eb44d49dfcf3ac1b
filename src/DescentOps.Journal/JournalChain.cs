using System.IO.Hashing;

namespace DescentOps.Journal;

/// <summary>
/// The hash chain that ties each journal line to every line before it. Line n's chain value is
/// XxHash128(chain value of line n-1 as 32 lowercase hex ASCII bytes, then line n's bytes up to but not
/// including <c>,"chain"</c>); line 1 uses 32 '0' characters as its predecessor.
/// </summary>
/// <remarks>
/// The hash is deliberately non-cryptographic. The chain exists to catch accidents: an edited byte, a lost or
/// reordered line, a file cut short by a crash or a copy. XxHash128 catches all of those with a collision
/// chance far below any real concern and runs at memory speed, so verifying a large log costs what reading it
/// costs. A cryptographic hash would buy nothing here: the chain has no key, so anyone who edits a log on
/// purpose can recompute every later link whichever hash is used. Stopping a deliberate forger needs a
/// signature or a keyed MAC held elsewhere, which is outside this format.
/// </remarks>
internal sealed class JournalChain
{
    private readonly XxHash128 _hash = new();
    private readonly byte[] _currentHex = new byte[JournalFormat.ChainHexLength];

    public JournalChain()
    {
        _currentHex.AsSpan().Fill((byte)'0');
    }

    /// <summary>The chain value of the last line passed to <see cref="Advance"/>, as lowercase hex ASCII.</summary>
    public ReadOnlySpan<byte> CurrentHex => _currentHex;

    /// <summary>Links the next line, given its bytes before <c>,"chain"</c>.</summary>
    public void Advance(ReadOnlySpan<byte> lineBeforeChain)
    {
        _hash.Append(_currentHex);
        _hash.Append(lineBeforeChain);
        Span<byte> digest = stackalloc byte[JournalFormat.ChainHexLength / 2];
        _hash.GetHashAndReset(digest);
        WriteLowerHex(digest, _currentHex);
    }

    private static void WriteLowerHex(ReadOnlySpan<byte> bytes, Span<byte> destination)
    {
        ReadOnlySpan<byte> digits = "0123456789abcdef"u8;
        for (var i = 0; i < bytes.Length; i++)
        {
            destination[2 * i] = digits[bytes[i] >> 4];
            destination[(2 * i) + 1] = digits[bytes[i] & 0xF];
        }
    }
}
