using System.CommandLine;
using DescentOps.Physics.Descent;
using DescentOps.Physics.Ice;
using DescentOps.Physics.Water;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// <c>physics descent</c>: the steady descent speed of a cylindrical probe and where its power goes, from the
/// same <see cref="SteadyDescent"/> solution the simulator uses at every depth node.
/// </summary>
internal static class DescentSubcommand
{
    /// <summary>Standard gravity: the defaults describe a test in a laboratory cold room.</summary>
    public const double DefaultGravityMPerS2 = 9.80665;

    /// <summary>One standard atmosphere, the laboratory default.</summary>
    public const double DefaultPressurePa = 101_325.0;

    /// <summary>Mean density assumed for the default mass, about that of a packed steel-and-electronics probe (RULE).</summary>
    public const double DefaultMeanDensityKgPerM3 = 2000.0;

    public static Command Create()
    {
        var radius = QuantityOption.Required("--radius", QuantityKind.Length, "Radius of the head and body.");
        var length = QuantityOption.Required("--length", QuantityKind.Length, "Length of the probe.");
        var headPower = QuantityOption.Required("--head-power", QuantityKind.Power, "Heater power in the head.");
        var temperature = QuantityOption.Required("--temperature", QuantityKind.Temperature, "Far-field ice temperature, 50 K up to the melting point at the pressure.");
        var pressure = QuantityOption.WithDefault("--pressure", QuantityKind.Pressure, "Absolute pressure at the head, 611.657 Pa to 50 MPa.", DefaultPressurePa, "101325 Pa (one standard atmosphere)");
        var wallPower = QuantityOption.WithDefault("--wall-power", QuantityKind.Power, "Side-wall heater power.", 0.0, "0 W");
        var mass = QuantityOption.NotRequired("--mass", QuantityKind.Mass, "Probe mass, which presses the head onto its melt film. Default: a mean density of 2000 kg/m³, i.e. 2000·πR²ℓ.");
        var gravity = QuantityOption.WithDefault("--gravity", QuantityKind.Acceleration, "Gravity, 0.001 to 30 m/s².", DefaultGravityMPerS2, "9.80665 m/s² (standard gravity)");
        var gap = QuantityOption.WithDefault("--gap", QuantityKind.Length, "Water gap around the body where nothing froze or melted (the side balance's design gap).", SteadyDescent.DefaultDesignGapM, "0.5 mm");
        var json = PhysicsAction.JsonOption();
        var command = new Command(
            "descent",
            "Steady descent speed and power breakdown of a melt probe. The sinks add up to the power in: "
            + "sensible_w + latent_w + lateral_loss_w + wall_surplus_w = power_in_w = head_power_w + wall_power_w. "
            + "A stalled probe (power too low to hold its surface at the melting point) does not move and loses all its power laterally.")
        {
            radius.Option, length.Option, headPower.Option, temperature.Option, pressure.Option, wallPower.Option, mass.Option, gravity.Option, gap.Option, json,
        };
        var map = new ParameterOptions
        {
            { "RadiusM", radius }, { "LengthM", length }, { "MassKg", mass }, { "geometry", mass },
            { "headPowerW", headPower }, { "wallPowerW", wallPower }, { "farFieldTemperatureK", temperature },
            { "pressurePa", pressure }, { "gravityMPerS2", gravity }, { "designGapM", gap },
        };
        command.SetAction(parse => PhysicsAction.Run("descent", parse, json, p =>
        {
            var r = radius.Value(p);
            var l = length.Value(p);
            var m = mass.Optional(p) ?? (DefaultMeanDensityKgPerM3 * Math.PI * r * r * l);
            var head = headPower.Value(p);
            var wall = wallPower.Value(p);
            var pa = pressure.Value(p);
            var geometry = new ProbeGeometry(r, l, m);
            var s = SteadyDescent.Solve(geometry, head, wall, temperature.Value(p), pa, gravity.Value(p), null, gap.Value(p));
            return new PhysicsReport("steady descent")
                .Number("velocity_m_s", "descent speed", s.VelocityMPerS, "m/s")
                .Number("ideal_velocity_m_s", "ideal speed (all head power melts ice ahead)", s.IdealVelocityMPerS, "m/s")
                .Number("head_power_w", "head power in", s.HeadPowerW, "W")
                .Number("wall_power_w", "wall power in", s.WallPowerW, "W")
                .Number("power_in_w", "power in (head + wall)", s.HeadPowerW + s.WallPowerW, "W")
                .Number("sensible_w", "  warming ice to the melting point", s.SensibleW, "W")
                .Number("latent_w", "  melting it", s.LatentW, "W")
                .Number("lateral_loss_w", "  conducted through the side wall", s.LateralLossW, "W")
                .Number("wall_surplus_w", "  wall surplus (widens the hole)", s.WallSurplusW, "W")
                .Number("film_superheat_w", "film water heat carried to the wall (superheat and boil-off)", s.FilmSuperheatW, "W")
                .Number("required_wall_power_w", "wall power needed to hold the whole wall at T_m", s.RequiredWallPowerW, "W")
                .Number("required_side_heat_w", "side heat needed to keep the gap open (film + wall)", s.Side?.RequiredSideHeatW ?? double.NaN, "W")
                .Number("side_heat_supplied_w", "side heat supplied (film + wall)", s.Side?.SideHeatSuppliedW ?? double.NaN, "W")
                .Number("refreeze_closure_m", "refrozen water closes the gap this far behind the head", s.Side?.RefreezeClosureM ?? double.NaN, "m")
                .Flag("held", "held by refrozen water within the body", s.Side?.Held ?? false)
                .Number("clearance_m", "mean water gap along the body (steering clearance)", s.Side?.ClearanceM ?? double.NaN, "m")
                .Number("boil_off_w", "head power boiling film water (film at the boiling point)", s.BoilOffW, "W")
                .Number("boiling_temperature_k", "boiling point of water at p (IAPWS-IF97)", s.BoilingTemperatureK, "K")
                .Flag("wall_power_sufficient", "wall power sufficient", s.WallPowerSufficient)
                .Flag("stalled", "stalled", s.Stalled)
                .Number("head_efficiency", "head efficiency", s.HeadEfficiency, "")
                .Number("film_thickness_m", "melt film thickness", s.FilmThicknessM, "m")
                .Number("head_superheat_k", "head superheat over melting point", s.HeadSuperheatK, "K")
                .Number("melting_temperature_k", "melting temperature at p", MeltingCurve.TemperatureK(pa), "K")
                .Number("mass_kg", "probe mass", m, "kg")
                .Number("net_load_n", "net load on the film (weight less buoyancy)", (m - (LiquidWater.DensityKgPerM3 * geometry.VolumeM3)) * gravity.Value(p), "N");
        }, map));
        return command;
    }
}
