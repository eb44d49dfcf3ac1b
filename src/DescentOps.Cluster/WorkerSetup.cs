using DescentOps.Campaigns;

namespace DescentOps.Cluster;

/// <summary>What a worker needs: its name and build, its slots (runs at once), the secret, and how to make a plan from a campaign's settings.</summary>
/// <param name="Name">Shown on the campaign node (host and process id).</param>
/// <param name="ToolVersion">This build; the campaign node admits only its own.</param>
/// <param name="Slots">Runs at once.</param>
/// <param name="Secret">The shared secret, when the campaign node asks for one.</param>
/// <param name="PlanOf">The plan a campaign's settings (JSON of a string map) describe.</param>
/// <param name="Notice">A line for the person running the worker.</param>
public sealed record WorkerSetup(string Name, string ToolVersion, int Slots, JoinSecret? Secret, Func<string, CampaignPlan> PlanOf, Action<string> Notice);
