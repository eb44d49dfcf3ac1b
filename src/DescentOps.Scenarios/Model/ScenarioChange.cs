namespace DescentOps.Scenarios.Model;

/// <summary>
/// A change to a scenario for a branch: faults added, faults removed by name, and optionally the whole rules block
/// replaced. Applied to the parent's scenario; a branch checks that the run is unchanged before its instant.
/// </summary>
public sealed record ScenarioChange(string Name, string Text, IReadOnlyList<FaultModel> AddFaults, IReadOnlyList<string> RemoveFaults, RulesSource? Rules)
{
    /// <summary>Where each field's value stands in the change file, by field path ("remove_faults[0].name").</summary>
    public IReadOnlyDictionary<string, Loading.SourceLocation> FieldLocations { get; init; } = new Dictionary<string, Loading.SourceLocation>();

    /// <summary>Time-tagged telecommands added to the parent's.</summary>
    public IReadOnlyList<TimedTelecommandModel> AddTelecommands { get; init; } = [];

    /// <summary>Rule sets the ground uplinks during the branch, each replacing the set in force from its time.</summary>
    public IReadOnlyList<RuleUplinkModel> RuleUplinks { get; init; } = [];

    /// <summary>The earliest instant the change acts at by its own times (telecommands and uplinks), if it gives any.</summary>
    public double? EarliestTimedActionS =>
        AddTelecommands.Select(t => (double?)t.AtS).Concat(RuleUplinks.Select(u => (double?)u.AtS)).Min();

    public Scenario ApplyTo(Scenario parent)
    {
        var missing = RemoveFaults.Select((n, i) => (Name: n, Index: i)).FirstOrDefault(r => parent.Faults.All(f => f.Name != r.Name));
        if (missing.Name is not null)
        {
            throw Refused($"remove_faults[{missing.Index}].name", $"the parent scenario has no fault named {missing.Name}");
        }

        var stranger = AddFaults.Select((f, i) => (Fault: f, Index: i)).FirstOrDefault(a => a.Fault.Effect is FaultEffect.VehicleLoss { Vehicle: var v } && parent.Vehicles.All(p => p.Name != v));
        if (stranger.Fault is not null)
        {
            throw Refused($"add_faults[{stranger.Index}].vehicle", $"fault '{stranger.Fault.Name}' names vehicle '{((FaultEffect.VehicleLoss)stranger.Fault.Effect).Vehicle}', which the parent scenario does not have");
        }

        var kept = parent.Faults.Where(f => !RemoveFaults.Contains(f.Name)).ToList();
        var clash = AddFaults.Select((f, i) => (Fault: f, Index: i)).FirstOrDefault(a => kept.Any(k => k.Name == a.Fault.Name) || AddFaults.Take(a.Index).Any(b => b.Name == a.Fault.Name));
        if (clash.Fault is not null)
        {
            throw Refused($"add_faults[{clash.Index}].name", $"fault '{clash.Fault.Name}' is already in the parent scenario; remove it first to replace it");
        }

        var faults = kept.Concat(AddFaults).ToList();
        return parent with
        {
            Faults = faults,
            Rules = Rules ?? parent.Rules,
            Telecommands = [.. parent.Telecommands.Concat(AddTelecommands).OrderBy(t => t.AtS)],
            RuleUplinks = [.. parent.RuleUplinks.Concat(RuleUplinks).OrderBy(u => u.AtS)],
        };
    }

    private Loading.ScenarioException Refused(string fieldPath, string message) =>
        new([new Loading.ScenarioError(FieldLocations.TryGetValue(fieldPath, out var at) ? at : new Loading.SourceLocation(Name, 1, 1), fieldPath, message)]);
}
