using System.CommandLine;
using DescentOps.Cli;
using DescentOps.Cli.Commands;

namespace DescentOps.Reports.Tests;

/// <summary>The two commands as the command line runs them, in process.</summary>
[Collection(RunLogsCollection.Name)]
public sealed class CommandTests(RunLogs logs)
{
    [Fact]
    public void The_verdicts_on_intact_truncated_and_edited_logs()
    {
        Assert.Equal(LogState.Intact, LogIntegrity.Check(logs.DefaultLog).State);
        var truncated = LogIntegrity.Check(logs.TruncatedLog);
        Assert.Equal(LogState.Truncated, truncated.State);
        Assert.Equal(logs.TruncatedAtLine, truncated.Line);
        var edited = LogIntegrity.Check(logs.EditedLog);
        Assert.Equal(LogState.Damaged, edited.State);
        Assert.Equal(logs.EditedLine, edited.Line);
        Assert.Contains("ChainMismatch", edited.Detail, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("report")]
    [InlineData("export", "--format", "sqlite")]
    [InlineData("export", "--format", "csv")]
    public void An_edited_log_is_refused_and_nothing_is_written(params string[] command)
    {
        var output = logs.File("refused-" + string.Join('-', command));
        var refusal = Assert.Throws<LogIntegrityException>(() => Invoke([command[0], logs.EditedLog, .. command[1..], "--output", output]));
        Assert.Contains($":{logs.EditedLine}:", refusal.Message, StringComparison.Ordinal);
        Assert.Contains("ChainMismatch", refusal.Message, StringComparison.Ordinal);
        Assert.False(File.Exists(output) || Directory.Exists(output));
    }

    [Fact]
    public void Both_commands_accept_a_truncated_log()
    {
        var report = logs.File("cmd-truncated.html");
        var database = logs.File("cmd-truncated.sqlite");
        Assert.Equal(0, Invoke(["report", logs.TruncatedLog, "--output", report]));
        Assert.Equal(0, Invoke(["export", logs.TruncatedLog, "--format", "sqlite", "--output", database]));
        Assert.Contains($"truncated at line {logs.TruncatedAtLine}", File.ReadAllText(report), StringComparison.Ordinal);
        Assert.True(File.Exists(database));
    }

    private static int Invoke(string[] arguments)
    {
        var root = new RootCommand { ReportCommand.Create(), ExportCommand.Create() };
        var parse = root.Parse(arguments);
        Assert.Empty(parse.Errors);
        return parse.Invoke(new InvocationConfiguration { EnableDefaultExceptionHandler = false });
    }
}
