namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// Folds each event an LP handles into that LP's running hash (FNV-1a style over 64-bit words), so two
/// engines agree on the checksum only if every LP saw the same events in the same order. The per-LP
/// hashes are then folded in LP order; each LP's own order is all that the kernels promise to fix.
/// </summary>
public static class OrderChecksum
{
    public const ulong Start = 14695981039346656037UL;
    private const ulong Prime = 1099511628211UL;

    public static ulong Fold(ulong hash, long word) => unchecked((hash ^ (ulong)word) * Prime);

    public static ulong Event(ulong hash, long timeTicks, long tokenId, int senderIndex) =>
        Fold(Fold(Fold(hash, timeTicks), tokenId), senderIndex);

    public static ulong Combine(IEnumerable<ulong> perProcess) =>
        perProcess.Aggregate(Start, (acc, h) => Fold(acc, unchecked((long)h)));
}
