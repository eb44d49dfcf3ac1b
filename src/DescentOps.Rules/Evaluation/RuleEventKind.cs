namespace DescentOps.Rules.Evaluation;

/// <summary>State changes the mission journals.</summary>
public enum RuleEventKind
{
    /// <summary>The condition stopped holding after a firing (or after a firing was held back by cooldown).</summary>
    Cleared,
    /// <summary>The condition holds but the rule fired less than its cooldown ago; it fires when the cooldown ends if still holding.</summary>
    HeldByCooldown,
    Enabled,
    Disabled,
    /// <summary>Escalation steps still to come were withdrawn because the condition cleared.</summary>
    EscalationWithdrawn,
    /// <summary>A higher-priority rule took an actuator another rule held.</summary>
    ActuatorTaken,
    ActuatorReleased,
    /// <summary>A command was not sent: its actuator is held by a rule of higher or equal priority.</summary>
    CommandBlocked,
    /// <summary>A sample was refused (late, wrong kind of value, not finite); nothing was evaluated.</summary>
    SampleRejected,
}
