namespace DescentOps.Mission.Probe;

/// <summary>Where the probe is in its mission. Names are written into telemetry and the log.</summary>
public enum ProbeRegime
{
    /// <summary>Melting down through the shell.</summary>
    Melting,

    /// <summary>Heater power too low to melt: the probe sits where it is.</summary>
    Stopped,

    /// <summary>Through the ice, at the ice-ocean interface, serving the vehicles.</summary>
    AtOcean,
}
