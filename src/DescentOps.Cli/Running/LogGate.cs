using DescentOps.Reports;

namespace DescentOps.Cli.Running;

/// <summary>
/// The check every command makes before it reads a log: the file exists and its hash chain holds. A damaged log is
/// refused (<see cref="ExitCode.VerificationFailed"/>); a cut tail, the normal end of a killed run, is read up to
/// its last intact line with a note on stderr.
/// </summary>
public static class LogGate
{
    /// <param name="path">The log.</param>
    /// <param name="progress">Called now and then with the share of the log verified (0 to 1).</param>
    public static LogIntegrity Open(string path, Action<double>? progress = null)
    {
        if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
        var integrity = LogIntegrity.Check(path, progress);
        if (integrity.State == LogState.Damaged) throw new LogIntegrityException($"{path}:{integrity.Line}: refused: the log fails verification: {integrity.Detail}");
        if (integrity.State == LogState.Truncated) Console.Error.WriteLine($"note: {path}: {integrity.TruncationNote}");
        return integrity;
    }
}
