namespace DescentOps.Scenarios.Model;

/// <summary>How a vehicle moves: a propeller at a set speed, or a buoyancy glider.</summary>
public enum VehicleKind
{
    Propeller,
    Glider,
}
