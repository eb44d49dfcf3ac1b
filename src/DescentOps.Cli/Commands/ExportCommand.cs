using System.CommandLine;
using DescentOps.Cli.Files;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Reports.Export;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops export LOG --format csv|sqlite [--output PATH]</c>: a log's events as CSV files or into a SQLite database.</summary>
public static class ExportCommand
{
    public static Command Create()
    {
        var logArgument = CommonOptions.Log("The event log to export.");
        var formatOption = new Option<string>("--format") { Description = "csv (events.csv and telemetry.csv in a folder) or sqlite (one database; many runs may share it).", Required = true, HelpName = "csv|sqlite" };
        formatOption.AcceptOnlyFromAmong("csv", "sqlite");
        var outputOption = CommonOptions.Output("The folder (csv; default LOG without extension plus -csv) or database file (sqlite; default LOG with .sqlite; an existing database receives the run).");
        var forceOption = CommonOptions.Force();
        var command = new Command("export", "Export a log's events as CSV or into a SQLite database; the same run exported again replaces its rows.") { logArgument, formatOption, outputOption, forceOption };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            // An edited log is refused: once its rows sit in a database beside good runs nobody would tell them apart.
            // One progress line for the whole command: the verification reads the log once, the export once (sqlite) or
            // twice (csv), so the verification is given about a third of the bar.
            var progress = new ProgressLine("  export ");
            progress.Around(() => LogGate.Open(path, share => progress.Fraction(0.3 * share, "verifying the log")));

            var output = parse.GetValue(outputOption);
            var force = parse.GetValue(forceOption);
            if (parse.GetValue(formatOption) == "csv")
            {
                var folder = output ?? CsvExport.DefaultDirectory(path);
                foreach (var file in new[] { folder, Path.Combine(folder, "events.csv"), Path.Combine(folder, "telemetry.csv") })
                {
                    if (OutputPaths.SameFile(file, path)) throw new OutputRefusedException($"{file} is also an input of this command; refusing to write over it.");
                }

                if (!force && (File.Exists(Path.Combine(folder, "events.csv")) || File.Exists(Path.Combine(folder, "telemetry.csv"))))
                {
                    throw new OutputRefusedException($"{folder} already holds an export; refusing to replace it (add --force to replace it, or name another folder).");
                }

                var csv = progress.Around(() => CsvExport.Write(path, folder, share => progress.Fraction(0.3 + 0.7 * share, "of the log exported")));

                Console.Out.WriteLine($"export: {Path.GetFullPath(csv.EventsPath)} ({csv.Events} events), {Path.GetFullPath(csv.TelemetryPath)} ({csv.TelemetryRows} rows)");
            }
            else
            {
                // A database gathers runs, so an existing one is added to, not replaced; but never the log itself.
                var database = output ?? SqliteExport.DefaultPath(path);
                if (OutputPaths.SameFile(database, path)) throw new OutputRefusedException($"{database} is also an input of this command; refusing to write over it.");
                var sqlite = progress.Around(() => SqliteExport.Write(path, database, share => progress.Fraction(0.3 + 0.7 * share, "of the log exported")));

                var how = sqlite.Replaced ? "replaced the same run already there as" : "added as";
                Console.Out.WriteLine($"export: {Path.GetFullPath(database)}: {how} run {sqlite.RunId} ({sqlite.Events} events, {sqlite.Fields} fields{(sqlite.TruncatedAtLine is { } at ? $", truncated at line {at}" : "")})");
            }

            return (int)ExitCode.Ok;
        });
        return command;
    }
}
