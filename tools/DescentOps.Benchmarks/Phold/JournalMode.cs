namespace DescentOps.Benchmarks.Phold;

/// <summary>What a kernel case does with the records: the processes journal every token only when not <see cref="None"/>.</summary>
public enum JournalMode
{
    /// <summary>Only the processes' checksum lines at the limit.</summary>
    None,

    /// <summary>Every token journaled to a sink that only counts: the cost of producing and committing records.</summary>
    Counting,

    /// <summary>Every token journaled through the project's JournalWriter to a file: the full cost of a log.</summary>
    File,
}
