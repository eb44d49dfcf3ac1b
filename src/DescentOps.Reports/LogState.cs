namespace DescentOps.Reports;

/// <summary>What a log is fit for before anything is made from it.</summary>
public enum LogState
{
    /// <summary>The chain holds from the manifest to the summary.</summary>
    Intact,

    /// <summary>The tail is cut or the summary is missing; every line before it is intact and usable.</summary>
    Truncated,

    /// <summary>A line was edited, lost or reordered, or nothing usable is left: refused.</summary>
    Damaged,
}
