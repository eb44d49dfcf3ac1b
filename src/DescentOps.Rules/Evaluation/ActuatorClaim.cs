namespace DescentOps.Rules.Evaluation;

/// <summary>The outcome of a rule asking to command an actuator.</summary>
internal enum ActuatorClaim
{
    /// <summary>Free, or already the asking rule's.</summary>
    Granted,
    /// <summary>Held by a lower-priority rule, which loses it.</summary>
    Taken,
    /// <summary>Held by a rule of higher or equal priority; the command is not sent.</summary>
    Blocked,
}
