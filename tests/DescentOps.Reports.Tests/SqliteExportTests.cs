using DescentOps.Reports.Export;
using Microsoft.Data.Sqlite;

namespace DescentOps.Reports.Tests;

[Collection(RunLogsCollection.Name)]
public sealed class SqliteExportTests(RunLogs logs)
{
    [Fact]
    public void Two_runs_share_a_database_and_the_documented_query_answers_from_the_log()
    {
        var database = logs.File("two-runs.sqlite");
        var first = SqliteExport.Write(logs.DefaultLog, database);
        var second = SqliteExport.Write(logs.OtherSeedLog, database);
        Assert.False(first.Replaced);
        Assert.False(second.Replaced);
        Assert.NotEqual(first.RunId, second.RunId);
        Assert.False(File.Exists(database + AtomicFile.PartialSuffix));

        var rows = Query(database, SqliteSchema.ExampleQuery);
        Assert.Equal(2, rows.Count);
        foreach (var (log, seed) in new[] { (logs.DefaultLog, logs.DefaultSeed), (logs.OtherSeedLog, logs.DefaultSeed + 1) })
        {
            var facts = LogFacts.Of(log);
            var row = Assert.Single(rows, r => (long)r["seed"]! == seed);
            Assert.Equal("Completed", row["outcome"]);
            Assert.Equal(0L, row["truncated"]);
            Assert.Equal(facts.BreakthroughTS, (double)row["breakthrough_t_s"]!);
            Assert.Equal(facts.MaxTelemetryDepthM, (double)row["max_depth_m"]!);
        }

        var counts = Query(database, "SELECT run_id, events, (SELECT COUNT(*) FROM events e WHERE e.run_id = r.run_id) AS n FROM runs r");
        Assert.All(counts, c => Assert.Equal(c["events"], c["n"]));
        Assert.Equal(LogFacts.Of(logs.DefaultLog).Events, (long)counts.Single(c => (long)c["run_id"]! == first.RunId)["n"]!);
    }

    [Fact]
    public void The_same_run_exported_again_replaces_its_rows()
    {
        var database = logs.File("replace.sqlite");
        var first = SqliteExport.Write(logs.DefaultLog, database);
        var again = SqliteExport.Write(logs.DefaultLog, database);
        Assert.True(again.Replaced);
        Assert.Equal(first.RunId, again.RunId);
        var rows = Query(database, "SELECT (SELECT COUNT(*) FROM runs) AS runs, (SELECT COUNT(*) FROM events) AS events, (SELECT COUNT(*) FROM event_fields) AS fields");
        Assert.Equal(1L, rows[0]["runs"]);
        Assert.Equal(first.Events, rows[0]["events"]);
        Assert.Equal(first.Fields, rows[0]["fields"]);
    }

    [Fact]
    public void A_truncated_log_exports_its_intact_prefix_and_is_flagged()
    {
        var database = logs.File("truncated.sqlite");
        var result = SqliteExport.Write(logs.TruncatedLog, database);
        Assert.Equal(logs.TruncatedAtLine, result.TruncatedAtLine);
        var facts = LogFacts.Of(logs.TruncatedLog);
        var run = Assert.Single(Query(database, "SELECT truncated, truncated_at_line, outcome, events, (SELECT MAX(seq) FROM events) AS last_seq FROM runs"));
        Assert.Equal(1L, run["truncated"]);
        Assert.Equal(logs.TruncatedAtLine, run["truncated_at_line"]);
        Assert.Null(run["outcome"]);
        Assert.Equal(facts.Events, run["events"]);
        Assert.Equal(logs.TruncatedAtLine - 2, run["last_seq"]); // line 1 is the manifest, the cut line is lost
    }

    [Fact]
    public void Each_event_of_a_three_lander_log_carries_its_lander_and_a_version_1_database_is_filled_in()
    {
        var log = Path.Combine(RepositoryFiles.Root, "tests", "golden", "three-landers-shared-link.jsonl");
        var database = logs.File("landers.sqlite");
        SqliteExport.Write(log, database);

        // The log read here as plain JSON: each event's lander is its data's "lander" member, written first by runs with landers.
        var expected = new Dictionary<long, string?>();
        foreach (var line in File.ReadLines(log))
        {
            var node = System.Text.Json.Nodes.JsonNode.Parse(line)!;
            if (node["type"]!.GetValue<string>() != "event") continue;
            var leading = node["data"]!.AsObject().FirstOrDefault();
            expected[node["seq"]!.GetValue<long>()] = leading.Key == "lander" ? leading.Value!.GetValue<string>() : null;
        }

        void Check(string db)
        {
            var rows = Query(db, "SELECT seq, lander FROM events ORDER BY seq");
            Assert.Equal(expected.Count, rows.Count);
            Assert.All(rows, r => Assert.Equal(expected[(long)r["seq"]!], (string?)r["lander"]));
        }

        Check(database);
        Assert.Equal(["brack", "fell", "tarn"], Query(database, "SELECT DISTINCT lander FROM events WHERE lander IS NOT NULL ORDER BY lander").Select(r => (string)r["lander"]!));
        Assert.Contains(expected.Values, v => v is null); // the shared link's own records and the run's belong to no lander

        // A database of version 1 (no lander column) gets the column, filled from the fields it already holds.
        using (var old = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = database, Pooling = false }.ToString()))
        {
            old.Open();
            using var command = old.CreateCommand();
            command.CommandText = "ALTER TABLE events DROP COLUMN lander; PRAGMA user_version = 1;";
            command.ExecuteNonQuery();
        }

        SqliteExport.Write(logs.DefaultLog, database);
        Assert.Equal(2L, Query(database, "PRAGMA user_version").Single()["user_version"]);
        Assert.Empty(Query(database, "SELECT seq FROM events WHERE run_id = (SELECT MAX(run_id) FROM runs) AND lander IS NOT NULL"));
        var first = Query(database, "SELECT seq, lander FROM events WHERE run_id = (SELECT MIN(run_id) FROM runs) ORDER BY seq");
        Assert.All(first, r => Assert.Equal(expected[(long)r["seq"]!], (string?)r["lander"]));
    }

    [Fact]
    public void Readme_documents_the_tables_indexes_and_the_example_query()
    {
        var section = RepositoryFiles.Normalized(RepositoryFiles.ReadmeSection("Reports and exports"));
        Assert.Contains(RepositoryFiles.Normalized(SqliteSchema.ExampleQuery), section, StringComparison.Ordinal);
        foreach (var name in new[] { "runs", "events", "event_fields", "events_by_run_kind_time", "event_fields_by_name" })
        {
            Assert.Contains($"`{name}`", section, StringComparison.Ordinal);
        }
    }

    private static List<Dictionary<string, object?>> Query(string database, string sql)
    {
        using var db = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = database, Mode = SqliteOpenMode.ReadOnly, Pooling = false }.ToString());
        db.Open();
        using var command = db.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var rows = new List<Dictionary<string, object?>>();
        while (reader.Read())
        {
            var row = new Dictionary<string, object?>(StringComparer.Ordinal);
            for (var i = 0; i < reader.FieldCount; i++) row[reader.GetName(i)] = reader.IsDBNull(i) ? null : reader.GetValue(i);
            rows.Add(row);
        }

        return rows;
    }
}
