namespace DescentOps.Mission.Probe;

/// <summary>Where the probe is in its descent. Names are written into telemetry and the log.</summary>
public enum ProbeRegime
{
    /// <summary>Near an airless surface, before the hole is sealed: the head sublimates the ice.</summary>
    Sublimating,

    /// <summary>Melting down through the shell.</summary>
    Melting,

    /// <summary>Not moving (heater power lost, or too little to beat the conduction loss); the water gap around it is still liquid.</summary>
    Stopped,

    /// <summary>The gap around the body has frozen: the probe is held by the ice until its wall heaters melt it free.</summary>
    FrozenIn,

    /// <summary>Wall heaters are melting the frozen gap; descent resumes when it is open.</summary>
    MeltingFree,

    /// <summary>Through the ice, at the ice-ocean interface, serving the vehicles.</summary>
    AtOcean,
}
