namespace DescentOps.Physics.Vehicles;

/// <summary>Speed, power, energy and endurance of a <see cref="PropelledVehicle"/>.</summary>
public static class PropelledVehicleModel
{
    private const string Model = "the propelled vehicle model";

    /// <summary>Everything at one through-water speed, for a battery of a given energy.</summary>
    public static VehicleOperatingPoint AtSpeed(PropelledVehicle vehicle, double speedMPerS, double waterDensityKgPerM3, double batteryEnergyJ)
    {
        Validate(vehicle, waterDensityKgPerM3);
        ValidRange.Require(speedMPerS, 1e-3, 20.0, nameof(speedMPerS), "m/s", Model);
        ValidRange.RequireNonNegative(batteryEnergyJ, nameof(batteryEnergyJ), "J", Model);
        var drag = 0.5 * waterDensityKgPerM3 * vehicle.DragCoefficient * vehicle.FrontalAreaM2 * speedMPerS * speedMPerS;
        var propulsive = drag * speedMPerS / vehicle.PropulsiveEfficiency;
        var total = vehicle.HotelPowerW + propulsive;
        var endurance = batteryEnergyJ / total;
        return new VehicleOperatingPoint(speedMPerS, drag, propulsive, total, total / speedMPerS, endurance, endurance * speedMPerS);
    }

    /// <summary>Speed reached with a given propulsive (shaft-in) power, (2ηP/(ρC_D·A))^(1/3).</summary>
    public static double SpeedForPropulsivePowerMPerS(PropelledVehicle vehicle, double propulsivePowerW, double waterDensityKgPerM3)
    {
        Validate(vehicle, waterDensityKgPerM3);
        ValidRange.RequireNonNegative(propulsivePowerW, nameof(propulsivePowerW), "W", Model);
        return Math.Cbrt(2.0 * vehicle.PropulsiveEfficiency * propulsivePowerW / (waterDensityKgPerM3 * vehicle.DragCoefficient * vehicle.FrontalAreaM2));
    }

    /// <summary>Speed of least energy per distance (most range), (P_hotel·η/(ρC_D·A))^(1/3).</summary>
    public static double MaximumRangeSpeedMPerS(PropelledVehicle vehicle, double waterDensityKgPerM3)
    {
        Validate(vehicle, waterDensityKgPerM3);
        return Math.Cbrt(vehicle.HotelPowerW * vehicle.PropulsiveEfficiency / (waterDensityKgPerM3 * vehicle.DragCoefficient * vehicle.FrontalAreaM2));
    }

    private static void Validate(PropelledVehicle vehicle, double waterDensityKgPerM3)
    {
        ArgumentNullException.ThrowIfNull(vehicle);
        ValidRange.Require(waterDensityKgPerM3, 900.0, 1300.0, nameof(waterDensityKgPerM3), "kg/m³", Model);
        ValidRange.RequirePositive(vehicle.DragCoefficient, nameof(vehicle.DragCoefficient), "(drag coefficient)", Model);
        ValidRange.RequirePositive(vehicle.FrontalAreaM2, nameof(vehicle.FrontalAreaM2), "m²", Model);
        ValidRange.Require(vehicle.PropulsiveEfficiency, 1e-3, 1.0, nameof(vehicle.PropulsiveEfficiency), "(fraction)", Model);
        ValidRange.RequireNonNegative(vehicle.HotelPowerW, nameof(vehicle.HotelPowerW), "W", Model);
    }
}
