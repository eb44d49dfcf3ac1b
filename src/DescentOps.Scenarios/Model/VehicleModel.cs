namespace DescentOps.Scenarios.Model;

/// <summary>
/// A vehicle carried by the probe and released at breakthrough to profile the water column.
/// <see cref="SpeedVariation"/> is the standard deviation, as a fraction of the speed, of the speed made good
/// over one leg: currents under the ice help on some legs and hinder on others.
/// </summary>
public sealed record VehicleModel(
    string Name,
    double BatteryEnergyJ,
    double ReserveFraction,
    double HotelPowerW,
    double PropulsionPowerW,
    double SpeedMPerS,
    double ProfileDepthM,
    double SpeedVariation);
