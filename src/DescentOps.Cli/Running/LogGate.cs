using DescentOps.Reports;

namespace DescentOps.Cli.Running;

/// <summary>
/// The check every command makes before it reads a log: the file exists and its hash chain holds. A damaged log is
/// refused (<see cref="ExitCode.VerificationFailed"/>); a cut tail, the normal end of a killed run, is read up to
/// its last intact line with a note on stderr.
/// </summary>
public static class LogGate
{
    public static LogIntegrity Open(string path)
    {
        if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
        var integrity = LogIntegrity.Check(path);
        if (integrity.State == LogState.Damaged) throw new LogIntegrityException($"{path}:{integrity.Line}: refused: the log fails verification: {integrity.Detail}");
        if (integrity.State == LogState.Truncated) Console.Error.WriteLine($"note: {path}: {integrity.TruncationNote}");
        return integrity;
    }
}
