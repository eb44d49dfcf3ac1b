using DescentOps.Cli;
using Microsoft.Data.Sqlite;

namespace DescentOps.Campaigns.Tests;

/// <summary>Runs the command line in this process, as the tool runs it, and reads a campaign's tables.</summary>
internal static class CampaignFixture
{
    public static string Scenario => Path.Combine(AppContext.BaseDirectory, "short-stall.yaml");

    public static string NoBoost => Path.Combine(AppContext.BaseDirectory, "no-boost.yaml");

    /// <summary>A fresh folder under one test root that is emptied when the test process starts.</summary>
    public static string TempDir()
    {
        var dir = Path.Combine(Root.Value, Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        return dir;
    }

    // One folder per test process under a shared parent: other worktrees run these tests on the same machine, so a
    // process removes only the folders of processes that no longer exist, never another live run's.
    private static readonly Lazy<string> Root = new(() =>
    {
        var parent = Path.Combine(Path.GetTempPath(), "descentops-campaign-test-runs");
        Directory.CreateDirectory(parent);
        foreach (var dir in Directory.GetDirectories(parent))
        {
            var alive = int.TryParse(Path.GetFileName(dir).Replace("pid", "", StringComparison.Ordinal), out var pid) && ProcessExists(pid);
            if (!alive) Directory.Delete(dir, recursive: true);
        }

        return Path.Combine(parent, $"pid{Environment.ProcessId}");
    });

    private static bool ProcessExists(int pid)
    {
        try
        {
            using var process = System.Diagnostics.Process.GetProcessById(pid);
            return !process.HasExited;
        }
        catch (ArgumentException)
        {
            return false;
        }
    }

    private static readonly SemaphoreSlim Turn = new(1, 1);

    /// <summary>The exit code of the command line run in this process (<see cref="CliApp.RunAsync"/>, as the tool runs it).</summary>
    public static async Task<int> CliAsync(params string[] args) => (await CliOutputAsync(args)).ExitCode;

    /// <summary>The command line in this process with its output captured; the console is process-wide, so calls take turns.</summary>
    public static async Task<(int ExitCode, string Stdout, string Stderr)> CliOutputAsync(params string[] args)
    {
        await Turn.WaitAsync();
        var (oldOut, oldError) = (Console.Out, Console.Error);
        using var stdout = new StringWriter();
        using var stderr = new StringWriter();
        try
        {
            Console.SetOut(stdout);
            Console.SetError(stderr);
            var exit = await CliApp.RunAsync(args);
            return (exit, stdout.ToString(), stderr.ToString());
        }
        finally
        {
            Console.SetOut(oldOut);
            Console.SetError(oldError);
            Turn.Release();
        }
    }

    /// <summary>Every table's rows, ordered by their key, as text: two equal dumps mean equal tables.</summary>
    public static string Dump(string dir) => CampaignTables.Dump(dir);

    public static void Execute(string dir, string sql)
    {
        using var connection = new SqliteConnection($"Data Source={Path.Combine(dir, "campaign.sqlite")};Pooling=False");
        connection.Open();
        using var command = connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }
}
