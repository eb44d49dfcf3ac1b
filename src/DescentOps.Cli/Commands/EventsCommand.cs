using System.CommandLine;
using System.Globalization;
using DescentOps.Records;
using DescentOps.Journal.Querying;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops events LOG</c>: filters a log's events and prints them as a table or JSON Lines.</summary>
public static class EventsCommand
{
    public static Command Create()
    {
        var logArgument = new Argument<string>("LOG") { Description = "The event log to read." };
        var kindOption = new Option<string[]>("--kind") { Description = "Event kind, exact or a prefix ending in '.' or '*' (repeatable), e.g. tether. or probe.breakthrough.", AllowMultipleArgumentsPerToken = true };
        var sourceOption = new Option<string[]>("--source") { Description = "Source component (repeatable), e.g. probe, tether, vehicle-minnow-1.", AllowMultipleArgumentsPerToken = true };
        var severityOption = new Option<Severity>("--severity") { Description = "Lowest severity shown: debug, info, notice, warning, alarm, critical.", DefaultValueFactory = _ => Severity.Debug };
        var fromOption = new Option<string?>("--from") { Description = "Start of the time window, simulated time with a unit (e.g. '40 d')." };
        var toOption = new Option<string?>("--to") { Description = "End of the time window, inclusive (e.g. '41 d')." };
        var fieldOption = new Option<string?>("--point") { Description = "Only events that carry this data field or telemetry point (e.g. depth_m)." };
        var formatOption = new Option<string>("--format") { Description = "table (default) or jsonl (the original log lines).", DefaultValueFactory = _ => "table" };
        formatOption.AcceptOnlyFromAmong("table", "jsonl");
        var command = new Command("events", "Filter and print the events of a log.")
        {
            logArgument, kindOption, sourceOption, severityOption, fromOption, toOption, fieldOption, formatOption,
        };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            if (!File.Exists(path)) throw new FileNotFoundException($"no such log: {path}", path);
            var filter = new EventFilter(
                parse.GetValue(kindOption) ?? [],
                parse.GetValue(sourceOption) ?? [],
                parse.GetValue(severityOption),
                Seconds(parse.GetValue(fromOption), "--from") ?? double.NegativeInfinity,
                Seconds(parse.GetValue(toOption), "--to") ?? double.PositiveInfinity,
                parse.GetValue(fieldOption));
            var table = parse.GetValue(formatOption) == "table";
            long? truncated = null;
            var count = 0;
            if (table) Console.Out.WriteLine($"{"time (d)",12}  {"source",-18} {"kind",-24} {"severity",-8}  data");
            foreach (var (entry, line) in JournalQuery.Events(path, filter, at => truncated = at))
            {
                count++;
                Console.Out.WriteLine(table ? Row(entry) : line);
            }

            if (table) Console.Out.WriteLine($"{count} events");
            if (truncated is { } cut) Console.Error.WriteLine($"note: the log is truncated at line {cut}; events up to its last intact line are shown.");
            return (int)ExitCode.Ok;
        });
        return command;
    }

    private static string Row(Journal.EventEntry e)
    {
        var data = string.Join(" ", e.Data.Select(f => f.Kind == RecordFieldKind.Number
            ? string.Create(CultureInfo.InvariantCulture, $"{f.Name}={f.Number:G6}")
            : f.ToString()));
        return string.Create(CultureInfo.InvariantCulture, $"{e.TimeSeconds / 86400,12:F6}  {e.Source,-18} {e.Kind,-24} {e.Severity.ToString().ToLowerInvariant(),-8}  {data}");
    }

    private static double? Seconds(string? text, string option)
    {
        if (text is null) return null;
        return QuantityParser.TryParseSi(QuantityKind.Duration, text, out var seconds, out var error)
            ? seconds
            : throw new UsageException($"{option}: {error}");
    }
}
