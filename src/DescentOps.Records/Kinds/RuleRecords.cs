namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. Recovery rules, on board and on the ground.</summary>
public static class RuleRecords
{
    public const string Continued = "rule.continued";
    public const string Escalated = "rule.escalated";
    public const string Fired = "rule.fired";
    public const string Cleared = "rule.cleared";
    public const string HeldByCooldown = "rule.held_by_cooldown";
    public const string Enabled = "rule.enabled";
    public const string Disabled = "rule.disabled";
    public const string EscalationWithdrawn = "rule.escalation_withdrawn";
    public const string ActuatorTaken = "rule.actuator_taken";
    public const string ActuatorReleased = "rule.actuator_released";
    public const string CommandBlocked = "rule.command_blocked";
    public const string SampleRejected = "rule.sample_rejected";

    /// <summary>The ground sends a new rule set (and starts its own part of it).</summary>
    public const string SetUplinked = "rule.set_uplinked";

    /// <summary>A rule host replaced its rules with an uplinked set.</summary>
    public const string SetLoaded = "rule.set_loaded";
}
