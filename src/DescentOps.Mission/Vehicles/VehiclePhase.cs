namespace DescentOps.Mission.Vehicles;

/// <summary>Where a vehicle is in its life: aboard the probe, at work, on the way home, charging at the dock, or done (finished or lost).</summary>
public enum VehiclePhase
{
    Stowed,
    Working,
    Returning,
    Charging,
    Done,
}
