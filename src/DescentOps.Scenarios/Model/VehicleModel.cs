namespace DescentOps.Scenarios.Model;

/// <summary>A vehicle carried by the probe and released at breakthrough to profile the water column.</summary>
public sealed record VehicleModel(
    string Name,
    double BatteryEnergyJ,
    double ReserveFraction,
    double HotelPowerW,
    double PropulsionPowerW,
    double SpeedMPerS,
    double ProfileDepthM);
