namespace DescentOps.Scenarios.Model;

/// <summary>What a bus load is. Heater loads draw their set points, electronics the probe's electronics power.</summary>
public enum BusLoadRole
{
    HeadHeater,
    WallHeater,
    Electronics,

    /// <summary>The hot-water jets: their heat set point and their pump, while they run (a probe with a jets section).</summary>
    Jets,

    /// <summary>A load of constant power given in the scenario (a pump, an instrument).</summary>
    Fixed,
}
