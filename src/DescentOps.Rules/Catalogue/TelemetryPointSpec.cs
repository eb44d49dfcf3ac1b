namespace DescentOps.Rules.Catalogue;

/// <summary>A telemetry point the mission publishes, by name.</summary>
public abstract record TelemetryPointSpec(string Name)
{
    /// <summary>
    /// True state that no sensor reports and no frame carries: a fault's trigger may read it (faults act on what is),
    /// rules may not (flight software and the ground see only what is sensed).
    /// </summary>
    public bool TrueStateOnly { get; init; }

    /// <summary>
    /// What the ground alone knows (the station as the ground hears it): ground rules and procedures may read it, rules
    /// on board and fault triggers may not.
    /// </summary>
    public bool GroundOnly { get; init; }
}
