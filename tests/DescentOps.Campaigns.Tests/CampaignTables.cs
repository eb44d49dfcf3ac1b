using Microsoft.Data.Sqlite;

namespace DescentOps.Campaigns.Tests;

/// <summary>A campaign store's tables as text, shared by the campaign and the cluster tests (linked into both).</summary>
public static class CampaignTables
{
    /// <summary>Every table's rows, ordered by their key, as text: two equal dumps mean equal tables.</summary>
    public static string Dump(string dir)
    {
        using var connection = new SqliteConnection($"Data Source={Path.Combine(dir, "campaign.sqlite")};Pooling=False;Mode=ReadOnly");
        connection.Open();
        var text = new System.Text.StringBuilder();
        foreach (var (table, order) in new[]
        {
            ("runs", "variant, run_index"), ("inputs", "variant, run_index, path"), ("criteria", "variant, run_index, criterion"),
            ("fault_measures", "variant, run_index, ordinal"), ("rule_firings", "variant, run_index, rule"),
            ("landers", "variant, run_index, ordinal"), ("lander_criteria", "variant, run_index, lander, criterion"),
            ("rule_coverage", "variant, run_index, rule"), ("procedure_branches", "variant, run_index, ordinal"),
        })
        {
            using var command = connection.CreateCommand();
            command.CommandText = $"SELECT * FROM {table} ORDER BY {order}";
            using var reader = command.ExecuteReader();
            text.Append(table).Append('\n');
            while (reader.Read())
            {
                for (var i = 0; i < reader.FieldCount; i++) text.Append(reader.IsDBNull(i) ? "NULL" : Convert.ToString(reader.GetValue(i), System.Globalization.CultureInfo.InvariantCulture)).Append('|');
                text.Append('\n');
            }
        }

        return text.ToString();
    }
}
