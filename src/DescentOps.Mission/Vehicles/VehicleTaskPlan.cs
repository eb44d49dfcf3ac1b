using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Vehicles;

/// <summary>
/// The legs of each task's cycle. Tasks are flown relative to where the vehicle is, not re-centred on the dock, so a
/// current carries the work away over the cycles; only the way home aims at the dock.
/// </summary>
public static class VehicleTaskPlan
{
    public static int LegsPerCycle(VehicleTask task) => task switch
    {
        VehicleTask.WaterColumn or VehicleTask.IceMapping => 2,
        VehicleTask.Sampling => 3,
        VehicleTask.SeafloorSurvey => 4,
        _ => throw new ArgumentOutOfRangeException(nameof(task), task, null),
    };

    /// <summary>Leg <paramref name="legIndex"/> of cycle <paramref name="cycle"/> starting at <paramref name="at"/>.</summary>
    public static PlannedLeg Leg(VehiclePerformance performance, int cycle, int legIndex, OceanVector at)
    {
        var vehicle = performance.Vehicle;
        var last = legIndex == LegsPerCycle(vehicle.Task) - 1;
        // A glider turns about at each cycle so that its dives do not walk it away along one heading.
        var heading = vehicle.HeadingRad + (vehicle.Task == VehicleTask.WaterColumn && cycle % 2 == 1 ? Math.PI : 0.0);
        return (vehicle.Task, legIndex) switch
        {
            (VehicleTask.WaterColumn, 0) or (VehicleTask.SeafloorSurvey, 0) or (VehicleTask.Sampling, 0) => Vertical(performance, "descend", at.Down, vehicle.ProfileDepthM, heading, last),
            (VehicleTask.WaterColumn, _) or (VehicleTask.SeafloorSurvey, 3) or (VehicleTask.Sampling, 2) => Vertical(performance, "ascend", at.Down, 0.0, heading, last),
            (VehicleTask.Sampling, 1) => new PlannedLeg("sample", OceanVector.Zero, 0.0, 0.0, vehicle.SampleTimeS, vehicle.HotelPowerW, 0.0, null, last),
            (VehicleTask.IceMapping, 0) or (VehicleTask.SeafloorSurvey, 1) => Transect(performance, "transect out", vehicle.HeadingRad, at.Down, last),
            _ => Transect(performance, "transect back", vehicle.HeadingRad + Math.PI, at.Down, last),
        };
    }

    /// <summary>The way home: a straight course at cruise speed from where the vehicle is to the dock.</summary>
    public static PlannedLeg Home(VehiclePerformance performance, OceanVector at)
    {
        var distance = at.Length;
        var direction = distance > 0 ? at * (-1.0 / distance) : OceanVector.Zero;
        return new PlannedLeg("return", direction * performance.CruiseSpeedMPerS, distance, performance.CruiseSpeedMPerS, 0.0, performance.MovingPowerW, performance.TransectPumpEnergyJ(distance, at.Down / 2), 0.0, false);
    }

    private static PlannedLeg Vertical(VehiclePerformance performance, string purpose, double fromDownM, double toDownM, double headingRad, bool last)
    {
        var extent = Math.Abs(toDownM - fromDownM);
        var sign = toDownM >= fromDownM ? 1.0 : -1.0;
        if (performance.Glide is { } glide)
        {
            var velocity = OceanVector.Horizontal(glide.HorizontalSpeedMPerS, headingRad) + new OceanVector(0, 0, sign * glide.VerticalSpeedMPerS);
            return new PlannedLeg(purpose, velocity, extent, glide.VerticalSpeedMPerS, 0.0, performance.MovingPowerW, performance.PumpStrokeJ(toDownM), toDownM, last);
        }

        var speed = performance.Vehicle.SpeedMPerS;
        return new PlannedLeg(purpose, new OceanVector(0, 0, sign * speed), extent, speed, 0.0, performance.MovingPowerW, 0.0, toDownM, last);
    }

    private static PlannedLeg Transect(VehiclePerformance performance, string purpose, double headingRad, double downM, bool last)
    {
        var length = performance.Vehicle.TrackLengthM;
        var speed = performance.CruiseSpeedMPerS;
        return new PlannedLeg(purpose, OceanVector.Horizontal(speed, headingRad), length, speed, 0.0, performance.MovingPowerW, performance.TransectPumpEnergyJ(length, downM), null, last);
    }
}
