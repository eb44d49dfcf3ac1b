using System.Globalization;
using System.Text.Json;
using DescentOps.Mission.Running;
using Microsoft.Data.Sqlite;

namespace DescentOps.Campaigns;

/// <summary>
/// <c>campaign.sqlite</c>: the campaign's settings and one committed transaction per run across the tables <c>runs</c>,
/// <c>inputs</c>, <c>criteria</c>, <c>fault_measures</c> and <c>rule_firings</c>, and for scenarios with landers <c>landers</c>
/// (each lander's figures) and <c>lander_criteria</c> (the criteria judged on each lander). A run is keyed by (variant, run_index):
/// a result already stored is never stored again, so a resumed or repeated run cannot be counted twice. Thread-safe:
/// workers hand results in from any thread.
/// Layouts: 1 had no lander tables; 2 adds <c>landers</c> and <c>lander_criteria</c>; 3 adds <c>rule_coverage</c> and
/// <c>procedure_branches</c>. An older store is brought to layout 3 when opened (the tables are added, empty: runs stored
/// before have no rows in them).
/// </summary>
public sealed class CampaignStore : IDisposable
{
    public const int LayoutVersion = 3;

    private readonly SqliteConnection _connection;
    private readonly Lock _gate = new();

    private CampaignStore(SqliteConnection connection) => _connection = connection;

    public static CampaignStore Open(string path)
    {
        var connection = new SqliteConnection(new SqliteConnectionStringBuilder { DataSource = path, Pooling = false }.ToString());
        connection.Open();
        var store = new CampaignStore(connection);
        store.Execute("PRAGMA journal_mode = WAL; PRAGMA synchronous = NORMAL;");
        var version = Convert.ToInt64(store.Scalar("PRAGMA user_version"), CultureInfo.InvariantCulture);
        if (version is >= 0 and < LayoutVersion)
        {
            // Each layout step's tables, added in order: a new store gets them all.
            if (version == 0) store.Execute(Schema);
            if (version <= 1) store.Execute(LanderTables);
            if (version <= 2) store.Execute(CoverageTables);
            store.Execute($"PRAGMA user_version = {LayoutVersion}");
        }
        else if (version != LayoutVersion)
        {
            store.Dispose();
            throw new InvalidDataException($"{path}: campaign database layout {version}, this tool reads layout {LayoutVersion}");
        }

        return store;
    }

    private const string Schema = """
        CREATE TABLE campaign (key TEXT PRIMARY KEY, value TEXT NOT NULL);
        CREATE TABLE runs (
          variant TEXT NOT NULL, run_index INTEGER NOT NULL, seed INTEGER NOT NULL,
          outcome TEXT NOT NULL, reason TEXT NOT NULL, success INTEGER NOT NULL,
          breakthrough_t_s REAL, final_t_s REAL NOT NULL, final_depth_m REAL NOT NULL, energy_used_j REAL NOT NULL,
          frames_lost INTEGER NOT NULL, frames_held_max INTEGER NOT NULL,
          time_stopped_s REAL NOT NULL, longest_stop_s REAL NOT NULL, time_frozen_s REAL NOT NULL, time_blind_s REAL NOT NULL,
          vehicles_lost INTEGER NOT NULL, component_failures INTEGER NOT NULL, summary_chain TEXT NOT NULL,
          PRIMARY KEY (variant, run_index));
        CREATE TABLE inputs (variant TEXT NOT NULL, run_index INTEGER NOT NULL, path TEXT NOT NULL, value_si REAL NOT NULL, unit TEXT NOT NULL,
          PRIMARY KEY (variant, run_index, path));
        CREATE TABLE criteria (variant TEXT NOT NULL, run_index INTEGER NOT NULL, criterion TEXT NOT NULL, requirement TEXT NOT NULL, value REAL, passed INTEGER NOT NULL,
          PRIMARY KEY (variant, run_index, criterion));
        CREATE TABLE fault_measures (variant TEXT NOT NULL, run_index INTEGER NOT NULL, ordinal INTEGER NOT NULL, fault TEXT NOT NULL, kind TEXT NOT NULL,
          start_s REAL NOT NULL, detected_after_s REAL, first_action_after_s REAL, recovered_after_s REAL, recovery TEXT NOT NULL,
          PRIMARY KEY (variant, run_index, ordinal));
        CREATE TABLE rule_firings (variant TEXT NOT NULL, run_index INTEGER NOT NULL, rule TEXT NOT NULL, firings INTEGER NOT NULL,
          PRIMARY KEY (variant, run_index, rule));
        """;

    /// <summary>Layout 2: each lander's figures per run (booleans as 0 and 1, as in <c>runs</c>) and the criteria judged on it.</summary>
    private const string LanderTables = """
        CREATE TABLE landers (
          variant TEXT NOT NULL, run_index INTEGER NOT NULL, ordinal INTEGER NOT NULL, lander TEXT NOT NULL, success INTEGER NOT NULL,
          breakthrough_t_s REAL, final_depth_m REAL NOT NULL, energy_used_j REAL NOT NULL,
          frames_sent INTEGER NOT NULL, frames_received INTEGER NOT NULL, frames_lost INTEGER NOT NULL, frames_held_max INTEGER NOT NULL,
          time_stopped_s REAL NOT NULL, longest_stop_s REAL NOT NULL, time_frozen_s REAL NOT NULL, time_blind_s REAL NOT NULL,
          vehicles_lost INTEGER NOT NULL, faults_unrecovered INTEGER NOT NULL, stalled INTEGER NOT NULL, station_dead INTEGER NOT NULL,
          PRIMARY KEY (variant, run_index, lander));
        CREATE TABLE lander_criteria (variant TEXT NOT NULL, run_index INTEGER NOT NULL, lander TEXT NOT NULL, criterion TEXT NOT NULL, requirement TEXT NOT NULL, value REAL, passed INTEGER NOT NULL,
          PRIMARY KEY (variant, run_index, lander, criterion));
        """;

    /// <summary>Layout 3: whether each rule acted in a run, and how often each procedure branch was taken.</summary>
    private const string CoverageTables = """
        CREATE TABLE rule_coverage (variant TEXT NOT NULL, run_index INTEGER NOT NULL, rule TEXT NOT NULL, acted INTEGER NOT NULL,
          PRIMARY KEY (variant, run_index, rule));
        CREATE TABLE procedure_branches (variant TEXT NOT NULL, run_index INTEGER NOT NULL, ordinal INTEGER NOT NULL, procedure TEXT NOT NULL, step TEXT NOT NULL, branch TEXT NOT NULL, taken INTEGER NOT NULL,
          PRIMARY KEY (variant, run_index, ordinal));
        """;

    /// <summary>The campaign's settings; empty for a new database.</summary>
    public IReadOnlyDictionary<string, string> Settings()
    {
        lock (_gate)
        {
            using var command = _connection.CreateCommand();
            command.CommandText = "SELECT key, value FROM campaign ORDER BY key";
            using var reader = command.ExecuteReader();
            var settings = new Dictionary<string, string>(StringComparer.Ordinal);
            while (reader.Read()) settings[reader.GetString(0)] = reader.GetString(1);
            return settings;
        }
    }

    public void SaveSettings(IReadOnlyDictionary<string, string> settings)
    {
        lock (_gate)
        {
            using var transaction = _connection.BeginTransaction();
            foreach (var (key, value) in settings)
            {
                using var command = _connection.CreateCommand();
                command.Transaction = transaction;
                command.CommandText = "INSERT OR REPLACE INTO campaign (key, value) VALUES ($k, $v)";
                command.Parameters.AddWithValue("$k", key);
                command.Parameters.AddWithValue("$v", value);
                command.ExecuteNonQuery();
            }

            transaction.Commit();
        }
    }

    /// <summary>The (variant, index) pairs already stored.</summary>
    public HashSet<(string Variant, int Index)> Done()
    {
        lock (_gate)
        {
            using var command = _connection.CreateCommand();
            command.CommandText = "SELECT variant, run_index FROM runs";
            using var reader = command.ExecuteReader();
            var done = new HashSet<(string, int)>();
            while (reader.Read()) done.Add((reader.GetString(0), reader.GetInt32(1)));
            return done;
        }
    }

    /// <summary>Stores a run in one transaction; false (and nothing written) when that run is already stored.</summary>
    public bool Add(RunRecord run)
    {
        lock (_gate)
        {
            using var transaction = _connection.BeginTransaction();
            var inserted = Insert(transaction, "INSERT OR IGNORE INTO runs VALUES ($v,$i,$seed,$outcome,$reason,$success,$bt,$ft,$depth,$energy,$lost,$held,$stopped,$longest,$frozen,$blind,$vlost,$failures,$chain)",
                ("$v", run.Variant), ("$i", run.Index), ("$seed", run.Seed), ("$outcome", run.Outcome), ("$reason", run.Reason), ("$success", run.Success ? 1 : 0),
                ("$bt", run.BreakthroughTimeS), ("$ft", run.FinalTimeS), ("$depth", run.FinalDepthM), ("$energy", run.EnergyUsedJ), ("$lost", run.FramesLost),
                ("$held", run.FramesHeldMax), ("$stopped", run.TimeStoppedS), ("$longest", run.LongestStopS), ("$frozen", run.TimeFrozenS), ("$blind", run.TimeBlindS),
                ("$vlost", run.VehiclesLost), ("$failures", run.ComponentFailures), ("$chain", run.SummaryChain));
            if (inserted == 0)
            {
                transaction.Rollback();
                return false;
            }

            foreach (var input in run.Inputs)
            {
                Insert(transaction, "INSERT INTO inputs VALUES ($v,$i,$p,$x,$u)", ("$v", run.Variant), ("$i", run.Index), ("$p", input.Path), ("$x", input.ValueSi), ("$u", input.Unit));
            }

            foreach (var c in run.Criteria)
            {
                Insert(transaction, "INSERT INTO criteria VALUES ($v,$i,$c,$r,$x,$ok)", ("$v", run.Variant), ("$i", run.Index), ("$c", c.Name), ("$r", c.Requirement), ("$x", c.Value), ("$ok", c.Passed ? 1 : 0));
            }

            for (var k = 0; k < run.Faults.Count; k++)
            {
                var f = run.Faults[k];
                Insert(transaction, "INSERT INTO fault_measures VALUES ($v,$i,$k,$f,$kind,$s,$d,$a,$r,$how)", ("$v", run.Variant), ("$i", run.Index), ("$k", k), ("$f", f.Fault), ("$kind", f.Kind),
                    ("$s", f.StartS), ("$d", f.DetectedAfterS), ("$a", f.FirstActionAfterS), ("$r", f.RecoveredAfterS), ("$how", f.Recovery));
            }

            foreach (var (rule, firings) in run.RuleFirings)
            {
                Insert(transaction, "INSERT OR REPLACE INTO rule_firings VALUES ($v,$i,$r,$n)", ("$v", run.Variant), ("$i", run.Index), ("$r", rule), ("$n", firings));
            }

            for (var k = 0; k < run.Landers.Count; k++)
            {
                var l = run.Landers[k];
                Insert(transaction, "INSERT INTO landers VALUES ($v,$i,$k,$l,$ok,$bt,$depth,$energy,$sent,$received,$lost,$held,$stopped,$longest,$frozen,$blind,$vlost,$unrecovered,$stalled,$dead)",
                    ("$v", run.Variant), ("$i", run.Index), ("$k", k), ("$l", l.Lander), ("$ok", l.Success ? 1 : 0), ("$bt", l.BreakthroughTimeS), ("$depth", l.FinalDepthM),
                    ("$energy", l.EnergyUsedJ), ("$sent", l.FramesSent), ("$received", l.FramesReceivedOnGround), ("$lost", l.FramesLost), ("$held", l.FramesHeldMax),
                    ("$stopped", l.TimeStoppedS), ("$longest", l.LongestStopS), ("$frozen", l.TimeFrozenS), ("$blind", l.TimeBlindS), ("$vlost", l.VehiclesLost),
                    ("$unrecovered", l.FaultsUnrecovered), ("$stalled", l.Stalled ? 1 : 0), ("$dead", l.StationDead ? 1 : 0));
                foreach (var c in l.Criteria)
                {
                    Insert(transaction, "INSERT INTO lander_criteria VALUES ($v,$i,$l,$c,$r,$x,$ok)", ("$v", run.Variant), ("$i", run.Index), ("$l", l.Lander), ("$c", c.Name), ("$r", c.Requirement), ("$x", c.Value), ("$ok", c.Passed ? 1 : 0));
                }
            }

            foreach (var rule in run.RulesActed)
            {
                Insert(transaction, "INSERT OR REPLACE INTO rule_coverage VALUES ($v,$i,$r,$a)", ("$v", run.Variant), ("$i", run.Index), ("$r", rule.Rule), ("$a", rule.Acted ? 1 : 0));
            }

            for (var k = 0; k < run.Branches.Count; k++)
            {
                var b = run.Branches[k];
                Insert(transaction, "INSERT INTO procedure_branches VALUES ($v,$i,$k,$p,$s,$b,$n)", ("$v", run.Variant), ("$i", run.Index), ("$k", k), ("$p", b.Procedure), ("$s", b.Step), ("$b", b.Branch), ("$n", b.Taken));
            }

            transaction.Commit();
            return true;
        }
    }

    /// <summary>Removes runs at or beyond an index (a precision stop keeps the same prefix of runs whatever finished first).</summary>
    public void RemoveFrom(int index)
    {
        lock (_gate)
        {
            foreach (var table in new[] { "runs", "inputs", "criteria", "fault_measures", "rule_firings", "landers", "lander_criteria", "rule_coverage", "procedure_branches" })
            {
                Execute($"DELETE FROM {table} WHERE run_index >= {index.ToString(CultureInfo.InvariantCulture)}");
            }
        }
    }

    /// <summary>Every stored run, ordered by variant and index: the one order every statistic reads them in.</summary>
    public IReadOnlyList<RunRecord> Runs()
    {
        lock (_gate)
        {
            var inputs = Group("SELECT variant, run_index, path, value_si, unit FROM inputs ORDER BY variant, run_index, rowid", r => new DrawnInput(r.GetString(2), r.GetDouble(3), r.GetString(4)));
            var criteria = Group("SELECT variant, run_index, criterion, requirement, value, passed FROM criteria ORDER BY variant, run_index, rowid", r => new CriterionResult(r.GetString(2), r.GetString(3), r.IsDBNull(4) ? null : r.GetDouble(4), r.GetInt64(5) != 0));
            var faults = Group("SELECT variant, run_index, fault, kind, start_s, detected_after_s, first_action_after_s, recovered_after_s, recovery FROM fault_measures ORDER BY variant, run_index, ordinal",
                r => new FaultMeasure(r.GetString(2), r.GetString(3), r.GetDouble(4), N(r, 5), N(r, 6), N(r, 7), r.GetString(8)));
            var firings = Group("SELECT variant, run_index, rule, firings FROM rule_firings ORDER BY variant, run_index, rowid", r => (r.GetString(2), r.GetInt32(3)));
            var acted = Group("SELECT variant, run_index, rule, acted FROM rule_coverage ORDER BY variant, run_index, rowid", r => new RuleCoverage(r.GetString(2), r.GetInt64(3) != 0));
            var branches = Group("SELECT variant, run_index, procedure, step, branch, taken FROM procedure_branches ORDER BY variant, run_index, ordinal", r => new BranchCoverage(r.GetString(2), r.GetString(3), r.GetString(4), r.GetInt32(5)));
            var landerCriteria = Group("SELECT variant, run_index, lander, criterion, requirement, value, passed FROM lander_criteria ORDER BY variant, run_index, rowid",
                r => (Lander: r.GetString(2), Result: new CriterionResult(r.GetString(3), r.GetString(4), N(r, 5), r.GetInt64(6) != 0)));
            var landers = Group("SELECT * FROM landers ORDER BY variant, run_index, ordinal", r => new LanderSummary(
                r.GetString(3), N(r, 5), r.GetDouble(6), r.GetDouble(7), r.GetInt64(8), r.GetInt64(9), r.GetInt64(10), r.GetInt64(11), r.GetDouble(12), r.GetDouble(13),
                r.GetDouble(14), r.GetDouble(15), r.GetInt32(16), r.GetInt32(17), r.GetInt64(18) != 0, r.GetInt64(19) != 0)
            {
                Success = r.GetInt64(4) != 0,
            });
            using var command = _connection.CreateCommand();
            command.CommandText = "SELECT * FROM runs ORDER BY variant, run_index";
            using var reader = command.ExecuteReader();
            var runs = new List<RunRecord>();
            while (reader.Read())
            {
                var key = (reader.GetString(0), reader.GetInt32(1));
                runs.Add(new RunRecord(key.Item1, key.Item2, reader.GetInt64(2), reader.GetString(3), reader.GetString(4), reader.GetInt64(5) != 0, N(reader, 6), reader.GetDouble(7),
                    reader.GetDouble(8), reader.GetDouble(9), reader.GetInt64(10), reader.GetInt64(11), reader.GetDouble(12), reader.GetDouble(13), reader.GetDouble(14), reader.GetDouble(15),
                    reader.GetInt32(16), reader.GetInt32(17), reader.GetString(18),
                    inputs.GetValueOrDefault(key) ?? [], criteria.GetValueOrDefault(key) ?? [], faults.GetValueOrDefault(key) ?? [], firings.GetValueOrDefault(key) ?? [])
                {
                    RulesActed = acted.GetValueOrDefault(key) ?? [],
                    Branches = branches.GetValueOrDefault(key) ?? [],
                    Landers = [.. (landers.GetValueOrDefault(key) ?? []).Select(l => l with { Criteria = [.. (landerCriteria.GetValueOrDefault(key) ?? []).Where(c => c.Lander == l.Lander).Select(c => c.Result)] })],
                });
            }

            return runs;
        }
    }

    public void Dispose() => _connection.Dispose();

    private static double? N(SqliteDataReader r, int i) => r.IsDBNull(i) ? null : r.GetDouble(i);

    private Dictionary<(string, int), List<T>> Group<T>(string sql, Func<SqliteDataReader, T> read)
    {
        using var command = _connection.CreateCommand();
        command.CommandText = sql;
        using var reader = command.ExecuteReader();
        var groups = new Dictionary<(string, int), List<T>>();
        while (reader.Read())
        {
            var key = (reader.GetString(0), reader.GetInt32(1));
            if (!groups.TryGetValue(key, out var list)) groups[key] = list = [];
            list.Add(read(reader));
        }

        return groups;
    }

    private int Insert(SqliteTransaction transaction, string sql, params (string Name, object? Value)[] parameters)
    {
        using var command = _connection.CreateCommand();
        command.Transaction = transaction;
        command.CommandText = sql;
        foreach (var (name, value) in parameters) command.Parameters.AddWithValue(name, value ?? DBNull.Value);
        return command.ExecuteNonQuery();
    }

    private void Execute(string sql)
    {
        using var command = _connection.CreateCommand();
        command.CommandText = sql;
        command.ExecuteNonQuery();
    }

    private object? Scalar(string sql)
    {
        using var command = _connection.CreateCommand();
        command.CommandText = sql;
        return command.ExecuteScalar();
    }

    /// <summary>Settings as JSON text, for the variants list.</summary>
    public static string Json<T>(T value) => JsonSerializer.Serialize(value);
}
