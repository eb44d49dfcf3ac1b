using System.CommandLine;
using DescentOps.Journal;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops verify LOG</c>: checks the hash chain and layout of an event log.</summary>
public static class VerifyCommand
{
    public static Command Create()
    {
        var logArgument = new Argument<string>("LOG") { Description = "The event log to check." };
        var command = new Command("verify", "Check an event log's hash chain; report the first bad line or a truncated tail.") { logArgument };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
            var report = JournalVerifier.Verify(path);
            if (report.Ok)
            {
                Console.Out.WriteLine($"{path}: intact, {report.LinesChecked} lines");
                return (int)ExitCode.Ok;
            }

            Console.Out.WriteLine($"{path}:{report.FirstBadLine}: {report.Failure}: {report.Detail}");
            return (int)ExitCode.VerificationFailed;
        });
        return command;
    }
}
