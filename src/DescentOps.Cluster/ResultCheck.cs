using DescentOps.Campaigns;

namespace DescentOps.Cluster;

/// <summary>
/// What a result from the network must be before the campaign node stores it: a record that reads, of the run it
/// claims to be, of a variant and index this campaign has, computed from the seed the plan gives that run.
/// </summary>
public static class ResultCheck
{
    /// <summary>The record, or an <see cref="InvalidDataException"/> saying why it is refused.</summary>
    public static RunRecord Validate(CampaignPlan plan, RunKey key, string recordJson)
    {
        if (key.Index < 0 || plan.Variants.All(v => v.Name != key.Variant)) throw new InvalidDataException($"run {key} is not in this campaign");
        var record = RunRecordCodec.Decode(recordJson);
        if (record.Variant != key.Variant || record.Index != key.Index) throw new InvalidDataException($"the record is of run {record.Index} of {record.Variant}, not of {key}");
        var seed = plan.Spec(key.Variant, key.Index).Seed;
        if (record.Seed != seed) throw new InvalidDataException($"the record's seed {record.Seed} is not the run's seed {seed}");
        return record;
    }
}
