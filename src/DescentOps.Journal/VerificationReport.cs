namespace DescentOps.Journal;

/// <summary>The verdict on one journal.</summary>
/// <param name="LinesChecked">Lines found good before the first bad one (all of them when the journal is good).</param>
/// <param name="Failure">What went wrong first, or <see cref="VerificationFailure.None"/>.</param>
/// <param name="FirstBadLine">1-based number of the first bad line; for a missing summary, the line where it should be.</param>
/// <param name="Detail">One sentence for an operator.</param>
public sealed record VerificationReport(long LinesChecked, VerificationFailure Failure, long? FirstBadLine, string Detail)
{
    public bool Ok => Failure == VerificationFailure.None;

    public override string ToString() => Ok ? $"ok: {LinesChecked} lines" : $"line {FirstBadLine}: {Failure}: {Detail}";
}
