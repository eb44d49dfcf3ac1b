using System.CommandLine;
using DescentOps.Mission.Vehicles;
using DescentOps.Physics.Vehicles;
using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Model;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics glider</c>: the steady glide, pump stroke, energy per kilometre and endurance of a buoyancy glider, from
/// the same performance model the simulated vehicles fly.
/// </summary>
internal static class GliderSubcommand
{
    /// <summary>Default hotel load of a glider, 2 W (RULE: the built-in flat-battery scenario's glider).</summary>
    public const double DefaultHotelPowerW = 2.0;

    /// <summary>Standard gravity, the default when no body is named.</summary>
    public const double StandardGravityMPerS2 = 9.80665;

    public static Command Create()
    {
        var graver = GliderCoefficients.Graver2005;
        var buoyancy = QuantityOption.Required("--net-buoyancy", QuantityKind.Mass, "Net heaviness when diving (and buoyancy when climbing), as a mass.");
        var angle = QuantityOption.Required("--glide-angle", QuantityKind.Angle, "Glide path angle below or above the horizontal.");
        var gravity = QuantityOption.WithDefault("--gravity", QuantityKind.Acceleration, "Gravity of the body.", StandardGravityMPerS2, "9.80665 m/s²");
        var hotel = QuantityOption.WithDefault("--hotel-power", QuantityKind.Power, "Everything but the pump.", DefaultHotelPowerW, "2 W");
        var battery = QuantityOption.WithDefault("--battery", QuantityKind.Energy, "Usable battery energy.", VehicleSubcommand.DefaultBatteryJ, "1.5 kWh");
        var pressure = QuantityOption.WithDefault("--pressure", QuantityKind.Pressure, "Sea pressure at the top of the water (under a shell: the ice overburden).", 0.0, "0 Pa");
        var density = QuantityOption.WithDefault("--water-density", QuantityKind.Density, "Water density, 900 to 1300 kg/m³.", VehicleSubcommand.DefaultWaterDensityKgPerM3, "1028 kg/m³");
        var pump = new Option<double>("--pump-efficiency") { Description = "Buoyancy pump efficiency, 0.001 to 1. Default: 0.5.", DefaultValueFactory = _ => Scenarios.Loading.ScenarioLoader.DefaultPumpEfficiency };
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "glider",
            "A buoyancy glider in steady glide (Leonard and Graver 2001 form, K_L 132.5, K_D0 2.15, K_D 25): speed √(m0·g/√(L²+D²)); "
            + "one pump stroke 2·m0/ρ · p_abs / η per turn of a 50 m yo-yo band; energy_per_km_j = (hotel + pump power) / horizontal speed · 1000 m; "
            + "endurance_s = battery / (hotel + pump power).")
        {
            buoyancy.Option, angle.Option, gravity.Option, hotel.Option, battery.Option, pressure.Option, density.Option, pump, json,
        };
        var map = new ParameterOptions
        {
            { "netHeavinessKg", buoyancy }, { "glidePathAngleRad", angle }, { "gravityMPerS2", gravity },
            { "pumpEfficiency", pump }, { "absolutePressurePa", pressure },
        };
        command.SetAction(parse => PhysicsAction.Run("glider", parse, json, p =>
        {
            var settings = new GliderSettings(buoyancy.Value(p), angle.Value(p), graver.LiftSlopeKgPerMRad, graver.DragOffsetKgPerM, graver.DragQuadraticKgPerMRad2, p.GetValue(pump));
            var vehicle = new VehicleModel("glider", battery.Value(p), 0.0, hotel.Value(p), 0.0, 0.0, 1.0, 0.0, VehicleKind.Glider, Glider: settings);
            var performance = VehiclePerformance.For(vehicle, density.Value(p), gravity.Value(p), pressure.Value(p));
            var glide = performance.Glide!;
            var perMetreJ = performance.CruiseEnergyJ(1000.0, 0.0) / 1000.0;
            var enduranceS = vehicle.BatteryEnergyJ / (perMetreJ * glide.HorizontalSpeedMPerS);
            return new PhysicsReport("buoyancy glider")
                .Number("angle_of_attack_rad", "angle of attack", glide.AngleOfAttackRad, "rad")
                .Number("glide_path_angle_rad", "glide path angle", glide.GlidePathAngleRad, "rad")
                .Number("min_glide_path_angle_rad", "shallowest glide", SteadyGlide.MinimumGlidePathAngleRad(GliderCoefficients.Graver2005), "rad")
                .Number("speed_m_s", "speed", glide.SpeedMPerS, "m/s")
                .Number("horizontal_speed_m_s", "horizontal speed", glide.HorizontalSpeedMPerS, "m/s")
                .Number("vertical_speed_m_s", "vertical speed", glide.VerticalSpeedMPerS, "m/s")
                .Number("pump_stroke_j", "pump stroke at mid-band", performance.PumpStrokeJ(VehiclePerformance.GliderTransectBandM / 2), "J")
                .Number("energy_per_km_j", "energy per km", perMetreJ * 1000.0, "J/km")
                .Number("endurance_s", "endurance", enduranceS, "s")
                .Number("range_m", "range", enduranceS * glide.HorizontalSpeedMPerS, "m");
        }, map));
        return command;
    }
}
