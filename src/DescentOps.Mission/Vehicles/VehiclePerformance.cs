using DescentOps.Physics.Vehicles;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// What a vehicle can do in the water it is released into: its speed through the water and the power it draws, from
/// the propeller model (given power, or drag of its hull at its speed) or the steady glide (Leonard and Graver 2001)
/// at the body's gravity, and a glider's pump stroke at the absolute pressure under the shell.
/// </summary>
public sealed record VehiclePerformance(VehicleModel Vehicle, double WaterDensityKgPerM3, double GravityMPerS2, double BasePressurePa, GlideState? Glide, double MovingPowerW)
{
    /// <summary>Depth band a glider yo-yos through on a level transect: 50 m (a modelling default of ours, no source).</summary>
    public const double GliderTransectBandM = 50.0;

    public static VehiclePerformance For(VehicleModel vehicle, double waterDensityKgPerM3, double gravityMPerS2, double basePressurePa)
    {
        if (vehicle.Kind == VehicleKind.Glider)
        {
            var g = vehicle.Glider!;
            var coefficients = Coefficients(g);
            var glide = SteadyGlide.AtAngleOfAttack(coefficients, SteadyGlide.AngleOfAttackRad(coefficients, g.GlideAngleRad), g.NetBuoyancyKg, gravityMPerS2);
            return new VehiclePerformance(vehicle, waterDensityKgPerM3, gravityMPerS2, basePressurePa, glide, vehicle.HotelPowerW);
        }

        var propulsion = vehicle.Hull is { } hull
            ? PropelledVehicleModel.AtSpeed(new PropelledVehicle(hull.DragCoefficient, Math.PI * hull.DiameterM * hull.DiameterM / 4, hull.PropulsiveEfficiency, vehicle.HotelPowerW), vehicle.SpeedMPerS, waterDensityKgPerM3, vehicle.BatteryEnergyJ).PropulsivePowerW
            : vehicle.PropulsionPowerW;
        return new VehiclePerformance(vehicle, waterDensityKgPerM3, gravityMPerS2, basePressurePa, null, vehicle.HotelPowerW + propulsion);
    }

    /// <summary>Speed through the water along a straight course: a glider's horizontal speed, a propeller's set speed.</summary>
    public double CruiseSpeedMPerS => Glide?.HorizontalSpeedMPerS ?? Vehicle.SpeedMPerS;

    /// <summary>Still-water energy to run a distance at cruise speed from a depth (the vehicle's estimate of the way home).</summary>
    public double CruiseEnergyJ(double distanceM, double fromDownM) => (MovingPowerW * distanceM / CruiseSpeedMPerS) + TransectPumpEnergyJ(distanceM, fromDownM / 2);

    /// <summary>One pump stroke: from heavy by m0 to buoyant by m0 displaces 2·m0/ρ against the absolute pressure at the depth.</summary>
    public double PumpStrokeJ(double downM)
    {
        if (Vehicle.Glider is not { } g) return 0.0;
        var pressure = BasePressurePa + (WaterDensityKgPerM3 * GravityMPerS2 * Math.Max(downM, 0.0));
        return SteadyGlide.PumpStrokeEnergyJ(2 * g.NetBuoyancyKg / WaterDensityKgPerM3, Math.Max(pressure, 1.0), g.PumpEfficiency);
    }

    /// <summary>Pump strokes of a glider yo-yoing over a horizontal distance, two per dive-and-climb of the transect band.</summary>
    public double TransectPumpEnergyJ(double distanceM, double meanDownM)
    {
        if (Glide is not { } glide) return 0.0;
        var strokes = 2 * distanceM / SteadyGlide.HorizontalDistancePerCycleM(GliderTransectBandM, glide.GlidePathAngleRad);
        return strokes * PumpStrokeJ(meanDownM + (GliderTransectBandM / 2));
    }

    private static GliderCoefficients Coefficients(GliderSettings g) => new(0.0, g.LiftSlopeKgPerMRad, g.DragOffsetKgPerM, g.DragQuadraticKgPerMRad2);
}
