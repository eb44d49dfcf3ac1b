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

    /// <summary>The lander each added fault names (<c>lander:</c>), in the order of <see cref="AddFaults"/>; null where none is named.</summary>
    public IReadOnlyList<string?> AddFaultLanders { get; init; } = [];

    /// <summary>The earliest instant the change acts at by its own times (telecommands and uplinks), if it gives any.</summary>
    public double? EarliestTimedActionS =>
        AddTelecommands.Select(t => (double?)t.AtS).Concat(RuleUplinks.Select(u => (double?)u.AtS)).Min();

    public Scenario ApplyTo(Scenario parent)
    {
        ArgumentNullException.ThrowIfNull(parent);
        if (parent.Landers.Count > 0) return ApplyToLanders(parent);
        var named = AddFaultLanders.Select((l, i) => (Lander: l, Index: i)).FirstOrDefault(a => a.Lander is not null);
        if (named.Lander is not null)
        {
            throw Refused($"add_faults[{named.Index}].lander", $"the parent scenario has no 'landers' list, so there is no lander '{named.Lander}' to name");
        }

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

    /// <summary>
    /// A change to a scenario with landers: each added fault goes to the lander it names (the only one when there is
    /// one), removed faults leave the lander that had them, and a rules block replaces every lander's rules.
    /// </summary>
    private Scenario ApplyToLanders(Scenario parent)
    {
        if (AddTelecommands.Count > 0) throw Refused("add_telecommands", "a branch of a scenario with landers cannot add telecommands yet: a telecommand names no lander");
        if (RuleUplinks.Count > 0) throw Refused("uplink_rules", "a branch of a scenario with landers cannot uplink rules yet: an uplink names no lander");
        var names = parent.Landers.Select(l => l.Name).ToList();
        var targets = new List<string>();
        for (var i = 0; i < AddFaults.Count; i++)
        {
            var lander = i < AddFaultLanders.Count ? AddFaultLanders[i] : null;
            if (lander is null && names.Count > 1) throw Refused($"add_faults[{i}].lander", $"with several landers an added fault names its lander ({string.Join(", ", names)})");
            lander ??= names[0];
            if (!names.Contains(lander)) throw Refused($"add_faults[{i}].lander", $"the parent scenario has no lander named '{lander}'");
            targets.Add(lander);
        }

        var missing = RemoveFaults.Select((n, i) => (Name: n, Index: i)).FirstOrDefault(r => parent.Faults.All(f => f.Name != r.Name));
        if (missing.Name is not null) throw Refused($"remove_faults[{missing.Index}].name", $"the parent scenario has no fault named {missing.Name}");
        var kept = parent.Faults.Where(f => !RemoveFaults.Contains(f.Name)).ToList();
        for (var i = 0; i < AddFaults.Count; i++)
        {
            var fault = AddFaults[i];
            if (kept.Any(k => k.Name == fault.Name) || AddFaults.Take(i).Any(b => b.Name == fault.Name))
            {
                throw Refused($"add_faults[{i}].name", $"fault '{fault.Name}' is already in the parent scenario; remove it first to replace it");
            }

            var view = parent.Landers[names.IndexOf(targets[i])].View;
            if (fault.Effect is FaultEffect.VehicleLoss { Vehicle: var v } && view.Vehicles.All(p => p.Name != v))
            {
                throw Refused($"add_faults[{i}].vehicle", $"fault '{fault.Name}' names vehicle '{v}', which lander '{targets[i]}' does not have");
            }
        }

        var landers = parent.Landers.Select(l => l with
        {
            View = l.View with
            {
                Faults = [.. l.View.Faults.Where(f => !RemoveFaults.Contains(f.Name)), .. AddFaults.Where((_, i) => targets[i] == l.Name)],
                Rules = Rules ?? l.View.Rules,
            },
        }).ToList();
        return parent with { Faults = [.. kept, .. AddFaults], Rules = Rules ?? parent.Rules, Landers = landers };
    }

    private Loading.ScenarioException Refused(string fieldPath, string message) =>
        new([new Loading.ScenarioError(FieldLocations.TryGetValue(fieldPath, out var at) ? at : new Loading.SourceLocation(Name, 1, 1), fieldPath, message)]);
}
