namespace DescentOps.Scenarios.Model;

/// <summary>What a vehicle_loss fault does to its vehicle.</summary>
public enum VehicleLossCause
{
    /// <summary>The battery fails: its charge falls to the fault's remaining fraction.</summary>
    Battery,

    /// <summary>The vehicle is caught (under a ridge of the ice, in a crevasse) and cannot move until the fault clears.</summary>
    Entrapment,

    /// <summary>The vehicle's acoustic link is dead until the fault clears.</summary>
    OutOfRange,
}
