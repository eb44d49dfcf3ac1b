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

    /// <summary><c>verify</c> found a damaged or truncated log.</summary>
    VerificationFailed = 6,

    /// <summary>A file could not be read or written.</summary>
    IoError = 7,
}
