namespace DescentOps.Reports.Export;

/// <summary>
/// The database that <c>descentops export --format sqlite</c> writes; README's "Reports and exports" section
/// documents the same tables, and a test runs <see cref="ExampleQuery"/> as written there.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item><c>runs</c>: one row per exported log. Manifest fields, the summary's outcome, reason, final time and
/// figures (as JSON), how many events were exported, and whether the log was truncated and at which line. A run
/// is identified by scenario SHA-256, seed, tool version and the manifest line's chain value (which differs
/// whenever any manifest byte does); exporting the same run again replaces its rows under the same run_id.</item>
/// <item><c>events</c>: one row per event, its data as a JSON object in <c>data_json</c>, and the lander it belongs to
/// (<c>lander</c>: the event's <c>lander</c> field, which a run with landers writes first; NULL for a single-lander log
/// and for shared records about no lander).</item>
/// <item><c>event_fields</c>: one row per data field of each event. <c>number</c> holds every finite numeric
/// value (integers too, as REAL) so one column answers "max depth"; <c>integer</c> holds integer and boolean
/// values exactly (booleans as 0 and 1); <c>text</c> holds text values and the spelling of NaN and the
/// infinities, which SQLite cannot store as REAL.</item>
/// </list>
/// </remarks>
public static class SqliteSchema
{
    /// <summary>
    /// Stored in <c>PRAGMA user_version</c>. Version 2 added <c>events.lander</c>; a version-1 database is brought to 2
    /// when exported into (the column added and filled from each event's <c>lander</c> field in <c>event_fields</c>);
    /// any other layout is refused, not altered.
    /// </summary>
    public const int Version = 2;

    /// <summary>The step from version 1: the column, filled from the fields already stored.</summary>
    public const string FromVersion1 = """
        ALTER TABLE events ADD COLUMN lander TEXT;
        UPDATE events SET lander = (SELECT f.text FROM event_fields f WHERE f.run_id = events.run_id AND f.seq = events.seq AND f.name = 'lander' LIMIT 1);
        """;

    public const string Create = """
        CREATE TABLE IF NOT EXISTS runs (
            run_id            INTEGER PRIMARY KEY,
            log_file          TEXT NOT NULL,
            tool_version      TEXT NOT NULL,
            scenario_name     TEXT NOT NULL,
            scenario_sha256   TEXT NOT NULL,
            scenario_text     TEXT NOT NULL,
            seed              INTEGER NOT NULL,
            until_s           REAL NOT NULL,
            random            TEXT NOT NULL,
            manifest_extra    TEXT NOT NULL,
            first_chain       TEXT NOT NULL,
            outcome           TEXT,
            reason            TEXT,
            final_t_s         REAL,
            summary_json      TEXT,
            events            INTEGER NOT NULL,
            truncated         INTEGER NOT NULL,
            truncated_at_line INTEGER,
            UNIQUE (scenario_sha256, seed, tool_version, first_chain)
        );
        CREATE TABLE IF NOT EXISTS events (
            run_id    INTEGER NOT NULL REFERENCES runs (run_id),
            seq       INTEGER NOT NULL,
            t_s       REAL NOT NULL,
            source    TEXT NOT NULL,
            kind      TEXT NOT NULL,
            severity  TEXT NOT NULL,
            data_json TEXT NOT NULL,
            lander    TEXT,
            PRIMARY KEY (run_id, seq)
        );
        CREATE TABLE IF NOT EXISTS event_fields (
            run_id  INTEGER NOT NULL,
            seq     INTEGER NOT NULL,
            name    TEXT NOT NULL,
            number  REAL,
            integer INTEGER,
            text    TEXT,
            FOREIGN KEY (run_id, seq) REFERENCES events (run_id, seq)
        );
        CREATE INDEX IF NOT EXISTS events_by_run_kind_time ON events (run_id, kind, t_s);
        CREATE INDEX IF NOT EXISTS event_fields_by_name ON event_fields (name);
        CREATE INDEX IF NOT EXISTS event_fields_by_event ON event_fields (run_id, seq);
        """;

    /// <summary>Time of breakthrough and deepest reported depth of every run: the query README shows.</summary>
    public const string ExampleQuery = """
        SELECT r.run_id, r.scenario_name, r.seed, r.outcome, r.truncated,
               (SELECT MIN(e.t_s) FROM events e
                 WHERE e.run_id = r.run_id AND e.kind = 'probe.breakthrough') AS breakthrough_t_s,
               (SELECT MAX(f.number) FROM event_fields f
                  JOIN events e ON e.run_id = f.run_id AND e.seq = f.seq
                 WHERE f.run_id = r.run_id AND f.name = 'depth_m' AND e.kind = 'probe.telemetry') AS max_depth_m
          FROM runs r
         ORDER BY r.run_id;
        """;
}
