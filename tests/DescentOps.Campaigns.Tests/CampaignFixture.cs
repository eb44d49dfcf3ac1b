using DescentOps.Cli;
using DescentOps.Tests.Shared;
using Microsoft.Data.Sqlite;

namespace DescentOps.Campaigns.Tests;

/// <summary>Runs the command line in this process, as the tool runs it, and reads a campaign's tables.</summary>
internal static class CampaignFixture
{
    public static string Scenario => Path.Combine(AppContext.BaseDirectory, "short-stall.yaml");

    public static string NoBoost => Path.Combine(AppContext.BaseDirectory, "no-boost.yaml");

    /// <summary>A fresh folder that goes when the test process ends.</summary>
    public static string TempDir() => TestFolders.New();

    /// <summary>The exit code of the command line run in this process (<see cref="CliApp.RunAsync"/>, as the tool runs it).</summary>
    public static async Task<int> CliAsync(params string[] args) => (await CliOutputAsync(args)).ExitCode;

    /// <summary>The command line in this process with its output captured.</summary>
    public static Task<(int ExitCode, string Stdout, string Stderr)> CliOutputAsync(params string[] args) => InProcessCli.RunAsync(args);

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
