namespace DescentOps.Scenarios.Model;

/// <summary>What a vehicle does in the ocean; each task is a repeating cycle of legs.</summary>
public enum VehicleTask
{
    /// <summary>Down to the profile depth below the ice and back up.</summary>
    WaterColumn,

    /// <summary>Out and back along a transect just under the ice.</summary>
    IceMapping,

    /// <summary>Down to the sea floor (the profile depth), a transect out and back, and up.</summary>
    SeafloorSurvey,

    /// <summary>Down to the profile depth, a time on station, and up.</summary>
    Sampling,
}
