using DescentOps.Records;
using DescentOps.Journal;
using Microsoft.Data.Sqlite;

namespace DescentOps.Reports.Export;

/// <summary>
/// Adds one log to a SQLite database (see <see cref="SqliteSchema"/>), creating it if needed. Many runs go into
/// one file so that campaigns can be compared with a query. A new database is written under a temporary name and
/// renamed when the whole run is in, its indexes built once at the end; a run added to an existing database goes in
/// place, in one transaction, so a failed export rolls back and leaves the database as it was, without copying
/// the whole database each time.
/// </summary>
public static class SqliteExport
{
    /// <param name="logPath">The log to export.</param>
    /// <param name="databasePath">The database to add it to (created if missing).</param>
    /// <param name="progress">Called now and then with the share of the log read (0 to 1).</param>
    public static SqliteExportResult Write(string logPath, string databasePath, Action<double>? progress = null)
    {
        if (File.Exists(databasePath)) return Into(logPath, databasePath, fresh: false, progress);
        SqliteExportResult? result = null;
        AtomicFile.Write(databasePath, partial => result = Into(logPath, partial, fresh: true, progress));
        return result!;
    }

    /// <summary>The default database: the log's path with <c>.sqlite</c> in place of its extension.</summary>
    public static string DefaultPath(string logPath) => Path.ChangeExtension(logPath, ".sqlite");

    private static SqliteExportResult Into(string logPath, string databasePath, bool fresh, Action<double>? progress)
    {
        // No pooling: a pooled connection would keep the file open and the rename onto the final name would race it.
        var connectionString = new SqliteConnectionStringBuilder { DataSource = databasePath, Pooling = false, Mode = SqliteOpenMode.ReadWriteCreate }.ToString();
        using var db = new SqliteConnection(connectionString);
        db.Open();
        // A new file is private until the rename publishes it, and a failure deletes it, so SQLite's own crash
        // safety (a journal on disk, a sync per commit) would only cost time there. An existing database keeps it:
        // the one transaction below is what makes adding a run all or nothing.
        Execute(db, null, fresh ? "PRAGMA journal_mode = OFF; PRAGMA synchronous = OFF" : "PRAGMA synchronous = NORMAL");
        Execute(db, null, "PRAGMA cache_size = -65536"); // 64 MiB of page cache: index pages stay in memory while rows go in
        PrepareSchema(db, withIndexes: !fresh);

        using var file = new FileStream(logPath, FileMode.Open, FileAccess.Read, FileShare.Read, bufferSize: 0, FileOptions.SequentialScan);
        var length = Math.Max(1.0, file.Length);
        using var reader = new JournalReader(file, leaveOpen: true);
        if (!reader.TryRead(out var first) || first is not ManifestEntry manifestEntry)
        {
            throw new InvalidDataException($"{logPath}: the log has no intact manifest line.");
        }

        var manifest = manifestEntry.Manifest;
        var chain = RunLog.ReadManifestChain(logPath);
        using var transaction = db.BeginTransaction();
        var existing = Scalar(db, transaction,
            "SELECT run_id FROM runs WHERE scenario_sha256 = $sha AND seed = $seed AND tool_version = $tool AND first_chain = $chain",
            ("$sha", manifest.ScenarioSha256), ("$seed", manifest.Seed), ("$tool", manifest.ToolVersion), ("$chain", chain));
        if (existing is long old)
        {
            foreach (var table in new[] { "event_fields", "events", "runs" })
            {
                Execute(db, transaction, $"DELETE FROM {table} WHERE run_id = $run", ("$run", old));
            }
        }

        Execute(db, transaction, """
            INSERT INTO runs (run_id, log_file, tool_version, scenario_name, scenario_sha256, scenario_text, seed, until_s, random, manifest_extra, first_chain, events, truncated)
            VALUES ($run, $file, $tool, $name, $sha, $text, $seed, $until, $random, $extra, $chain, 0, 0)
            """,
            ("$run", existing), ("$file", Path.GetFileName(logPath)), ("$tool", manifest.ToolVersion), ("$name", manifest.ScenarioName),
            ("$sha", manifest.ScenarioSha256), ("$text", manifest.ScenarioText), ("$seed", manifest.Seed), ("$until", manifest.UntilSeconds),
            ("$random", manifest.RandomAlgorithm), ("$extra", DataJson.Of(manifest.Extra)), ("$chain", chain));
        var runId = (long)Scalar(db, transaction, "SELECT last_insert_rowid()")!;

        using var insertEvent = Command(db, transaction,
            "INSERT INTO events (run_id, seq, t_s, source, kind, severity, data_json, lander) VALUES ($run, $seq, $t, $source, $kind, $severity, $data, $lander)",
            "$run", "$seq", "$t", "$source", "$kind", "$severity", "$data", "$lander");
        using var insertField = Command(db, transaction,
            "INSERT INTO event_fields (run_id, seq, name, number, integer, text) VALUES ($run, $seq, $name, $number, $integer, $text)",
            "$run", "$seq", "$name", "$number", "$integer", "$text");
        insertEvent.Parameters["$run"].Value = runId;
        insertField.Parameters["$run"].Value = runId;

        long events = 0, fields = 0;
        SummaryEntry? summary = null;
        while (reader.TryRead(out var entry))
        {
            if (entry is SummaryEntry s)
            {
                summary = s;
                continue;
            }

            var e = (EventEntry)entry;
            if (++events % 8192 == 0) progress?.Invoke(file.Position / length);
            insertEvent.Parameters["$seq"].Value = e.Sequence;
            insertEvent.Parameters["$t"].Value = e.TimeSeconds;
            insertEvent.Parameters["$source"].Value = e.Source;
            insertEvent.Parameters["$kind"].Value = e.Kind;
            insertEvent.Parameters["$severity"].Value = e.Severity.ToString().ToLowerInvariant();
            insertEvent.Parameters["$data"].Value = DataJson.Of(e.Data);
            insertEvent.Parameters["$lander"].Value = e.Data.Count > 0 && e.Data[0].Name == "lander" && e.Data[0].Text is { } lander ? lander : DBNull.Value;
            insertEvent.ExecuteNonQuery();
            insertField.Parameters["$seq"].Value = e.Sequence;
            foreach (var f in e.Data)
            {
                fields++;
                var (number, integer, text) = Columns(f);
                insertField.Parameters["$name"].Value = f.Name;
                insertField.Parameters["$number"].Value = number ?? (object)DBNull.Value;
                insertField.Parameters["$integer"].Value = integer ?? (object)DBNull.Value;
                insertField.Parameters["$text"].Value = text ?? (object)DBNull.Value;
                insertField.ExecuteNonQuery();
            }
        }

        long? truncatedAt = reader.IsTruncated ? reader.TruncatedAtLine : null;
        Execute(db, transaction, """
            UPDATE runs SET outcome = $outcome, reason = $reason, final_t_s = $final, summary_json = $summary,
                            events = $events, truncated = $truncated, truncated_at_line = $at
             WHERE run_id = $run
            """,
            ("$outcome", summary?.Summary.OutcomeKind), ("$reason", summary?.Summary.Reason), ("$final", summary?.Summary.FinalTimeS),
            ("$summary", summary is null ? null : DataJson.Of(summary.Summary.Data)), ("$events", events),
            ("$truncated", truncatedAt is null ? 0L : 1L), ("$at", truncatedAt), ("$run", runId));
        if (fresh)
        {
            // Built once over the finished tables: much cheaper than keeping three indexes sorted row by row.
            foreach (var index in Statements(SqliteSchema.Create).Where(IsIndex)) Execute(db, transaction, index);
        }

        transaction.Commit();
        return new SqliteExportResult(runId, existing is not null, events, fields, truncatedAt);
    }

    private static (double? Number, long? Integer, string? Text) Columns(RecordField f) => f.Kind switch
    {
        RecordFieldKind.Number when double.IsFinite(f.Number) => (f.Number, null, null),
        RecordFieldKind.Number => (null, null, DataJson.Number(f.Number)),
        RecordFieldKind.Integer => (f.Integer, f.Integer, null),
        RecordFieldKind.Boolean => (null, f.Integer, null),
        _ => (null, null, f.Text),
    };

    private static IEnumerable<string> Statements(string sql) =>
        sql.Split(';', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries).Where(t => t.Length > 0);

    private static bool IsIndex(string statement) => statement.StartsWith("CREATE INDEX", StringComparison.Ordinal);

    private static void PrepareSchema(SqliteConnection db, bool withIndexes)
    {
        var version = (long)Scalar(db, null, "PRAGMA user_version")!;
        var tables = (long)Scalar(db, null, "SELECT COUNT(*) FROM sqlite_master WHERE type = 'table'")!;
        if (version == 1)
        {
            foreach (var statement in Statements(SqliteSchema.FromVersion1)) Execute(db, null, statement);
        }
        else if (version != SqliteSchema.Version && (version != 0 || tables != 0))
        {
            throw new InvalidDataException($"The database has layout version {version} (or unrelated tables), not DescentOps export version {SqliteSchema.Version}; export into a new file.");
        }

        foreach (var statement in Statements(SqliteSchema.Create).Where(t => withIndexes || !IsIndex(t))) Execute(db, null, statement);
        Execute(db, null, $"PRAGMA user_version = {SqliteSchema.Version}");
    }

    private static SqliteCommand Command(SqliteConnection db, SqliteTransaction? transaction, string sql, params string[] parameters)
    {
        var command = db.CreateCommand();
        command.CommandText = sql;
        command.Transaction = transaction;
        foreach (var p in parameters) command.Parameters.Add(new SqliteParameter { ParameterName = p });
        return command;
    }

    private static void Execute(SqliteConnection db, SqliteTransaction? transaction, string sql, params (string Name, object? Value)[] values)
    {
        using var command = Bind(db, transaction, sql, values);
        command.ExecuteNonQuery();
    }

    private static object? Scalar(SqliteConnection db, SqliteTransaction? transaction, string sql, params (string Name, object? Value)[] values)
    {
        using var command = Bind(db, transaction, sql, values);
        var value = command.ExecuteScalar();
        return value is DBNull ? null : value;
    }

    private static SqliteCommand Bind(SqliteConnection db, SqliteTransaction? transaction, string sql, (string Name, object? Value)[] values)
    {
        var command = db.CreateCommand();
        command.CommandText = sql;
        command.Transaction = transaction;
        foreach (var (name, value) in values) command.Parameters.AddWithValue(name, value ?? DBNull.Value);
        return command;
    }
}
