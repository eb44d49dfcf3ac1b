using System.Text.Json;
using System.Text.Json.Serialization;
using DescentOps.Campaigns;

namespace DescentOps.Cluster;

/// <summary>
/// A run's record as it crosses the network: System.Text.Json, whose numbers are written in the shortest form that reads
/// back to the same double, so a record computed on a worker is stored bit for bit as if computed locally. A record
/// larger than <see cref="MaxChars"/> or one that does not read back is refused, not stored. Each lander's figures
/// (<see cref="RunRecord.Landers"/>) travel in the same text.
/// </summary>
public static class RunRecordCodec
{
    /// <summary>Far above any real record (a few kilobytes), far below the transport's frame limit.</summary>
    public const int MaxChars = 1_000_000;

    private static readonly JsonSerializerOptions Options = new()
    {
        IncludeFields = true, // the (rule, firings) pairs are value tuples
        NumberHandling = JsonNumberHandling.AllowNamedFloatingPointLiterals,
        MaxDepth = 8,
    };

    public static string Encode(RunRecord record) => JsonSerializer.Serialize(record, Options);

    /// <summary>The record, or an <see cref="InvalidDataException"/> naming what is wrong.</summary>
    public static RunRecord Decode(string json)
    {
        if (json.Length > MaxChars) throw new InvalidDataException($"a run record of {json.Length} characters (at most {MaxChars})");
        RunRecord? record;
        try
        {
            record = JsonSerializer.Deserialize<RunRecord>(json, Options);
        }
        catch (JsonException exception)
        {
            throw new InvalidDataException($"a run record that does not read: {exception.Message}", exception);
        }

        if (record is null || record.Variant is null || record.Outcome is null || record.Reason is null || record.SummaryChain is null
            || record.Inputs is null || record.Criteria is null || record.Faults is null || record.RuleFirings is null
            || record.Landers is null || record.Landers.Any(l => l is null || l.Lander is null || l.Criteria is null)
            || record.RulesActed is null || record.RulesActed.Any(r => r?.Rule is null)
            || record.Branches is null || record.Branches.Any(b => b?.Procedure is null || b.Step is null || b.Branch is null))
        {
            throw new InvalidDataException("a run record with missing fields");
        }

        return record;
    }
}
