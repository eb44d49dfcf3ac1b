using System.CommandLine;
using DescentOps.Physics.Vehicles;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary><c>physics vehicle</c>: speed, power, energy per kilometre and endurance of a propelled ocean vehicle.</summary>
internal static class VehicleSubcommand
{
    /// <summary>Default battery, 1.5 kWh (RULE: the size of the default scenario's first vehicle).</summary>
    public const double DefaultBatteryJ = 1.5 * 3.6e6;

    /// <summary>Default water density, cold seawater of practical salinity 35 near the surface (RULE).</summary>
    public const double DefaultWaterDensityKgPerM3 = 1028.0;

    public static Command Create()
    {
        var defaults = PropelledVehicle.Default;
        var speed = QuantityOption.NotRequired("--speed", QuantityKind.Speed, "Through-water speed. Default: the speed of least energy per distance (most range).");
        var propulsive = QuantityOption.NotRequired("--propulsive-power", QuantityKind.Power, "Instead of --speed: propulsive (shaft-in) power, which sets the speed.");
        var battery = QuantityOption.WithDefault("--battery", QuantityKind.Energy, "Usable battery energy.", DefaultBatteryJ, "1.5 kWh");
        var hotel = QuantityOption.WithDefault("--hotel-power", QuantityKind.Power, "Everything but propulsion.", defaults.HotelPowerW, "20 W");
        var diameter = QuantityOption.WithDefault("--diameter", QuantityKind.Length, "Hull diameter (frontal area π·d²/4).", 0.2, "0.2 m");
        var drag = new Option<double>("--drag-coefficient") { Description = "Drag coefficient on frontal area. Default: 0.2.", DefaultValueFactory = _ => defaults.DragCoefficient };
        var efficiency = new Option<double>("--efficiency") { Description = "Propeller and motor efficiency together, 0.001 to 1. Default: 0.5.", DefaultValueFactory = _ => defaults.PropulsiveEfficiency };
        var density = QuantityOption.WithDefault("--water-density", QuantityKind.Density, "Water density, 900 to 1300 kg/m³.", DefaultWaterDensityKgPerM3, "1028 kg/m³");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "vehicle",
            "A propeller-driven vehicle: drag ½ρC_D·A·V², propulsive power drag·V/η, total power = hotel + propulsive; "
            + "energy_per_km_j = total power / V · 1000 m; endurance_s = battery / total power; range_m = endurance · V.")
        {
            speed.Option, propulsive.Option, battery.Option, hotel.Option, diameter.Option, drag, efficiency, density.Option, json,
        };
        var map = new ParameterOptions
        {
            { "speedMPerS", speed }, { "propulsivePowerW", propulsive }, { "batteryEnergyJ", battery }, { "HotelPowerW", hotel },
            { "FrontalAreaM2", diameter }, { "DragCoefficient", drag }, { "PropulsiveEfficiency", efficiency },
            { "waterDensityKgPerM3", density },
        };
        command.SetAction(parse => PhysicsAction.Run("vehicle", parse, json, p =>
        {
            var d = diameter.Value(p);
            var vehicle = new PropelledVehicle(p.GetValue(drag), Math.PI * d * d / 4.0, p.GetValue(efficiency), hotel.Value(p));
            var rho = density.Value(p);
            var (givenSpeed, givenPower) = (speed.Optional(p), propulsive.Optional(p));
            if (givenSpeed is not null && givenPower is not null) throw new UsageException("give --speed or --propulsive-power, not both.");
            var bestSpeed = PropelledVehicleModel.MaximumRangeSpeedMPerS(vehicle, rho);
            var v = givenSpeed ?? (givenPower is { } w ? PropelledVehicleModel.SpeedForPropulsivePowerMPerS(vehicle, w, rho) : bestSpeed);
            var point = PropelledVehicleModel.AtSpeed(vehicle, v, rho, battery.Value(p));
            return new PhysicsReport("propelled vehicle")
                .Number("speed_m_s", "speed", point.SpeedMPerS, "m/s")
                .Number("drag_n", "drag", point.DragN, "N")
                .Number("propulsive_power_w", "propulsive power", point.PropulsivePowerW, "W")
                .Number("total_power_w", "total power", point.TotalPowerW, "W")
                .Number("energy_per_km_j", "energy per km", point.EnergyPerMetreJPerM * 1000.0, "J/km")
                .Number("endurance_s", "endurance", point.EnduranceS, "s")
                .Number("range_m", "range", point.RangeM, "m")
                .Number("max_range_speed_m_s", "speed of most range", bestSpeed, "m/s");
        }, map));
        return command;
    }
}
