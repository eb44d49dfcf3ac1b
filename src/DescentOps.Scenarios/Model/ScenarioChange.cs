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

    /// <summary>
    /// The lander each added telecommand and uplink names, by its field path in the change file
    /// (<c>add_telecommands[0]</c>, <c>uplink_rules[1]</c>); an entry without <c>lander:</c> is absent.
    /// </summary>
    public IReadOnlyDictionary<string, string> TimedLanders { get; init; } = new Dictionary<string, string>();

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

        if (TimedLanders.OrderBy(t => t.Key, StringComparer.Ordinal).FirstOrDefault() is { Key: not null } timed)
        {
            throw Refused(timed.Key + ".lander", $"the parent scenario has no 'landers' list, so there is no lander '{timed.Value}' to name");
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
    /// A change to a scenario with landers: each added fault, telecommand and rule uplink goes to the lander it names (the
    /// only one when there is one), removed faults leave the lander that had them, and a rules block replaces every
    /// lander's rules. An uplink replaces the rules of its lander only.
    /// </summary>
    private Scenario ApplyToLanders(Scenario parent)
    {
        var names = parent.Landers.Select(l => l.Name).ToList();
        string TimedTarget(string fieldPath, string what)
        {
            var lander = TimedLanders.GetValueOrDefault(fieldPath);
            if (lander is null && names.Count > 1) throw Refused(fieldPath + ".lander", $"with several landers an added {what} names its lander ({string.Join(", ", names)})");
            lander ??= names[0];
            return names.Contains(lander) ? lander : throw Refused(fieldPath + ".lander", $"the parent scenario has no lander named '{lander}'");
        }

        var telecommandTargets = AddTelecommands.Select(t => TimedTarget(t.FieldPath, "telecommand")).ToList();
        var uplinkTargets = RuleUplinks.Select(u => TimedTarget(u.FieldPath, "rule uplink")).ToList();
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
                Telecommands = [.. l.View.Telecommands.Concat(AddTelecommands.Where((_, i) => telecommandTargets[i] == l.Name)).OrderBy(t => t.AtS)],
                RuleUplinks = [.. l.View.RuleUplinks.Concat(RuleUplinks.Where((_, i) => uplinkTargets[i] == l.Name)).OrderBy(u => u.AtS)],
            },
        }).ToList();
        // The top level stands for the first lander (as the loader made it), so it carries that lander's timed parts.
        return parent with
        {
            Faults = [.. kept, .. AddFaults],
            Rules = Rules ?? parent.Rules,
            Landers = landers,
            Telecommands = landers[0].View.Telecommands,
            RuleUplinks = landers[0].View.RuleUplinks,
        };
    }

    /// <summary>A located refusal: at the field, or at the nearest enclosing field the file has (an omitted <c>lander</c> at its entry).</summary>
    private Loading.ScenarioException Refused(string fieldPath, string message)
    {
        for (var path = fieldPath; path.Length > 0; path = path.Contains('.', StringComparison.Ordinal) ? path[..path.LastIndexOf('.')] : "")
        {
            if (FieldLocations.TryGetValue(path, out var at)) return new([new Loading.ScenarioError(at, fieldPath, message)]);
            // An entry is placed by its first field.
            var inside = FieldLocations.Where(l => l.Key.StartsWith(path + ".", StringComparison.Ordinal)).Select(l => l.Value).OrderBy(l => l.Line).ThenBy(l => l.Column).ToList();
            if (inside.Count > 0) return new([new Loading.ScenarioError(inside[0], fieldPath, message)]);
        }

        return new([new Loading.ScenarioError(new Loading.SourceLocation(Name, 1, 1), fieldPath, message)]);
    }
}
