using System.CommandLine;
using DescentOps.Cli.Output;
using DescentOps.Journal;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops verify LOG</c>: checks the hash chain and layout of an event log.</summary>
public static class VerifyCommand
{
    public static Command Create()
    {
        var logArgument = CommonOptions.Log("The event log to check.");
        var jsonOption = CommonOptions.Json();
        var command = new Command("verify", "Check an event log's hash chain; report the first bad line or a truncated tail.") { logArgument, jsonOption };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
            var report = JournalVerifier.Verify(path);
            if (parse.GetValue(jsonOption))
            {
                JsonOutput.Write(w =>
                {
                    w.WriteString("log", path);
                    w.WriteBoolean("intact", report.Ok);
                    w.WriteString("state", report.Ok ? "intact" : report.Failure == VerificationFailure.TruncatedTail ? "truncated" : "damaged");
                    w.WriteNumber("lines_checked", report.LinesChecked);
                    w.Number("first_bad_line", report.FirstBadLine);
                    w.Text("failure", report.Ok ? null : report.Failure.ToString());
                    w.Text("detail", report.Ok ? null : report.Detail);
                });
            }
            else if (report.Ok)
            {
                Console.Out.WriteLine($"{path}: intact, {report.LinesChecked} lines");
            }
            else
            {
                Console.Out.WriteLine($"{path}:{report.FirstBadLine}: {report.Failure}: {report.Detail}");
            }

            return (int)(report.Ok ? ExitCode.Ok : ExitCode.VerificationFailed);
        });
        return command;
    }
}
