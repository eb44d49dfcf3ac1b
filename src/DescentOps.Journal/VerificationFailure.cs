namespace DescentOps.Journal;

/// <summary>Why a journal failed verification.</summary>
public enum VerificationFailure
{
    /// <summary>The journal verified.</summary>
    None,

    /// <summary>Line 1 is missing or is not a manifest (an empty file, a deleted first line).</summary>
    MissingManifest,

    /// <summary>
    /// A line's chain value does not follow from the line before: a byte of this line was changed, or the line
    /// before it was deleted, moved or changed in its chain value.
    /// </summary>
    ChainMismatch,

    /// <summary>A line does not have the shape of a journal line (no chain member, unknown type, after the summary).</summary>
    UnparseableLine,

    /// <summary>The last line is cut short, or the journal ends without its summary line.</summary>
    TruncatedTail,
}
