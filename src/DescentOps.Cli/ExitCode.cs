namespace DescentOps.Cli;

/// <summary>
/// The process exit codes of <c>descentops</c>. Scripts depend on them: add new codes, never renumber.
/// </summary>
public enum ExitCode
{
    /// <summary>The command did its job; for <c>run</c>, the mission completed.</summary>
    Ok = 0,

    /// <summary>A defect in the tool itself; the message says what to report.</summary>
    InternalError = 1,

    /// <summary>The command line was wrong (unknown option, bad value).</summary>
    UsageError = 2,

    /// <summary>An input file (scenario) is malformed; every problem is listed with file, line and column.</summary>
    InvalidInput = 3,

    /// <summary>The run finished but the mission did not complete (time limit, mission lost, nothing left to do).</summary>
    MissionNotCompleted = 4,

    /// <summary>The run was aborted by a failing component or a kernel fault.</summary>
    RunAborted = 5,

    /// <summary>A log failed its hash-chain check: <c>verify</c> found it damaged or truncated, or another command refused a damaged log.</summary>
    VerificationFailed = 6,

    /// <summary>A file could not be read or written, or does not exist.</summary>
    IoError = 7,

    /// <summary><c>replay</c> (or <c>diff</c>) found the two runs different.</summary>
    RunsDiffer = 8,

    /// <summary>An output was not written: it exists (without <c>--force</c>) or it is an input of the command.</summary>
    OutputRefused = 9,

    /// <summary>Stopped by Ctrl-C or SIGTERM (128 + SIGINT, as shells report it); a run says where its partial log is.</summary>
    Interrupted = 130,
}
