using DescentOps.Journal;

namespace DescentOps.Reports;

/// <summary>
/// The verdict that decides whether a report or an export may be made from a log. A cut tail is a normal end
/// of a killed run and still worth a post-mortem; anything else the chain catches means the numbers cannot be
/// trusted, so nothing is made from them.
/// </summary>
/// <param name="State">Intact, truncated (usable prefix) or damaged (refused).</param>
/// <param name="Line">For a truncated log, the cut line or where the summary should be; for a damaged one, the first bad line.</param>
/// <param name="Detail">One sentence for an operator, from the verifier.</param>
public sealed record LogIntegrity(LogState State, long? Line, string Detail)
{
    /// <param name="path">The log.</param>
    /// <param name="progress">Called now and then with the share of the log verified (0 to 1).</param>
    public static LogIntegrity Check(string path, Action<double>? progress = null)
    {
        VerificationReport report;
        if (progress is null)
        {
            report = JournalVerifier.Verify(path);
        }
        else
        {
            using var stream = ReadProgressStream.OpenFile(path, progress);
            report = JournalVerifier.Verify(stream);
        }

        return report.Failure switch
        {
            VerificationFailure.None => new LogIntegrity(LogState.Intact, null, report.Detail),
            // A cut first line leaves no manifest, so there is nothing to say what the run was.
            VerificationFailure.TruncatedTail when report.LinesChecked > 0 => new LogIntegrity(LogState.Truncated, report.FirstBadLine, report.Detail),
            _ => new LogIntegrity(LogState.Damaged, report.FirstBadLine, $"{report.Failure}: {report.Detail}"),
        };
    }

    /// <summary>The note printed and written into outputs for a truncated log.</summary>
    public string TruncationNote =>
        $"the log is truncated at line {Line}: only the lines before it are used, and the run's summary is missing.";
}
