using DescentOps.Records;

namespace DescentOps.Benchmarks.Phold;

/// <summary>
/// The lean sink: counts every record and keeps only the processes' checksum lines, then hands the record
/// on to <paramref name="next"/> if there is one (the file journal). Alone it measures the cost of producing
/// and committing records, not of encoding or writing them.
/// </summary>
public sealed class ChecksumSink(IJournalSink? next = null) : IJournalSink
{
    private readonly SortedDictionary<string, ulong> _checksums = new(StringComparer.Ordinal);

    public long Records { get; private set; }

    public void Write(JournalRecord record)
    {
        Records++;
        if (record.Kind == PholdProcess.ChecksumKind)
        {
            _checksums[record.Source.Name] = unchecked((ulong)record.Fields[0].Integer);
        }

        next?.Write(record);
    }

    /// <summary>Process hashes folded in process index order, matching the plain engine.</summary>
    public ulong Checksum(IEnumerable<string> processNamesInIndexOrder) =>
        OrderChecksum.Combine(processNamesInIndexOrder.Select(name => _checksums[name]));
}
