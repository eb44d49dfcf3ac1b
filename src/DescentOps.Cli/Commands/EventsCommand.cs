using System.CommandLine;
using System.Globalization;
using DescentOps.Cli.Output;
using DescentOps.Cli.Running;
using DescentOps.Records;
using DescentOps.Journal.Querying;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops events LOG</c>: filters a log's events and prints them as a table, JSON Lines or CLEF.</summary>
public static class EventsCommand
{
    public static Command Create()
    {
        var logArgument = CommonOptions.Log("The event log to read.");
        var kindOption = new Option<string[]>("--kind", "-k") { Description = "Event kind, exact or a prefix ending in '.' or '*' (repeatable), e.g. tether. or probe.breakthrough.", AllowMultipleArgumentsPerToken = true, HelpName = "KIND" };
        var sourceOption = new Option<string[]>("--source", "-s") { Description = "Source component (repeatable), e.g. probe, tether, vehicle-wisp-1.", AllowMultipleArgumentsPerToken = true, HelpName = "SOURCE" };
        var severityOption = new Option<Severity>("--severity", "-l") { Description = "Lowest severity shown: debug, info, notice, warning, alarm, critical.", DefaultValueFactory = _ => Severity.Debug, HelpName = "LEVEL" };
        var fromOption = new Option<string?>("--from") { Description = "Start of the time window, simulated time with a unit (e.g. '40 d').", HelpName = "TIME" };
        var toOption = new Option<string?>("--to") { Description = "End of the time window, inclusive (e.g. '41 d').", HelpName = "TIME" };
        var landerOption = new Option<string[]>("--lander") { Description = "Only the events of this lander of a run with landers (repeatable).", AllowMultipleArgumentsPerToken = true, HelpName = "NAME" };
        var fieldOption = new Option<string?>("--point") { Description = "Only events that carry this data field or telemetry point (e.g. depth_m).", HelpName = "FIELD" };
        var formatOption = new Option<string>("--format") { Description = "table (default), jsonl (the original log lines) or clef (Compact Log Event Format, for structured-log viewers).", DefaultValueFactory = _ => "table", HelpName = "table|jsonl|clef" };
        formatOption.AcceptOnlyFromAmong("table", "jsonl", "clef");
        var epochOption = new Option<string?>("--epoch") { Description = "For clef: the date and time that simulated time zero is shown at (ISO 8601; default 1970-01-01T00:00:00Z).", HelpName = "DATE" };
        var command = new Command("events", "Filter and print the events of a log.")
        {
            logArgument, kindOption, sourceOption, landerOption, severityOption, fromOption, toOption, fieldOption, formatOption, epochOption,
        };
        command.SetAction(parse =>
        {
            var path = parse.GetValue(logArgument)!;
            var filter = new EventFilter(
                parse.GetValue(kindOption) ?? [],
                parse.GetValue(sourceOption) ?? [],
                parse.GetValue(severityOption),
                Seconds(parse.GetValue(fromOption), "--from") ?? double.NegativeInfinity,
                Seconds(parse.GetValue(toOption), "--to") ?? double.PositiveInfinity,
                parse.GetValue(fieldOption))
            {
                Landers = parse.GetValue(landerOption) ?? [],
            };
            var epoch = Epoch(parse.GetValue(epochOption));
            var format = parse.GetValue(formatOption) switch
            {
                "jsonl" => EventsPrinter.Format.Jsonl,
                "clef" => EventsPrinter.Format.Clef,
                _ => EventsPrinter.Format.Table,
            };

            // The chain is checked first, as by every command that reads a log: a forged line is never printed.
            // The gate also says where a cut log ends.
            LogGate.Open(path);
            EventsPrinter.Print(path, filter, format, StandardOutput.Open(), Console.Error, epoch, noteTruncation: false);
            return (int)ExitCode.Ok;
        });
        return command;
    }

    private static DateTimeOffset Epoch(string? text)
    {
        if (text is null) return ClefLine.Epoch;
        return DateTimeOffset.TryParse(text, CultureInfo.InvariantCulture, DateTimeStyles.AssumeUniversal, out var epoch)
            ? epoch
            : throw new UsageException($"--epoch: '{text}' is not a date and time (write it as 2040-03-01T00:00:00Z).");
    }

    private static double? Seconds(string? text, string option)
    {
        if (text is null) return null;
        return QuantityParser.TryParseSi(QuantityKind.Duration, text, out var seconds, out var error)
            ? seconds
            : throw new UsageException($"{option}: {error}");
    }
}
