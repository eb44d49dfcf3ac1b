using System.CommandLine;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics jets</c>: the hot-water jet mode's energy balance. Given the jet heat and either the hole radius or the
/// speed, it answers the other, the clearance around the probe and the freeze-back time of that clearance.
/// </summary>
internal static class JetsSubcommand
{
    public static Command Create()
    {
        var power = QuantityOption.Required("--power", QuantityKind.Power, "Heat the jets deliver to the water (the heaters' share, not the pump's electric draw).");
        var hole = QuantityOption.NotRequired("--hole-radius", QuantityKind.Length, "Radius of the hole to cut; give this or --speed.");
        var speed = QuantityOption.NotRequired("--speed", QuantityKind.Speed, "Descent speed; give this or --hole-radius.");
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Far-field ice temperature.");
        var melting = QuantityOption.WithDefault("--melting-temperature", QuantityKind.Temperature, "Melting temperature at the hole wall, 269 K to 273.16 K.", TriplePoint.TemperatureK, "273.16 K");
        var radius = QuantityOption.Required("--probe-radius", QuantityKind.Length, "Outer radius of the probe.");
        var length = QuantityOption.Required("--probe-length", QuantityKind.Length, "Length of the probe body (the wall stays warm while it passes).");
        var minimum = QuantityOption.NotRequired("--minimum-hole-radius", QuantityKind.Length, "Smallest hole the jets may cut (default: the probe radius).");
        var pump = QuantityOption.WithDefault("--pump-power", QuantityKind.Power, "Electric draw of the jet pump, added to the power bill.", 0.0, "0 W");
        var efficiency = new Option<double>("--efficiency") { Description = $"Share of jet heat that melts the hole, 0 to 1 (default {HotWaterJet.DefaultEfficiency}: a rule of thumb of hot-water drilling, 0.6–0.9).", DefaultValueFactory = _ => HotWaterJet.DefaultEfficiency };
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "jets",
            "Hot-water jet mode: η·P = π·R_h²·v·ρ_i·(L + Δh_s) gives the hole radius from the speed or the speed from the hole radius; the clearance R_h − R and its freeze-back time if the probe stops.")
        {
            power.Option, hole.Option, speed.Option, temperature.Option, melting.Option, radius.Option, length.Option, minimum.Option, pump.Option, efficiency, json,
        };
        var map = new ParameterOptions
        {
            { "jetHeatW", power }, { "holeRadiusM", hole }, { "speedMPerS", speed }, { "probeRadiusM", radius }, { "probeLengthM", length },
            { "minimumHoleRadiusM", minimum }, { "efficiency", efficiency }, { "farFieldTemperatureK", temperature },
        };
        command.SetAction(parse => PhysicsAction.Run("jets", parse, json, p =>
        {
            var heat = power.Value(p);
            var t = temperature.Value(p);
            var tm = melting.Value(p);
            var eta = p.GetValue(efficiency);
            var r = radius.Value(p);
            var holeGiven = hole.Optional(p);
            var speedGiven = speed.Optional(p);
            if ((holeGiven is null) == (speedGiven is null)) throw new UsageException("give exactly one of --hole-radius and --speed.");
            var holeRadius = holeGiven ?? HotWaterJet.HoleRadiusM(heat, speedGiven!.Value, t, tm, eta);
            var point = HotWaterJet.At(heat, holeRadius, minimum.Optional(p) ?? r, r, length.Value(p), t, tm, eta);
            var electric = pump.Value(p);
            return new PhysicsReport("hot-water jets")
                .Number("hole_radius_m", "hole radius", point.HoleRadiusM, "m")
                .Number("speed_m_s", "descent speed", point.SpeedMPerS, "m/s")
                .Number("speed_m_h", "descent speed", point.SpeedMPerS * 3600.0, "m/h")
                .Number("clearance_m", "radial clearance around the probe", point.ClearanceM, "m")
                .Number("freeze_back_time_s", "freeze-back of the clearance if the probe stops", point.FreezeBackTimeS, "s")
                .Number("pump_power_w", "pump electric draw", electric, "W")
                .Number("energy_per_metre_j", "jet heat and pump energy per metre of descent", (heat + electric) / point.SpeedMPerS, "J/m");
        }, map));
        return command;
    }
}
