namespace DescentOps.Scenarios.Model;

/// <summary>
/// A change to a scenario for a branch: faults added, faults removed by name, and optionally the whole rules block
/// replaced. Applied to the parent's scenario; a branch checks that the run is unchanged before its instant.
/// </summary>
public sealed record ScenarioChange(string Name, string Text, IReadOnlyList<FaultModel> AddFaults, IReadOnlyList<string> RemoveFaults, RulesSource? Rules)
{
    /// <summary>Time-tagged telecommands added to the parent's.</summary>
    public IReadOnlyList<TimedTelecommandModel> AddTelecommands { get; init; } = [];

    /// <summary>Rule sets the ground uplinks during the branch, each replacing the set in force from its time.</summary>
    public IReadOnlyList<RuleUplinkModel> RuleUplinks { get; init; } = [];

    /// <summary>The earliest instant the change acts at by its own times (telecommands and uplinks), if it gives any.</summary>
    public double? EarliestTimedActionS =>
        AddTelecommands.Select(t => (double?)t.AtS).Concat(RuleUplinks.Select(u => (double?)u.AtS)).Min();

    public Scenario ApplyTo(Scenario parent)
    {
        var missing = RemoveFaults.Where(n => parent.Faults.All(f => f.Name != n)).ToList();
        if (missing.Count > 0)
        {
            throw new Loading.ScenarioException([new Loading.ScenarioError(new Loading.SourceLocation(Name, 1, 1), "remove_faults",
                $"the parent scenario has no fault named {string.Join(", ", missing)}")]);
        }

        var stranger = AddFaults.FirstOrDefault(f => f.Vehicle is { } v && parent.Vehicles.All(p => p.Name != v));
        if (stranger is not null)
        {
            throw new Loading.ScenarioException([new Loading.ScenarioError(new Loading.SourceLocation(Name, 1, 1), "add_faults",
                $"fault '{stranger.Name}' names vehicle '{stranger.Vehicle}', which the parent scenario does not have")]);
        }

        var faults = parent.Faults.Where(f => !RemoveFaults.Contains(f.Name)).Concat(AddFaults).ToList();
        var clash = faults.GroupBy(f => f.Name).FirstOrDefault(g => g.Count() > 1);
        if (clash is not null)
        {
            throw new Loading.ScenarioException([new Loading.ScenarioError(new Loading.SourceLocation(Name, 1, 1), "add_faults",
                $"fault '{clash.Key}' is already in the parent scenario; remove it first to replace it")]);
        }

        return parent with
        {
            Faults = faults,
            Rules = Rules ?? parent.Rules,
            Telecommands = [.. parent.Telecommands.Concat(AddTelecommands).OrderBy(t => t.AtS)],
            RuleUplinks = [.. parent.RuleUplinks.Concat(RuleUplinks).OrderBy(u => u.AtS)],
        };
    }
}
