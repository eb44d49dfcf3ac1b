using DescentOps.Campaigns;

namespace DescentOps.Cluster;

/// <summary>
/// What the campaign node's dispatcher needs: the campaign (its settings as sent to workers, and the plan to check seeds
/// against), the runs still to do, who may join, and where accepted results go.
/// </summary>
/// <param name="SettingsJson">The campaign's settings as stored in campaign.sqlite, as JSON: workers build the plan from them.</param>
/// <param name="Plan">The campaign's plan: a result's seed must be the one the plan gives its key.</param>
/// <param name="Work">The runs not yet stored, in the campaign's order.</param>
/// <param name="ToolVersion">Only workers of this very build take part (the same binary gives the same results).</param>
/// <param name="Secret">When set, a worker must prove it holds it before it gets any work.</param>
/// <param name="Accept">Stores an accepted result (called on the dispatcher's thread, one at a time); false when the store already had it.</param>
/// <param name="StopIndex">The precision stop: runs at or beyond it are no longer handed out.</param>
/// <param name="Notice">A line for the person running the campaign (workers joining and lost, duplicates discarded).</param>
public sealed record DispatcherSetup(
    string SettingsJson,
    CampaignPlan Plan,
    IReadOnlyList<RunKey> Work,
    string ToolVersion,
    JoinSecret? Secret,
    Func<RunRecord, bool> Accept,
    Func<int> StopIndex,
    Action<string> Notice);
