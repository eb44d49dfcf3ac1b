namespace DescentOps.Rules.Evaluation;

/// <summary>
/// Who holds each actuator (command target). A rule holds what it has commanded until its condition clears or
/// it is disabled. Higher priority takes an actuator over; equal priority (allowed only where the rule set
/// declares an exclusion) leaves it with whoever commanded it first.
/// </summary>
internal sealed class ActuatorLocks
{
    private readonly Dictionary<string, RuleRuntime> _holders = new(StringComparer.Ordinal);

    public ActuatorClaim Claim(string target, RuleRuntime claimant, out RuleRuntime? previousHolder)
    {
        previousHolder = _holders.GetValueOrDefault(target);
        if (previousHolder is null || ReferenceEquals(previousHolder, claimant))
        {
            _holders[target] = claimant;
            return ActuatorClaim.Granted;
        }

        if (claimant.Rule.Priority > previousHolder.Rule.Priority)
        {
            _holders[target] = claimant;
            return ActuatorClaim.Taken;
        }

        return ActuatorClaim.Blocked;
    }

    /// <summary>Releases everything the rule holds; returns the targets in ordinal order, for a stable journal.</summary>
    public IReadOnlyList<string> ReleaseAll(RuleRuntime holder)
    {
        var released = _holders.Where(pair => ReferenceEquals(pair.Value, holder)).Select(pair => pair.Key).Order(StringComparer.Ordinal).ToArray();
        foreach (var target in released)
        {
            _holders.Remove(target);
        }

        return released;
    }
}
