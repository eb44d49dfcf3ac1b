using System.Text.Json;
using DescentOps.Cli.Commands;
using DescentOps.Cli.Output;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Records;
using DescentOps.Engine.Running;
using DescentOps.Journal;
using DescentOps.Journal.Querying;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Mission.Tests.Cli;

/// <summary>The pieces of the command line's output that need no run: CLEF lines, parse errors, progress text, closed pipes.</summary>
public sealed class OutputFormatTests
{
    private static EventEntry Event(Severity severity, params RecordField[] data) =>
        new(LineNumber: 7, Sequence: 6, TimeSeconds: 90061.5, Source: "probe", Kind: "probe.regime", Severity: severity, Data: data);

    [Fact]
    public void A_clef_line_has_the_reserved_fields_the_format_defines()
    {
        // CLEF (the Compact Log Event Format of the open-source Serilog project): @t an ISO 8601 timestamp, @mt the
        // message template, @l the level, left out when it is Information; other names are the event's properties.
        var line = ClefLine.Format(Event(Severity.Warning, RecordField.Of("depth_m", 812.5), RecordField.Of("ratio", double.NaN)), ClefLine.Epoch);
        using var json = JsonDocument.Parse(line);
        var root = json.RootElement;
        Assert.Equal("1970-01-02T01:01:01.5000000Z", root.GetProperty("@t").GetString()); // 90061.5 s = 1 d 1 h 1 min 1.5 s
        Assert.Equal("{source}: {kind}", root.GetProperty("@mt").GetString());
        Assert.Equal("Warning", root.GetProperty("@l").GetString());
        Assert.Equal("probe", root.GetProperty("source").GetString());
        Assert.Equal(812.5, root.GetProperty("depth_m").GetDouble());
        Assert.Equal(JsonValueKind.Null, root.GetProperty("ratio").ValueKind);
        Assert.DoesNotContain('\n', line);

        using var info = JsonDocument.Parse(ClefLine.Format(Event(Severity.Info), new DateTimeOffset(2040, 3, 1, 0, 0, 0, TimeSpan.Zero)));
        Assert.False(info.RootElement.TryGetProperty("@l", out _));
        Assert.Equal("2040-03-02T01:01:01.5000000Z", info.RootElement.GetProperty("@t").GetString());
    }

    [Theory]
    [InlineData("Cannot parse argument 'abc' for option '--seed' as expected type 'System.Nullable`1[System.Int64]'.", "--seed: 'abc' is not a whole number.")]
    [InlineData("Cannot parse argument 'x' for option '--radius' as expected type 'System.Double'.", "--radius: 'x' is not a number.")]
    [InlineData("Unrecognized command or argument 'frob'.", "Unrecognized command or argument 'frob'.")]
    public void Parse_errors_are_told_without_dotnet_type_names(string message, string expected) =>
        Assert.Equal(expected, ParseErrorText.Clean(message));

    [Fact]
    public void The_time_left_goes_by_the_pace_so_far()
    {
        Assert.Equal("ETA 30 s", ProgressLine.Eta(TimeSpan.FromSeconds(10), 0.25)); // a quarter in 10 s: 30 s to go
        Assert.Equal("ETA 2 min 00 s", ProgressLine.Eta(TimeSpan.FromSeconds(120), 0.5));
        Assert.Equal("ETA --", ProgressLine.Eta(TimeSpan.FromSeconds(1), 0));
        Assert.Equal("2 h 05 min", ProgressLine.Duration(7500));
    }

    [Fact]
    public void The_runs_progress_is_the_missions_depth_and_regime_not_the_time_limit()
    {
        var mission = new MissionProgress(shellThicknessM: 2500);
        void Frame(double t, double depth) => mission.Write(new JournalRecord(SimTime.FromSecondsSinceEpoch(t), new ComponentId("probe"), "probe.telemetry", Severity.Debug,
            [RecordField.Of("regime", "Melting"), RecordField.Of("depth_m", depth)]));
        var until = SimTime.FromSecondsSinceEpoch(400 * 86400.0);

        Frame(86400, 100);
        _ = mission.Describe(new KernelProgress(SimTime.FromSecondsSinceEpoch(86400), until, 10), TimeSpan.FromSeconds(1));
        Frame(2 * 86400, 1250);
        var text = mission.Describe(new KernelProgress(SimTime.FromSecondsSinceEpoch(2 * 86400), until, 20), TimeSpan.FromSeconds(2));

        Assert.Contains("depth   1250.0 m of 2500 m", text, StringComparison.Ordinal);
        Assert.Contains("50.0", text, StringComparison.Ordinal); // half the shell, not 0.5 % of the 400-day limit
        Assert.Contains("Melting", text, StringComparison.Ordinal);
        Assert.Contains("ETA to breakthrough 1 s", text, StringComparison.Ordinal); // 1150 m in 1 s, 1250 m to go
    }

    [Fact]
    public void Events_stop_reading_the_log_when_the_reader_of_their_output_has_gone()
    {
        var folder = ToolProcess.NewTempDirectory();
        var log = Path.Combine(folder, "a.jsonl");
        using (var writer = JournalWriter.Create(log, new RunManifest("test", "s", "scenario: s\n", 1, 10, "none")))
        {
            for (var i = 0; i < 1000; i++) writer.Write(new JournalRecord(SimTime.FromSecondsSinceEpoch(i), new ComponentId("probe"), "probe.telemetry", Severity.Debug, [RecordField.Of("depth_m", i * 1.0)]));
            writer.Complete(new RunSummary("Completed", "done", 1000, []));
        }

        var output = new ClosingPipe(linesBeforeClose: 10);
        var result = EventsPrinter.Print(log, EventFilter.All, EventsPrinter.Format.Jsonl, output, TextWriter.Null, ClefLine.Epoch);

        Assert.True(result.ReaderGone);
        Assert.Equal(11, result.Printed); // ten written, the eleventh found the pipe closed, and nothing after it
        Assert.Equal(11, output.Attempts);
    }

    /// <summary>A pipe whose reader goes away after some lines, as <c>head</c> does: writes then fail with EPIPE.</summary>
    private sealed class ClosingPipe(int linesBeforeClose) : StringWriter
    {
        public int Attempts { get; private set; }

        public override void WriteLine(string? value)
        {
            Attempts++;
            if (Attempts > linesBeforeClose) throw new IOException("Broken pipe", 32);
            base.WriteLine(value);
        }
    }
}
