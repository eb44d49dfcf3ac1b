using System.CommandLine;
using DescentOps.Reports;
using DescentOps.Reports.Export;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops export LOG --format csv|sqlite [--output PATH]</c>: a log's events as CSV files or into a SQLite database.</summary>
public static class ExportCommand
{
    public static Command Create()
    {
        var logArgument = new Argument<string>("LOG") { Description = "The event log to export." };
        var formatOption = new Option<string>("--format") { Description = "csv (events.csv and telemetry.csv in a folder) or sqlite (one database; many runs may share it).", Required = true };
        formatOption.AcceptOnlyFromAmong("csv", "sqlite");
        var outputOption = new Option<string?>("--output") { Description = "The folder (csv; default LOG without extension plus -csv) or database file (sqlite; default LOG with .sqlite)." };
        var command = new Command("export", "Export a log's events as CSV or into a SQLite database; the same run exported again replaces its rows.") { logArgument, formatOption, outputOption };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
            // An edited log is refused: once its rows sit in a database beside good runs nobody would tell them apart.
            var integrity = LogIntegrity.Check(path);
            if (integrity.State == LogState.Damaged) throw new LogIntegrityException($"{path}:{integrity.Line}: refused: {integrity.Detail}");
            if (integrity.State == LogState.Truncated) Console.Error.WriteLine($"note: {path}: {integrity.TruncationNote}");

            var output = parse.GetValue(outputOption);
            if (parse.GetValue(formatOption) == "csv")
            {
                var csv = CsvExport.Write(path, output ?? CsvExport.DefaultDirectory(path));
                Console.Out.WriteLine($"export: {Path.GetFullPath(csv.EventsPath)} ({csv.Events} events), {Path.GetFullPath(csv.TelemetryPath)} ({csv.TelemetryRows} rows)");
            }
            else
            {
                var database = output ?? SqliteExport.DefaultPath(path);
                var sqlite = SqliteExport.Write(path, database);
                var how = sqlite.Replaced ? "replaced the same run already there as" : "added as";
                Console.Out.WriteLine($"export: {Path.GetFullPath(database)}: {how} run {sqlite.RunId} ({sqlite.Events} events, {sqlite.Fields} fields{(sqlite.TruncatedAtLine is { } at ? $", truncated at line {at}" : "")})");
            }

            return (int)ExitCode.Ok;
        });
        return command;
    }
}
